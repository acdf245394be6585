/**
 * The mention index's tokenising of a page's prose (`buildMentionIndex` in `mentions.ts`): the
 * kept words, their offsets and spans and which of them may join one phrase, exactly as
 * `prepareSource` (`anchor.ts`) gives them, but through a word table keyed by characters, so a
 * word met before costs no string, no regular expression and no array. At 10,000 generated
 * pages `prepareSource` took about half of the mention index; the index reads nothing else of it.
 */
import { WordTable } from '../text/scan.js';
import { isStopWord, stemToken } from '../text/tokenize.js';
import type { StemCache } from '../text/tokenize.js';

/**
 * The words met in prose, each distinct word as written looked up once: its stem (`''` when
 * dropped, as `stemToken` gives it) and whether it is a stop word. The table finds a word by its
 * characters, so a word seen before costs no string.
 */
export interface ProseWords {
  readonly table: WordTable;
  readonly stem: string[];
  readonly stop: boolean[];
}

/** An empty {@link ProseWords} filling `cache`. */
export function proseWords(cache: StemCache): ProseWords {
  const stem: string[] = [];
  const stop: boolean[] = [];
  const table = new WordTable((raw) => {
    const s = stemToken(raw, cache);
    stem.push(s);
    stop.push(s === '' && isStopWord(raw));
    return stem.length - 1;
  });
  return { table, stem, stop };
}

/** Kept words of one page's prose (the arrays are reused from page to page). */
export class ProseTokens {
  readonly stem: string[] = [];
  /** The word-table id of each kept word (its stem is `words.stem[id]`). */
  readonly word: number[] = [];
  /** Start/end offsets of each kept word within its span's text, and the span's index. */
  readonly start: number[] = [];
  readonly end: number[] = [];
  readonly span: number[] = [];
  /** joinNext[i]: word i and word i + 1 may be in one phrase. */
  readonly joinNext: boolean[] = [];
  /** stopBetween[i]: stop words stand between word i and word i + 1 ("storage *of* tiles"). */
  readonly stopBetween: boolean[] = [];
}

/** Stop words allowed between two words of one phrase (as in `anchor.ts`). */
const MAX_GAP_STOP_WORDS = 2;

/**
 * The kept words of `spans` into `out`: the stems, offsets, spans and `joinNext` that
 * `prepareSource` (`anchor.ts`) gives, the same to the word (`test/suggest/mention-tokens.test.ts`
 * compares the two), without a string, regular expression or array per word; the mention index
 * reads nothing else of a page's prose.
 */
export function proseTokens(spans: readonly { readonly text: string }[], words: ProseWords, out: ProseTokens): void {
  let count = 0;
  for (let si = 0; si < spans.length; si++) {
    const text = spans[si].text;
    let last = -1;
    let stopWords = 0;
    let bad = false;
    let prevEnd = 0;
    words.table.scanWords(text, (id, start, end) => {
      if (last >= 0 && !bad && !gapOnly(text, prevEnd, start)) bad = true;
      prevEnd = end;
      const stem = words.stem[id];
      if (stem === '') {
        if (words.stop[id]) stopWords++;
        else bad = true;
        return;
      }
      const i = count++;
      if (last >= 0) {
        out.joinNext[last] = !bad && stopWords <= MAX_GAP_STOP_WORDS;
        out.stopBetween[last] = stopWords > 0;
      }
      out.stem[i] = stem;
      out.word[i] = id;
      out.start[i] = start;
      out.end[i] = end;
      out.span[i] = si;
      out.joinNext[i] = false;
      out.stopBetween[i] = false;
      last = i;
      stopWords = 0;
      bad = false;
    });
  }
  out.stem.length = count;
  out.word.length = count;
  out.start.length = count;
  out.end.length = count;
  out.span.length = count;
  out.joinNext.length = count;
  out.stopBetween.length = count;
}

/** True when `text[from, to)` holds only what may stand between two words of a phrase: spaces, tabs, no-break spaces, hyphens and apostrophes (`GAP_CHARS` in `anchor.ts`). */
function gapOnly(text: string, from: number, to: number): boolean {
  for (let k = from; k < to; k++) {
    const c = text.charCodeAt(k);
    if (c !== 32 && c !== 9 && c !== 0xa0 && c !== 45 && c !== 39 && c !== 0x2019) return false;
  }
  return true;
}
