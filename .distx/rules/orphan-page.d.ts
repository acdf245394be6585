import type { Rule } from './types.js';
/** Options of `orphan-page`. */
export interface OrphanPageOptions {
    /**
     * Count template links (navigation, header, footer, repeated links) as inlinks.
     * `false`: a page only the sidebar links to is an orphan too.
     * @default true
     */
    readonly countTemplateLinks: boolean;
}
/**
 * `orphan-page`: every page has at least one inlink from another page.
 *
 * Entry pages are exempt. Reported at line 1, column 1 of the page's file.
 *
 * Options: `countTemplateLinks` (default `true`). Default severity: `error`: nothing leads a
 * reader to an orphan page, so it is unreachable too.
 *
 * @example ok: `index.md` links to `about.md`, so `/about/` is no orphan.
 * @example not ok: nothing links to `old/notes.md`:
 * `old/notes.md:1:1  error  Unexpected orphan page /old/notes/, expected a link to it from
 * at least one other page  orphan-page`
 */
export declare const orphanPage: Rule<OrphanPageOptions>;
