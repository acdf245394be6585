/** Parse files on the main thread or in a worker pool, by `options.workers` and the file count. */
import type { ResolvedOptions } from '../config/options.js';
import { parseSource } from '../parse/index.js';
import type { PageFacts, SourceFile } from '../types.js';
import { chooseThreads } from './plan.js';
import { parseInPool } from './pool.js';
import type { WorkerStats } from './types.js';

/** Files parsed on the main thread between two turns of the event loop (progress, signals). */
const MAIN_STEP = 64;

/** What `parseFiles` needs besides the files and options. */
export interface ParseFilesSettings {
  /** `os.availableParallelism()`, read by the caller. */
  readonly cores: number;
  /** Called with the number of files of each step as it is parsed. */
  readonly onParsed?: (count: number) => void;
}

/**
 * Facts of every file in the order of `files`, identical whichever path parses them: the main
 * thread (`options.workers` 1, or automatic below `AUTO_MIN_FILES` files) or a pool of worker
 * threads (`options.workers` N >= 2, or automatic: one per core).
 */
export async function parseFiles(
  files: readonly SourceFile[],
  options: ResolvedOptions,
  settings: ParseFilesSettings,
): Promise<{ facts: PageFacts[]; stats: WorkerStats }> {
  const onParsed = settings.onParsed ?? (() => undefined);
  const threads = chooseThreads(options.workers, files.length, settings.cores);
  if (threads >= 2) return parseInPool(files, options, threads, onParsed);

  const facts: PageFacts[] = new Array(files.length);
  for (let i = 0; i < files.length; i += MAIN_STEP) {
    const end = Math.min(files.length, i + MAIN_STEP);
    for (let j = i; j < end; j++) facts[j] = parseSource(files[j], options);
    onParsed(end - i);
    if (end < files.length) await new Promise<void>((resolve) => setImmediate(resolve));
  }
  return { facts, stats: { threads: 1, batches: 0, fallback: null } };
}
