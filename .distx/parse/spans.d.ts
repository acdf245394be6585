/**
 * Text spans (where a link may be inserted) and plain text of tree nodes.
 *
 * A span never crosses a line ending and never starts or ends with white space, so a consumer
 * can compute the column of any offset inside it as `span.column + (offset - span.offset)`.
 * A span is kept only where the source holds exactly the text the parser produced (no escapes
 * or character references in between), so inserting at an offset inside it is safe.
 */
import type { LineIndex } from './lines.js';
import type { PageDraft } from './types.js';
/**
 * Add the lines of a piece of source text as spans (trimmed; lines without a letter or digit
 * are left out).
 * @param draft the page being collected
 * @param text a run of source text, equal to the source at `start`
 * @param start its offset in the source
 */
export declare function addSourceSpans(draft: PageDraft, text: string, start: number): void;
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
export declare function addMarkdownTextSpans(draft: PageDraft, src: string, lines: LineIndex, value: string, start: number, end: number): void;
/**
 * Take source ranges out of the spans added since `first` (a span overlapping a range keeps the
 * trimmed pieces around it that still hold a letter or digit).
 * @param draft the page being collected
 * @param first index of the first span to look at
 * @param cuts ranges `[start, end)` as pairs, in offset order
 */
export declare function cutSpans(draft: PageDraft, first: number, cuts: readonly number[]): void;
/**
 * Spans of an HTML text node: parse5 turns `\r\n` and `\r` into `\n` in text values, so the
 * source slice is compared with its line endings normalised, and the spans come from the source.
 * @param draft the page being collected
 * @param src the source text
 * @param value the text node's value
 * @param start the node's start offset
 * @param end the node's end offset
 */
export declare function addHtmlTextSpans(draft: PageDraft, src: string, value: string, start: number, end: number): void;
/** Collapse white space runs to one space and trim. */
export declare function collapseSpace(text: string): string;
/** True when a link's visible text is its own address (an autolink): such text is no prose. */
export declare function looksLikeUrl(text: string, href: string): boolean;
