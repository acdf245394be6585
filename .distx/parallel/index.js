/** Parallel parsing: the main thread or a piscina pool of worker threads, identical results. */
export { parseFiles } from './parse-files.js';
export { parseInPool, workerUrl } from './pool.js';
export { chooseThreads, makeBatches, AUTO_MIN_FILES, AUTO_MIN_CORES, AUTO_MAX_THREADS } from './plan.js';
