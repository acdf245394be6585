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
import type { StemCache } from './tokenize.js';
/** Field boosts applied to occurrence counts. */
export declare const FIELD_BOOSTS: {
    readonly title: 3;
    readonly headings: 2;
    readonly body: 1;
};
/** Sublinear term frequency of a (boosted) count: 1 + ln(count); 0 for a count of 0. */
export declare function termFrequency(count: number): number;
/** Smoothed inverse document frequency: ln((1 + n) / (1 + df)) + 1. */
export declare function inverseDocumentFrequency(n: number, df: number): number;
/**
 * Build the TF-IDF index of the pages' texts (`texts[i]` is page i).
 * @param texts title/headings/body text per page, in page-id order
 * @param cache per-run stem cache (a fresh one by default); pass one to reuse stems later in the
 *   same run, e.g. for anchor matching
 */
export declare function buildTermIndex(texts: readonly PageText[], cache?: StemCache): TermIndex;
/**
 * Cosine similarity of two pages over all their terms (vectors are L2-normalised, so this is
 * the dot product). Used for checks and explanations; relatedness uses {@link relatedPages}.
 */
export declare function cosine(index: TermIndex, a: number, b: number): number;
/**
 * The `count` highest-weighted terms of a page (its key terms), heaviest first, ties by term id.
 * @returns term ids
 */
export declare function topTerms(index: TermIndex, page: number, count: number): number[];
/**
 * For every term, the `count` pages where it weighs most (heaviest first, ties by page id),
 * as a flat array: entries `[t * count, (t + 1) * count)` of term t, -1 where the term has fewer
 * pages. One pass over the index.
 */
export declare function termLeaders(index: TermIndex, count: number): Int32Array;
