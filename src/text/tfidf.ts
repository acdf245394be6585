/**
 * The TF-IDF term index (DESIGN section 6): one sparse, L2-normalised vector per page, stored
 * as CSR typed arrays over term ids.
 *
 * - Count of a term in a page: `3 x (occurrences in the title) + 2 x (occurrences in the
 *   headings) + 1 x (occurrences in the body)` (the field boosts).
 * - tf = 1 + ln(count) (sublinear tf); idf = ln((1 + N) / (1 + df)) + 1 (smoothed; N pages,
 *   df pages containing the term in any field).
 * - weight = tf x idf, then each page's vector is divided by its L2 norm (a page without terms
 *   keeps an empty row).
 * - Term ids: stems sorted by UTF-16 code units (plain `<`), so the index does not depend on
 *   page order; each page's row is sorted by term id.
 */
import type { PageText, TermIndex } from '../types.js';
import { createStemCache, stemToken } from './tokenize.js';
import { WordTable } from './scan.js';
import type { StemCache } from './tokenize.js';

/** Field boosts applied to occurrence counts. */
export const FIELD_BOOSTS = { title: 3, headings: 2, body: 1 } as const;

/** Sublinear term frequency of a (boosted) count: 1 + ln(count); 0 for a count of 0. */
export function termFrequency(count: number): number {
  return count > 0 ? 1 + Math.log(count) : 0;
}

/** Smoothed inverse document frequency: ln((1 + n) / (1 + df)) + 1. */
export function inverseDocumentFrequency(n: number, df: number): number {
  return Math.log((1 + n) / (1 + df)) + 1;
}

/**
 * Growable typed buffers for the (term, count) pairs met while reading the pages, 8 bytes a pair
 * (boosted counts are small integers, exact in a Float32). Memory is the limit on large sites:
 * at 100,000 pages there are tens of millions of pairs.
 */
class EntryBuffer {
  terms = new Int32Array(1 << 16);
  counts = new Float32Array(1 << 16);
  length = 0;

  push(term: number, count: number): void {
    if (this.length === this.terms.length) {
      const size = Math.ceil(this.terms.length * 1.5);
      const terms = new Int32Array(size);
      terms.set(this.terms);
      this.terms = terms;
      const counts = new Float32Array(size);
      counts.set(this.counts);
      this.counts = counts;
    }
    this.terms[this.length] = term;
    this.counts[this.length] = count;
    this.length += 1;
  }
}

/**
 * Build the TF-IDF index of the pages' texts (`texts[i]` is page i).
 * @param texts title/headings/body text per page, in page-id order
 * @param cache per-run stem cache (a fresh one by default); pass one to reuse stems later in the
 *   same run, e.g. for anchor matching
 */
