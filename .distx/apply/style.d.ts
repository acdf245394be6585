import type { FileKind, RawLink } from '../types.js';
import type { LinkStyle, StyleCounts } from './types.js';
/** The style of one href, or null when it is not a link to a page of the site. */
export declare function classifyHref(href: string): LinkStyle | null;
/** Count the styles of the links written in one page (navigation and pattern links left out). */
export declare function countStyles(links: readonly RawLink[], kind: FileKind): StyleCounts;
/** Sum of counts. */
export declare function addCounts(a: StyleCounts, b: StyleCounts): StyleCounts;
/** The style with the most links, or null when there are none or the top is a tie. */
export declare function majority(counts: StyleCounts): LinkStyle | null;
/** Where a style came from, for the summary. */
export type StyleOrigin = 'flag' | 'file' | 'site' | 'default';
/**
 * The style for new links in one source file.
 * @param fileCounts the file's own links
 * @param siteCounts all links of the site, asked for only when the file decides nothing
 * @param forced `--link-style`, when given
 */
export declare function chooseStyle(fileCounts: StyleCounts, siteCounts: () => StyleCounts, forced: LinkStyle | null): {
    style: LinkStyle;
    origin: StyleOrigin;
};
