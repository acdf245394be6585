/** A one-line progress display on stderr (terminals only), fed by the pipeline's hooks. */
import type { AnalyzeHooks } from '../pipeline/index.js';
import type { TextSink } from './io.js';

/**
 * Hooks that redraw one stderr line per stage and clear it at the end.
 * @returns the hooks and `done()`, which clears the line
 */
export function progressHooks(stderr: TextSink): { hooks: AnalyzeHooks; done: () => void } {
  let shown = false;
  const draw = (text: string) => {
    stderr.write(`\r\x1b[2K${text}`);
    shown = true;
  };
  return {
    hooks: {
      onStage(stage, phase) {
        if (phase === 'start') draw(`linkweave: ${stage}`);
      },
      onProgress(stage, done, total) {
        draw(`linkweave: ${stage} ${done}/${total}`);
      },
    },
    done() {
      if (shown) stderr.write('\r\x1b[2K');
      shown = false;
    },
  };
}
