/**
 * Offsets to 1-based line/column through a line-start table built once per file.
 *
 * Line endings are `\n`, `\r\n` and a lone `\r` (as CommonMark and the HTML standard count them).
 * Columns count UTF-16 code units from 1, so `column - 1` added to the line's start offset gives
 * the offset back. The table is a typed array and lookups are binary searches: no per-node scans.
 */
/** Line-start table of one text. */
export interface LineIndex {
    /** Offset of the first character of each line (line i + 1 starts at `starts[i]`). */
    readonly starts: Int32Array;
    /** Number of lines (an empty text has one line). */
    readonly count: number;
    /** Length of the text the table was built from. */
    readonly length: number;
}
/**
 * Build the line-start table of `text` in one pass.
 * @param text the decoded source text
 */
export declare function buildLineIndex(text: string): LineIndex;
/**
 * 0-based line number of an offset (binary search).
 * @param index the file's line table
 * @param offset UTF-16 offset, clamped to the text
 */
export declare function lineOf(index: LineIndex, offset: number): number;
/**
 * 1-based line and column of an offset.
 * @param index the file's line table
 * @param offset UTF-16 offset into the text the table was built from
 */
export declare function positionOf(index: LineIndex, offset: number): {
    line: number;
    column: number;
};
/**
 * Offset where a 0-based line starts.
 * @param index the file's line table
 * @param line 0-based line number
 */
export declare function lineStart(index: LineIndex, line: number): number;
/**
 * Offset just past the last character of a 0-based line, before its line ending.
 * @param index the file's line table
 * @param text the text the table was built from
 * @param line 0-based line number
 */
export declare function lineContentEnd(index: LineIndex, text: string, line: number): number;
