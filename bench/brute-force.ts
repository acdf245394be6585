/**
 * (d) Reference relatedness: all pairs of pages, row merged against row, over the same term
 * index and the same definition as the text stage's `relatedPages` (DESIGN section 6): cosine
 * of the L2-normalised vectors over the terms with 2 <= df <= max(2, floor(N / 2)), summed in
 * ascending term order; top k most similar first, ties by page id; pages sharing no such term
 * are not listed. Written here on its own (not the text stage's helper) so that the bench
 * checks the fast path against an independent reference.
 */
import type { RelatedList, TermIndex } from '../src/types.js';

/** Top-k related pages of every page by brute force. */
export function bruteForceRelated(index: TermIndex, k: number): RelatedList[] {
  const n = index.docOffsets.length - 1;
  const { docOffsets, docTerms, docWeights, df } = index;
  const maxDf = Math.max(2, Math.floor(n / 2));
  const relating = new Uint8Array(index.terms.length);
  for (let t = 0; t < relating.length; t++) relating[t] = df[t]! >= 2 && df[t]! <= maxDf ? 1 : 0;
  const out: RelatedList[] = [];
  const scores: { page: number; similarity: number }[] = [];
  for (let q = 0; q < n; q++) {
    scores.length = 0;
    const qEnd = docOffsets[q + 1]!;
    for (let p = 0; p < n; p++) {
      if (p === q) continue;
      let i = docOffsets[q]!;
      let j = docOffsets[p]!;
      const pEnd = docOffsets[p + 1]!;
      let s = 0;
      let shared = false;
      while (i < qEnd && j < pEnd) {
        const ti = docTerms[i]!;
        const tj = docTerms[j]!;
        if (ti === tj) {
          if (relating[ti] === 1) {
            s += docWeights[i]! * docWeights[j]!;
            shared = true;
          }
          i++;
          j++;
        } else if (ti < tj) i++;
        else j++;
      }
      if (shared) scores.push({ page: p, similarity: s });
    }
    scores.sort((a, b) => b.similarity - a.similarity || a.page - b.page);
    out.push({ page: q, related: scores.slice(0, k) });
  }
  return out;
}

/** How two sets of related lists compare. */
export interface RelatedAgreement {
  /** Pages whose top-k page sets differ. */
  readonly differing: number;
  /** Of those, pages where the difference is more than a tie at the k-th place (|Δ| > 1e-9). */
  readonly differingBeyondTies: number;
}

/** Compare the top-k page sets of `a` and `b`, page by page. */
export function compareRelated(a: readonly RelatedList[], b: readonly RelatedList[]): RelatedAgreement {
  let differing = 0;
  let beyond = 0;
  const n = Math.max(a.length, b.length);
  for (let q = 0; q < n; q++) {
    const x = a[q]?.related ?? [];
    const y = b[q]?.related ?? [];
    const sx = new Set(x.map((r) => r.page));
    const same = x.length === y.length && y.every((r) => sx.has(r.page));
    if (same) continue;
    differing++;
    const kth = Math.min(x.at(-1)?.similarity ?? 0, y.at(-1)?.similarity ?? 0);
    const sy = new Set(y.map((r) => r.page));
    const odd = [...x.filter((r) => !sy.has(r.page)), ...y.filter((r) => !sx.has(r.page))];
    if (x.length !== y.length || odd.some((r) => Math.abs(r.similarity - kth) > 1e-9)) beyond++;
  }
  return { differing, differingBeyondTies: beyond };
}
