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
export declare function pagerank(forward: Csr, reverse: Csr, n: number, opts: PagerankOptions): PagerankResult;
