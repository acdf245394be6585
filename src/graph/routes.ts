/**
 * The route index: page routes, then frontmatter `aliases`, then redirects (chains followed),
 * all keyed by `normalizeRoute` keys (DESIGN section 3: old routes that still resolve).
 */
import type { GraphRedirect, RedirectEnd } from './types.js';
import { canonicalPath, extensionOf, lookupKey, routeKeyOf, withBasePath } from '../routes/index.js';
import type { RouteOptions } from '../routes/index.js';
import { SITE_ORIGIN } from './link-source.js';

/** Longest redirect chain followed; longer chains (and loops) end as dead routes. */
const MAX_REDIRECT_HOPS = 64;

/** A written route resolved to a canonical path, an outside URL, or nothing usable. */
export type RouteValue = { readonly kind: 'path'; readonly path: string } | { readonly kind: 'external'; readonly url: string } | null;

/**
 * Resolve a route as written in configuration, frontmatter or a redirects file: site-absolute
 * values are taken against `basePath`, relative ones against `against` (a route; default the
 * base path). Query and fragment are dropped. Another origin gives `external`.
 */
export function resolveRouteValue(value: string, basePath: string, against?: string): RouteValue {
  const trimmed = value.trim();
  if (trimmed === '' || trimmed.includes('\0')) return null;
  let url: URL;
  try {
    url = new URL(trimmed, SITE_ORIGIN + (against ?? basePath));
  } catch {
    return null;
  }
  if (url.origin !== SITE_ORIGIN) return { kind: 'external', url: url.href };
  const absolute = /^[\\/](?![\\/])/.test(trimmed);
  const path = canonicalPath(absolute ? withBasePath(url.pathname, basePath) : url.pathname);
  return path === null ? null : { kind: 'path', path };
}

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
export function buildRouteIndex(
  pages: readonly IndexedPage[],
  redirects: readonly GraphRedirect[],
  routes: RouteOptions,
  basePath: string,
): RouteIndexes {
  const routeIndex = new Map<string, number>();
  for (let id = 0; id < pages.length; id++) {
    const key = routeKeyOf(pages[id].route, routes);
    if (!routeIndex.has(key)) routeIndex.set(key, id);
  }
  for (let id = 0; id < pages.length; id++) {
    for (const alias of pages[id].aliases) {
      const value = resolveRouteValue(alias, basePath, pages[id].route);
      if (value === null || value.kind !== 'path') continue;
      const key = routeKeyOf(value.path, routes);
      if (lookupKey(routeIndex, key, routes) !== undefined) continue;
      for (const form of keyForms(key)) if (!routeIndex.has(form)) routeIndex.set(form, id);
    }
  }

  // Redirects: from-key -> written target, first line wins; then each chain is followed.
  const edges = new Map<string, RouteValue>();
  const order: string[] = [];
  for (const r of redirects) {
    const from = resolveRouteValue(r.from, basePath);
    if (from === null || from.kind !== 'path') continue;
    const to = resolveRouteValue(r.to, basePath);
    const key = routeKeyOf(from.path, routes);
    // A source that already reaches a page (as a link would look it up) is shadowed by it.
    if (lookupKey(routeIndex, key, routes) !== undefined) continue;
    for (const form of keyForms(key)) {
      if (routeIndex.has(form) || edges.has(form)) continue;
      edges.set(form, to);
      order.push(form);
    }
  }
  const redirectEnds = new Map<string, RedirectEnd>();
  for (const key of order) {
    const end = followRedirect(key, edges, routeIndex, routes);
    if (typeof end === 'number') routeIndex.set(key, end);
    else redirectEnds.set(key, end);
  }
  return { routeIndex, redirectEnds };
}

/**
 * The keys an alias or redirect source answers to: written with or without its trailing slash
 * (`/old` and `/old/`), as hosts match redirects either way (common practice, no source).
 * A source with an extension (`/old.html`) answers only as written.
 */
function keyForms(key: string): string[] {
  if (key.endsWith('/')) return key === '/' ? [key] : [key, key.slice(0, -1)];
  return extensionOf(key) === '' ? [key, key + '/'] : [key];
}

function followRedirect(
  start: string,
  edges: ReadonlyMap<string, RouteValue>,
  routeIndex: ReadonlyMap<string, number>,
  routes: RouteOptions,
): number | RedirectEnd {
  let key = start;
  let shown = start;
  const seen = new Set<string>([start]);
  for (let hop = 0; hop < MAX_REDIRECT_HOPS; hop++) {
    const to = edges.get(key);
    if (to === undefined || to === null) return { kind: 'dead', route: shown };
    if (to.kind === 'external') return { kind: 'external', url: to.url };
    const next = routeKeyOf(to.path, routes);
    shown = to.path;
    const page = lookupKey(routeIndex, next, routes);
    if (page !== undefined) return page;
    const nextKey = edges.has(next) ? next : null;
    if (nextKey === null || seen.has(nextKey)) return { kind: 'dead', route: shown };
    seen.add(nextKey);
    key = nextKey;
  }
  return { kind: 'dead', route: shown };
}
