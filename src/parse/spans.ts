/**
 * Text spans (where a link may be inserted) and plain text of tree nodes.
 *
 * A span never crosses a line ending and never starts or ends with white space, so a consumer
 * can compute the column of any offset inside it as `span.column + (offset - span.offset)`.
 * A span is kept only where the source holds exactly the text the parser produced (no escapes
 * or character references in between), so inserting at an offset inside it is safe.
 */
import type { LineIndex } from '../util/line-index.js';
import { lineContentEnd, lineOf, lineStart } from '../util/line-index.js';
import type { PageDraft, SpanDraft } from './types.js';

const LINE_BREAK = /\r\n|\r|\n/;
const WORDY = /[\p{L}\p{N}]/u;

/**
 * Add the lines of a piece of source text as spans (trimmed; lines without a letter or digit
 * are left out).
 * @param draft the page being collected
 * @param text a run of source text, equal to the source at `start`
 * @param start its offset in the source
 */
export function addSourceSpans(draft: PageDraft, text: string, start: number): void {
  let lineBegin = 0;
  const n = text.length;
  for (let i = 0; i <= n; i++) {
    const c = i < n ? text.charCodeAt(i) : 10;
    if (c !== 10 && c !== 13) continue;
    pushTrimmed(draft, text, lineBegin, i, start);
    if (c === 13 && i + 1 < n && text.charCodeAt(i + 1) === 10) i++;
    lineBegin = i + 1;
  }
}

function pushTrimmed(draft: PageDraft, text: string, from: number, to: number, base: number): void {
  while (from < to && isSpace(text.charCodeAt(from))) from++;
  while (to > from && isSpace(text.charCodeAt(to - 1))) to--;
  if (to <= from) return;
  const piece = text.slice(from, to);
  if (WORDY.test(piece)) draft.spans.push({ text: piece, offset: base + from });
}

function isSpace(c: number): boolean {
  return c === 32 || c === 9 || c === 10 || c === 13 || c === 12 || c === 0xa0;
}

/**
 * Spans of a Markdown text node. The node's value equals its source slice in plain paragraphs;
 * inside block quotes and lists the container prefixes (`> `, indentation) of continuation
 * lines are missing from the value, so each line of the value is matched against the end of its
 * own source line instead, and lines that do not match exactly (escapes, references) are skipped.
 * @param draft the page being collected
 * @param src the source text
 * @param lines its line table
 * @param value the text node's value
 * @param start the node's start offset
 * @param end the node's end offset
 */
export function addMarkdownTextSpans(
  draft: PageDraft,
  src: string,
  lines: LineIndex,
  value: string,
  start: number,
  end: number,
): void {
  if (end - start === value.length && src.startsWith(value, start)) {
    addSourceSpans(draft, value, start);
    return;
  }
  const parts = value.split(LINE_BREAK);
  const first = parts[0];
  if (src.startsWith(first, start)) addSourceSpans(draft, first, start);
  if (parts.length === 1) return;
  const firstLine = lineOf(lines, start);
  for (let k = 1; k < parts.length; k++) {
    const part = parts[k];
    if (part === '') continue;
    let at: number;
    if (k === parts.length - 1) {
      at = end - part.length;
    } else {
      const line = firstLine + k;
      let lineEnd = lineContentEnd(lines, src, line);
      at = lineEnd - part.length;
      if (!src.startsWith(part, at)) {
        const begin = lineStart(lines, line);
        while (lineEnd > begin && isSpace(src.charCodeAt(lineEnd - 1))) lineEnd--;
        at = lineEnd - part.length;
      }
    }
    if (at >= 0 && src.startsWith(part, at)) addSourceSpans(draft, part, at);
  }
}

/**
 * Take source ranges out of the spans added since `first` (a span overlapping a range keeps the
 * trimmed pieces around it that still hold a letter or digit).
 * @param draft the page being collected
 * @param first index of the first span to look at
 * @param cuts ranges `[start, end)` as pairs, in offset order
 */
