/** Types of the suggest stage (contracts.md). */
import type { StemCache } from '../text/tokenize.js';
import type { FitMemo } from './model.js';
import type { Importance, LinkModelReport, PageFacts, Ranking, RelatedList, SiteGraph, Suggestion, TermIndex, UnderlinkedReason } from '../types.js';

/** What `suggestLinks` works from. Arrays are indexed by page id (the graph's order). */
export interface SuggestInput {
  readonly graph: SiteGraph;
  /**
   * Facts per page: `facts[i]` belongs to page i (as `analyze` passes them), or the array given
   * to `buildGraph` (then `graph.pages[i].factsIndex` is used).
   */
  readonly facts: readonly PageFacts[];
  readonly ranking: Ranking;
  /** The term index of the pages' texts, row i = page i. */
  readonly index: TermIndex;
  readonly related: readonly RelatedList[];
  readonly centrality: Float64Array;
  /** Views per route from the traffic CSV (see `parseTraffic`), or null. */
  readonly traffic: ReadonlyMap<string, number> | null;
  /**
   * Stems already computed in this run (the one the term index was built with), so the anchor
   * search does not stem the same words again. A memo: results do not depend on it. @default a new one
   */
  readonly stems?: StemCache;
  /** Fitted link models kept between runs (the cache folder's). A memo: results do not depend on it. @default none */
  readonly fitMemo?: FitMemo;
  /** Threads the impact predictions may use: 1, or 2 (half on a worker thread). Results do not depend on it. @default 1 */
  readonly threads?: number;
}


/** A page that wants more links, and why (reasons in a fixed order). */
export interface UnderlinkedPage {
  readonly page: number;
  readonly reasons: UnderlinkedReason[];
}

import type { RepairPlan } from '../types.js';
export type { RepairPlan };

/** Result of `suggestLinks`. */
export interface SuggestResult {
  readonly suggestions: Suggestion[];
  readonly underlinked: UnderlinkedPage[];
  readonly plan: RepairPlan;
  /** Importance level per page id. */
  readonly importance: Importance[];
  /** The link model the suggestions were scored with. */
  readonly model: LinkModelReport;
}
