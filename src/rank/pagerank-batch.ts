/**
 * Many PageRank scenarios in one sweep: each scenario is the graph plus a few extra edges (the
 * links a suggestion would add), and each is solved exactly as `pagerank` in `./pagerank.ts`
 * solves it with `start` and `extraEdges` (same damping, teleport, dangling and stopping rule),
 * but up to `lanes` of them advance together, in lockstep, over one pass of the reverse CSR.
 *
 * Why: predicting the impact of every suggestion costs one power iteration over the whole graph
 * per suggestion. Run one at a time, each iteration reads every edge (target row, source index,
 * weight) and gathers one value per edge from a random place. In lockstep the state is node-major
 * (`x[v * lanes + k]` is scenario k's value at node v), so an edge is read once per iteration for
 * all lanes and its gather fetches `lanes` neighbouring values: one or two cache lines instead of
 * `lanes` misses. The inner loop over lanes runs over contiguous memory.
 *
 * A lane whose scenario converges (its own L1 change below the tolerance, or `maxIterations`
 * reached) is refilled with the next waiting scenario, so lanes stay busy; every lane follows
 * the arithmetic of its own scenario only, so results do not depend on the lane count or on
 * which lane a scenario lands in. No allocation inside the iteration loop.
 *
 * An extra edge s -> t changes s's out-weight sum, so the share of every out-edge of s changes
 * (handled by a per-scenario patch of s's inverse out-weight), and a dangling s stops being
 * dangling (its rank no longer returns through the teleport vector).
 */
import type { Csr } from '../types.js';
import { EngineError } from '../errors.js';
import { outWeightSums } from '../graph/csr.js';
import { checkLength, distribution } from './vectors.js';
import type { ExtraEdge, PagerankOptions } from './pagerank.js';
import { pullLanes, settleLanes } from './lanes.js';

/**
 * Lanes advanced together when the caller does not say. Measured (CPU time, 200-240 scenarios):
 * 8 lanes (one 64-byte gather per edge) ran 1.6-1.7x faster than one scenario at a time on
 * generated sites of 1,000 and 10,000 pages and on a 100,000-node graph; 16 lanes were no
 * faster at 10,000 and slower at 100,000 (the lane state no longer fits the cache).
 */
export const DEFAULT_LANES = 8;

/** Settings of a batched run: those of `pagerank`, plus the lane count. */
export interface ScenarioOptions extends Omit<PagerankOptions, 'start' | 'extraEdges'> {
  /** Scenarios advanced together (1 = one after another). Default {@link DEFAULT_LANES}. */
  lanes?: number;
}

/** What a batched run returns, per scenario in input order. */
export interface ScenarioResult {
  /** `values[k][j]`: scenario k's converged PageRank (sum 1) at node `at[k][j]`. */
  values: Float64Array[];
  /** Power iterations scenario k took. */
  iterations: Int32Array;
  /** 1 when scenario k's L1 change fell below the tolerance, 0 when it stopped at `maxIterations`. */
  converged: Uint8Array;
}

/**
 * PageRank of `scenarios.length` variants of one graph, each the graph plus its extra edges,
 * warm-started from `start` (normally the graph's own PageRank).
 * @param at nodes to report per scenario; default: the targets of the scenario's extra edges
 * @throws EngineError E_INTERNAL on a wrong length, a bad damping or an edge outside the graph
 */
