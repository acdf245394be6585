/**
 * A linear pre-scan of Markdown for input that makes remark-parse superlinear, so those lines can
 * be read by the simple scanner instead and the page still counts.
 *
 * Measured here (remark-parse 11 + remark-gfm 4): 3,000 lines of ever deeper block quotes took
 * 207 s; 400 levels of nested lists 2.4 s; 600 nested `*a **a` openers 0.75 s and 3,000 over 30 s;
 * one 10 MB line holding links did not finish in 300 s; a 2 MB line of plain words took 4 s.
 * Real pages nest a few levels and hold tens of links per paragraph, so the limits below sit far
 * above real content and far below the slow cases.
 */
import type { LineIndex } from './lines.js';
/** Container nesting (block quotes, list items) above which lines are read by the simple scanner. */
export declare const MAX_NESTING = 32;
/** Emphasis and bracket characters in one paragraph above which it is read by the simple scanner. */
export declare const MAX_MARKERS_PER_PARAGRAPH = 3000;
/** Characters in one paragraph above which it is read by the simple scanner. */
export declare const MAX_PARAGRAPH_CHARS = 500000;
/** Lines `[from, to)`, 0-based. */
export interface LineRange {
    readonly from: number;
    readonly to: number;
}
/** Lines that the full parser should not see, and why. */
export interface HeavyRegion extends LineRange {
    readonly code: 'deep-nesting' | 'too-complex';
    readonly message: string;
}
/**
 * Find the regions the full parser should not see.
 * @param src Markdown source
 * @param lines its line table
 * @param firstLine first line after the frontmatter
 */
export declare function findHeavyRegions(src: string, lines: LineIndex, firstLine: number): HeavyRegion[];
/** A text with some lines emptied, and the way back to source offsets. */
export interface BlankedText {
    readonly text: string;
    /** Offset in `text` -> offset in the source. */
    readonly toSource: (offset: number) => number;
}
/**
 * The text with the content of every line of the regions removed (line endings kept, so the
 * block structure around them stays and line numbers hold). Removed, not replaced by spaces:
 * 3,000 lines of spaces inside 32 nested lists took remark 80 s here.
 * @param src the source text
 * @param lines its line table
 * @param heavy line ranges to empty, in line order, not overlapping
 */
export declare function blankRegions(src: string, lines: LineIndex, heavy: readonly LineRange[]): BlankedText;
