/** How many worker threads to parse with, and how to cut the files into batches. Pure. */
import type { SourceFile } from '../types.js';

/**
 * Least number of files to parse (after cache hits) before `workers: 0` (automatic) starts a
 * pool. Starting threads and loading the parser in each costs about 0.2-0.3 s, and copying
 * facts back to the main thread costs a share of what the workers save, so small runs stay on
 * the main thread.
 */
export const AUTO_MIN_FILES = 2000;

/**
 * Least cores for `workers: 0` to start a pool. Measured on a 2-core machine (4,000 pages of
 * 5 KB, shared with other work): two workers used 28% more CPU time than the main thread alone
 * (each thread loads and warms up its own parser; facts are copied back) and finished no
 * sooner (0.8-0.9x); the issue's own note saw about 1.1x at best, since V8's helper threads
 * already keep a second core busy. So on two cores the automatic choice is the main thread.
 * Tried again with the main thread parsing batches beside one worker (10,000 generated pages,
 * `check`, runs interleaved at raised priority): 64.6 and 72.4 s against 53.6 and 57.3 s for the
 * main thread alone, with 25% more CPU time, so that was not kept either.
 */
export const AUTO_MIN_CORES = 3;

/** Most threads `workers: 0` starts. */
export const AUTO_MAX_THREADS = 8;

/**
 * Worker threads to use; 1 means parse on the main thread.
 * @param setting `options.workers`: 0 automatic, 1 main thread only, N exactly N workers
 * @param files number of files to parse
 * @param cores `os.availableParallelism()` of this machine
 * @returns for `setting` 0: 1 below `AUTO_MIN_FILES` files or `AUTO_MIN_CORES` cores, else one
 *   worker per core but one (the main thread receives the results), at most `AUTO_MAX_THREADS`
 */
export function chooseThreads(setting: number, files: number, cores: number): number {
  if (files === 0) return 1;
  if (setting >= 1) return setting;
  if (files < AUTO_MIN_FILES || cores < AUTO_MIN_CORES) return 1;
  return Math.min(cores - 1, AUTO_MAX_THREADS);
}

/** A run of consecutive files `[start, end)` sent to a worker in one message. */
export interface Batch {
  readonly start: number;
  readonly end: number;
}

/** Bounds of a batch's size in UTF-16 code units of source text. */
const MIN_BATCH_CHARS = 32 * 1024;
const MAX_BATCH_CHARS = 1024 * 1024;
/** Most files in one batch. */
const MAX_BATCH_FILES = 256;
/** Batches per thread, at least, so a slow batch at the end does not leave the other threads idle. */
const BATCHES_PER_THREAD = 8;

/**
 * Cut `files` into consecutive batches of about equal text size: at least `BATCHES_PER_THREAD`
 * per thread (for balance), at most 1 MiB of text or 256 files each (so results come back in
 * steady steps), at least 32 KiB (so a message carries real work).
 */
export function makeBatches(files: readonly SourceFile[], threads: number): Batch[] {
  let total = 0;
  for (const f of files) total += f.text.length;
  const target = Math.min(MAX_BATCH_CHARS, Math.max(MIN_BATCH_CHARS, Math.ceil(total / (threads * BATCHES_PER_THREAD))));
  const batches: Batch[] = [];
  let start = 0;
  let size = 0;
  for (let i = 0; i < files.length; i++) {
    size += files[i].text.length;
    if (size >= target || i + 1 - start >= MAX_BATCH_FILES) {
      batches.push({ start, end: i + 1 });
      start = i + 1;
      size = 0;
    }
  }
  if (start < files.length) batches.push({ start, end: files.length });
  return batches;
}
