/**
 * What becomes of a held-out link's words. Either they go with the link (`withoutWords`: out of
 * the page's text for TF-IDF, as if the author had never written the link), or they stay as
 * plain prose (`linkTextRange` + `withSpans`: where the text is in the source, so it becomes a
 * span where an anchor may be proposed, as if the author had written the words without the
 * link). Pure: works on the decoded source text and the parsed facts only.
 */
import type { FileKind, PageText, RawLink, TextSpan } from '../types.js';
/** UTF-16 offset of the start of each line (`\n`, `\r\n` and lone `\r` end a line). */
export declare function lineStarts(text: string): number[];
/** 1-based line and column (UTF-16 code units) of an offset. */
export declare function positionOf(starts: readonly number[], offset: number): {
    line: number;
    column: number;
};
/**
 * Where a link's visible text is in the source: right after the `[` of a Markdown link, or after
 * the opening tag of an `<a>` element (HTML pages, raw HTML in Markdown). The text must be there
 * exactly as `raw.text` says (so a span made from it keeps `text === source.slice(...)`); links
 * whose text carries markup (`[**x**](y)`), link patterns and empty texts give null.
 */
export declare function linkTextRange(source: string, starts: readonly number[], raw: RawLink, kind: FileKind): {
    start: number;
    end: number;
} | null;
/**
 * `spans` with a span for each range added, in offset order. A range that overlaps an existing
 * span is left out (the parse stage never puts link text in a span, so this is only a guard).
 */
export declare function withSpans(spans: readonly TextSpan[], source: string, starts: readonly number[], ranges: readonly {
    start: number;
    end: number;
}[]): TextSpan[];
/**
 * `text` with one whole-word occurrence of `phrase` blanked out, or `text` itself when there is
 * none. Which occurrence does not matter to TF-IDF: the index counts words, not places.
 */
export declare function removeOnce(text: string, phrase: string): string;
/**
 * The page's text without the words of the given links: each link text taken once out of the
 * body, else out of the headings (a link in a heading); the title is left alone.
 */
export declare function withoutWords(text: PageText, linkTexts: readonly string[]): PageText;
