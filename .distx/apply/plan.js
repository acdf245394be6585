import { buildLineIndex, parseSource, positionOf } from '../parse/index.js';
import { linkMarkup } from './markup.js';
/** Source problems that mean the decoded text is not the file's bytes. */
const UNWRITABLE = new Set(['binary', 'too-large', 'invalid-utf8', 'unreadable']);
/** Plan one file's edits. */
export function planFile(input) {
    const { file } = input;
    const refused = [];
    const refuse = (s, reason) => refused.push({ id: s.id, file: file.path, reason });
    const bad = file.problems.find((p) => UNWRITABLE.has(p.code));
    let candidates = [];
    for (const s of input.suggestions) {
        if (bad !== undefined)
            refuse(s, `cannot be edited without changing other bytes: ${bad.message}`);
        else if (s.sourceHash !== file.hash) {
            refuse(s, `changed since the report (content hash ${s.sourceHash.slice(0, 12)}, now ${file.hash.slice(0, 12)}); run "linkweave suggest" again`);
        }
        else if (s.anchor === null || s.anchor === '')
            refuse(s, 'no anchor phrase to link');
        else if (s.offset < 0 || s.endOffset > file.text.length || file.text.slice(s.offset, s.endOffset) !== s.anchor) {
            refuse(s, `the anchor "${s.anchor}" is not at offset ${s.offset}`);
        }
        else if (splitsPair(file.text, s.offset) || splitsPair(file.text, s.endOffset)) {
            refuse(s, `the anchor "${s.anchor}" starts or ends inside a character (between the halves of a surrogate pair)`);
        }
        else if (!input.hrefs.has(s.id))
            refuse(s, `the target ${s.target} is not a page of the report`);
        else
            candidates.push(s);
    }
    candidates.sort((a, b) => a.offset - b.offset || a.endOffset - b.endOffset || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
    const chosen = [];
    for (const s of candidates) {
        const last = chosen[chosen.length - 1];
        if (last !== undefined && s.offset < last.endOffset)
            refuse(s, `its anchor overlaps the anchor of ${last.id} ("${last.anchor}")`);
        else
            chosen.push(s);
    }
    candidates = chosen;
    // Re-parse and drop what does not read as a link; a drop can change how the rest parses, so
    // repeat until every remaining edit checks out.
    for (;;) {
        const { text, applied } = edit(file.text, candidates, input);
        if (applied.length === 0)
            return done(file, input.style, applied, refused, file.text);
        const links = parseSource({ ...file, text }, input.options).links;
        const failed = applied.filter((a) => !links.some((l) => l.href === a.href && l.line === a.line && l.column === a.column));
        if (failed.length === 0)
            return done(file, input.style, applied, refused, text);
        for (const f of failed)
            refuse(candidates.find((s) => s.id === f.id), `a link here would not be read as a link (checked by parsing the edited file)`);
        const gone = new Set(failed.map((f) => f.id));
        candidates = candidates.filter((s) => !gone.has(s.id));
    }
}
/** True when `offset` falls between a high and a low surrogate (inserting there would break the character). */
function splitsPair(text, offset) {
    if (offset <= 0 || offset >= text.length)
        return false;
    const before = text.charCodeAt(offset - 1);
    const after = text.charCodeAt(offset);
    return before >= 0xd800 && before <= 0xdbff && after >= 0xdc00 && after <= 0xdfff;
}
/** Insert the markup of `sorted` (ascending, not overlapping) into `text`. */
function edit(text, sorted, input) {
    const parts = [];
    let at = text.length;
    for (let i = sorted.length - 1; i >= 0; i--) {
        const s = sorted[i];
        const { open, close } = linkMarkup(input.file.kind, input.hrefs.get(s.id));
        parts.push(text.slice(s.endOffset, at), close, text.slice(s.offset, s.endOffset), open);
        at = s.offset;
    }
    parts.push(text.slice(0, at));
    const edited = parts.reverse().join('');
    const lines = buildLineIndex(edited);
    let shift = 0;
    const applied = sorted.map((s) => {
        const href = input.hrefs.get(s.id);
        const { open, close } = linkMarkup(input.file.kind, href);
        const offset = s.offset + shift;
        shift += open.length + close.length;
        const { line, column } = positionOf(lines, offset);
        return { id: s.id, file: input.file.path, line, column, anchor: s.anchor, target: s.target, href, open, close, offset };
    });
    return { text: edited, applied };
}
function done(file, style, applied, refused, after) {
    return { file: file.path, before: file.text, after, style, applied, refused: refused.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0)) };
}
