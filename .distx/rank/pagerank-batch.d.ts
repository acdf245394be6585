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
import type { ExtraEdge, PagerankOptions } from './pagerank.js';
/**
 * Lanes advanced together when the caller does not say. Measured (CPU time, 200-240 scenarios):
 * 8 lanes (one 64-byte gather per edge) ran 1.6-1.7x faster than one scenario at a time on
 * generated sites of 1,000 and 10,000 pages and on a 100,000-node graph; 16 lanes were no
 * faster at 10,000 and slower at 100,000 (the lane state no longer fits the cache).
 */
export declare const DEFAULT_LANES = 8;
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
export declare function pagerankScenarios(forward: Csr, reverse: Csr, n: number, opts: ScenarioOptions, scenarios: readonly (readonly ExtraEdge[])[], start: Float64Array, at?: readonly (readonly number[])[]): ScenarioResult;
