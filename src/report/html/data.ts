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
import type { Overview } from './layout.js';
import { selectSummary } from './summary.js';

/** One page as the HTML report's script sees it. */
export interface HtmlPage {
  readonly route: string;
  readonly title: string;
  readonly file: string;
  readonly pagerank: number;
  readonly rank: number;
  readonly depth: number | null;
  readonly inlinks: number;
  readonly contentInlinks: number;
  readonly outlinks: number;
  readonly importance: ReportPage['importance'];
  readonly orphan: boolean;
  /** Linked from the site-wide navigation file. */
  readonly nav: boolean;
  /** Findings naming this page's route. */
  readonly findings: number;
}

/** A finding row of the findings table. */
export interface HtmlFinding {
  readonly rule: string;
  readonly severity: 'error' | 'warning';
  readonly file: string;
  readonly line: number;
  readonly column: number;
  readonly route: string;
  readonly message: string;
}

/** A suggestion row of the suggestions table. */
export interface HtmlSuggestion {
  readonly id: string;
  readonly source: string;
  readonly target: string;
  readonly targetTitle: string;
  readonly file: string;
  readonly line: number;
  readonly column: number;
  readonly anchor: string | null;
  readonly similarity: number;
  readonly targetRankBefore: number;
  /** null: not computed (outside `suggest.impactLimit`). */
  readonly targetRankAfter: number | null;
  readonly depthBefore: number | null;
  readonly depthAfter: number | null;
  readonly reason: string;
}

/** Pages per click depth. */
export interface DepthHistogram {
  /** `counts[d]` = pages at depth d, for d = 0 .. max(deepest page, maxDepth). */
  readonly counts: readonly number[];
  readonly unreachable: number;
  readonly maxDepth: number;
}

/** Everything the HTML report embeds as JSON and draws. */
export interface HtmlData {
  readonly schema: 'linkweave/html-data@1';
  readonly root: string;
  readonly version: string;
  readonly stats: Report['stats'];
  readonly gate: Report['gate'];
  readonly maxDepth: number;
  readonly pages: readonly HtmlPage[];
  /** Flat triples `[from, to, flags, from, to, flags, ...]`. */
  readonly edges: readonly number[];
  readonly histogram: DepthHistogram;
  /** Page ids by PageRank, highest first (ties by route), at most ten. */
  readonly topPages: readonly number[];
  /** The page at the greatest click depth (first by route), or -1. */
  readonly deepestPage: number;
  readonly findings: readonly HtmlFinding[];
  readonly suggestions: readonly HtmlSuggestion[];
  readonly overview: Overview;
  /**
   * null: everything is embedded. Otherwise the site was too large for one page, and `pages`,
   * `edges`, `findings` and `suggestions` hold a selection (see {@link selectSummary}); `stats`,
   * `gate` and `histogram` still count the whole site.
   */
  readonly summary: HtmlSummary | null;
}

/** What a summary kept of the report's lists, against their full lengths. */
export interface HtmlSummary {
  readonly pages: { readonly kept: number; readonly total: number };
  readonly findings: { readonly kept: number; readonly total: number };
  readonly suggestions: { readonly kept: number; readonly total: number };
}

/**
 * Above these sizes the HTML report embeds a summary instead of every page, link, finding and
 * suggestion (a 100,000-page site would give a page of about 170 MB that no browser opens
 * quickly); the JSON report keeps everything.
 */
export interface SummaryLimits {
  /** More pages than this: summarise. */
  readonly pages: number;
  /** More findings plus suggestions than this: summarise. */
  readonly rows: number;
  /** Pages kept with the most to fix (findings, unreachable, deepest, fewest inlinks). */
  readonly worstPages: number;
  /** Findings kept, errors first, in the report's order. */
  readonly findings: number;
  /** Suggestions kept, in the report's order (best first). */
  readonly suggestions: number;
  /** Pages kept at even steps of the PageRank order, so the distribution chart keeps its shape. */
  readonly rankSamples: number;
}

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
    else counts[p.depth]!++;
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
  ids.sort((a, b) => pages[b]!.pagerank - pages[a]!.pagerank || a - b);
  return ids.slice(0, k);
}

function deepestPage(pages: readonly HtmlPage[]): number {
  let best = -1;
  for (let i = 0; i < pages.length; i++) {
    const d = pages[i]!.depth;
    if (d !== null && (best < 0 || d > pages[best]!.depth!)) best = i;
  }
  return best;
}
