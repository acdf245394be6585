/**
 * One worker thread that works beside the main thread while the main thread does its own share,
 * for a synchronous caller: the worker reports through shared memory (`Atomics`), so the main
 * thread can wait for it without returning to the event loop. Used by the impact predictions'
 * batched PageRank (`rank/pagerank-threads.ts`), whose callers are synchronous.
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';

/** Values of the shared status word. */
export const PENDING = 0;
export const DONE = 1;
export const FAILED = 2;

/**
 * The compiled module at `path` (relative to `dist/`). A worker thread cannot run TypeScript, so
 * when the caller runs from the sources (under vitest), the compiled one in `dist/` is used.
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
   * Wait until the worker reports (at most `timeoutMs`).
   * @returns true when it finished its share, false when it failed or did not finish in time
   *   (it is then stopped, and the caller does the share itself)
   */
  wait(timeoutMs: number): boolean;
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
  // The event loop is not turned while the main thread waits: an error the worker cannot report
  // itself (say, its module fails to load) shows as a status that never changes, and the wait
  // runs out.
  worker.on('error', () => undefined);
  return {
    wait(timeoutMs: number): boolean {
      const end = Date.now() + timeoutMs;
      while (Atomics.load(status, 0) === PENDING) {
        const left = end - Date.now();
        if (left <= 0 || Atomics.wait(status, 0, PENDING, left) === 'timed-out') break;
      }
      const done = Atomics.load(status, 0) === DONE;
      if (!done) void worker.terminate();
      return done;
    },
  };
}
