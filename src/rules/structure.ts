/**
 * Structural facts about pages shared by the rules and the report's counts, so that a finding
 * and the statistic a gate limit reads can never disagree on what an orphan or a dead end is.
 */
import type { ResolvedOptions } from '../config/options.js';
import type { Csr, Ranking, SiteGraph } from '../types.js';

/** Ids of the entry pages, as a set. */
export function entrySet(graph: SiteGraph): ReadonlySet<number> {
  return new Set(graph.entries);
}

/** Pages that take part in findings: not excluded by `linkweave.exclude`. */
export function isChecked(graph: SiteGraph, page: number): boolean {
  return !graph.pages[page].meta.exclude;
}

/** Number of distinct pages `page` links to with at least one content link. */
export function contentOutlinks(forward: Csr, page: number): number {
  let count = 0;
  for (let e = forward.offsets[page]; e < forward.offsets[page + 1]; e++) {
    if ((forward.flags[e] & 1) !== 0) count++;
  }
  return count;
}

/**
 * Orphan page: no inlinks from any other page (template links count unless
 * `countTemplateLinks` is false). Entry pages are never orphans.
 */
export function isOrphan(
  graph: SiteGraph,
  ranking: Ranking,
  entries: ReadonlySet<number>,
  page: number,
  countTemplateLinks = true,
): boolean {
  if (entries.has(page)) return false;
  const inlinks = countTemplateLinks ? ranking.inlinks[page] : ranking.contentInlinks[page];
  return inlinks === 0;
}

/**
 * Dead end: no content outlinks to other pages (template links count only when
 * `countTemplateLinks` is true). A site of one page has no dead ends: there is nowhere to link to.
 */
export function isDeadEnd(graph: SiteGraph, ranking: Ranking, page: number, countTemplateLinks = false): boolean {
  if (graph.pages.length < 2) return false;
  const outlinks = countTemplateLinks ? ranking.outlinks[page] : contentOutlinks(graph.forward, page);
  return outlinks === 0;
}

/** Unreachable: no path of links from any entry page. */
export function isUnreachable(ranking: Ranking, page: number): boolean {
  return ranking.depth[page] < 0;
}
