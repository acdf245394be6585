/**
 * The text stage: the term index of the pages' texts (TF-IDF), each page's related pages and
 * content centrality. The stem cache it fills is handed on to the suggest stage.
 */
import type { ResolvedOptions } from '../config/options.js';
import { buildTermIndex, contentCentrality, createStemCache, relatedPagesMemo } from '../text/index.js';
import type { StemCache } from '../text/index.js';
import type { PageFacts, RelatedList, RelatedMemo, TermIndex } from '../types.js';

/** What the text stage gives the suggest stage. */
export interface TextResults {
  readonly index: TermIndex;
  readonly related: readonly RelatedList[];
  readonly centrality: Float64Array;
  readonly stems: StemCache;
}

/**
 * The text stage over the facts in page order (`ordered[i]` belongs to page i).
 * @param memo the cache folder's related lists (`relatedStore`): the same lists, without the
 *   search, when the term index did not change
 */
export function textOf(ordered: readonly PageFacts[], options: ResolvedOptions, stems: StemCache = createStemCache(), memo?: RelatedMemo): TextResults {
  const index = buildTermIndex(ordered.map((f) => f.text), stems);
  const related = relatedPagesMemo(index, options.suggest.relatedK, memo);
  return { index, related, centrality: contentCentrality(related, ordered.length), stems };
}
