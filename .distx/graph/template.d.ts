/**
 * Template-link detection (DESIGN section 4): a link that repeats on at least `templateShare`
 * of the pages, with the same resolved target and the same text, is part of the site's
 * template (a sidebar, header or footer written into every source), not of the page's content.
 */
import type { ResolvedLink } from '../types.js';
/** Fewest pages for which repetition means anything. */
export declare const TEMPLATE_MIN_PAGES = 4;
/**
 * Mark repeated links as template links. Links must be grouped by page (`from` ascending, as
 * `buildGraph` produces them); links with `from` < 0 (navigation) are left as they are and not
 * counted. Returns a new array; unchanged links are the same objects.
 * @param pageCount number of pages in the site
 * @param share the share of pages at or above which a link is a template link (0 < share <= 1)
 */
export declare function markTemplateLinks(links: readonly ResolvedLink[], pageCount: number, share: number): ResolvedLink[];
