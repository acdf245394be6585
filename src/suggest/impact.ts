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
import type { ResolvedOptions } from '../config/options.js';
import type { Csr, Ranking, SiteGraph } from '../types.js';
import { compareText } from '../util/index.js';
import { outWeightSums } from '../graph/csr.js';
import { pagerank } from '../rank/pagerank.js';
import type { PagerankOptions } from '../rank/pagerank.js';
import { pagerankScenariosOnThreads } from '../rank/pagerank-threads.js';
import { depthMask, teleportVector } from '../rank/rank.js';

/** Everything needed to predict PageRank after adding links, made once per run. */
export interface RankModel {
  readonly graph: SiteGraph;
  readonly current: Float64Array;
  readonly options: PagerankOptions;
}

/** The PageRank settings of the ranking stage, with the current vector as warm start. */
export function rankModel(graph: SiteGraph, ranking: Ranking, options: ResolvedOptions): RankModel {
  const teleport = teleportVector(graph, options);
  return {
    graph,
    current: ranking.pagerank,
    options: {
      damping: options.damping,
      maxIterations: options.pagerankIterations,
      tolerance: options.pagerankTolerance,
      outWeights: outWeightSums(graph.forward, graph.pages.length),
      ...(teleport === null ? {} : { teleport }),
    },
  };
}

/** PageRank of every page with the content links source -> target added (weight 1 each). */
export function pagerankWithLinks(model: RankModel, links: readonly { from: number; to: number }[]): Float64Array {
  const { graph } = model;
  return pagerank(graph.forward, graph.reverse, graph.pages.length, {
    ...model.options,
    start: model.current,
    extraEdges: links.map((l) => ({ from: l.from, to: l.to, weight: 1 })),
  }).scores;
}

/**
 * PageRank of each link's target with that link alone added (weight 1, a content link), each
 * link its own scenario; all in one batched run, exactly as {@link pagerankWithLinks} per link.
 * @param threads 1, or 2 to solve half the scenarios on a worker thread (same results)
 * @returns `after[i]`: PageRank (sum 1) of `links[i].to` with `links[i]` added
 */
export function targetRanksWithLinks(model: RankModel, links: readonly { from: number; to: number }[], threads = 1): Float64Array {
  const { graph, options } = model;
  const result = pagerankScenariosOnThreads(
    graph.forward,
    graph.reverse,
    graph.pages.length,
    options,
    links.map((l) => [{ from: l.from, to: l.to, weight: 1 }]),
    model.current,
    links.map((l) => [l.to]),
    threads,
  );
  const after = new Float64Array(links.length);
  for (let i = 0; i < links.length; i++) after[i] = result.values[i][0];
  return after;
}

/**
 * Which suggestions get a PageRank prediction: the `limit` best by score (ties: smaller id
 * first) and the first `limit` of the depth-repair plan (`planIds` in the plan's greedy order,
 * which takes the links that fix the most pages first); `limit` 0 = all. At most `2 x limit`
 * predictions whatever the site's size: the plan grows with the site (about 4% of the pages on
 * generated sites: 44 links at 1,000 pages, 409 at 10,000), and each prediction reads the whole
 * graph some twenty times.
 * @returns one flag per item, 1 = predict
 */
export function impactSelection(items: readonly { readonly id: string; readonly score: number }[], planIds: readonly string[], limit: number): Uint8Array {
  const selected = new Uint8Array(items.length);
  if (limit === 0 || limit >= items.length) return selected.fill(1);
  const order = items.map((_, i) => i).sort((a, b) => items[b].score - items[a].score || compareText(items[a].id, items[b].id));
  for (let k = 0; k < limit; k++) selected[order[k]] = 1;
  const inPlan = new Set(planIds.slice(0, limit));
  items.forEach((item, i) => {
    if (inPlan.has(item.id)) selected[i] = 1;
  });
  return selected;
}

/**
 * Click depths that can take proposed links: `add` relaxes exactly (the depths stay those of a
 * full BFS on the graph with every added link), `gain` counts without changing anything.
 */
export class DepthState {
  /** Current depth per page (-1 unreachable), with the added links. */
  readonly depth: Int32Array;
  private readonly forward: Csr;
  private readonly mask: number;
  private readonly added = new Map<number, number[]>();
  private readonly stamp: Int32Array;
  private readonly scratch: Int32Array;
  private readonly queue: Int32Array;
  private epoch = 0;

  /**
   * @param depth depths of the graph as it is (copied)
   * @param mask edge flags click depth follows (`depthMask(options)`)
   */
  constructor(forward: Csr, depth: Int32Array, mask: number) {
    this.forward = forward;
    this.mask = mask;
    this.depth = depth.slice();
    this.stamp = new Int32Array(depth.length);
    this.scratch = new Int32Array(depth.length);
    this.queue = new Int32Array(depth.length);
  }

  /** Depth of `target` with the link source -> target added (the only page whose depth matters for a report row). */
  depthWith(source: number, target: number): number {
    const ds = this.depth[source];
    const dt = this.depth[target];
    if (ds < 0) return dt;
    return dt < 0 ? ds + 1 : Math.min(dt, ds + 1);
  }

  /**
   * How many pages `counts` would accept go from outside `limit` (deeper, or unreachable) to
   * within it if the link source -> target were added. Nothing changes.
   */
  gain(source: number, target: number, limit: number, counts: (page: number) => boolean): number {
    const ds = this.depth[source];
    if (ds < 0 || ds + 1 > limit) return 0;
    const epoch = ++this.epoch;
    const get = (u: number): number => (this.stamp[u] === epoch ? this.scratch[u] : this.depth[u]);
    let fixed = 0;
    let head = 0;
    let tail = 0;
    const visit = (v: number, d: number): void => {
      const cur = get(v);
      if (cur >= 0 && cur <= d) return;
      this.stamp[v] = epoch;
      this.scratch[v] = d;
      const before = this.depth[v];
      if ((before < 0 || before > limit) && counts(v)) fixed++;
      if (d < limit) this.queue[tail++] = v;
    };
    visit(target, ds + 1);
    while (head < tail) {
      const u = this.queue[head++];
      const d = get(u) + 1;
      this.eachNext(u, (v) => visit(v, d));
    }
    return fixed;
  }

  /**
   * Add the link source -> target and update every depth it shortens.
   * @returns the pages whose depth changed
   */
  add(source: number, target: number): number[] {
    const list = this.added.get(source);
    if (list === undefined) this.added.set(source, [target]);
    else list.push(target);
    const ds = this.depth[source];
    const changed: number[] = [];
    if (ds < 0) return changed;
    let head = 0;
    let tail = 0;
    const visit = (v: number, d: number): void => {
      const cur = this.depth[v];
      if (cur >= 0 && cur <= d) return;
      this.depth[v] = d;
      changed.push(v);
      this.queue[tail++] = v;
    };
    visit(target, ds + 1);
    while (head < tail) {
      const u = this.queue[head++];
      const d = this.depth[u] + 1;
      this.eachNext(u, (v) => visit(v, d));
    }
    return changed;
  }

  private eachNext(u: number, fn: (v: number) => void): void {
    const { offsets, targets, flags } = this.forward;
    for (let e = offsets[u]; e < offsets[u + 1]; e++) if ((flags[e] & this.mask) !== 0) fn(targets[e]);
    for (const v of this.added.get(u) ?? []) fn(v);
  }
}

/** A {@link DepthState} for the graph and ranking as they are. */
export function depthState(graph: SiteGraph, ranking: Ranking, options: ResolvedOptions): DepthState {
  return new DepthState(graph.forward, ranking.depth, depthMask(options));
}
