/**
 * The ranked lists of proposed sources per target, for the three methods compared:
 *
 * - linkweave: the suggestion stage's choice (`chooseLikeSuggest`, the same as `suggestLinks`
 *   without the impact prediction), a target's suggestions ordered by their score, best first
 *   (the order in which the stage's greedy choice took them), ties by source route;
 * - TF-IDF only: the same candidate sources the stage starts from (related pages with
 *   similarity >= `minSimilarity` that do not link to the target yet), ordered by cosine
 *   similarity alone, ties by source route: no PageRank, no click depth, no anchor search;
 * - title phrase: the pages whose prose holds the target's whole title (on stems, as one run of
 *   words in one text span, stop words allowed between), most occurrences first, then by cosine
 *   similarity, then by source; the anchor is the first occurrence. No model, no graph.
 * - random related page: the same candidates in a seeded random order (a stream of its own,
 *   separate from the sampler's): what the ordering adds over the candidate set;
 * - random page: ten pages drawn at random (seeded) from every page that could link to the
 *   target (not the target, not excluded, no content link to it yet): chance, what the
 *   candidate set itself adds.
 */
import type { CandidatePair, Chosen } from '../suggest/index.js';
import { hasContentLink, positionInSpan } from '../suggest/index.js';
import { cosine, tokenize, tokenizeWithOffsets } from '../text/index.js';
import type { StemCache } from '../text/index.js';
import type { PageFacts, SiteGraph, TermIndex } from '../types.js';
import { LIST_LENGTH } from './metrics.js';
import type { RankedSource } from './metrics.js';
import { shuffle, streamFor } from './prng.js';

/** Purpose numbers of the random baselines' streams (the sampler uses 0). */
const RANDOM_STREAM = 1;
const RANDOM_PAGE_STREAM = 2;

/** Our ranked lists: the chosen suggestions grouped by target, best score first. */
export function suggestionLists(chosen: readonly Chosen[]): Map<number, RankedSource[]> {
  const scored = new Map<number, { item: RankedSource; score: number }[]>();
  for (const { pair, anchor, score } of chosen) {
    const list = scored.get(pair.target) ?? [];
    const item: RankedSource = anchor === null
      ? { source: pair.source, anchor: null, offset: -1, endOffset: -1, line: -1 }
      : { source: pair.source, anchor: anchor.text, offset: anchor.offset, endOffset: anchor.endOffset, line: anchor.line };
    list.push({ item, score });
    scored.set(pair.target, list);
  }
  const out = new Map<number, RankedSource[]>();
  for (const [target, list] of scored) {
    list.sort((a, b) => b.score - a.score || a.item.source - b.item.source);
    out.set(target, list.slice(0, LIST_LENGTH).map((x) => x.item));
  }
  return out;
}

/** Candidates grouped by target, each list sorted by source id. */
function byTarget(candidates: readonly CandidatePair[]): Map<number, CandidatePair[]> {
  const out = new Map<number, CandidatePair[]>();
  for (const c of candidates) {
    const list = out.get(c.target) ?? [];
    list.push(c);
    out.set(c.target, list);
  }
  for (const list of out.values()) list.sort((a, b) => a.source - b.source);
  return out;
}

const plain = (source: number): RankedSource => ({ source, anchor: null, offset: -1, endOffset: -1, line: -1 });

/** TF-IDF only: candidates by similarity, best first, ties by source. */
export function similarityLists(candidates: readonly CandidatePair[]): Map<number, RankedSource[]> {
  const out = new Map<number, RankedSource[]>();
  for (const [target, list] of byTarget(candidates)) {
    const sorted = [...list].sort((a, b) => b.similarity - a.similarity || a.source - b.source);
    out.set(target, sorted.slice(0, LIST_LENGTH).map((c) => plain(c.source)));
  }
  return out;
}

/** Random: candidates in a seeded random order, targets taken in ascending order. */
export function randomLists(candidates: readonly CandidatePair[], seed: number): Map<number, RankedSource[]> {
  const rnd = streamFor(seed, RANDOM_STREAM);
  const groups = byTarget(candidates);
  const out = new Map<number, RankedSource[]>();
  for (const target of [...groups.keys()].sort((a, b) => a - b)) {
    const order = shuffle(rnd, groups.get(target)!.map((c) => c.source));
    out.set(target, order.slice(0, LIST_LENGTH).map(plain));
  }
  return out;
}

