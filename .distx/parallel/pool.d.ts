import type { ResolvedOptions } from '../options.js';
import type { PageFacts, SourceFile } from '../types.js';
import type { WorkerStats } from './types.js';
/**
 * The worker module. A worker thread cannot run TypeScript, so when this module itself runs from
 * the sources (`src/parallel/pool.ts` under vitest), the compiled worker in `dist/` is used
 * (`npm test` and the vitest global setup build it first).
 */
export declare function workerUrl(moduleUrl?: string): URL;
/**
 * Parse `files` with `threads` worker threads.
 * @param onParsed called with the number of files of each batch as it completes
 * @param worker the worker module (tests give a missing one to see the fallback)
 */
export declare function parseInPool(files: readonly SourceFile[], options: ResolvedOptions, threads: number, onParsed: (count: number) => void, worker?: URL): Promise<{
    facts: PageFacts[];
    stats: WorkerStats;
}>;
