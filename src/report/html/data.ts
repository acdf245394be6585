/**
 * Data preparation for the HTML report: maps a `Report` to the compact, JSON-friendly view the
 * page embeds (`HtmlData`). Pure: the same report gives the same data, in the same order.
 *
 * Page ids are indexes into `report.pages` (sorted by route). Links become one edge per
 * (from, to) page pair with flag bits (1 content, 2 template), sorted by from, then to.
 */
import { anchorForReading } from '../../parse/index.js';
import type { Report, ReportPage } from '../../types.js';
import { buildOverview } from './layout.js';
import { selectSummary } from './summary.js';
import type { DepthHistogram, HtmlData, HtmlFinding, HtmlPage, HtmlSuggestion, SummaryLimits } from './types.js';

export type * from './types.js';

/** The limits the HTML formatter uses. */
export const SUMMARY_LIMITS: SummaryLimits = { pages: 5000, rows: 20_000, worstPages: 1000, findings: 2000, suggestions: 2000, rankSamples: 400 };

/** Above this many pages the overview shows folders instead of pages. */
export const PAGE_OVERVIEW_LIMIT = 300;

/**
 * Build the HTML report's data from a report.
 * @param report the report (its arrays are already sorted)
 */
export function buildHtmlData(report: Report, limits: SummaryLimits = SUMMARY_LIMITS): HtmlData {
  const full = buildFullData(report);
  return full.pages.length > limits.pages || full.findings.length + full.suggestions.length > limits.rows ? selectSummary(full, limits, PAGE_OVERVIEW_LIMIT) : full;
}

function buildFullData(report: Report): HtmlData {
  const pageIndex = new Map<string, number>();
  report.pages.forEach((p, i) => pageIndex.set(p.route, i));
  const { edges, nav } = collectEdges(report, pageIndex);
  const findingsPerRoute = new Map<string, number>();
  for (const f of report.findings) findingsPerRoute.set(f.route, (findingsPerRoute.get(f.route) ?? 0) + 1);

  const pages: HtmlPage[] = report.pages.map((p, i) => ({
    route: p.route,
    title: p.title,
    file: p.file,
    pagerank: p.pagerank,
    rank: p.rank,
    depth: p.depth,
    inlinks: p.inlinks,
    contentInlinks: p.contentInlinks,
    outlinks: p.outlinks,
    importance: p.importance,
    // As the report's orphan count has it: no inlinks at all, and not an entry page.
    orphan: p.inlinks === 0 && p.depth !== 0,
    nav: nav.has(i),
    findings: findingsPerRoute.get(p.route) ?? 0,
  }));

  const findings: HtmlFinding[] = report.findings.map((f) => ({
    rule: f.rule,
    severity: f.severity,
    file: f.file,
    line: f.line,
    column: f.column,
    route: f.route,
    message: f.message,
  }));

  const suggestions: HtmlSuggestion[] = report.suggestions.map((s) => ({
    id: s.id,
    source: s.source,
    target: s.target,
    targetTitle: report.pages[pageIndex.get(s.target) ?? -1]?.title ?? s.target,
    file: s.file,
    line: s.line,
    column: s.column,
    anchor: s.anchor === null ? null : anchorForReading(s.anchor),
    similarity: s.similarity,
    targetRankBefore: s.targetRankBefore,
    targetRankAfter: s.targetRankAfter,
    depthBefore: s.depthBefore,
    depthAfter: s.depthAfter,
    reason: s.reason,
  }));

  const histogram = depthHistogram(pages, report.options.maxDepth);
  return {
    schema: 'linkweave/html-data@1',
    root: report.root,
    version: report.tool.version,
    stats: report.stats,
    gate: report.gate,
    maxDepth: report.options.maxDepth,
    pages,
    edges,
    histogram,
    topPages: topPages(pages, 10),
    deepestPage: deepestPage(pages),
    findings,
    suggestions,
    overview: buildOverview(pages, edges, report.options.maxDepth, PAGE_OVERVIEW_LIMIT),
    summary: null,
  };
}

/** One edge per page pair with the link contexts OR-ed into flag bits; navigation targets apart. */
function collectEdges(report: Report, pageIndex: ReadonlyMap<string, number>): { edges: number[]; nav: Set<number> } {
  const n = report.pages.length;
  const flags = new Map<number, number>();
  const nav = new Set<number>();
  for (const link of report.links) {
    if (link.kind !== 'internal' || (link.status !== 'ok' && link.status !== 'broken-fragment')) continue;
    const hash = link.to.indexOf('#');
    const to = pageIndex.get(hash < 0 ? link.to : link.to.slice(0, hash));
    if (to === undefined) continue;
    const from = pageIndex.get(link.from);
    if (from === undefined) {
      // A link of the navigation file: it stands on every page; the graph draws it as a flag.
      nav.add(to);
      continue;
    }
    if (from === to) continue;
    const key = from * n + to;
    flags.set(key, (flags.get(key) ?? 0) | (link.context === 'template' ? 2 : 1));
  }
  const keys = [...flags.keys()].sort((a, b) => a - b);
  const edges: number[] = [];
  for (const key of keys) edges.push(Math.floor(key / n), key % n, flags.get(key)!);
  return { edges, nav };
}

function depthHistogram(pages: readonly HtmlPage[], maxDepth: number): DepthHistogram {
  let deepest = 0;
  for (const p of pages) if (p.depth !== null && p.depth > deepest) deepest = p.depth;
  const counts = new Array<number>(Math.max(deepest, maxDepth) + 1).fill(0);
  let unreachable = 0;
  for (const p of pages) {
    if (p.depth === null) unreachable++;
    else counts[p.depth]++;
  }
  return { counts, unreachable, maxDepth };
}

/**
 * Page ids by PageRank, highest first, ties by id (= route order).
 * @param pages the report's pages
 * @param k how many
 */
export function topPages(pages: readonly HtmlPage[], k: number): number[] {
  const ids = pages.map((_, i) => i);
  ids.sort((a, b) => pages[b].pagerank - pages[a].pagerank || a - b);
  return ids.slice(0, k);
}

function deepestPage(pages: readonly HtmlPage[]): number {
  let best = -1;
  for (let i = 0; i < pages.length; i++) {
    const d = pages[i].depth;
    if (d !== null && (best < 0 || d > pages[best].depth!)) best = i;
  }
  return best;
}
