/**
 * Choosing the graph's pages from the parsed facts: drafts left out, routes made canonical,
 * one page per route (the first file by path keeps it), pages sorted by route.
 */
import type { PageFacts, PageNode } from '../types.js';
import type { RouteOptions } from './normalize.js';
/** A file that lost its route to another file. */
export interface DuplicateRoute {
    readonly file: string;
    readonly route: string;
    readonly keptFile: string;
}
/** The pages of a site and the files that did not become pages. */
export interface PageSelection {
    readonly pages: PageNode[];
    readonly duplicates: DuplicateRoute[];
    /** File path -> page id, for every non-draft file (a duplicate maps to the page that kept its route). */
    readonly fileToPage: Map<string, number>;
}
/**
 * Canonical form of a page route from the parse stage. A route that does not percent-decode
 * (a literal `%` in a file name) is taken as already decoded and encoded once.
 */
export declare function canonicalRoute(route: string): string;
/** Code-unit order: deterministic and locale-free. */
export declare function compareStrings(a: string, b: string): number;
/** Select and sort the pages of `facts`. */
export declare function selectPages(facts: readonly PageFacts[], routes: RouteOptions): PageSelection;
