function isObject(v) {
    return typeof v === 'object' && v !== null && !Array.isArray(v);
}
function isInt(v) {
    return typeof v === 'number' && Number.isInteger(v);
}
function optional(v, type) {
    return v === undefined || typeof v === type;
}
function isStringArray(v) {
    if (!Array.isArray(v))
        return false;
    for (const s of v)
        if (typeof s !== 'string')
            return false;
    return true;
}
/** A parsed header line, or null when it is not one. */
export function asHeader(v) {
    if (!isObject(v))
        return null;
    const { schema, version, fingerprint, shard, count } = v;
    if (typeof schema !== 'string' || typeof version !== 'string' || typeof fingerprint !== 'string')
        return null;
    if (!isInt(shard) || !isInt(count) || count < 0)
        return null;
    return { schema, version, fingerprint, shard, count };
}
const ORIGINS = new Set(['markdown', 'html', 'pattern', 'navigation']);
const CONTEXTS = new Set(['content', 'template']);
const KINDS = new Set(['markdown', 'html']);
const IMPORTANCE = new Set([undefined, 'high', 'normal', 'low']);
const PROBLEM_CODES = new Set([
    'invalid-utf8',
    'too-large',
    'binary',
    'unreadable',
    'frontmatter',
    'parse-failed',
    'bad-link-pattern',
    'too-many-links',
    'deep-nesting',
]);
function isLink(v) {
    if (!isObject(v))
        return false;
    return (typeof v.href === 'string' &&
        typeof v.text === 'string' &&
        isInt(v.line) &&
        isInt(v.column) &&
        CONTEXTS.has(v.context) &&
        typeof v.nofollow === 'boolean' &&
        ORIGINS.has(v.origin) &&
        optional(v.fileRelative, 'boolean'));
}
function isHeading(v) {
    return (isObject(v) &&
        isInt(v.depth) &&
        typeof v.text === 'string' &&
        typeof v.slug === 'string' &&
        isInt(v.line) &&
        isInt(v.column));
}
function isProblem(v) {
    return (isObject(v) &&
        PROBLEM_CODES.has(v.code) &&
        typeof v.message === 'string' &&
        (v.line === undefined || isInt(v.line)) &&
        (v.column === undefined || isInt(v.column)));
}
function isSpan(v) {
    return isObject(v) && typeof v.text === 'string' && isInt(v.offset) && isInt(v.line) && isInt(v.column);
}
function isSpans(v) {
    if (!Array.isArray(v))
        return false;
    if (v.length === 0)
        return true;
    if (typeof v[0] === 'number') {
        if (v.length % 4 !== 0)
            return false;
        for (const n of v)
            if (!isInt(n))
                return false;
        return true;
    }
    for (const s of v)
        if (!isSpan(s))
            return false;
    return true;
}
function every(v, check) {
    if (!Array.isArray(v))
        return false;
    for (const x of v)
        if (!check(x))
            return false;
    return true;
}
function isMeta(v) {
    return (isObject(v) &&
        typeof v.draft === 'boolean' &&
        typeof v.noindex === 'boolean' &&
        typeof v.exclude === 'boolean' &&
        isStringArray(v.aliases) &&
        optional(v.slug, 'string') &&
        optional(v.permalink, 'string') &&
        IMPORTANCE.has(v.importance));
}
/** True when `v` has the full shape of stored facts (every field of `PageFacts`, spans packed or not). */
export function isStoredFacts(v) {
    if (!isObject(v))
        return false;
    const text = v.text;
    return (typeof v.file === 'string' &&
        KINDS.has(v.kind) &&
        typeof v.hash === 'string' &&
        typeof v.route === 'string' &&
        typeof v.title === 'string' &&
        isMeta(v.meta) &&
        every(v.headings, isHeading) &&
        isStringArray(v.ids) &&
        every(v.links, isLink) &&
        optional(v.baseHref, 'string') &&
        isObject(text) &&
        typeof text.title === 'string' &&
        typeof text.headings === 'string' &&
        typeof text.body === 'string' &&
        isSpans(v.spans) &&
        every(v.problems, isProblem));
}
