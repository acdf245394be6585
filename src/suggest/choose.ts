/**
 * The choice part of the suggest stage, shared by `suggestLinks` and the backtest: for the given
 * targets, candidate sources -> anchors (each source tokenised once) -> scores -> greedy choice
 * under the per-source and per-target caps. Impact is not part of it.
 */
import type { ResolvedOptions } from '../options.js';
import { createStemCache } from '../text/tokenize.js';
import { termLeaders, topTerms } from '../text/tfidf.js';
import { findAnchors, prepareSource } from './anchor.js';
import { targetNames } from './names.js';
import type { TargetNames } from './names.js';
import { findCandidates } from './candidates.js';
import { baseScore, NO_ANCHOR_SIMILARITY } from './score.js';
import { chooseSuggestions } from './select.js';
import type { Chosen, ScoredPair } from './select.js';
import { factsByPage } from './facts-of.js';
import type { SuggestInput } from './types.js';

/** Key terms of a target that an anchor may match: its heaviest TF-IDF terms. */
export const KEY_TERMS = 5;
/** A key term is strong for a target among the pages it weighs most in (this many). */
export const STRONG_LEADERS = 3;

/**
 * The suggestions chosen for `targets`, in the order they are chosen.
 * @param rankPct PageRank percentile per page id
 */
export function chooseForTargets(
  input: SuggestInput,
  options: ResolvedOptions,
  targets: readonly number[],
  rankPct: ArrayLike<number>,
): Chosen[] {
  const { graph, ranking, index, related } = input;
  const factsOf = factsByPage(input);
  const { maxDepth } = options;
  const settings = options.suggest;
  const pairs = findCandidates(graph, related, targets, settings.minSimilarity);

  // Anchors: each source's spans tokenised once, for all its targets.
  const cache = input.stems ?? createStemCache();
  const names = new Map<number, TargetNames>();
  const leaders = termLeaders(index, STRONG_LEADERS);
  const df = (stem: string): number => {
    // index.terms is sorted by code unit: binary search
    let lo = 0;
    let hi = index.terms.length - 1;
    while (lo <= hi) {
      const mid = (lo + hi) >> 1;
      const t = index.terms[mid]!;
      if (t === stem) return index.df[mid]!;
      if (t < stem) lo = mid + 1;
      else hi = mid - 1;
    }
    return 0;
  };
  const namesOf = (t: number): TargetNames => {
    let v = names.get(t);
    if (v === undefined) {
      const page = graph.pages[t]!;
      const ids = t < index.docOffsets.length - 1 ? topTerms(index, t, KEY_TERMS) : [];
      const leads = (id: number): boolean => {
        for (let k = 0; k < STRONG_LEADERS; k++) if (leaders[id * STRONG_LEADERS + k] === t) return true;
        return false;
      };
      const keys = {
        all: ids.map((id) => index.terms[id]!),
        strong: ids.filter((id) => leads(id)).map((id) => index.terms[id]!),
      };
      v = targetNames(page.title, [page.route, ...page.meta.aliases], keys, cache, df);
      names.set(t, v);
    }
    return v;
  };
  const bySource = [...pairs].sort((a, b) => a.source - b.source || a.target - b.target);
  const scored: ScoredPair[] = [];
  const minSimilarityWithoutAnchor = NO_ANCHOR_SIMILARITY * settings.minSimilarity;
  for (let i = 0; i < bySource.length; ) {
    const source = bySource[i]!.source;
    const tokens = prepareSource(factsOf(source)?.spans ?? [], cache, graph.pages[source]!.title);
    for (; i < bySource.length && bySource[i]!.source === source; i++) {
      const pair = bySource[i]!;
      const targetDepth = ranking.depth[pair.target]!;
      const base = baseScore({
        similarity: pair.similarity,
        sourceRankPercentile: rankPct[source]!,
        sourceDepth: ranking.depth[source]!,
        targetNeedsDepth: targetDepth < 0 || targetDepth > maxDepth,
        maxDepth,
      });
      const anchors = findAnchors(tokens, namesOf(pair.target));
      if (anchors.length === 0 && pair.similarity < minSimilarityWithoutAnchor) continue;
      scored.push({ ...pair, base, anchors });
    }
  }

  return chooseSuggestions(scored, settings.maxNewLinksPerPage, settings.perTarget, minSimilarityWithoutAnchor);
}