/**
 * Random page: for each target (ascending), up to ten distinct pages drawn uniformly from the
 * pages that could link to it. Draws are by rejection (a page id at random, kept when it may
 * link and was not drawn yet); when that keeps failing (few possible sources) the possible
 * sources are listed and shuffled instead. Either way each possible source is equally likely.
 */
export function randomPageLists(graph: SiteGraph, targets: readonly number[], seed: number): Map<number, RankedSource[]> {
  const rnd = streamFor(seed, RANDOM_PAGE_STREAM);
  const n = graph.pages.length;
  const mayLink = (s: number, t: number): boolean => s !== t && !graph.pages[s].meta.exclude && !hasContentLink(graph.forward, s, t);
  const out = new Map<number, RankedSource[]>();
  for (const t of [...targets].sort((a, b) => a - b)) {
    const drawn: number[] = [];
    const seen = new Set<number>();
    for (let tries = 0; drawn.length < LIST_LENGTH && tries < 20 * LIST_LENGTH; tries++) {
      const s = Math.floor(rnd() * n);
      if (seen.has(s) || !mayLink(s, t)) continue;
      seen.add(s);
      drawn.push(s);
    }
    if (drawn.length < LIST_LENGTH) {
      const all: number[] = [];
      for (let s = 0; s < n; s++) if (mayLink(s, t)) all.push(s);
      drawn.length = 0;
      drawn.push(...shuffle(rnd, all).slice(0, LIST_LENGTH));
    }
    out.set(t, drawn.map(plain));
  }
  return out;
}

/**
 * Title phrase only: for each target, the sources whose prose holds its whole title, most
 * occurrences first, then by cosine similarity, ties by source; anchored on the first one.
 * @param facts facts in page order
 */
export function titlePhraseLists(
  graph: SiteGraph,
  facts: readonly PageFacts[],
  index: TermIndex,
  targets: readonly number[],
  cache: StemCache,
): Map<number, RankedSource[]> {
  const wanted = new Set(targets);
  const byTitle = new Map<string, number[]>();
  let longest = 0;
  for (const t of wanted) {
    const stems = tokenize(graph.pages[t].title, cache);
    if (stems.length === 0) continue;
    const key = stems.join(' ');
    byTitle.set(key, [...(byTitle.get(key) ?? []), t]);
    longest = Math.max(longest, stems.length);
  }
  const found = new Map<number, Map<number, { count: number; first: RankedSource }>>();
  graph.pages.forEach((page, s) => {
    if (page.meta.exclude) return;
    for (const span of facts[s]?.spans ?? []) {
      const words = tokenizeWithOffsets(span.text, cache);
      for (let i = 0; i < words.length; i++) {
        let key = '';
        for (let len = 1; len <= longest && i + len <= words.length; len++) {
          key = len === 1 ? words[i].stem : `${key} ${words[i + len - 1].stem}`;
          for (const t of byTitle.get(key) ?? []) {
            if (t === s || hasContentLink(graph.forward, s, t)) continue;
            const m = found.get(t) ?? new Map<number, { count: number; first: RankedSource }>();
            found.set(t, m);
            const prev = m.get(s);
            if (prev !== undefined) {
              prev.count++;
              continue;
            }
            const start = words[i].start;
            const end = words[i + len - 1].end;
            const { line } = positionInSpan(span, start);
            m.set(s, { count: 1, first: { source: s, anchor: span.text.slice(start, end), offset: span.offset + start, endOffset: span.offset + end, line } });
          }
        }
      }
    }
  });
  const out = new Map<number, RankedSource[]>();
  for (const t of [...found.keys()].sort((a, b) => a - b)) {
    const list = [...found.get(t)!.entries()].map(([s, v]) => ({ s, v, sim: cosine(index, s, t) }));
    list.sort((a, b) => b.v.count - a.v.count || b.sim - a.sim || a.s - b.s);
    out.set(t, list.slice(0, LIST_LENGTH).map((x) => x.v.first));
  }
  return out;
}
