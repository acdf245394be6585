/** Field order of the page rows. */
export const PAGE_FIELDS = ['route', 'title', 'file', 'pagerank', 'rank', 'depth', 'inlinks', 'contentInlinks', 'outlinks', 'importance', 'orphan', 'nav', 'findings'];
/** Field order of the finding rows. */
export const FINDING_FIELDS = ['rule', 'severity', 'file', 'line', 'column', 'route', 'message'];
/** Field order of the suggestion rows. */
export const SUGGESTION_FIELDS = ['id', 'source', 'target', 'targetTitle', 'file', 'line', 'column', 'anchor', 'similarity', 'targetRankBefore', 'targetRankAfter', 'depthBefore', 'depthAfter', 'reason'];
function rows(items, fields) {
    return items.map((item) => fields.map((f) => {
        const v = item[f];
        return typeof v === 'boolean' ? (v ? 1 : 0) : v;
    }));
}
/**
 * Turn the HTML data into its embedded form.
 * @param data the report's HTML data
 */
export function embedData(data) {
    return {
        ...data,
        fields: { pages: PAGE_FIELDS, findings: FINDING_FIELDS, suggestions: SUGGESTION_FIELDS },
        pages: rows(data.pages, [...PAGE_FIELDS]),
        findings: rows(data.findings, [...FINDING_FIELDS]),
        suggestions: rows(data.suggestions, [...SUGGESTION_FIELDS]),
    };
}
/**
 * Rows back to objects (booleans stay 0/1), as the page's script does.
 * @param list rows
 * @param fields field names, in row order
 */
export function decodeRows(list, fields) {
    return list.map((row) => Object.fromEntries(fields.map((f, k) => [f, row[k] ?? null])));
}
