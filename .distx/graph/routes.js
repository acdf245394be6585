import { canonicalPath, extensionOf, lookupKey, routeKeyOf, withBasePath } from './normalize.js';
import { SITE_ORIGIN } from './source.js';
/** Longest redirect chain followed; longer chains (and loops) end as dead routes. */
const MAX_REDIRECT_HOPS = 64;
/**
 * Resolve a route as written in configuration, frontmatter or a redirects file: site-absolute
 * values are taken against `basePath`, relative ones against `against` (a route; default the
 * base path). Query and fragment are dropped. Another origin gives `external`.
 */
export function resolveRouteValue(value, basePath, against) {
    const trimmed = value.trim();
    if (trimmed === '' || trimmed.includes('\0'))
        return null;
    let url;
    try {
        url = new URL(trimmed, SITE_ORIGIN + (against ?? basePath));
    }
    catch {
        return null;
    }
    if (url.origin !== SITE_ORIGIN)
        return { kind: 'external', url: url.href };
    const absolute = /^[\\/](?![\\/])/.test(trimmed);
    const path = canonicalPath(absolute ? withBasePath(url.pathname, basePath) : url.pathname);
    return path === null ? null : { kind: 'path', path };
}
/**
 * Build the route index. Pages come first (their ids are their positions in `pages`); an alias
 * or redirect never takes a route that already reaches a page (trailing-slash lookup included);
 * between aliases the first page in route order wins, between redirects the first line.
 */
export function buildRouteIndex(pages, redirects, routes, basePath) {
    const routeIndex = new Map();
    for (let id = 0; id < pages.length; id++) {
        const key = routeKeyOf(pages[id].route, routes);
        if (!routeIndex.has(key))
            routeIndex.set(key, id);
    }
    for (let id = 0; id < pages.length; id++) {
        for (const alias of pages[id].aliases) {
            const value = resolveRouteValue(alias, basePath, pages[id].route);
            if (value === null || value.kind !== 'path')
                continue;
            const key = routeKeyOf(value.path, routes);
            if (lookupKey(routeIndex, key, routes) !== undefined)
                continue;
            for (const form of keyForms(key))
                if (!routeIndex.has(form))
                    routeIndex.set(form, id);
        }
    }
    // Redirects: from-key -> written target, first line wins; then each chain is followed.
    const edges = new Map();
    const order = [];
    for (const r of redirects) {
        const from = resolveRouteValue(r.from, basePath);
        if (from === null || from.kind !== 'path')
            continue;
        const to = resolveRouteValue(r.to, basePath);
        const key = routeKeyOf(from.path, routes);
        // A source that already reaches a page (as a link would look it up) is shadowed by it.
        if (lookupKey(routeIndex, key, routes) !== undefined)
            continue;
        for (const form of keyForms(key)) {
            if (routeIndex.has(form) || edges.has(form))
                continue;
            edges.set(form, to);
            order.push(form);
        }
    }
    const redirectEnds = new Map();
    for (const key of order) {
        const end = followRedirect(key, edges, routeIndex, routes);
        if (typeof end === 'number')
            routeIndex.set(key, end);
        else
            redirectEnds.set(key, end);
    }
    return { routeIndex, redirectEnds };
}
/**
 * The keys an alias or redirect source answers to: written with or without its trailing slash
 * (`/old` and `/old/`), as hosts match redirects either way (common practice, no source).
 * A source with an extension (`/old.html`) answers only as written.
 */
function keyForms(key) {
    if (key.endsWith('/'))
        return key === '/' ? [key] : [key, key.slice(0, -1)];
    return extensionOf(key) === '' ? [key, key + '/'] : [key];
}
function followRedirect(start, edges, routeIndex, routes) {
    let key = start;
    let shown = start;
    const seen = new Set([start]);
    for (let hop = 0; hop < MAX_REDIRECT_HOPS; hop++) {
        const to = edges.get(key);
        if (to === undefined || to === null)
            return { kind: 'dead', route: shown };
        if (to.kind === 'external')
            return { kind: 'external', url: to.url };
        const next = routeKeyOf(to.path, routes);
        shown = to.path;
        const page = lookupKey(routeIndex, next, routes);
        if (page !== undefined)
            return page;
        const nextKey = edges.has(next) ? next : null;
        if (nextKey === null || seen.has(nextKey))
            return { kind: 'dead', route: shown };
        seen.add(nextKey);
        key = nextKey;
    }
    return { kind: 'dead', route: shown };
}
