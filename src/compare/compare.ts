/**
 * Comparing this run with a base run (`--compare BASE.json`), so a reviewer sees what a pull
 * request did to the site's structure:
 * - findings: new and fixed, matched by rule, route and target as for a baseline;
 * - pages added and removed, by route;
 * - the pages whose rank (pagerank x pages: comparable across runs with different page counts)
 *   or click depth changed most, top `TOP_CHANGES` each, sorted by absolute change then route.
 *   A page that became reachable or unreachable sorts before every numeric depth change. Rank
 *   changes smaller than `MIN_RANK_CHANGE` (they show as no change at two decimals) are left out.
 * Pure.
 */
import { matchFindings } from '../baseline/index.js';
import { compareText } from '../util/index.js';
import { RATIO_DECIMALS, roundTo } from '../report/round.js';
import type { Comparison, PageChange, Report } from '../types.js';
import type { ReportFile } from './read.js';

/** Pages listed per kind of change. */
export const TOP_CHANGES = 10;
/** Least rank change listed. */
export const MIN_RANK_CHANGE = 0.005;

type PageRow = ReportFile['pages'][number];

/**
 * Compare `head` (this run) with `base`.
 * @param base the base branch's report, as read by `parseReportFile`
 * @param head this run's report
 */
export function compareReports(base: ReportFile, head: Pick<Report, 'pages' | 'findings'>): Comparison {
  const match = matchFindings(head.findings, base.findings);
  const before = new Map<string, PageRow>(base.pages.map((p) => [p.route, p]));
  const after = new Set(head.pages.map((p) => p.route));
  const byRoute = (a: { route: string }, b: { route: string }) => compareText(a.route, b.route);

  const rank: PageChange[] = [];
  const depth: PageChange[] = [];
  for (const page of head.pages) {
    const old = before.get(page.route);
    if (old === undefined) continue;
    const rankChange = roundTo(page.rank - old.rank, RATIO_DECIMALS);
    const depthChange = page.depth === old.depth ? 0 : page.depth === null || old.depth === null ? null : page.depth - old.depth;
    const change: PageChange = {
      route: page.route,
      file: page.file,
      rankBefore: old.rank,
      rankAfter: page.rank,
      rankChange,
      depthBefore: old.depth,
      depthAfter: page.depth,
      depthChange,
    };
    if (Math.abs(rankChange) >= MIN_RANK_CHANGE) rank.push(change);
    if (depthChange !== 0) depth.push(change);
  }
  rank.sort((a, b) => Math.abs(b.rankChange) - Math.abs(a.rankChange) || compareText(a.route, b.route));
  // Reachability changes (null) first, then by size of the change.
  const size = (c: PageChange) => (c.depthChange === null ? Number.MAX_SAFE_INTEGER : Math.abs(c.depthChange));
  depth.sort((a, b) => size(b) - size(a) || compareText(a.route, b.route));

  return {
    base: { version: base.version, pages: base.pages.length, findings: base.findings.length },
    newFindings: match.new,
    fixedFindings: match.fixed,
    knownFindings: match.known.length,
    pagesAdded: head.pages.filter((p) => !before.has(p.route)).map(({ route, file }) => ({ route, file })).sort(byRoute),
    pagesRemoved: base.pages.filter((p) => !after.has(p.route)).map(({ route, file }) => ({ route, file })).sort(byRoute),
    rankChanges: rank.slice(0, TOP_CHANGES),
    depthChanges: depth.slice(0, TOP_CHANGES),
    changedPages: { rank: rank.length, depth: depth.length },
  };
}
