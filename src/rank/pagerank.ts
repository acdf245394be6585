/**
 * Weighted PageRank by power iteration (Brin and Page 1998; DESIGN section 5).
 *
 * Pull-based over the reverse CSR: each iteration reads every in-edge once, in row order, and
 * gathers the sources' `rank / outWeight` from one array, so the hot loop is a sequential scan
 * of two typed arrays plus one gather. Dangling pages (no out-weight) give their rank back
 * through the teleport vector. Hand-written rather than a library call: the library at hand
 * (graphology-metrics) rebuilds its own index from an object graph on every call, which costs
 * more than the whole iteration here (see `npm run bench`).
 *
 * No allocation inside the iteration loop: the arrays are made once and swapped.
 * Non-convergence is reported (`converged: false`) rather than thrown: DESIGN section 5 asks
 * for the iteration count and whether it converged, and the last vector is still a
 * distribution that sums to 1.
 */
import type { Csr } from '../types.js';
import { EngineError } from '../errors.js';
import { outWeightSums } from '../graph/csr.js';
import { checkLength, distribution } from './vectors.js';

/** An edge that is not in the CSR but should count as if it were (impact prediction). */
export interface ExtraEdge {
  readonly from: number;
  readonly to: number;
  readonly weight: number;
}

/** Settings of one PageRank run. */
export interface PagerankOptions {
  /** Probability of following a link (0 < damping < 1). */
  damping: number;
  maxIterations: number;
  /** Stop when the L1 change of one iteration is below this. */
  tolerance: number;
  /** Teleport distribution (length n, any positive scale; normalised here). Default: uniform. */
  teleport?: Float64Array;
  /** Warm start (length n; normalised here). Default: the teleport vector's uniform start. */
  start?: Float64Array;
  /** Edges added on top of the CSR: they change their source's out-weight and row. */
  extraEdges?: readonly ExtraEdge[];
  /** `outWeightSums(forward, n)`, when the caller runs many predictions on one graph. */
  outWeights?: Float64Array;
}

/** Scores (sum 1), iterations run and whether the L1 change fell below the tolerance. */
export interface PagerankResult {
  scores: Float64Array;
  iterations: number;
  converged: boolean;
}

/**
 * PageRank of the graph given by `forward` (for out-weights) and `reverse` (its transpose,
 * pulled from), with `n` nodes.
 */
