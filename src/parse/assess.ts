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
import type { LineIndex } from '../util/line-index.js';
import { lineContentEnd, lineStart } from '../util/line-index.js';

/** Container nesting (block quotes, list items) above which lines are read by the simple scanner. */
export const MAX_NESTING = 32;
/** Emphasis and bracket characters in one paragraph above which it is read by the simple scanner. */
export const MAX_MARKERS_PER_PARAGRAPH = 3000;
/** Characters in one paragraph above which it is read by the simple scanner. */
export const MAX_PARAGRAPH_CHARS = 500_000;

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

const DEEP = 1;
const COMPLEX = 2;

/**
 * Find the regions the full parser should not see.
 * @param src Markdown source
 * @param lines its line table
 * @param firstLine first line after the frontmatter
 */
export function findHeavyRegions(src: string, lines: LineIndex, firstLine: number): HeavyRegion[] {
  const flags = new Uint8Array(lines.count);
  const runs: { from: number; to: number; markers: number; chars: number }[] = [];
  let run: { from: number; to: number; markers: number; chars: number } | null = null;
  let fence: { char: number; length: number } | null = null;
  const endRun = (): void => {
    if (run !== null && (run.markers > MAX_MARKERS_PER_PARAGRAPH || run.chars > MAX_PARAGRAPH_CHARS)) runs.push(run);
    run = null;
  };
  for (let line = firstLine; line < lines.count; line++) {
    const s = lineStart(lines, line);
    const e = lineContentEnd(lines, src, line);
    let p = s;
    let indent = 0;
    while (p < e && (src.charCodeAt(p) === 32 || src.charCodeAt(p) === 9)) {
      indent += src.charCodeAt(p) === 9 ? 4 : 1;
      p++;
    }
    let markers = 0;
    let listItem = false;
    for (;;) {
      while (p < e && (src.charCodeAt(p) === 32 || src.charCodeAt(p) === 9)) p++;
      if (p >= e) break;
      const c = src.charCodeAt(p);
      if (c === 62 /* > */) {
        markers++;
        p++;
        continue;
      }
      const after = listMarkerEnd(src, p, e);
      if (after < 0) break;
      markers++;
      listItem = true;
      p = after;
    }
    const depth = markers === 0 ? 0 : markers + (indent >> 1);
    if (fence !== null) {
      if (isFence(src, p, e, fence.char, fence.length)) fence = null;
      continue;
    }
    const opened = fenceOpen(src, p, e);
    if (opened !== null) {
      endRun();
      fence = opened;
      continue;
    }
    if (depth > MAX_NESTING) {
      endRun();
      flags[line] = DEEP;
      continue;
    }
    if (p >= e) {
      endRun();
      continue;
    }
    const c = src.charCodeAt(p);
    if (listItem || c === 35 /* # */ || c === 124 /* | */) endRun();
    if (run === null) run = { from: line, to: line + 1, markers: 0, chars: 0 };
    run.to = line + 1;
    run.chars += e - p;
    for (let i = p; i < e; i++) {
      const k = src.charCodeAt(i);
      if (k === 42 || k === 95 || k === 91 || k === 93) run.markers++;
    }
  }
  endRun();
  const complex = new Map<number, string>();
  for (const r of runs) {
    for (let l = r.from; l < r.to; l++) flags[l] = COMPLEX;
    complex.set(
      r.from,
      r.chars > MAX_PARAGRAPH_CHARS
        ? `A paragraph of ${r.chars} characters is longer than the full parser takes (${MAX_PARAGRAPH_CHARS})`
        : `A paragraph holds ${r.markers} emphasis or bracket characters, more than the full parser takes (${MAX_MARKERS_PER_PARAGRAPH})`,
    );
  }
  return regions(flags, complex);
}

function regions(flags: Uint8Array, complex: Map<number, string>): HeavyRegion[] {
  const out: HeavyRegion[] = [];
  let l = 0;
  while (l < flags.length) {
    const f = flags[l];
    if (f === 0) {
      l++;
      continue;
    }
    let to = l + 1;
    while (to < flags.length && flags[to] === f && !(f === COMPLEX && complex.has(to))) to++;
    const where = to - l === 1 ? `line ${l + 1}` : `lines ${l + 1}-${to}`;
    const tail = `; ${where} read with a simple scan (links and headings only, no places to insert links)`;
    out.push(
      f === DEEP
        ? { from: l, to, code: 'deep-nesting', message: `Lists or quotes nest more than ${MAX_NESTING} levels deep${tail}` }
        : { from: l, to, code: 'too-complex', message: `${complex.get(l) ?? 'A paragraph is too complex for the full parser'}${tail}` },
    );
    l = to;
  }
  return out;
}

/** End of a list marker (`-`, `*`, `+`, `1.`, `1)`) followed by white space or the line end, or -1. */
function listMarkerEnd(src: string, p: number, e: number): number {
  const c = src.charCodeAt(p);
  let q = p;
  if (c === 45 || c === 42 || c === 43) q = p + 1;
  else {
    while (q < e && q - p < 9 && src.charCodeAt(q) >= 48 && src.charCodeAt(q) <= 57) q++;
    if (q === p || q >= e) return -1;
    const d = src.charCodeAt(q);
    if (d !== 46 && d !== 41) return -1;
    q++;
  }
  if (q < e && src.charCodeAt(q) !== 32 && src.charCodeAt(q) !== 9) return -1;
  return q;
}

function fenceOpen(src: string, p: number, e: number): { char: number; length: number } | null {
  const c = src.charCodeAt(p);
  if (c !== 96 && c !== 126) return null;
  let q = p;
  while (q < e && src.charCodeAt(q) === c) q++;
  return q - p >= 3 ? { char: c, length: q - p } : null;
}

function isFence(src: string, p: number, e: number, char: number, length: number): boolean {
  let q = p;
  while (q < e && src.charCodeAt(q) === char) q++;
  if (q - p < length) return false;
  while (q < e && (src.charCodeAt(q) === 32 || src.charCodeAt(q) === 9)) q++;
  return q === e;
}

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
export function blankRegions(src: string, lines: LineIndex, heavy: readonly LineRange[]): BlankedText {
  if (heavy.length === 0) return { text: src, toSource: (o) => o };
  const parts: string[] = [];
  const cuts: number[] = [];
  const shifts: number[] = [];
  let last = 0;
  let removed = 0;
  let length = 0;
  for (const r of heavy) {
    for (let l = r.from; l < r.to; l++) {
      const s = lineStart(lines, l);
      const e = lineContentEnd(lines, src, l);
      if (e === s) continue;
      parts.push(src.slice(last, s));
      length += s - last;
      removed += e - s;
      cuts.push(length);
      shifts.push(removed);
      last = e;
    }
  }
  parts.push(src.slice(last));
  const toSource = (o: number): number => {
    let lo = 0;
    let hi = cuts.length - 1;
    let k = -1;
    while (lo <= hi) {
      const mid = (lo + hi) >>> 1;
      if (cuts[mid] <= o) {
        k = mid;
        lo = mid + 1;
      } else hi = mid - 1;
    }
    return k < 0 ? o : o + shifts[k];
  };
  return { text: parts.join(''), toSource };
}