export function pagerankScenarios(
  forward: Csr,
  reverse: Csr,
  n: number,
  opts: ScenarioOptions,
  scenarios: readonly (readonly ExtraEdge[])[],
  start: Float64Array,
  at?: readonly (readonly number[])[],
): ScenarioResult {
  const { damping, maxIterations, tolerance } = opts;
  if (!(damping > 0 && damping < 1)) throw new EngineError('E_INTERNAL', `pagerankScenarios: damping must be in (0, 1), got ${damping}`);
  checkLength('pagerankScenarios', forward.offsets.length - 1, n, 'forward CSR');
  checkLength('pagerankScenarios', reverse.offsets.length - 1, n, 'reverse CSR');
  checkLength('pagerankScenarios', start.length, n, 'start');
  if (at !== undefined && at.length !== scenarios.length) {
    throw new EngineError('E_INTERNAL', `pagerankScenarios: "at" has ${at.length} lists for ${scenarios.length} scenarios`);
  }
  const count = scenarios.length;
  const plan = planScenarios(scenarios, n, at);
  const values = plan.at.map((nodes) => new Float64Array(nodes.length));
  const iterationsOut = new Int32Array(count);
  const convergedOut = new Uint8Array(count);
  if (count === 0 || n === 0) return { values, iterations: iterationsOut, converged: convergedOut };

  const lanes = Math.max(1, Math.min(count, Math.floor(opts.lanes ?? DEFAULT_LANES)));
  const teleport = opts.teleport === undefined ? null : distribution('pagerankScenarios', opts.teleport, n, 'teleport');
  const x0 = distribution('pagerankScenarios', start, n, 'start') ?? (teleport === null ? new Float64Array(n).fill(1 / n) : teleport.slice());
  const outWeights = opts.outWeights ?? outWeightSums(forward, n);
  checkLength('pagerankScenarios', outWeights.length, n, 'outWeights');
  const inv = new Float64Array(n);
  let baseDangling = 0;
  for (let u = 0; u < n; u++) {
    inv[u] = outWeights[u] > 0 ? 1 / outWeights[u] : 0;
    if (inv[u] === 0) baseDangling += x0[u];
  }
  const { patchNode, patchInv } = plan;
  for (let p = 0; p < patchNode.length; p++) {
    const w = outWeights[patchNode[p]] + patchInv[p]; // patchInv holds the added weight until here
    patchInv[p] = w > 0 ? 1 / w : 0;
  }

  // Node-major state: x (current), next, contrib = x / out-weight (with the lane's own patches).
  let x = new Float64Array(n * lanes);
  let next = new Float64Array(n * lanes);
  const contrib = new Float64Array(n * lanes);
  const laneScenario = new Int32Array(lanes).fill(-1);
  const laneIterations = new Int32Array(lanes);
  const dangling = new Float64Array(lanes);
  const jump = new Float64Array(lanes);
  const change = new Float64Array(lanes);
  const sums = new Float64Array(lanes);

  let nextScenario = 0;
  let active = 0;
  const load = (k: number): void => {
    if (nextScenario >= count) {
      laneScenario[k] = -1;
      return;
    }
    const s = nextScenario++;
    laneScenario[k] = s;
    laneIterations[k] = 0;
    active++;
    for (let v = 0, i = k; v < n; v++, i += lanes) {
      x[i] = x0[v];
      contrib[i] = x0[v] * inv[v];
    }
    let d = baseDangling;
    for (let p = plan.patchStart[s]; p < plan.patchStart[s + 1]; p++) {
      const u = plan.patchNode[p];
      contrib[u * lanes + k] = x0[u] * plan.patchInv[p];
      d += danglingShift(inv[u], plan.patchInv[p], x0[u]);
    }
    dangling[k] = d;
  };
  for (let k = 0; k < lanes; k++) load(k);

  const { offsets, targets: sources, weights } = reverse;
  const uniform = 1 / n;
  while (active > 0) {
    for (let k = 0; k < lanes; k++) jump[k] = 1 - damping + damping * dangling[k];
    pullLanes(offsets, sources, weights, contrib, next, n, lanes);
    // Extra edges: next[to] += contrib[from] * weight, per lane.
    for (let k = 0; k < lanes; k++) {
      const s = laneScenario[k];
      if (s < 0) continue;
      for (let e = plan.edgeStart[s]; e < plan.edgeStart[s + 1]; e++) {
        next[plan.edgeTo[e] * lanes + k] += contrib[plan.edgeFrom[e] * lanes + k] * plan.edgeWeight[e];
      }
    }
    settleLanes(next, x, inv, contrib, n, lanes, damping, jump, uniform, teleport, change, dangling, sums);
    // The lanes' own sources: their out-weight (and whether they dangle) differs from the graph's.
    for (let k = 0; k < lanes; k++) {
      const s = laneScenario[k];
      if (s < 0) continue;
      for (let p = plan.patchStart[s]; p < plan.patchStart[s + 1]; p++) {
        const i = plan.patchNode[p] * lanes + k;
        const value = next[i];
        contrib[i] = value * plan.patchInv[p];
        dangling[k] += danglingShift(inv[plan.patchNode[p]], plan.patchInv[p], value);
      }
    }
    const previous = x;
    x = next;
    next = previous;
    for (let k = 0; k < lanes; k++) {
      const s = laneScenario[k];
      if (s < 0) continue;
      const done = ++laneIterations[k];
      const converged = change[k] < tolerance;
      if (!converged && done < maxIterations) continue;
      iterationsOut[s] = done;
      convergedOut[s] = converged ? 1 : 0;
      const nodes = plan.at[s];
      const out = values[s];
      for (let j = 0; j < nodes.length; j++) out[j] = x[nodes[j] * lanes + k] / sums[k];
      active--;
      load(k);
    }
  }
  return { values, iterations: iterationsOut, converged: convergedOut };
}

