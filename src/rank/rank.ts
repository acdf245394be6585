/**
 * `rankGraph`: the ranking stage (DESIGN section 5): PageRank, click depth, inlinks and outlinks.
 */
import type { ResolvedOptions } from '../config/options.js';
import type { Ranking, SiteGraph } from '../types.js';
import { EDGE_CONTENT, EDGE_TEMPLATE } from '../graph/csr.js';
import { clickDepth } from './depth.js';
import { pagerank } from './pagerank.js';

/**
 * The teleport vector of `options.teleport`: null for uniform; for `entry`, mass on the entry
 * pages only (uniform again when no entry page exists, so the ranking is still defined).
 */
export function teleportVector(graph: SiteGraph, options: ResolvedOptions): Float64Array | null {
  if (options.teleport !== 'entry' || graph.entries.length === 0) return null;
  const t = new Float64Array(graph.pages.length);
  for (const e of graph.entries) t[e] = 1 / graph.entries.length;
  return t;
}

/** The flag mask click depth follows: content links, plus template links when `depthCountsTemplate`. */
export function depthMask(options: ResolvedOptions): number {
  return options.depthCountsTemplate ? EDGE_CONTENT | EDGE_TEMPLATE : EDGE_CONTENT;
}

/** Rank the pages of a graph. Arrays are indexed by page id. */
export function rankGraph(graph: SiteGraph, options: ResolvedOptions): Ranking {
  const n = graph.pages.length;
  const { forward, reverse } = graph;
  const teleport = teleportVector(graph, options);
  const pr = pagerank(forward, reverse, n, {
    damping: options.damping,
    maxIterations: options.pagerankIterations,
    tolerance: options.pagerankTolerance,
    ...(teleport === null ? {} : { teleport }),
  });
  const depth = clickDepth(forward, graph.entries, depthMask(options));
  const inlinks = new Int32Array(n);
  const contentInlinks = new Int32Array(n);
  const outlinks = new Int32Array(n);
  for (let v = 0; v < n; v++) {
    inlinks[v] = reverse.offsets[v + 1] - reverse.offsets[v];
    outlinks[v] = forward.offsets[v + 1] - forward.offsets[v];
    let c = 0;
    for (let e = reverse.offsets[v]; e < reverse.offsets[v + 1]; e++) if ((reverse.flags[e] & EDGE_CONTENT) !== 0) c++;
    contentInlinks[v] = c;
  }
  return { pagerank: pr.scores, depth, inlinks, contentInlinks, outlinks, iterations: pr.iterations, converged: pr.converged };
}
