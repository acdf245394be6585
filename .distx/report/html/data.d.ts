/**
 * Data preparation for the HTML report: maps a `Report` to the compact, JSON-friendly view the
 * page embeds (`HtmlData`). Pure: the same report gives the same data, in the same order.
 *
 * Page ids are indexes into `report.pages` (sorted by route). Links become one edge per
 * (from, to) page pair with flag bits (1 content, 2 template), sorted by from, then to.
 */
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
}
/** Above this many pages the overview shows folders instead of pages. */
export declare const PAGE_OVERVIEW_LIMIT = 300;
/**
 * Build the HTML report's data from a report.
 * @param report the report (its arrays are already sorted)
 */
export declare function buildHtmlData(report: Report): HtmlData;
/**
 * Page ids by PageRank, highest first, ties by id (= route order).
 * @param pages the report's pages
 * @param k how many
 */
export declare function topPages(pages: readonly HtmlPage[], k: number): number[];
