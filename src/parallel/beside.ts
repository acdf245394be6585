/**
 * One worker thread that works beside the main thread while the main thread does its own share,
 * for a synchronous caller: the worker reports through shared memory (`Atomics`), so the main
 * thread can wait for it without returning to the event loop. Used by the impact predictions'
 * batched PageRank (`rank/pagerank-threads.ts`), whose callers are synchronous.
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';

/** Values of the shared status word: set by the worker, read by the main thread. */
export const PENDING = 0;
/** The worker's module has loaded and it has started on its share. */
export const STARTED = 1;
export const DONE = 2;
export const FAILED = 3;

/** How long a worker may take to load and start before the caller does its share itself. */
export const START_TIMEOUT_MS = 5000;

/**
 * A compiled module for a worker thread. A worker thread cannot run TypeScript, so when the
 * caller runs from the sources (under vitest), the compiled one in `dist/` is used (`npm test`
 * and the vitest global setup build it first).
 * @param moduleUrl the caller's `import.meta.url`
 * @param fromCaller the compiled module's path relative to the caller's folder
 * @param fromDist the same, relative to `dist/`
 */
export function compiledModule(moduleUrl: string, fromCaller: string, fromDist: string): URL {
  return moduleUrl.endsWith('.ts') ? new URL(`../../dist/${fromDist}`, moduleUrl) : new URL(fromCaller, moduleUrl);
}

/** A worker started by {@link startBeside}. */
export interface Beside {
  /**
   * Wait until the worker reports: at most {@link START_TIMEOUT_MS} for it to start, then at most
   * `timeoutMs` for it to finish.
   * @returns true when it finished its share, false when it failed, did not start or did not
   *   finish in time (it is then stopped, and the caller does the share itself)
   */
  wait(timeoutMs: number): boolean;
  /** Stop the worker (when the caller gives up before waiting, say on an error of its own). */
  cancel(): void;
}

/**
 * Start a worker on `module` with `data` (copied to it; SharedArrayBuffers are shared) and a
 * status word it sets to {@link DONE} or {@link FAILED} through `Atomics`.
 * @returns null when the module is not there (nothing started)
 */
export function startBeside(module: URL, data: object): Beside | null {
  if (!existsSync(fileURLToPath(module))) return null;
  const status = new Int32Array(new SharedArrayBuffer(4));
  let worker: Worker;
  try {
    worker = new Worker(module, { workerData: { ...data, status: status.buffer } });
  } catch {
    return null;
  }
  worker.unref();
  // The event loop is not turned while the main thread waits, so an error the worker cannot
  // report itself (a thread that cannot start, a crash) shows as a status that stays PENDING
  // (the start wait runs out) or STARTED (the finish wait runs out).
  worker.on('error', () => undefined);
  const until = (from: number, ms: number): void => {
    const end = Date.now() + ms;
    while (Atomics.load(status, 0) === from) {
      const left = end - Date.now();
      if (left <= 0 || Atomics.wait(status, 0, from, left) === 'timed-out') return;
    }
  };
  return {
    wait(timeoutMs: number): boolean {
      until(PENDING, START_TIMEOUT_MS);
      until(STARTED, timeoutMs);
      const done = Atomics.load(status, 0) === DONE;
      if (!done) void worker.terminate();
      return done;
    },
    cancel(): void {
      void worker.terminate();
    },
  };
}

/**
 * The worker side: set {@link STARTED}, run `work`, then set {@link DONE}, or {@link FAILED} when
 * it throws (its module failing to load included, when `work` imports it).
 * @param status the status word's buffer (`workerData.status`)
 */
export async function reportBeside(status: SharedArrayBuffer, work: () => Promise<void>): Promise<void> {
  const word = new Int32Array(status);
  Atomics.store(word, 0, STARTED);
  Atomics.notify(word, 0);
  let end: number = DONE;
  try {
    await work();
  } catch {
    end = FAILED;
  }
  Atomics.store(word, 0, end);
  Atomics.notify(word, 0);
}