export function buildTermIndex(texts: readonly PageText[], cache: StemCache = createStemCache()): TermIndex {
  const n = texts.length;
  // Word as written -> provisional term id (-1: dropped); stems looked up once per distinct word.
  const stemIds = new Map<string, number>();
  const stems: string[] = [];
  let counts = new Float64Array(1024);
  const touched: number[] = [];
  const entries = new EntryBuffer();
  const rowEnds = new Int32Array(n);
  const words = new WordTable((raw) => {
    const stem = stemToken(raw, cache);
    if (stem === '') return -1;
    let id = stemIds.get(stem);
    if (id === undefined) {
      id = stems.length;
      stems.push(stem);
      stemIds.set(stem, id);
      if (id === counts.length) {
        const grown = new Float64Array(counts.length * 2);
        grown.set(counts);
        counts = grown;
      }
    }
    return id;
  });
  const add = (id: number, boost: number): void => {
    if (id < 0) return;
    if (counts[id] === 0) touched.push(id);
    counts[id] += boost;
  };
  const addTitle = (id: number): void => add(id, FIELD_BOOSTS.title);
  const addHeading = (id: number): void => add(id, FIELD_BOOSTS.headings);
  const addBody = (id: number): void => add(id, FIELD_BOOSTS.body);

  for (let d = 0; d < n; d++) {
    const text = texts[d];
    words.scan(text.title, addTitle);
    words.scan(text.headings, addHeading);
    words.scan(text.body, addBody);
    for (const id of touched) {
      entries.push(id, counts[id]);
      counts[id] = 0;
    }
    touched.length = 0;
    rowEnds[d] = entries.length;
  }

  // Final term ids: stems in code-unit order.
  const t = stems.length;
  const byStem = Array.from({ length: t }, (_, i) => i).sort((a, b) => (stems[a] < stems[b] ? -1 : stems[a] > stems[b] ? 1 : 0));
  const finalId = new Int32Array(t);
  const terms: string[] = new Array(t);
  for (let i = 0; i < t; i++) {
    finalId[byStem[i]] = i;
    terms[i] = stems[byStem[i]];
  }

  const nnz = entries.length;
  const entryTerm = entries.terms;
  for (let e = 0; e < nnz; e++) entryTerm[e] = finalId[entryTerm[e]];
  const df = new Int32Array(t);
  for (let e = 0; e < nnz; e++) df[entryTerm[e]] += 1;
  const idf = new Float64Array(t);
  for (let i = 0; i < t; i++) idf[i] = inverseDocumentFrequency(n, df[i]);
  const weightOf = (e: number): number => termFrequency(entries.counts[e]) * idf[entryTerm[e]];

  // Each page's norm; the weight of an entry is computed again where it is stored (cheaper in
  // memory than keeping a weight per entry, and the same double each time).
  const scales = new Float64Array(n);
  let start = 0;
  for (let d = 0; d < n; d++) {
    const end = rowEnds[d];
    let norm = 0;
    for (let e = start; e < end; e++) {
      const w = weightOf(e);
      norm += w * w;
    }
    scales[d] = norm > 0 ? 1 / Math.sqrt(norm) : 0;
    start = end;
  }

  // A counting sort by term (stable, so pages stay in ascending order within a term), then the
  // entries dealt back to their rows in term order: every row ends up sorted by term id, O(nnz).
  const termStart = new Int32Array(t + 1);
  for (let i = 0; i < t; i++) termStart[i + 1] = termStart[i] + df[i];
  const cursor = termStart.slice(0, t);
  const byTerm = new Int32Array(nnz);
  for (let e = 0; e < nnz; e++) {
    const term = entryTerm[e];
    byTerm[cursor[term]] = e;
    cursor[term] = cursor[term] + 1;
  }
  const docOffsets = new Int32Array(n + 1);
  for (let d = 0; d < n; d++) docOffsets[d + 1] = rowEnds[d];
  const rowOf = new Int32Array(nnz);
  start = 0;
  for (let d = 0; d < n; d++) {
    for (let e = start; e < rowEnds[d]; e++) rowOf[e] = d;
    start = rowEnds[d];
  }
  const rowCursor = docOffsets.slice(0, n);
  const docTerms = new Int32Array(nnz);
  const docWeights = new Float32Array(nnz);
  for (let at = 0; at < nnz; at++) {
    const e = byTerm[at];
    const d = rowOf[e];
    const slot = rowCursor[d];
    rowCursor[d] = slot + 1;
    docTerms[slot] = entryTerm[e];
    docWeights[slot] = weightOf(e) * scales[d];
  }
  return { terms, df, docOffsets, docTerms, docWeights };
}

/**
 * Cosine similarity of two pages over all their terms (vectors are L2-normalised, so this is
 * the dot product). Used for checks and explanations; relatedness uses {@link relatedPages}.
 */
export function cosine(index: TermIndex, a: number, b: number): number {
  let i = index.docOffsets[a];
  const iEnd = index.docOffsets[a + 1];
  let j = index.docOffsets[b];
  const jEnd = index.docOffsets[b + 1];
  let sum = 0;
  while (i < iEnd && j < jEnd) {
    const ti = index.docTerms[i];
    const tj = index.docTerms[j];
    if (ti === tj) {
      sum += index.docWeights[i] * index.docWeights[j];
      i++;
      j++;
    } else if (ti < tj) i++;
    else j++;
  }
  return sum;
}

/**
 * The `count` highest-weighted terms of a page (its key terms), heaviest first, ties by term id.
 * @returns term ids
 */
export function topTerms(index: TermIndex, page: number, count: number): number[] {
  const ids: number[] = [];
  for (let e = index.docOffsets[page]; e < index.docOffsets[page + 1]; e++) ids.push(e);
  ids.sort((x, y) => index.docWeights[y] - index.docWeights[x] || index.docTerms[x] - index.docTerms[y]);
  return ids.slice(0, count).map((e) => index.docTerms[e]);
}

/**
 * For every term, the `count` pages where it weighs most (heaviest first, ties by page id),
 * as a flat array: entries `[t * count, (t + 1) * count)` of term t, -1 where the term has fewer
 * pages. One pass over the index.
 */
export function termLeaders(index: TermIndex, count: number): Int32Array {
  const t = index.terms.length;
  const pages = new Int32Array(t * count).fill(-1);
  const weights = new Float64Array(t * count).fill(-1);
  const n = index.docOffsets.length - 1;
  for (let d = 0; d < n; d++) {
    for (let e = index.docOffsets[d]; e < index.docOffsets[d + 1]; e++) {
      const base = index.docTerms[e] * count;
      const w = index.docWeights[e];
      // pages arrive in ascending id, so an equal weight never displaces an earlier page
      let slot = count;
      while (slot > 0 && w > weights[base + slot - 1]) slot--;
      if (slot === count) continue;
      for (let k = count - 1; k > slot; k--) {
        pages[base + k] = pages[base + k - 1];
        weights[base + k] = weights[base + k - 1];
      }
      pages[base + slot] = d;
      weights[base + slot] = w;
    }
  }
  return pages;
}
