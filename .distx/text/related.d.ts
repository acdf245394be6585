/**
 * Related pages: the top-k pages by cosine similarity for every page, through an inverted index
 * (DESIGN section 6), never all pairs.
 *
 * Only terms with 2 <= df <= max(2, floor(N / 2)) relate pages (a term of one page cannot, a
 * term of most pages says little); similarity is the dot product of the L2-normalised vectors
 * over those terms.
 *
 * Per query page q the work grows with the postings it reads, not with N:
 * 1. q's relating terms are taken in order of decreasing impact `w(q,t) x max_p w(p,t)`, so rare,
 *    heavy terms (short postings) come first and common terms (long postings) last.
 * 2. Their postings are added into a dense accumulator with a touched list (phase 1). Before a
 *    long posting, if the k-th best partial score already exceeds the most any untouched page
 *    could still collect from the remaining terms, no untouched page can enter the top k: the
 *    remaining (long) postings are skipped.
 * 3. Touched pages whose partial score plus that bound can still reach the k-th best are scored
 *    exactly, by one pass over their own row against a dense copy of q's weights, in ascending
 *    term order: the same sum, in the same order, as a pairwise merge, so the result (ties by
 *    page id included) is identical to brute force ({@link relatedPagesBruteForce}).
 */
import type { RelatedList, TermIndex } from '../types.js';
/** Largest document frequency of a term that relates pages. */
export declare function maxRelatingDf(n: number): number;
/** 1 for each term id that relates pages (2 <= df <= {@link maxRelatingDf}), else 0. */
export declare function relatingTerms(index: TermIndex): Uint8Array;
/**
 * Top-k related pages of every page, most similar first, ties by page id (pages are sorted by
 * route, so ties go by route). Pages sharing no relating term are never listed.
 * @param index the term index (row i = page i)
 * @param k pages kept per page
 */
export declare function relatedPages(index: TermIndex, k: number): RelatedList[];
/** Related lists plus how much of the inverted index was read (for the benchmark and the tests). */
export interface RelatedResult {
    readonly lists: RelatedList[];
    /** Posting entries added into the accumulator. */
    readonly postingsRead: number;
    /** Posting entries of query terms skipped because no untouched page could reach the top k. */
    readonly postingsSkipped: number;
    /** Pages scored exactly (the candidates that survived the bounds). */
    readonly pagesScored: number;
}
/** {@link relatedPages} with counters of the work done. */
export declare function relatedPagesWithStats(index: TermIndex, k: number): RelatedResult;
