/**
 * Anchor phrases (DESIGN section 7): the longest phrase of the source's prose spans (text
 * outside links, headings, code and images, as `parse` gives them) that matches the target's
 * title, an alias (the words of the last segment of its route or of a frontmatter alias) or its
 * key terms (its heaviest TF-IDF terms), compared on Porter stems.
 *
 * A phrase is a run of kept (non-stop) words inside one span; between two of its words there
 * may be up to two stop words and spaces, hyphens or apostrophes, nothing else (no line break,
 * no punctuation), so a phrase never crosses a sentence, a line or markup. It starts and ends
 * on a kept word, so it is never made of stop words only.
 *
 * What counts as a match:
 * - the whole title or a whole alias;
 * - two or more words of one that include the name's rarest word (the stem with the smallest
 *   document frequency): "tile cache" alone does not stand for "Warming the tile cache",
 *   "warming the tile" does;
 * - a run of two or more key terms written next to each other (no stop word between them), one
 *   of them "strong" (the target is among the pages where it weighs most) and one a word of the
 *   title or an alias.
 * One word is an anchor only when it is the whole name. Read on the example site, lone words
 * ("week", "app", "repair", "predict") named the topic of a sentence far more often than the
 * target page ("replace the card within a week" is not about the first-week checklist).
 * A phrase made only of words of the source's own title is the source speaking of itself, never
 * an anchor for another page.
 *
 * Quality = number of matched words, plus 2 for the whole title (0.5 for part of it), 1 for a
 * whole alias (0.3 for part of it); ties go to the earlier phrase.
 */
import type { TextSpan } from '../types.js';
import type { StemCache } from '../text/tokenize.js';
import type { TargetNames } from './names.js';
/** Which of the target's names an anchor matched. */
export type AnchorKind = 'title' | 'alias' | 'key-terms' | 'name';
/** An anchor phrase in a source file. */
export interface AnchorMatch {
    /** UTF-16 offsets into the source file's text. */
    readonly offset: number;
    readonly endOffset: number;
    /** 1-based line and column (UTF-16 code units) of the phrase's first character. */
    readonly line: number;
    readonly column: number;
    /** The phrase as written. */
    readonly text: string;
    readonly kind: AnchorKind;
    readonly words: number;
    readonly quality: number;
}
/** A source page's prose, tokenised once for all targets. */
export interface SourceTokens {
    readonly spans: readonly TextSpan[];
    readonly stem: string[];
    /** Start/end offsets of each kept word within its span's text. */
    readonly start: number[];
    readonly end: number[];
    readonly span: number[];
    /** joinNext[i]: word i and word i + 1 may be in one phrase. */
    readonly joinNext: boolean[];
    /** joinDirect[i]: only spaces or hyphens (no stop word) between word i and word i + 1. */
    readonly joinDirect: boolean[];
    /** Stems of the source page's own title. */
    readonly ownTitle: ReadonlySet<string>;
    /** stem -> indices of the kept words with that stem, ascending. */
    readonly positions: Map<string, number[]>;
}
/** Options kept per (source, target) pair, so a later target can take another phrase. */
export declare const ANCHOR_OPTIONS = 3;
/** Tokenise a source page's spans for anchor matching. */
export declare function prepareSource(spans: readonly TextSpan[], cache: StemCache, title?: string): SourceTokens;
/**
 * The best anchor phrases for one target in one source, best first, pairwise non-overlapping
 * (at most {@link ANCHOR_OPTIONS}); empty when none matches.
 * @param avoid absolute [offset, endOffset) ranges already taken by other targets
 */
export declare function findAnchors(source: SourceTokens, names: TargetNames, avoid?: readonly (readonly [number, number])[]): AnchorMatch[];
/**
 * Line and column of a position inside a span: the span's own line/column, moved by the line
 * breaks (`\r\n`, `\n` or `\r`) in the span's text before the position.
 */
export declare function positionInSpan(span: TextSpan, at: number): {
    line: number;
    column: number;
};