/** Change of a lane's dangling rank at a node whose inverse out-weight is `patched` instead of `base`. */
function danglingShift(base: number, patched: number, value: number): number {
  if (base === 0 && patched !== 0) return -value;
  if (base !== 0 && patched === 0) return value;
  return 0;
}

/** The scenarios flattened into typed arrays: edges, patched inverse out-weights, nodes to report. */
interface ScenarioPlan {
  readonly edgeStart: Int32Array;
  readonly edgeFrom: Int32Array;
  readonly edgeTo: Int32Array;
  readonly edgeWeight: Float64Array;
  readonly patchStart: Int32Array;
  readonly patchNode: Int32Array;
  /** Inverse out-weight of the patched node in its scenario (0: still dangling). */
  readonly patchInv: Float64Array;
  readonly at: readonly Int32Array[];
}

function planScenarios(scenarios: readonly (readonly ExtraEdge[])[], n: number, at: readonly (readonly number[])[] | undefined): ScenarioPlan {
  let total = 0;
  for (const edges of scenarios) total += edges.length;
  const edgeStart = new Int32Array(scenarios.length + 1);
  const edgeFrom = new Int32Array(total);
  const edgeTo = new Int32Array(total);
  const edgeWeight = new Float64Array(total);
  const patchStart = new Int32Array(scenarios.length + 1);
  const patchNode = new Int32Array(total);
  const patchAdd = new Float64Array(total); // out-weight added at the patched node (made inverse later)
  const nodes: Int32Array[] = [];
  let e = 0;
  let p = 0;
  scenarios.forEach((edges, s) => {
    const targets: number[] = [];
    for (const edge of edges) {
      if (!(Number.isInteger(edge.from) && Number.isInteger(edge.to) && edge.from >= 0 && edge.from < n && edge.to >= 0 && edge.to < n) || !(edge.weight >= 0)) {
        throw new EngineError('E_INTERNAL', `pagerankScenarios: scenario ${s}: extra edge ${edge.from} -> ${edge.to} (weight ${edge.weight}) is outside the graph`);
      }
      if (!targets.includes(edge.to)) targets.push(edge.to);
      if (edge.from === edge.to) continue; // the graph has no self-edges (as in `pagerank`)
      edgeFrom[e] = edge.from;
      edgeTo[e] = edge.to;
      edgeWeight[e++] = edge.weight;
      let q = patchStart[s];
      while (q < p && patchNode[q] !== edge.from) q++;
      if (q === p) {
        patchNode[p] = edge.from;
        patchAdd[p++] = 0;
      }
      patchAdd[q] += edge.weight;
    }
    edgeStart[s + 1] = e;
    patchStart[s + 1] = p;
    const asked = at === undefined ? targets : at[s];
    const list = new Int32Array(asked.length);
    asked.forEach((v, j) => {
      if (!(Number.isInteger(v) && v >= 0 && v < n)) throw new EngineError('E_INTERNAL', `pagerankScenarios: scenario ${s}: node ${v} to report is outside the graph`);
      list[j] = v;
    });
    nodes.push(list);
  });
  return { edgeStart, edgeFrom, edgeTo, edgeWeight, patchStart, patchNode: patchNode.subarray(0, p), patchInv: patchAdd.subarray(0, p), at: nodes };
}
