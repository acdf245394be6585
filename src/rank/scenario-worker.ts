/**
 * The worker side of `pagerank-threads.ts`: solve the scenarios it was given with
 * `pagerankScenarios` and write the results into the shared buffers. Loaded by a worker thread
 * from the built `dist/rank/scenario-worker.js`. The solver is imported inside the reported work,
 * so a module that fails to load reports a failure instead of leaving the main thread waiting.
 */
import { workerData } from 'node:worker_threads';
import { reportBeside } from '../parallel/beside.js';
import type { ScenarioShare } from './pagerank-threads.js';

const share = workerData as ScenarioShare & { status: SharedArrayBuffer };
await reportBeside(share.status, async () => {
  const { pagerankScenarios } = await import('./pagerank-batch.js');
  const result = pagerankScenarios(share.forward, share.reverse, share.n, share.options, share.scenarios, share.start, share.at);
  const values = new Float64Array(share.values);
  let k = 0;
  for (const v of result.values) for (let j = 0; j < v.length; j++) values[k++] = v[j];
  new Int32Array(share.iterations).set(result.iterations);
  new Uint8Array(share.converged).set(result.converged);
});
