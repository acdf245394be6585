import { canonicalPath, encodeRouteSegment, routeKeyOf } from './normalize.js';
/**
 * Canonical form of a page route from the parse stage. A route that does not percent-decode
 * (a literal `%` in a file name) is taken as already decoded and encoded once.
 */
export function canonicalRoute(route) {
    return canonicalPath(route) ?? canonicalPath(route.split('/').map(encodeRouteSegment).join('/'));
}
/** Code-unit order: deterministic and locale-free. */
export function compareStrings(a, b) {
    return a < b ? -1 : a > b ? 1 : 0;
}
/** Select and sort the pages of `facts`. */
export function selectPages(facts, routes) {
    const candidates = [];
    for (let index = 0; index < facts.length; index++) {
        const f = facts[index];
        if (f.meta.draft)
            continue;
        const route = canonicalRoute(f.route);
        candidates.push({ index, route, key: routeKeyOf(route, routes), file: f.file });
    }
    candidates.sort((a, b) => compareStrings(a.key, b.key) || compareStrings(a.file, b.file) || a.index - b.index);
    const kept = [];
    const lost = [];
    for (const c of candidates) {
        const last = kept[kept.length - 1];
        if (last !== undefined && last.key === c.key)
            lost.push({ file: c.file, route: c.route, keptIndex: kept.length - 1 });
        else
            kept.push(c);
    }
    const order = kept.map((_, i) => i);
    order.sort((a, b) => compareStrings(kept[a].route, kept[b].route) || compareStrings(kept[a].file, kept[b].file));
    const idOfKept = new Int32Array(kept.length);
    const pages = order.map((k, id) => {
        idOfKept[k] = id;
        const c = kept[k];
        const f = facts[c.index];
        return { id, factsIndex: c.index, route: c.route, file: f.file, title: f.title, meta: f.meta };
    });
    const fileToPage = new Map();
    for (const p of pages)
        if (!fileToPage.has(p.file))
            fileToPage.set(p.file, p.id);
    const duplicates = [];
    for (const d of lost) {
        const keptPage = pages[idOfKept[d.keptIndex]];
        duplicates.push({ file: d.file, route: d.route, keptFile: keptPage.file });
        if (!fileToPage.has(d.file))
            fileToPage.set(d.file, keptPage.id);
    }
    duplicates.sort((a, b) => compareStrings(a.route, b.route) || compareStrings(a.file, b.file));
    return { pages, duplicates, fileToPage };
}
