/**
 * Related pages: the top-k pages by cosine similarity for every page, through an inverted index
 * (DESIGN section 6), never all pairs, with a cost that stays bounded when many terms are shared
 * by many pages (a realistic vocabulary).
 *
 * Only terms with 2 <= df <= max(2, floor(N / 2)) relate pages (a term of one page cannot, a
 * term of most pages says little); similarity is the dot product of the L2-normalised vectors
 * over those terms.
 *
 * Per query page q, a term-at-a-time search with upper bounds in the MaxScore manner:
 * 1. q's relating terms are taken in order of decreasing impact `w(q,t) x max_p w(p,t)`, so rare,
 *    heavy terms (short postings) come first and common terms (long postings) last.
 * 2. Their postings are added into a dense accumulator (partial scores) and, per touched page,
 *    the sum of its squared weights read so far (phase 1).
 * 3. Before a long posting, a lower bound theta of q's k-th best similarity is compared with the
 *    most any page could still collect from the remaining terms R:
 *    `min(sum_R w(q,t) max_p w(p,t), ||q_R|| x min(1, ||max_p w(p,.)_R||))` (Cauchy-Schwarz).
 *    When theta is larger, no untouched page can enter the top k and R's postings are skipped.
 *    theta is the k-th best of exact scores (pages with the best partial scores scored exactly,
 *    again each time the touched set has doubled), never below the k-th best partial score.
 * 4. Each touched page p gets an upper bound `acc(p) + min(that bound, ||q_R|| x ||p_R||)`,
 *    where `||p_R||^2 <= 1 - (p's squared weights read in phase 1)`. Candidates are scored
 *    exactly in order of decreasing bound, theta rising as they are, until the next bound is
 *    below theta: usually a few dozen pages, not every page that shares a common term.
 * 5. An exact score is one pass over p's own row against a dense copy of q's weights, in
 *    ascending term order: the same sum, in the same order, as a pairwise merge, so the result
 *    (ties by page id included) is identical to brute force ({@link relatedPagesBruteForce}).
 */
import type { RelatedList, TermIndex } from '../types.js';
import { buildPostings } from './postings.js';
import { ExactTopK, KnownScores, kthLargest, topKByScore } from './topk.js';

/** Slack for comparing bounds computed in a different summation order. */
const EPS = 1e-9;
/** Slack on a row's squared norm (1 up to Float32 rounding of its weights). */
const NORM_SLACK = 1e-5;
/** How many posting entries cost as much as one row entry of an exact score (both measured). */
const READ_VS_SCORE = 1;

/** Largest document frequency of a term that relates pages. */
export function maxRelatingDf(n: number): number {
  return Math.max(2, Math.floor(n / 2));
}

/** 1 for each term id that relates pages (2 <= df <= {@link maxRelatingDf}), else 0. */
export function relatingTerms(index: TermIndex): Uint8Array {
  const n = index.docOffsets.length - 1;
  const maxDf = maxRelatingDf(n);
  const mask = new Uint8Array(index.terms.length);
  for (let t = 0; t < mask.length; t++) mask[t] = index.df[t] >= 2 && index.df[t] <= maxDf ? 1 : 0;
  return mask;
}

/**
 * Top-k related pages of every page, most similar first, ties by page id (pages are sorted by
 * route, so ties go by route). Pages sharing no relating term are never listed.
 * @param index the term index (row i = page i)
 * @param k pages kept per page
 */
export function relatedPages(index: TermIndex, k: number): RelatedList[] {
  return relatedPagesWithStats(index, k).lists;
}

/** Related lists plus how much of the inverted index was read (for the benchmark and the tests). */
export interface RelatedResult {
  readonly lists: RelatedList[];
  /** Posting entries added into the accumulator. */
  readonly postingsRead: number;
  /** Posting entries of query terms skipped because no untouched page could reach the top k. */
  readonly postingsSkipped: number;
  /** Pages scored exactly (the candidates that survived the bounds). */
  readonly pagesScored: number;
  /** Row entries read by the exact scores (their cost beside `postingsRead`). */
  readonly entriesScored: number;
}