export function pagerank(forward: Csr, reverse: Csr, n: number, opts: PagerankOptions): PagerankResult {
  const { damping, maxIterations, tolerance } = opts;
  if (!(damping > 0 && damping < 1)) throw new EngineError('E_INTERNAL', `pagerank: damping must be in (0, 1), got ${damping}`);
  checkLength('pagerank', forward.offsets.length - 1, n, 'forward CSR');
  checkLength('pagerank', reverse.offsets.length - 1, n, 'reverse CSR');
  if (n === 0) return { scores: new Float64Array(0), iterations: 0, converged: true };

  const teleport = opts.teleport === undefined ? null : distribution('pagerank', opts.teleport, n, 'teleport');
  const uniform = 1 / n;
  let x: Float64Array | null = opts.start === undefined ? null : distribution('pagerank', opts.start, n, 'start');
  if (x === null) {
    x = teleport === null ? new Float64Array(n).fill(uniform) : teleport.slice();
  }

  // Inverse out-weights, extra edges included; 0 marks a dangling page.
  const inv = opts.outWeights === undefined ? outWeightSums(forward, n) : opts.outWeights.slice();
  checkLength('pagerank', inv.length, n, 'outWeights');
  const extras = opts.extraEdges ?? [];
  const extraFrom = new Int32Array(extras.length);
  const extraTo = new Int32Array(extras.length);
  const extraWeight = new Float64Array(extras.length);
  let extraCount = 0;
  for (const e of extras) {
    if (!(e.from >= 0 && e.from < n && e.to >= 0 && e.to < n) || !(e.weight >= 0)) {
      throw new EngineError('E_INTERNAL', `pagerank: extra edge ${e.from} -> ${e.to} (weight ${e.weight}) is outside the graph`);
    }
    if (e.from === e.to) continue; // the graph has no self-edges
    extraFrom[extraCount] = e.from;
    extraTo[extraCount] = e.to;
    extraWeight[extraCount++] = e.weight;
    inv[e.from] += e.weight;
  }
  for (let u = 0; u < n; u++) inv[u] = inv[u] > 0 ? 1 / inv[u] : 0;

  const { offsets, targets: sources, weights } = reverse;
  let next: Float64Array = new Float64Array(n);
  const contrib = new Float64Array(n);
  let dangling = 0;
  for (let u = 0; u < n; u++) {
    contrib[u] = x[u] * inv[u];
    if (inv[u] === 0) dangling += x[u];
  }

  let iterations = 0;
  let converged = false;
  const totals = new Float64Array(2); // [L1 change, dangling rank] of the last settle
  while (iterations < maxIterations) {
    iterations++;
    // Mass that jumps: (1 - d) of everything plus d of the dangling pages' rank.
    const jump = 1 - damping + damping * dangling;
    pullLinks(offsets, sources, weights, contrib, next, n, damping);
    for (let k = 0; k < extraCount; k++) next[extraTo[k]] += damping * contrib[extraFrom[k]] * extraWeight[k];
    settle(next, x, inv, contrib, n, jump * uniform, jump, teleport, totals);
    dangling = totals[1];
    const previous = x;
    x = next;
    next = previous;
    if (totals[0] < tolerance) {
      converged = true;
      break;
    }
  }

  let sum = 0;
  for (let v = 0; v < n; v++) sum += x[v];
  for (let v = 0; v < n; v++) x[v] /= sum;
  return { scores: x, iterations, converged };
}

/**
 * The link part of one iteration: `next[v] = d * sum over in-edges (u, v) of contrib[u] * w`.
 * Kept in its own small function so the engine optimises the hot loop on its own.
 */
function pullLinks(offsets: Int32Array, sources: Int32Array, weights: Float32Array, contrib: Float64Array, next: Float64Array, n: number, damping: number): void {
  let start = offsets[0];
  for (let v = 0; v < n; v++) {
    const end = offsets[v + 1];
    // Four partial sums: the adds of a long row do not wait on one another.
    let s0 = 0;
    let s1 = 0;
    let s2 = 0;
    let s3 = 0;
    let e = start;
    for (const stop = end - 3; e < stop; e += 4) {
      s0 += contrib[sources[e]] * weights[e];
      s1 += contrib[sources[e + 1]] * weights[e + 1];
      s2 += contrib[sources[e + 2]] * weights[e + 2];
      s3 += contrib[sources[e + 3]] * weights[e + 3];
    }
    for (; e < end; e++) s0 += contrib[sources[e]] * weights[e];
    start = end;
    next[v] = damping * (s0 + s1 + (s2 + s3));
  }
}

/**
 * The node part of one iteration: add the jumps, measure the L1 change against `x`, and
 * prepare `contrib = next / outWeight` and the dangling rank for the next iteration.
 * Writes `[change, dangling]` into `totals`.
 */
function settle(
  next: Float64Array,
  x: Float64Array,
  inv: Float64Array,
  contrib: Float64Array,
  n: number,
  jumpUniform: number,
  jump: number,
  teleport: Float64Array | null,
  totals: Float64Array,
): void {
  let change = 0;
  let dangling = 0;
  for (let v = 0; v < n; v++) {
    const value = next[v] + (teleport === null ? jumpUniform : jump * teleport[v]);
    next[v] = value;
    change += Math.abs(value - x[v]);
    const c = value * inv[v];
    contrib[v] = c;
    if (c === 0) dangling += value; // inv 0 (dangling), or value 0 (adds nothing)
  }
  totals[0] = change;
  totals[1] = dangling;
}
