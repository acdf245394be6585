/**
 * Under-linked pages (DESIGN section 7). Reasons, in this order:
 * - `orphan`: no inlinks from any other page (entry pages are never orphans);
 * - `unreachable`: no click path from the entry pages;
 * - `too-deep`: click depth greater than `maxDepth`;
 * - `few-inlinks`: an important (`high`) page with fewer than `suggest.minInlinks` content inlinks;
 * - `rank-below-importance`: an important (`high`) page whose importance percentile minus its
 *   PageRank percentile is greater than `suggest.rankGap` (both percentiles over the pages that
 *   are not excluded). Only important pages: DESIGN section 7 says so, and on a generated site
 *   of 2,000 pages applying it to every page flagged about a quarter of them on a weak signal
 *   (content centrality against PageRank).
 * Entry pages are reached directly, so they get no reason; pages with `linkweave.exclude` get none.
 */
import type { ResolvedOptions } from '../config/options.js';
import type { Ranking, SiteGraph, UnderlinkedReason } from '../types.js';
import type { Importance } from './importance.js';
import { percentiles } from './percentile.js';
import type { UnderlinkedPage } from './types.js';

/** PageRank percentile of every page among the pages that are not excluded (NaN for excluded pages). */
export function pagerankPercentiles(graph: SiteGraph, ranking: Ranking): Float64Array {
  return percentiles(ranking.pagerank, (i) => !graph.pages[i].meta.exclude);
}

/**
 * The under-linked pages, by page id, each with its reasons.
 * @param importance from `computeImportance`
 * @param rankPercentile from `pagerankPercentiles`
 */
export function findUnderlinked(
  graph: SiteGraph,
  ranking: Ranking,
  importance: Importance,
  rankPercentile: Float64Array,
  options: ResolvedOptions,
): UnderlinkedPage[] {
  const entries = new Set(graph.entries);
  const { maxDepth } = options;
  const { minInlinks, rankGap } = options.suggest;
  const out: UnderlinkedPage[] = [];
  for (let i = 0; i < graph.pages.length; i++) {
    if (graph.pages[i].meta.exclude || entries.has(i)) continue;
    const reasons: UnderlinkedReason[] = [];
    const depth = ranking.depth[i];
    if (ranking.inlinks[i] === 0) reasons.push('orphan');
    if (depth < 0) reasons.push('unreachable');
    else if (depth > maxDepth) reasons.push('too-deep');
    if (importance.level[i] === 'high' && ranking.contentInlinks[i] < minInlinks) reasons.push('few-inlinks');
    if (importance.level[i] === 'high' && importance.score[i] - rankPercentile[i] > rankGap) reasons.push('rank-below-importance');
    if (reasons.length > 0) out.push({ page: i, reasons });
  }
  return out;
}
