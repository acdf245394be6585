/**
 * The text stage: the term index of the pages' texts (TF-IDF), each page's related pages and
 * content centrality. The stem cache it fills is handed on to the suggest stage.
 */
import type { ResolvedOptions } from '../config/options.js';
import { buildTermIndex, contentCentrality, createStemCache, relatedPages } from '../text/index.js';
import type { StemCache } from '../text/index.js';
import type { PageFacts, RelatedList, TermIndex } from '../types.js';

/** What the text stage gives the suggest stage. */
export interface TextResults {
  readonly index: TermIndex;
  readonly related: readonly RelatedList[];
  readonly centrality: Float64Array;
  readonly stems: StemCache;
}

/** The text stage over the facts in page order (`ordered[i]` belongs to page i). */
export function textOf(ordered: readonly PageFacts[], options: ResolvedOptions, stems: StemCache = createStemCache()): TextResults {
  const index = buildTermIndex(ordered.map((f) => f.text), stems);
  const related = relatedPages(index, options.suggest.relatedK);
  return { index, related, centrality: contentCentrality(related, ordered.length), stems };
}