/** {@link relatedPages} with counters of the work done. */
export function relatedPagesWithStats(index: TermIndex, k: number): RelatedResult {
  const n = index.docOffsets.length - 1;
  const post = buildPostings(index, relatingTerms(index));
  const { postOffsets, postDocs, postWeights, maxWeight, rowOffsets, rowTerms, rowWeights } = post;

  const acc = new Float64Array(n);
  const accSq = new Float64Array(n);
  const exact = new Float64Array(n);
  const stamp = new Int32Array(n).fill(-1);
  const scoredStamp = new Int32Array(n).fill(-1);
  const touched = new Int32Array(n);
  const scored = new Int32Array(n);
  const bound = new Float64Array(n);
  const qDense = new Float64Array(index.terms.length);
  const rows = post.longestRow;
  const impact = new Float64Array(rows);
  const order = new Int32Array(rows);
  const suffixImpact = new Float64Array(rows + 1);
  const suffixSq = new Float64Array(rows + 1);
  const suffixMaxSq = new Float64Array(rows + 1);
  const suffixPostings = new Float64Array(rows + 1);
  const heap = new Float64Array(Math.max(1, k));
  const best = new ExactTopK(k);
  // Exact scores are symmetric: what page q's search learnt of page p bounds p's k-th best.
  const known = new KnownScores(n, k);
  let base = 0;
  const byImpact = (a: number, b: number): number => impact[b] - impact[a] || rowTerms[base + a] - rowTerms[base + b];
  const byBound = (a: number, b: number): number => bound[b] - bound[a] || a - b;
  const out: RelatedList[] = new Array(n);
  let postingsRead = 0;
  let postingsSkipped = 0;
  let pagesScored = 0;
  let entriesScored = 0;

  for (let q = 0; q < n; q++) {
    base = rowOffsets[q];
    const m = rowOffsets[q + 1] - base;
    if (m === 0 || k <= 0) {
      out[q] = { page: q, related: [] };
      continue;
    }
    for (let i = 0; i < m; i++) {
      const w = rowWeights[base + i];
      impact[i] = w * maxWeight[rowTerms[base + i]];
      order[i] = i;
      qDense[rowTerms[base + i]] = w;
    }
    const sorted = order.subarray(0, m).sort(byImpact);
    suffixImpact[m] = 0;
    suffixSq[m] = 0;
    suffixMaxSq[m] = 0;
    suffixPostings[m] = 0;
    for (let i = m - 1; i >= 0; i--) {
      const e = base + sorted[i];
      const w = rowWeights[e];
      const mw = maxWeight[rowTerms[e]];
      suffixImpact[i] = suffixImpact[i + 1] + w * mw;
      suffixSq[i] = suffixSq[i + 1] + w * w;
      suffixMaxSq[i] = suffixMaxSq[i + 1] + mw * mw;
      suffixPostings[i] = suffixPostings[i + 1] + postOffsets[rowTerms[e] + 1] - postOffsets[rowTerms[e]];
    }
    // The most a page not yet touched can collect from terms i.. (slack for summation order).
    const restBound = (i: number): number =>
      Math.min(suffixImpact[i], Math.sqrt(suffixSq[i] * Math.min(1, suffixMaxSq[i]))) * (1 + EPS) + EPS;
    best.reset();
    let nScored = 0;
    // Exact score: p's relating row against q's dense weights, ascending term order (as brute
    // force sums); a term q lacks adds an exact 0, which leaves the sum unchanged.
    const score = (p: number): void => {
      if (scoredStamp[p] === q) return;
      scoredStamp[p] = q;
      entriesScored += rowOffsets[p + 1] - rowOffsets[p];
      let s = 0;
      for (let e = rowOffsets[p]; e < rowOffsets[p + 1]; e++) s += qDense[rowTerms[e]] * rowWeights[e];
      exact[p] = s;
      scored[nScored++] = p;
      best.add(s);
      known.offer(p, s);
    };
    // Row entries the exact scores of the touched pages that could reach theta would read, if
    // phase 1 stopped before term i.
    const scoringCost = (i: number, count: number, theta: number): number => {
      const rest = restBound(i);
      const qRest = Math.sqrt(suffixSq[i]);
      let cost = 0;
      for (let c = 0; c < count; c++) {
        const p = touched[c];
        const own = qRest * Math.sqrt(Math.max(0, 1 + NORM_SLACK - accSq[p]));
        if (acc[p] + Math.min(rest, own) >= theta) cost += rowOffsets[p + 1] - rowOffsets[p];
      }
      return cost;
    };
    const lower = (count: number): number => Math.max(best.kth(), known.kth(q), kthLargest(touched, count, acc, k, heap));

    // Phase 1: accumulate postings until untouched pages can no longer reach the top k.
    let count = 0;
    let cutoff = m;
    let refreshedAt = 0;
    for (let i = 0; i < m; i++) {
      const term = rowTerms[base + sorted[i]];
      const from = postOffsets[term];
      const to = postOffsets[term + 1];
      if (count >= k && (to - from) * 4 >= count) {
        const rest = restBound(i);
        let theta = lower(count);
        if (theta <= rest && count >= 2 * refreshedAt) {
          // Score the best partial pages exactly: a higher theta ends phase 1 sooner.
          refreshedAt = count;
          for (const p of topKByScore(touched, count, acc, k)) score(p);
          theta = Math.max(theta, best.kth());
        }
        // Untouched pages are out; stop unless reading this posting (which tightens every touched
        // page's bound) costs less than scoring the pages that could still reach theta.
        if (theta > rest && suffixPostings[i] * READ_VS_SCORE >= scoringCost(i, count, theta)) {
          cutoff = i;
          for (let j = i; j < m; j++) postingsSkipped += postOffsets[rowTerms[base + sorted[j]] + 1] - postOffsets[rowTerms[base + sorted[j]]];
          break;
        }
      }
      const w = qDense[term];
      postingsRead += to - from;
      for (let a = from; a < to; a++) {
        const p = postDocs[a];
        if (p === q) continue;
        const pw = postWeights[a];
        if (stamp[p] !== q) {
          stamp[p] = q;
          acc[p] = 0;
          accSq[p] = 0;
          touched[count++] = p;
        }
        acc[p] += w * pw;
        accSq[p] += pw * pw;
      }
    }

    // Upper bounds of the touched pages; score them best first while they can reach theta.
    const rest = restBound(cutoff);
    const qRest = Math.sqrt(suffixSq[cutoff]);
    let theta = lower(count);
    let kept = 0;
    for (let i = 0; i < count; i++) {
      const p = touched[i];
      const own = qRest * Math.sqrt(Math.max(0, 1 + NORM_SLACK - accSq[p])) * (1 + EPS) + EPS;
      const ub = acc[p] * (1 + EPS) + EPS + Math.min(rest, own);
      if (ub < theta) continue;
      bound[p] = ub;
      touched[kept++] = p;
    }
    const candidates = touched.subarray(0, kept).sort(byBound);
    for (let i = 0; i < kept; i++) {
      const p = candidates[i];
      if (bound[p] < theta) break;
      score(p);
      theta = Math.max(theta, best.kth());
    }
    pagesScored += nScored;
    const top = topKByScore(scored, nScored, exact, k);
    out[q] = { page: q, related: top.map((p) => ({ page: p, similarity: exact[p] })) };
    for (let i = 0; i < m; i++) qDense[rowTerms[base + i]] = 0;
  }
  return { lists: out, postingsRead, postingsSkipped, pagesScored, entriesScored };
}
