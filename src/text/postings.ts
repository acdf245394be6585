/**
 * The two sparse layouts the related-pages search reads, built once from the term index over
 * the relating terms only: the inverted index (postings per term, in page order, with each
 * term's largest weight) and each page's row cut down to its relating terms (in ascending term
 * id, as in the term index).
 */
import type { TermIndex } from '../types.js';

/** The inverted index and the relating rows. */
export interface Postings {
  /** Postings of term t: `postDocs/postWeights[postOffsets[t]..postOffsets[t+1])`, pages ascending. */
  readonly postOffsets: Int32Array;
  readonly postDocs: Int32Array;
  readonly postWeights: Float32Array;
  /** Largest weight of each term (0 for a term that does not relate pages). */
  readonly maxWeight: Float64Array;
  /** Rows over relating terms only: page d is `rowTerms/rowWeights[rowOffsets[d]..rowOffsets[d+1])`. */
  readonly rowOffsets: Int32Array;
  readonly rowTerms: Int32Array;
  readonly rowWeights: Float32Array;
  /** Length of the longest relating row. */
  readonly longestRow: number;
}

/**
 * Build the postings and the relating rows.
 * @param relating 1 for each term id that relates pages
 */
export function buildPostings(index: TermIndex, relating: Uint8Array): Postings {
  const n = index.docOffsets.length - 1;
  const { docOffsets, docTerms, docWeights } = index;
  const t = index.terms.length;
  const postOffsets = new Int32Array(t + 1);
  for (let term = 0; term < t; term++) postOffsets[term + 1] = postOffsets[term] + (relating[term] === 1 ? index.df[term] : 0);
  const entries = postOffsets[t];
  const postDocs = new Int32Array(entries);
  const postWeights = new Float32Array(entries);
  const rowOffsets = new Int32Array(n + 1);
  const rowTerms = new Int32Array(entries);
  const rowWeights = new Float32Array(entries);
  const maxWeight = new Float64Array(t);
  const fill = postOffsets.slice(0, t);
  let longestRow = 0;
  let r = 0;
  for (let d = 0; d < n; d++) {
    for (let e = docOffsets[d]; e < docOffsets[d + 1]; e++) {
      const term = docTerms[e];
      if (relating[term] === 0) continue;
      const w = docWeights[e];
      const at = fill[term];
      fill[term] = at + 1;
      postDocs[at] = d;
      postWeights[at] = w;
      rowTerms[r] = term;
      rowWeights[r] = w;
      r++;
      if (w > maxWeight[term]) maxWeight[term] = w;
    }
    rowOffsets[d + 1] = r;
    longestRow = Math.max(longestRow, r - rowOffsets[d]);
  }
  return { postOffsets, postDocs, postWeights, maxWeight, rowOffsets, rowTerms, rowWeights, longestRow };
}
