import type { DepthHistogram, HtmlPage } from './data.js';
/** Shorten a text to at most `max` characters (by code point), adding an ellipsis. */
export declare function shorten(text: string, max: number): string;
/**
 * The click-depth histogram: one bar per depth 0..max, a separate bar for unreachable pages,
 * bars past the limit hatched, the limit marked by a dashed line, counts written on the bars.
 * Each bar carries `data-depth` and `data-count`; its height is proportional to the count.
 */
export declare function depthHistogramSvg(h: DepthHistogram): string;
/**
 * The PageRank distribution: pages sorted by PageRank, highest first, on a log scale of
 * `rank` (PageRank x pages, so 1 is an average page), with the top pages named.
 * @param pages the report's pages
 * @param top page ids of the top pages, highest first
 * @param named how many of them to label on the chart
 */
export declare function pagerankSvg(pages: readonly HtmlPage[], top: readonly number[], named?: number): string;
