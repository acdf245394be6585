/** The suggest stage: importance, under-linked pages and the link model's suggestions (suggest/). */
import { availableParallelism } from 'node:os';
import type { ResolvedOptions } from '../config/options.js';
import { suggestLinks } from '../suggest/index.js';
import type { SuggestResult } from '../suggest/index.js';
import type { FitMemo, PageFacts, Ranking, SiteGraph } from '../types.js';
import type { TextResults } from './text.js';

/** Suggestions for the site (`ordered[i]` are the facts of page i; `fitMemo`: the cache folder's last fit, `linkModelStore`). */
export function suggestFor(
  site: { readonly graph: SiteGraph; readonly ranking: Ranking },
  ordered: readonly PageFacts[],
  text: TextResults,
  traffic: ReadonlyMap<string, number> | null,
  options: ResolvedOptions,
  fitMemo?: FitMemo,
): SuggestResult {
  // The impact predictions' PageRank takes a second thread where there is a second core (and
  // `workers` is not 1, the main thread only); the results are the same either way.
  const threads = options.workers !== 1 && availableParallelism() >= 2 ? 2 : 1;
  return suggestLinks({ graph: site.graph, facts: ordered, ranking: site.ranking, ...text, traffic, threads, ...(fitMemo === undefined ? {} : { fitMemo }) }, options);
}
