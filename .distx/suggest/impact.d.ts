/**
 * Predicted impact of a suggestion (DESIGN section 7), computed, not estimated:
 * - PageRank after adding the link: the ranking stage's power iteration, warm-started from the
 *   current vector, with the link passed as an extra edge (weight 1, a content link), under the
 *   same damping, teleport vector and stopping rule as the ranking. One such run reads the whole
 *   graph a few dozen times, so it is done for a budget of suggestions only
 *   ({@link impactSelection}, option `suggest.impactLimit`), all of them in one batched run
 *   (`pagerankScenarios`: many scenarios per sweep of the graph);
 * - click depth after: exact. Adding one edge s -> t can only shorten paths through it, so
 *   t's depth becomes min(depth t, depth s + 1) and the change spreads from t by BFS over
 *   the edges click depth follows; {@link DepthState} does this locally (only improved pages
 *   are visited), which the tests check against a full BFS of the modified graph.
 */
import type { ResolvedOptions } from '../options.js';
import type { Csr, Ranking, SiteGraph } from '../types.js';
import type { PagerankOptions } from '../rank/pagerank.js';
/** Everything needed to predict PageRank after adding links, made once per run. */
export interface RankModel {
    readonly graph: SiteGraph;
    readonly current: Float64Array;
    readonly options: PagerankOptions;
}
/** The PageRank settings of the ranking stage, with the current vector as warm start. */
export declare function rankModel(graph: SiteGraph, ranking: Ranking, options: ResolvedOptions): RankModel;
/** PageRank of every page with the content links source -> target added (weight 1 each). */
export declare function pagerankWithLinks(model: RankModel, links: readonly {
    from: number;
    to: number;
}[]): Float64Array;
/**
 * PageRank of each link's target with that link alone added (weight 1, a content link), each
 * link its own scenario; all in one batched run, exactly as {@link pagerankWithLinks} per link.
 * @returns `after[i]`: PageRank (sum 1) of `links[i].to` with `links[i]` added
 */
export declare function targetRanksWithLinks(model: RankModel, links: readonly {
    from: number;
    to: number;
}[]): Float64Array;
/**
 * Which suggestions get a PageRank prediction: the `limit` best by score (ties: smaller id
 * first) and the first `limit` of the depth-repair plan (`planIds` in the plan's greedy order,
 * which takes the links that fix the most pages first); `limit` 0 = all. At most `2 x limit`
 * predictions whatever the site's size: the plan grows with the site (about 4% of the pages on
 * generated sites: 44 links at 1,000 pages, 409 at 10,000), and each prediction reads the whole
 * graph some twenty times.
 * @returns one flag per item, 1 = predict
 */
export declare function impactSelection(items: readonly {
    readonly id: string;
    readonly score: number;
}[], planIds: readonly string[], limit: number): Uint8Array;
/**
 * Click depths that can take proposed links: `add` relaxes exactly (the depths stay those of a
 * full BFS on the graph with every added link), `gain` counts without changing anything.
 */
export declare class DepthState {
    /** Current depth per page (-1 unreachable), with the added links. */
    readonly depth: Int32Array;
    private readonly forward;
    private readonly mask;
    private readonly added;
    private readonly stamp;
    private readonly scratch;
    private readonly queue;
    private epoch;
    /**
     * @param depth depths of the graph as it is (copied)
     * @param mask edge flags click depth follows (`depthMask(options)`)
     */
    constructor(forward: Csr, depth: Int32Array, mask: number);
    /** Depth of `target` with the link source -> target added (the only page whose depth matters for a report row). */
    depthWith(source: number, target: number): number;
    /**
     * How many pages `counts` would accept go from outside `limit` (deeper, or unreachable) to
     * within it if the link source -> target were added. Nothing changes.
     */
    gain(source: number, target: number, limit: number, counts: (page: number) => boolean): number;
    /**
     * Add the link source -> target and update every depth it shortens.
     * @returns the pages whose depth changed
     */
    add(source: number, target: number): number[];
    private eachNext;
}
/** A {@link DepthState} for the graph and ranking as they are. */
export declare function depthState(graph: SiteGraph, ranking: Ranking, options: ResolvedOptions): DepthState;