export function cutSpans(draft: PageDraft, first: number, cuts: readonly number[]): void {
  if (cuts.length === 0) return;
  const added = draft.spans.splice(first);
  for (const span of added) {
    const spanEnd = span.offset + span.text.length;
    let from = span.offset;
    for (let c = 0; c < cuts.length; c += 2) {
      const cutStart = cuts[c];
      const cutEnd = cuts[c + 1];
      if (cutEnd <= from || cutStart >= spanEnd) continue;
      if (cutStart > from) pushTrimmed(draft, span.text, from - span.offset, cutStart - span.offset, span.offset);
      from = Math.max(from, cutEnd);
    }
    if (from < spanEnd) pushTrimmed(draft, span.text, from - span.offset, spanEnd - span.offset, span.offset);
  }
}

/**
 * Spans cut by ranges: each span overlapping a range keeps the trimmed pieces around it that
 * still hold a letter or digit.
 * @param spans spans in any order
 * @param ranges `[start, end)` first, sorted by start with ascending ends (none holds another)
 * @returns the spans sorted by offset
 */
export function cutSpansByRanges(spans: readonly SpanDraft[], ranges: readonly (readonly [number, number, ...unknown[]])[]): SpanDraft[] {
  const sorted = spans.slice().sort((a, b) => a.offset - b.offset);
  if (ranges.length === 0) return sorted;
  const out = { spans: [] as SpanDraft[] } as unknown as PageDraft;
  let r = 0;
  for (const span of sorted) {
    const spanEnd = span.offset + span.text.length;
    while (r < ranges.length && ranges[r][1] <= span.offset) r++;
    let from = span.offset;
    for (let k = r; k < ranges.length && ranges[k][0] < spanEnd; k++) {
      const [cutStart, cutEnd] = ranges[k];
      if (cutEnd <= from) continue;
      if (cutStart > from) pushTrimmed(out, span.text, from - span.offset, cutStart - span.offset, span.offset);
      from = Math.max(from, cutEnd);
    }
    if (from === span.offset) out.spans.push(span);
    else if (from < spanEnd) pushTrimmed(out, span.text, from - span.offset, spanEnd - span.offset, span.offset);
  }
  return out.spans;
}

/**
 * Spans of an HTML text node: parse5 turns `\r\n` and `\r` into `\n` in text values, so the
 * source slice is compared with its line endings normalised, and the spans come from the source.
 * @param draft the page being collected
 * @param src the source text
 * @param value the text node's value
 * @param start the node's start offset
 * @param end the node's end offset
 */
export function addHtmlTextSpans(draft: PageDraft, src: string, value: string, start: number, end: number): void {
  const slice = src.slice(start, end);
  if (slice === value || slice.replace(/\r\n?/g, '\n') === value) addSourceSpans(draft, slice, start);
}

/** Collapse white space runs to one space and trim. */
export function collapseSpace(text: string): string {
  return text.replace(/\s+/g, ' ').trim();
}

/**
 * The text an inline code span reads as (a link around it has this `RawLink.text`): the code
 * without its backtick runs, one space stripped from each end when both ends have one and it is
 * not all spaces (CommonMark 0.31, section 6.1), white space collapsed.
 * @param span the span as written, backticks included
 */
export function codeSpanText(span: string): string {
  let inner = span.replace(/^`+/, '').replace(/`+$/, '');
  if (inner.length > 1 && inner.startsWith(' ') && inner.endsWith(' ') && inner.trim() !== '') inner = inner.slice(1, -1);
  return collapseSpace(inner);
}

/** True when a link's visible text is its own address (an autolink): such text is no prose. */
export function looksLikeUrl(text: string, href: string): boolean {
  const t = text.trim();
  if (t === '') return false;
  return t === href || href === `mailto:${t}` || href === `http://${t}` || /^(?:https?:\/\/|www\.|mailto:)/i.test(t);
}
