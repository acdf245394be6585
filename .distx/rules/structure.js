/** Path of the navigation file as the report names it (relative posix path, no leading `./`). */
export function navigationFile(options) {
    if (options.navigation === null)
        return '';
    return options.navigation.replace(/\\/g, '/').replace(/^(\.\/)+/, '');
}
/** Ids of the entry pages, as a set. */
export function entrySet(graph) {
    return new Set(graph.entries);
}
/** Pages that take part in findings: not excluded by `linkweave.exclude`. */
export function isChecked(graph, page) {
    return !graph.pages[page].meta.exclude;
}
/** Number of distinct pages `page` links to with at least one content link. */
export function contentOutlinks(forward, page) {
    let count = 0;
    for (let e = forward.offsets[page]; e < forward.offsets[page + 1]; e++) {
        if ((forward.flags[e] & 1) !== 0)
            count++;
    }
    return count;
}
/**
 * Orphan page: no inlinks from any other page (template links count unless
 * `countTemplateLinks` is false). Entry pages are never orphans.
 */
export function isOrphan(graph, ranking, entries, page, countTemplateLinks = true) {
    if (entries.has(page))
        return false;
    const inlinks = countTemplateLinks ? ranking.inlinks[page] : ranking.contentInlinks[page];
    return inlinks === 0;
}
/**
 * Dead end: no content outlinks to other pages (template links count only when
 * `countTemplateLinks` is true). A site of one page has no dead ends: there is nowhere to link to.
 */
export function isDeadEnd(graph, ranking, page, countTemplateLinks = false) {
    if (graph.pages.length < 2)
        return false;
    const outlinks = countTemplateLinks ? ranking.outlinks[page] : contentOutlinks(graph.forward, page);
    return outlinks === 0;
}
/** Unreachable: no path of links from any entry page. */
export function isUnreachable(ranking, page) {
    return ranking.depth[page] < 0;
}
/** Code-unit order, the same on every machine (unlike `localeCompare`). */
export function compareText(a, b) {
    return a < b ? -1 : a > b ? 1 : 0;
}
