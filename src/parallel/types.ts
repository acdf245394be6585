/** Types of the parallel parse. */
import type { CacheStats } from '../cache/index.js';
import type { ResolvedOptions } from '../config/options.js';
import type { SourceFile } from '../types.js';

/** One message to a worker: a batch of files and the options to parse them with. */
export interface ParseTask {
  readonly files: readonly SourceFile[];
  readonly options: ResolvedOptions;
}

/** How the files of one run were parsed. */
export interface WorkerStats {
  /** Threads that parsed: 1 = the main thread alone. */
  readonly threads: number;
  /** Messages sent to workers (0 on the main thread). */
  readonly batches: number;
  /** When workers failed (could not start, crashed), the first error; those files were parsed on the main thread. */
  readonly fallback: string | null;
}

/** What the parse stage did: cache use and threads. */
export interface ParseStats {
  readonly cache: CacheStats;
  readonly workers: WorkerStats;
}

/**
 * Hooks of the parse stage beyond `AnalyzeHooks`: pass them in the same hooks object to
 * `analyze` (typed `AnalyzeHooks & ParseHooks`).
 */
export interface ParseHooks {
  /** Once per run, when the parse stage is done (the cache saved). */
  onParseStats?(stats: ParseStats): void;
}
