/**
 * Tokenising for the term index and for anchor matching: natural's word tokens, lower-cased,
 * natural's English stop words dropped, Porter stems (DESIGN section 6).
 *
 * Word boundaries are exactly those of natural's `WordTokenizer` (it splits on
 * `/[^A-Za-zА-Яа-я0-9_]+/`); this file walks the characters of the complementary class
 * (`isWordChar`, shared with the term index's scan in `scan.ts`) instead of calling
 * `WordTokenizer.tokenize`, because the anchor search needs each token's offsets (which a split
 * cannot give). A single `exec` loop had measured 2-4x faster than `split` plus natural's
 * empty-string filter on 14 MB of text; the character loop also drops the regular expression
 * object per call and the match array per word. `test/text/tokenize.test.ts` checks that both
 * give the same tokens. The term index scans with its own character loop (`scan.ts`), checked
 * against `tokenize` in `test/text/tfidf.test.ts`.
 *
 * Stemming is the expensive step (about 2.5 us per token with natural's Porter stemmer), so
 * every caller passes a {@link StemCache} that lives as long as one index build: each distinct
 * raw token is lower-cased, checked against the stop list and stemmed once.
 */
import PorterStemmer from 'natural/lib/natural/stemmers/porter_stemmer.js';
import naturalStopwords from 'natural/lib/natural/util/stopwords.js';
import { isWordChar } from './scan.js';

/** natural's English stop word list (170 words, single letters and digits included). A constant. */
const STOP_WORDS: ReadonlySet<string> = new Set(naturalStopwords.words);

/** Tokens longer than this (hashes, base64, minified names) carry no topic; they are dropped. */
const MAX_TOKEN_LENGTH = 40;

/** At least one letter; tokens of digits and underscores only (numbers, list counters) are dropped. */
const HAS_LETTER = /[A-Za-zА-Яа-я]/;

/**
 * Per-distinct-token results: raw token (as written) -> Porter stem, or `''` when the token is
 * dropped (stop word, no letter, too long). Create one per index build with {@link createStemCache};
 * never share one across unrelated runs through module state.
 */
export type StemCache = Map<string, string>;

/** A fresh, empty {@link StemCache}. */
export function createStemCache(): StemCache {
  return new Map();
}

/** A kept token: its Porter stem and its UTF-16 start/end offsets in the input string. */
export interface Token {
  readonly stem: string;
  readonly start: number;
  readonly end: number;
}

/**
 * Stem of one raw token, or `''` when it is dropped.
 * @param raw a token as written (any case)
 * @param cache per-run cache (see {@link StemCache})
 */
export function stemToken(raw: string, cache: StemCache): string {
  let stem = cache.get(raw);
  if (stem === undefined) {
    const lower = raw.toLowerCase();
    stem = STOP_WORDS.has(lower) || lower.length > MAX_TOKEN_LENGTH || !HAS_LETTER.test(lower) ? '' : PorterStemmer.stem(lower);
    cache.set(raw, stem);
  }
  return stem;
}

/** True when the lower-cased word is on natural's English stop word list. */
export function isStopWord(word: string): boolean {
  // Most stop words are written in lower case: no lower-cased copy for those.
  return STOP_WORDS.has(word) || STOP_WORDS.has(word.toLowerCase());
}

/**
 * Calls `visit(raw, start, end)` for every word of `text` in order (natural's word boundaries),
 * stop words included. The callback form keeps the hot loop free of per-token objects.
 */
export function forEachWord(text: string, visit: (raw: string, start: number, end: number) => void): void {
  // A character loop over natural's word class (`isWordChar`): no regular expression object per
  // call and no match array per word, only the word's own string.
  const len = text.length;
  let i = 0;
  while (i < len) {
    if (!isWordChar(text.charCodeAt(i))) {
      i++;
      continue;
    }
    const start = i;
    i++;
    while (i < len && isWordChar(text.charCodeAt(i))) i++;
    visit(text.slice(start, i), start, i);
  }
}

/**
 * Stems of the words of `text`: lower-cased, stop words dropped, Porter-stemmed.
 * @param text any plain text
 * @param cache optional per-run stem cache; a private one is used when omitted
 * @example tokenize('Caching the ponies') // ['cach', 'poni']
 */
export function tokenize(text: string, cache: StemCache = createStemCache()): string[] {
  const out: string[] = [];
  forEachWord(text, (raw) => {
    const stem = stemToken(raw, cache);
    if (stem !== '') out.push(stem);
  });
  return out;
}

/**
 * Like {@link tokenize}, with each kept token's UTF-16 `start`/`end` offsets in `text`
 * (`text.slice(start, end)` is the word as written).
 */
export function tokenizeWithOffsets(text: string, cache: StemCache = createStemCache()): Token[] {
  const out: Token[] = [];
  forEachWord(text, (raw, start, end) => {
    const stem = stemToken(raw, cache);
    if (stem !== '') out.push({ stem, start, end });
  });
  return out;
}
