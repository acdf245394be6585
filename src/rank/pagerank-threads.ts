/**
 * `pagerankScenarios` on two threads: the main thread solves the first half of the scenarios
 * while a worker thread solves the second half, each over its own copy of the graph. Every
 * scenario follows its own arithmetic whatever lane or thread it lands on (see
 * `pagerank-batch.ts`), so the results are those of one thread to the bit; a test compares them.
 *
 * Why: the impact predictions are the suggest stage's largest single cost after the mention
 * index (about 400 scenarios, each reading the whole graph some twenty times), and unlike
 * parsing, which allocates heavily and measured slower on two threads here, this loop reads
 * typed arrays and allocates nothing: on 10,000 generated pages, 400 scenarios took 1.3-1.5 s on
 * two threads against 2.0-2.8 s on one (the same machine, busy with other work).
 *
 * The caller stays synchronous: the main thread waits for the worker through shared memory. If
 * the worker cannot start (within `START_TIMEOUT_MS`), fails, or does not finish (within ten
 * times the main thread's own half, at least 10 s), the main thread solves its half too. This
 * file and `parallel/beside.ts` are the one place where a stage starts a thread and reads the
 * clock outside the parse pool (DEVELOPERS.md, "Decisions").
 */
import { compiledModule, startBeside } from '../parallel/beside.js';
import type { Csr } from '../types.js';
import type { ExtraEdge } from './pagerank.js';
import { pagerankScenarios } from './pagerank-batch.js';
import type { ScenarioOptions, ScenarioResult } from './pagerank-batch.js';

/**
 * Least work (scenarios x edges) worth a worker thread: starting one and copying the graph to it
 * costs some tens of milliseconds, about what 2 million edge reads cost.
 */
export const MIN_SPLIT_WORK = 2_000_000;

/** What the worker gets: its scenarios, the graph, and shared buffers for its results. */
export interface ScenarioShare {
  readonly forward: Csr;
  readonly reverse: Csr;
  readonly n: number;
  readonly options: ScenarioOptions;
  readonly scenarios: readonly (readonly ExtraEdge[])[];
  readonly start: Float64Array;
  readonly at: readonly (readonly number[])[];
  /** Float64 per reported node, scenario after scenario. */
  readonly values: SharedArrayBuffer;
  /** Int32 per scenario. */
  readonly iterations: SharedArrayBuffer;
  /** Uint8 per scenario. */
  readonly converged: SharedArrayBuffer;
}

/**
 * `pagerankScenarios`, on `threads` threads (1 or 2; more are not used). Same arguments and
 * the same result, with the threads that solved it (1 when the work was too small to split or
 * the worker failed).
 * @param worker the worker module (tests give a missing one to see the fallback)
 */
export function pagerankScenariosOnThreads(
  forward: Csr,
  reverse: Csr,
  n: number,
  options: ScenarioOptions,
  scenarios: readonly (readonly ExtraEdge[])[],
  start: Float64Array,
  at: readonly (readonly number[])[],
  threads: number,
  worker: URL = compiledModule(import.meta.url, './scenario-worker.js', 'rank/scenario-worker.js'),
): ScenarioResult & { threads: number } {
  const count = scenarios.length;
  const half = Math.ceil(count / 2);
  if (threads < 2 || count < 2 || count * forward.targets.length < MIN_SPLIT_WORK) {
    return { ...pagerankScenarios(forward, reverse, n, options, scenarios, start, at), threads: 1 };
  }
  const theirs = scenarios.slice(half);
  const theirAt = at.slice(half);
  let width = 0;
  for (const nodes of theirAt) width += nodes.length;
  const share: ScenarioShare = {
    forward,
    reverse,
    n,
    options,
    scenarios: theirs,
    start,
    at: theirAt,
    values: new SharedArrayBuffer(8 * width),
    iterations: new SharedArrayBuffer(4 * theirs.length),
    converged: new SharedArrayBuffer(theirs.length),
  };
  const beside = startBeside(worker, share);
  const startedAt = Date.now();
  let mine: ScenarioResult;
  try {
    mine = pagerankScenarios(forward, reverse, n, options, scenarios.slice(0, half), start, at.slice(0, half));
  } catch (error) {
    beside?.cancel();
    throw error;
  }
  // The worker's half is about as much work as ours; allow for a busy machine before giving up.
  const done = beside !== null && beside.wait(Math.max(10_000, 10 * (Date.now() - startedAt)));
  const rest = done ? fromShare(share, theirAt) : pagerankScenarios(forward, reverse, n, options, theirs, start, theirAt);
  return {
    values: [...mine.values, ...rest.values],
    iterations: Int32Array.from([...mine.iterations, ...rest.iterations]),
    converged: Uint8Array.from([...mine.converged, ...rest.converged]),
    threads: done ? 2 : 1,
  };
}

/** The worker's results, out of the shared buffers. */
function fromShare(share: Pick<ScenarioShare, 'values' | 'iterations' | 'converged'>, at: readonly (readonly number[])[]): ScenarioResult {
  const flat = new Float64Array(share.values);
  const values: Float64Array[] = [];
  let k = 0;
  for (const nodes of at) {
    values.push(flat.slice(k, k + nodes.length));
    k += nodes.length;
  }
  return { values, iterations: new Int32Array(share.iterations).slice(), converged: new Uint8Array(share.converged).slice() };
}
