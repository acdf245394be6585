/** Fewest pages for which repetition means anything. */
export const TEMPLATE_MIN_PAGES = 4;
/**
 * Mark repeated links as template links. Links must be grouped by page (`from` ascending, as
 * `buildGraph` produces them); links with `from` < 0 (navigation) are left as they are and not
 * counted. Returns a new array; unchanged links are the same objects.
 * @param pageCount number of pages in the site
 * @param share the share of pages at or above which a link is a template link (0 < share <= 1)
 */
export function markTemplateLinks(links, pageCount, share) {
    if (pageCount < TEMPLATE_MIN_PAGES)
        return links.slice();
    // A link on a single page does not repeat, whatever the share.
    const threshold = Math.max(2, Math.ceil(share * pageCount - 1e-9));
    // Pass 1: distinct pages per target, texts aside (typed arrays for page targets). Only the
    // targets that reach the threshold can carry a template link, so pass 2 keys few links.
    const perPage = new Int32Array(pageCount);
    const lastFrom = new Int32Array(pageCount).fill(-1);
    const perOther = new Map();
    for (const link of links) {
        if (link.from < 0)
            continue;
        if (link.to >= 0) {
            if (lastFrom[link.to] !== link.from) {
                lastFrom[link.to] = link.from;
                perPage[link.to]++;
            }
        }
        else
            count(perOther, link.target, link.from);
    }
    const candidate = (link) => link.from >= 0 && link.context !== 'template' && (link.to >= 0 ? perPage[link.to] >= threshold : perOther.get(link.target).pages >= threshold);
    // Pass 2: distinct pages per (target, text) among the candidates.
    const perKey = new Map();
    for (const link of links)
        if (candidate(link))
            count(perKey, templateKey(link), link.from);
    if (perKey.size === 0)
        return links.slice();
    return links.map((link) => (candidate(link) && perKey.get(templateKey(link)).pages >= threshold ? { ...link, context: 'template' } : link));
}
/** Count page `from` once per key (links come grouped by page). */
function count(map, key, from) {
    const c = map.get(key);
    if (c === undefined)
        map.set(key, { pages: 1, last: from });
    else if (c.last !== from) {
        c.pages++;
        c.last = from;
    }
}
/** Same target (kind and resolved target, fragment aside) and same text, whitespace collapsed. */
function templateKey(link) {
    const text = link.raw.text.trim().replace(/\s+/g, ' ');
    return link.kind + '\u0000' + link.target + '\u0000' + text;
}
