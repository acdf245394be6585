import type { Rule } from './types.js';
/**
 * `unreachable-page`: every page can be reached by following links from an entry page.
 *
 * Click depth follows content links, and template links when `depthCountsTemplate` is true.
 * An orphan page is unreachable too, but `orphan-page` already says why, so this rule reports
 * only the pages that do have inlinks (from pages that are unreachable themselves, or through
 * links that click depth does not follow); the message names those pages, which is where the
 * fix goes. When no entry page exists the rule
 * is silent: `missing-entry` reports the cause once instead of every page.
 * Reported at line 1, column 1 of the page's file.
 *
 * Options: none. Default severity: `error`.
 *
 * @example ok: `/` links to `/guide/`, which links to `/guide/install/`.
 * @example not ok: `/archive/` and `/archive/2019/` link to each other, nothing else links in:
 * `archive/index.md:1:1  error  Unexpected unreachable page /archive/, expected a path of
 * links to it from an entry page (/)  unreachable-page`
 */
export declare const unreachablePage: Rule;
