/**
 * Reference relatedness by brute force: every pair of pages, merged row against row. Quadratic;
 * it exists for the tests (the inverted index must give the same lists) and the benchmark (the
 * speed-up it reports), never for a real run.
 */
import type { RelatedList, TermIndex } from '../types.js';
import { relatingTerms } from './related.js';
import { topKByScore } from './topk.js';

/**
 * Top-k related pages of every page from all pairs, with the same relating terms, summation
 * order and tie rule as `relatedPages`.
 */
export function relatedPagesBruteForce(index: TermIndex, k: number): RelatedList[] {
  const n = index.docOffsets.length - 1;
  const { docOffsets, docTerms, docWeights } = index;
  const relating = relatingTerms(index);
  const score = new Float64Array(n);
  const ids: number[] = [];
  const out: RelatedList[] = [];
  for (let q = 0; q < n; q++) {
    ids.length = 0;
    for (let p = 0; p < n; p++) {
      if (p === q) continue;
      let i = docOffsets[q];
      let j = docOffsets[p];
      let s = 0;
      while (i < docOffsets[q + 1] && j < docOffsets[p + 1]) {
        const ti = docTerms[i];
        const tj = docTerms[j];
        if (ti === tj) {
          if (relating[ti] === 1) s += docWeights[i] * docWeights[j];
          i++;
          j++;
        } else if (ti < tj) i++;
        else j++;
      }
      if (s > 0) {
        score[p] = s;
        ids.push(p);
      }
    }
    const best = topKByScore(ids, ids.length, score, k);
    out.push({ page: q, related: best.map((p) => ({ page: p, similarity: score[p] })) });
  }
  return out;
}
