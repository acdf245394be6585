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
export function buildLineIndex(text: string): LineIndex {
  let starts = new Int32Array(Math.max(16, (text.length >>> 5) + 1));
  let count = 1;
  starts[0] = 0;
  const n = text.length;
  for (let i = 0; i < n; i++) {
    const c = text.charCodeAt(i);
    if (c === 10 || c === 13) {
      if (c === 13 && i + 1 < n && text.charCodeAt(i + 1) === 10) i++;
      if (count === starts.length) {
        const grown = new Int32Array(starts.length * 2);
        grown.set(starts);
        starts = grown;
      }
      starts[count++] = i + 1;
    }
  }
  return { starts: starts.subarray(0, count), count, length: n };
}

/**
 * 0-based line number of an offset (binary search).
 * @param index the file's line table
 * @param offset UTF-16 offset, clamped to the text
 */
export function lineOf(index: LineIndex, offset: number): number {
  const { starts } = index;
  let lo = 0;
  let hi = index.count - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >>> 1;
    if (starts[mid] <= offset) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/**
 * 1-based line and column of an offset.
 * @param index the file's line table
 * @param offset UTF-16 offset into the text the table was built from
 */
export function positionOf(index: LineIndex, offset: number): { line: number; column: number } {
  const line = lineOf(index, offset);
  return { line: line + 1, column: offset - index.starts[line] + 1 };
}

/**
 * Offset where a 0-based line starts.
 * @param index the file's line table
 * @param line 0-based line number
 */
export function lineStart(index: LineIndex, line: number): number {
  return index.starts[Math.min(Math.max(line, 0), index.count - 1)];
}

/**
 * Offset just past the last character of a 0-based line, before its line ending.
 * @param index the file's line table
 * @param text the text the table was built from
 * @param line 0-based line number
 */
export function lineContentEnd(index: LineIndex, text: string, line: number): number {
  if (line + 1 >= index.count) return index.length;
  let end = index.starts[line + 1];
  if (end > 0 && text.charCodeAt(end - 1) === 10) end--;
  if (end > 0 && text.charCodeAt(end - 1) === 13) end--;
  return end;
}
