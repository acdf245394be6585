/** The types of the HTML report's data (`HtmlData`), apart from the code that builds it. */
import type { Report, ReportPage } from '../../types.js';
import type { Overview } from './layout.js';

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
