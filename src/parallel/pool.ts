/**
 * Parsing batches of files in a piscina worker pool. Results are placed by index, so the
 * output order is the input order whatever order batches finish in; a batch a worker cannot
 * parse (no worker file, a crashed thread) is parsed on the main thread instead.
 */
import { Piscina } from 'piscina';
import type { ResolvedOptions } from '../config/options.js';
import { parseSource } from '../parse/index.js';
import type { PageFacts, SourceFile } from '../types.js';
import { compiledModule } from './beside.js';
import { makeBatches } from './plan.js';
import type { ParseTask, WorkerStats } from './types.js';

/**
 * The worker module. A worker thread cannot run TypeScript, so when this module itself runs from
 * the sources (`src/parallel/pool.ts` under vitest), the compiled worker in `dist/` is used
 * (`npm test` and the vitest global setup build it first).
 */
export function workerUrl(moduleUrl: string = import.meta.url): URL {
  return compiledModule(moduleUrl, './worker.js', 'parallel/worker.js');
}

/**
 * Parse `files` with `threads` worker threads.
 * @param onParsed called with the number of files of each batch as it completes
 * @param worker the worker module (tests give a missing one to see the fallback)
 */
export async function parseInPool(
  files: readonly SourceFile[],
  options: ResolvedOptions,
  threads: number,
  onParsed: (count: number) => void,
  worker: URL = workerUrl(),
): Promise<{ facts: PageFacts[]; stats: WorkerStats }> {
  const batches = makeBatches(files, threads);
  const used = Math.min(threads, batches.length);
  const facts: PageFacts[] = new Array(files.length);
  const pool = new Piscina<ParseTask, PageFacts[]>({
    filename: worker.href,
    minThreads: used,
    maxThreads: used,
    idleTimeout: 1000,
  });
  let fallback: string | null = null;
  // A worker that fails while starting (say, its module cannot be loaded) is not replaced and
  // its queued tasks would wait forever: end the pool, which rejects them, so the batches fall
  // back to the main thread below.
  let broken: Promise<void> | null = null;
  pool.on('error', (error: unknown) => {
    fallback ??= error instanceof Error ? error.message : String(error);
    broken ??= pool.destroy();
  });
  try {
    await Promise.all(
      batches.map(async ({ start, end }) => {
        const batch = files.slice(start, end);
        let out: PageFacts[];
        try {
          out = await pool.run({ files: batch, options });
          if (!Array.isArray(out) || out.length !== batch.length) throw new Error('a worker returned a result of the wrong length');
        } catch (error) {
          fallback ??= error instanceof Error ? error.message : String(error);
          out = batch.map((f) => parseSource(f, options));
        }
        for (let i = 0; i < out.length; i++) facts[start + i] = out[i];
        onParsed(batch.length);
      }),
    );
  } finally {
    await (broken ?? pool.destroy());
  }
  return { facts, stats: { threads: used, batches: batches.length, fallback } };
}
