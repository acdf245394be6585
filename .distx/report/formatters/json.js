/** Pieces of about this many characters are handed to the writer. */
const PIECE_CHARS = 1 << 20;
/** Array items stringified in one call. */
const CHUNK_ITEMS = 1000;
/** The JSON formatter (the report is already sorted and rounded by `buildReport`). */
export const jsonFormatter = {
    id: 'json',
    fileExtension: '.json',
    format(report) {
        return [...jsonPieces(report)].join('');
    },
    pieces(report) {
        return jsonPieces(report);
    },
};
/**
 * `JSON.stringify(report, null, 2)` plus a final newline, in pieces of about `PIECE_CHARS`,
 * made as they are asked for (so the whole text never exists at once).
 */
export function jsonPieces(report) {
    return jsonTextPieces(report, 2);
}
/**
 * `JSON.stringify(value, null, 2)` plus a final newline, in pieces: objects and arrays are
 * opened `levels` deep (so the items of arrays at that depth are stringified one by one).
 */
export function* jsonTextPieces(value, levels) {
    let current = [];
    let size = 0;
    for (const text of valueParts(value, '', levels)) {
        current.push(text);
        size += text.length;
        if (size >= PIECE_CHARS) {
            yield current.join('');
            current = [];
            size = 0;
        }
    }
    current.push('\n');
    yield current.join('');
}
/**
 * Write `value` as `JSON.stringify` with 2-space indentation would, at nesting `indent`; objects
 * and arrays are opened up `levels` deep, anything deeper is stringified whole.
 */
function* valueParts(value, indent, levels) {
    if (levels === 0 || value === null || typeof value !== 'object' || typeof value.toJSON === 'function') {
        yield indented(JSON.stringify(value, null, 2), indent);
        return;
    }
    const inner = `${indent}  `;
    if (Array.isArray(value)) {
        if (value.length === 0) {
            yield '[]';
            return;
        }
        if (levels === 1) {
            // The items are stringified whole: a slice of them at a time, as one array, gives the
            // same text as one by one, with far fewer calls. `[\n` and `\n<indent>]` are cut off.
            for (let i = 0; i < value.length; i += CHUNK_ITEMS) {
                const json = indented(JSON.stringify(value.slice(i, i + CHUNK_ITEMS), null, 2), indent);
                const items = json.slice(2, json.length - indent.length - 2);
                yield i === 0 ? `[\n${items}` : `,\n${items}`;
            }
            yield `\n${indent}]`;
            return;
        }
        for (let i = 0; i < value.length; i++) {
            yield i === 0 ? `[\n${inner}` : `,\n${inner}`;
            const item = value[i];
            // Inside arrays, `undefined` and functions are written as null.
            yield* valueParts(item === undefined || typeof item === 'function' || typeof item === 'symbol' ? null : item, inner, levels - 1);
        }
        yield `\n${indent}]`;
        return;
    }
    let first = true;
    for (const [key, item] of Object.entries(value)) {
        if (item === undefined || typeof item === 'function' || typeof item === 'symbol')
            continue;
        yield `${first ? '{' : ','}\n${inner}${JSON.stringify(key)}: `;
        first = false;
        yield* valueParts(item, inner, levels - 1);
    }
    yield first ? '{}' : `\n${indent}}`;
}
function indented(json, indent) {
    return indent === '' ? json : json.replaceAll('\n', `\n${indent}`);
}
