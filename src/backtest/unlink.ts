/**
 * What becomes of a held-out link's words. Either they go with the link (`withoutWords`: out of
 * the page's text for TF-IDF, as if the author had never written the link), or they stay as
 * plain prose (`linkTextRange` + `withSpans`: where the text is in the source, so it becomes a
 * span where an anchor may be proposed, as if the author had written the words without the
 * link). Pure: works on the decoded source text and the parsed facts only.
 */
import { codeSpanText, htmlFragmentText } from '../parse/index.js';
import type { CodeSpan, FileKind, PageText, RawLink, TextSpan } from '../types.js';
import { lineStart, positionOf } from '../util/line-index.js';
import type { LineIndex } from '../util/line-index.js';

/** Where a held-out link's words are in the source; `code` (the code as it reads) when they are one inline code span. */
export interface TextRange {
  readonly start: number;
  readonly end: number;
  readonly code?: string;
}

const CODE_SPAN = /^(`+)(?!`)[^\r\n]*?[^`\r\n]\1(?!`)/;

/**
 * Where a link's visible text is in the source: right after the `[` of a Markdown link, or after
 * the opening tag of an `<a>` element (HTML pages, raw HTML in Markdown). The text must be there
 * exactly as `raw.text` says (so a span made from it keeps `text === source.slice(...)`), or be
 * one inline code span that reads as `raw.text` and fills the link (`` [`fs.stat()`](fs.md) ``,
 * `<a href="fs.html"><code>fs.stat()</code></a>`: the range is the span with its backticks or
 * tags, `code`); links whose text carries other markup (`[**x**](y)`), link patterns and empty
 * texts give null.
 */
export function linkTextRange(source: string, lines: LineIndex, raw: RawLink, kind: FileKind): TextRange | null {
  if (raw.origin === 'pattern' || raw.origin === 'navigation' || raw.text.trim() === '') return null;
  if (raw.line < 1 || raw.line > lines.count || raw.column < 1) return null;
  const at = lineStart(lines, raw.line - 1) + raw.column - 1;
  if (at >= source.length) return null;
  let start = -1;
  if (source[at] === '[' && kind === 'markdown') start = at + 1;
  else if (/^<a[\s>]/i.test(source.slice(at, at + 3))) {
    const close = source.indexOf('>', at);
    if (close >= 0) start = close + 1;
  }
  if (start < 0) return null;
  if (kind === 'markdown' && source[start] === '`') {
    const code = CODE_SPAN.exec(source.slice(start, start + raw.text.length + 200));
    if (code === null || source[start + code[0].length] !== ']' || codeSpanText(code[0]) !== raw.text) return null;
    return { start, end: start + code[0].length, code: raw.text };
  }
  if (source[at] === '<' && /^<code[\s>]/i.test(source.slice(start, start + 6))) {
    const close = source.toLowerCase().indexOf('</code>', start);
    if (close < 0) return null;
    const end = close + '</code>'.length;
    if (!/^\s*<\/a>/i.test(source.slice(end, end + 40)) || /[\r\n]/.test(source.slice(start, end))) return null;
    if (htmlFragmentText(source.slice(start, end)) !== raw.text) return null;
    return { start, end, code: raw.text };
  }
  if (!source.startsWith(raw.text, start)) return null;
  return { start, end: start + raw.text.length };
}

/** `codeSpans` with a code span for each range added, in offset order. */
export function withCodeSpans(codeSpans: readonly CodeSpan[], source: string, lines: LineIndex, ranges: readonly TextRange[]): CodeSpan[] {
  const out = [...codeSpans];
  for (const r of ranges) out.push({ text: source.slice(r.start, r.end), code: r.code ?? '', offset: r.start, endOffset: r.end, ...positionOf(lines, r.start) });
  return out.sort((a, b) => a.offset - b.offset);
}

/**
 * `spans` with a span for each range added, in offset order. A range that overlaps an existing
 * span is left out (the parse stage never puts link text in a span, so this is only a guard).
 */
export function withSpans(spans: readonly TextSpan[], source: string, lines: LineIndex, ranges: readonly { start: number; end: number }[]): TextSpan[] {
  const out = [...spans];
  for (const r of ranges) {
    const overlaps = out.some((s) => r.start < s.offset + s.text.length && s.offset < r.end);
    if (overlaps) continue;
    const { line, column } = positionOf(lines, r.start);
    out.push({ text: source.slice(r.start, r.end), offset: r.start, line, column });
  }
  return out.sort((a, b) => a.offset - b.offset);
}

const WORD_CHAR = /[\p{L}\p{N}]/u;

/**
 * `text` with one whole-word occurrence of `phrase` blanked out, or `text` itself when there is
 * none. Which occurrence does not matter to TF-IDF: the index counts words, not places.
 */
export function removeOnce(text: string, phrase: string): string {
  if (phrase.trim() === '') return text;
  for (let at = text.indexOf(phrase); at >= 0; at = text.indexOf(phrase, at + 1)) {
    const before = at > 0 ? text[at - 1] : ' ';
    const after = at + phrase.length < text.length ? text[at + phrase.length] : ' ';
    if (!WORD_CHAR.test(before) && !WORD_CHAR.test(after)) return `${text.slice(0, at)} ${text.slice(at + phrase.length)}`;
  }
  return text;
}

/**
 * The page's text without the words of the given links: each link text taken once out of the
 * body, else out of the headings (a link in a heading); the title is left alone.
 */
export function withoutWords(text: PageText, linkTexts: readonly string[]): PageText {
  let { body, headings } = text;
  for (const phrase of linkTexts) {
    const b = removeOnce(body, phrase);
    if (b !== body) body = b;
    else headings = removeOnce(headings, phrase);
  }
  return { title: text.title, headings, body };
}

