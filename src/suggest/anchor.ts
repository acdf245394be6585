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
import { forEachWord, isStopWord, stemToken, tokenize } from '../text/tokenize.js';
import type { StemCache } from '../text/tokenize.js';
import type { TargetName, TargetNames } from './names.js';

/**
 * Which of the target's names an anchor matched: `name` is a phrase of the mention index in
 * prose, `code` a whole inline code span (the link wraps it, backticks included).
 */
export type AnchorKind = 'title' | 'alias' | 'key-terms' | 'name' | 'code';

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

const GAP_CHARS = /^[ \t\u00a0\-'\u2019]*$/;
const MAX_GAP_STOP_WORDS = 2;
/** Options kept per (source, target) pair, so a later target can take another phrase. */
export const ANCHOR_OPTIONS = 3;

/** Tokenise a source page's spans for anchor matching. */
export function prepareSource(spans: readonly TextSpan[], cache: StemCache, title = ''): SourceTokens {
  const out: SourceTokens = {
    spans,
    stem: [],
    start: [],
    end: [],
    span: [],
    joinNext: [],
    joinDirect: [],
    ownTitle: new Set(tokenize(title, cache)),
    positions: new Map(),
  };
  spans.forEach((span, si) => {
    let last = -1;
    let stopWords = 0;
    let bad = false;
    let prevEnd = 0;
    forEachWord(span.text, (raw, start, end) => {
      if (last >= 0 && !GAP_CHARS.test(span.text.slice(prevEnd, start))) bad = true;
      prevEnd = end;
      const stem = stemToken(raw, cache);
      if (stem === '') {
        if (isStopWord(raw)) stopWords++;
        else bad = true;
        return;
      }
      const i = out.stem.length;
      if (last >= 0) {
        out.joinNext[last] = !bad && stopWords <= MAX_GAP_STOP_WORDS;
        out.joinDirect[last] = !bad && stopWords === 0;
      }
      out.stem.push(stem);
      out.start.push(start);
      out.end.push(end);
      out.span.push(si);
      out.joinNext.push(false);
      out.joinDirect.push(false);
      const list = out.positions.get(stem);
      if (list === undefined) out.positions.set(stem, [i]);
      else list.push(i);
      last = i;
      stopWords = 0;
      bad = false;
    });
  });
  return out;
}

interface Candidate {
  first: number;
  words: number;
  kind: AnchorKind;
  quality: number;
}

/**
 * The best anchor phrases for one target in one source, best first, pairwise non-overlapping
 * (at most {@link ANCHOR_OPTIONS}); empty when none matches.
 * @param avoid absolute [offset, endOffset) ranges already taken by other targets
 */
export function findAnchors(source: SourceTokens, names: TargetNames, avoid: readonly (readonly [number, number])[] = []): AnchorMatch[] {
  const found: Candidate[] = [];
  const own = (first: number, words: number): boolean => {
    if (source.ownTitle.size === 0) return false;
    for (let k = first; k < first + words; k++) if (!source.ownTitle.has(source.stem[k])) return false;
    return true;
  };
  const sequence = (name: TargetName, kind: 'title' | 'alias'): void => {
    const pattern = name.stems;
    for (let j = 0; j < pattern.length; j++) {
      for (const i of source.positions.get(pattern[j]) ?? []) {
        // Start only where the match cannot be extended to the left.
        if (j > 0 && i > 0 && source.joinNext[i - 1] && source.stem[i - 1] === pattern[j - 1]) continue;
        let len = 1;
        while (j + len < pattern.length && source.joinNext[i + len - 1] && source.stem[i + len] === pattern[j + len]) len++;
        const whole = j === 0 && len === pattern.length;
        if (!whole) {
          if (len === 1) continue;
          let rare = false;
          for (let k = 0; k < len && !rare; k++) rare = name.rarest.has(pattern[j + k]);
          if (!rare) continue;
        }
        if (own(i, len)) continue;
        const bonus = kind === 'title' ? (whole ? 2 : 0.5) : whole ? 1 : 0.3;
        found.push({ first: i, words: len, kind, quality: len + bonus });
      }
    }
  };
  sequence(names.title, 'title');
  for (const alias of names.aliases) sequence(alias, 'alias');
  for (const key of names.keyTerms) {
    for (const i of source.positions.get(key) ?? []) {
      if (i > 0 && source.joinDirect[i - 1] && names.keyTerms.has(source.stem[i - 1])) continue;
      let len = 1;
      while (source.joinDirect[i + len - 1] && names.keyTerms.has(source.stem[i + len])) len++;
      if (len < 2 || !anyOf(source, i, len, names.strongTerms) || !anyOf(source, i, len, names.nameWords)) continue;
      if (own(i, len)) continue;
      found.push({ first: i, words: len, kind: 'key-terms', quality: len });
    }
  }
  found.sort((a, b) => b.quality - a.quality || a.first - b.first || b.words - a.words);

  const out: AnchorMatch[] = [];
  const taken: [number, number][] = avoid.map(([a, b]) => [a, b]);
  for (const c of found) {
    const match = toMatch(source, c);
    if (taken.some(([a, b]) => match.offset < b && a < match.endOffset)) continue;
    out.push(match);
    taken.push([match.offset, match.endOffset]);
    if (out.length === ANCHOR_OPTIONS) break;
  }
  return out;
}

function anyOf(source: SourceTokens, first: number, words: number, set: ReadonlySet<string>): boolean {
  for (let k = first; k < first + words; k++) if (set.has(source.stem[k])) return true;
  return false;
}

function toMatch(source: SourceTokens, c: Candidate): AnchorMatch {
  const last = c.first + c.words - 1;
  const span = source.spans[source.span[c.first]];
  const start = source.start[c.first];
  const end = source.end[last];
  const { line, column } = positionInSpan(span, start);
  return {
    offset: span.offset + start,
    endOffset: span.offset + end,
    line,
    column,
    text: span.text.slice(start, end),
    kind: c.kind,
    words: c.words,
    quality: c.quality,
  };
}

/**
 * Line and column of a position inside a span: the span's own line/column, moved by the line
 * breaks (`\r\n`, `\n` or `\r`) in the span's text before the position.
 */
export function positionInSpan(span: TextSpan, at: number): { line: number; column: number } {
  let line = span.line;
  let lineStart = -1;
  for (let i = 0; i < at; i++) {
    const ch = span.text.charCodeAt(i);
    if (ch === 10 || (ch === 13 && span.text.charCodeAt(i + 1) !== 10)) {
      line++;
      lineStart = i + 1;
    }
  }
  return { line, column: lineStart < 0 ? span.column + at : at - lineStart + 1 };
}
