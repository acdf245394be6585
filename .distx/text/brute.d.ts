/**
 * Reference relatedness by brute force: every pair of pages, merged row against row. Quadratic;
 * it exists for the tests (the inverted index must give the same lists) and the benchmark (the
 * speed-up it reports), never for a real run.
 */
import type { RelatedList, TermIndex } from '../types.js';
/**
 * Top-k related pages of every page from all pairs, with the same relating terms, summation
 * order and tie rule as `relatedPages`.
 */
export declare function relatedPagesBruteForce(index: TermIndex, k: number): RelatedList[];
