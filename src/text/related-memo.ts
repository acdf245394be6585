/**
 * Related pages kept between runs. The lists are a function of the term index and k alone, so
 * a run whose index is the same to the bit (every page's terms and weights: no page text
 * changed, as when a pull request only fixes link targets or navigation) takes the lists of the
 * last run instead of searching again. The key ({@link relatedKey}) is a sha256 of everything
 * the search reads; the store (`src/cache/related.ts`) keys on the code hash as well.
 */
import { createHash } from 'node:crypto';
import type { RelatedList, RelatedMemo, TermIndex } from '../types.js';
import { relatedPages } from './related.js';

export type { RelatedMemo } from '../types.js';

/** sha256 of k, the terms, and every page's row (term ids, document frequencies, weights as stored). */
export function relatedKey(index: TermIndex, k: number): string {
  const hash = createHash('sha256');
  hash.update(`related\nk=${k}\n${index.terms.length}\n`);
  hash.update(index.terms.join('\n')); // all terms in one update, not one call per term
  hash.update('\n');
  for (const array of [index.df, index.docOffsets, index.docTerms, index.docWeights]) {
    hash.update(`${array.length}\n`);
    hash.update(new Uint8Array(array.buffer, array.byteOffset, array.byteLength));
  }
  return hash.digest('hex');
}

/** {@link relatedPages}, or the memo's lists for the same index and k. */
export function relatedPagesMemo(index: TermIndex, k: number, memo: RelatedMemo | undefined): RelatedList[] {
  if (memo === undefined) return relatedPages(index, k);
  const key = relatedKey(index, k);
  const kept = memo.get(key, index.docOffsets.length - 1);
  if (kept !== null) return kept;
  const lists = relatedPages(index, k);
  memo.set(key, lists);
  return lists;
}
