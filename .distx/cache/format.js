/** Schema id of a shard file; bump when the entry layout changes. */
export const CACHE_SCHEMA = 'linkweave/facts-cache@1';
/** Number of shard files. */
export const SHARDS = 16;
/** File name of shard `i`. */
export function shardFileName(i) {
    return `facts-${i.toString(16)}.json`;
}
/** Shard of a source path: FNV-1a (32 bit) of its UTF-16 code units, modulo `SHARDS`. */
export function shardOfPath(path) {
    let h = 0x811c9dc5;
    for (let i = 0; i < path.length; i++) {
        h ^= path.charCodeAt(i);
        h = Math.imul(h, 0x01000193);
    }
    return (h >>> 0) % SHARDS;
}
/**
 * True when a file's facts depend only on its bytes, its path and the parse options, so they may
 * be cached. A `too-large` file depends on `maxFileBytes` (collect gave it no text), and any
 * other read problem (unreadable, or one added later) may not recur: such files are parsed every
 * run, which costs nothing since they carry no text. `binary` and `invalid-utf8` follow from the
 * bytes alone and are cached.
 */
export function isCacheable(file) {
    for (const p of file.problems)
        if (p.code !== 'binary' && p.code !== 'invalid-utf8')
            return false;
    return true;
}
/** The key order of a span as `parseSource` builds it; spans in another form are stored as written. */
const SPAN_KEYS = ['text', 'offset', 'line', 'column'];
/** Facts in their stored form. Key order is kept, so restoring gives the same JSON. */
export function packFacts(facts, source) {
    const packed = packSpans(facts.spans, source);
    return packed === null ? facts : { ...facts, spans: packed };
}
/**
 * Facts back from their stored form, with span texts sliced from `source`; null when a packed
 * span does not fit the source (a damaged entry).
 */
export function unpackFacts(stored, source) {
    const spans = stored.spans;
    if (spans.length === 0 || typeof spans[0] !== 'number')
        return stored;
    const numbers = spans;
    const out = new Array(numbers.length / 4);
    for (let i = 0, j = 0; i < numbers.length; i += 4, j++) {
        const offset = numbers[i];
        const length = numbers[i + 1];
        if (offset < 0 || length < 0 || offset + length > source.length)
            return null;
        out[j] = { text: source.slice(offset, offset + length), offset, line: numbers[i + 2], column: numbers[i + 3] };
    }
    return { ...stored, spans: out };
}
function packSpans(spans, source) {
    const out = new Array(spans.length * 4);
    for (let i = 0; i < spans.length; i++) {
        const s = spans[i];
        if (!hasSpanKeys(s))
            return null;
        if (!Number.isInteger(s.offset) || source.slice(s.offset, s.offset + s.text.length) !== s.text)
            return null;
        out[i * 4] = s.offset;
        out[i * 4 + 1] = s.text.length;
        out[i * 4 + 2] = s.line;
        out[i * 4 + 3] = s.column;
    }
    return out;
}
function hasSpanKeys(span) {
    let n = 0;
    for (const key in span) {
        if (key !== SPAN_KEYS[n])
            return false;
        n++;
    }
    return n === SPAN_KEYS.length;
}
