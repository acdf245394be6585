/**
 * The route index: page routes, then frontmatter `aliases`, then redirects (chains followed),
 * all keyed by `normalizeRoute` keys (DESIGN section 3: old routes that still resolve).
 */
import type { GraphRedirect, RedirectEnd } from './types.js';
import type { RouteOptions } from './normalize.js';
/** A written route resolved to a canonical path, an outside URL, or nothing usable. */
export type RouteValue = {
    readonly kind: 'path';
    readonly path: string;
} | {
    readonly kind: 'external';
    readonly url: string;
} | null;
/**
 * Resolve a route as written in configuration, frontmatter or a redirects file: site-absolute
 * values are taken against `basePath`, relative ones against `against` (a route; default the
 * base path). Query and fragment are dropped. Another origin gives `external`.
 */
export declare function resolveRouteValue(value: string, basePath: string, against?: string): RouteValue;
/** A kept page as the route index needs it. */
export interface IndexedPage {
    /** Canonical route. */
    readonly route: string;
    readonly aliases: readonly string[];
}
/** The route index and the redirect chains that reach no page. */
export interface RouteIndexes {
    readonly routeIndex: Map<string, number>;
    readonly redirectEnds: Map<string, RedirectEnd>;
}
/**
 * Build the route index. Pages come first (their ids are their positions in `pages`); an alias
 * or redirect never takes a route that already reaches a page (trailing-slash lookup included);
 * between aliases the first page in route order wins, between redirects the first line.
 */
export declare function buildRouteIndex(pages: readonly IndexedPage[], redirects: readonly GraphRedirect[], routes: RouteOptions, basePath: string): RouteIndexes;
