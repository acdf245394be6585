/** A one-line progress display on stderr (terminals only), fed by `analyze`'s hooks. */
import type { AnalyzeHooks } from '../analyze.js';
import type { TextSink } from './io.js';
/**
 * Hooks that redraw one stderr line per stage and clear it at the end.
 * @returns the hooks and `done()`, which clears the line
 */
export declare function progressHooks(stderr: TextSink): {
    hooks: AnalyzeHooks;
    done: () => void;
};
