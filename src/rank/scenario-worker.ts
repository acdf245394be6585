/**
 * The worker side of `pagerank-threads.ts`: solve the scenarios it was given with
 * `pagerankScenarios` and write the results into the shared buffers, then set the status word.
 * Loaded by a worker thread from the built `dist/rank/scenario-worker.js`.
 */
import { workerData } from 'node:worker_threads';
import { DONE, FAILED } from '../parallel/beside.js';
import { pagerankScenarios } from './pagerank-batch.js';
import type { ScenarioShare } from './pagerank-threads.js';

const share = workerData as ScenarioShare & { status: SharedArrayBuffer };
const status = new Int32Array(share.status);
try {
  const result = pagerankScenarios(share.forward, share.reverse, share.n, share.options, share.scenarios, share.start, share.at);
  const values = new Float64Array(share.values);
  let k = 0;
  for (const v of result.values) for (let j = 0; j < v.length; j++) values[k++] = v[j];
  new Int32Array(share.iterations).set(result.iterations);
  new Uint8Array(share.converged).set(result.converged);
  Atomics.store(status, 0, DONE);
} catch {
  Atomics.store(status, 0, FAILED);
}
Atomics.notify(status, 0);
