/**
 * The suggestion stage's choice of suggestions, without the impact prediction.
 *
 * `suggestLinks` predicts, for every suggestion it makes, the target's PageRank after the new
 * link (a warm-started power iteration each) and then plans depth repairs. With every page a
 * target that is one PageRank per suggestion: measured here, 11.5 s of 11.6 s for 1,000
 * generated pages (9,577 suggestions), and about a hundred times that at 10,000 pages. The
 * prediction changes no choice and no score, so the backtest runs the steps before it:
 * targets -> candidate sources -> anchors -> scores -> greedy choice under the caps. They are
 * the exported parts of `src/suggest/` composed exactly as `suggestLinks` composes them
 * (suggest.ts, from "targets" to `chooseSuggestions`); test/backtest/choose.test.ts checks the
 * result equals `suggestLinks`' own suggestions (pairs, anchors, offsets and scores) on a
 * generated site, so the two cannot drift apart unnoticed.
 */
import type { ResolvedOptions } from '../options.js';
import { baseScore, chooseSuggestions, findAnchors, findCandidates, pagerankPercentiles, prepareSource, targetNames, KEY_TERMS, STRONG_LEADERS } from '../suggest/index.js';
import type { Chosen, ScoredPair, SuggestInput, TargetNames } from '../suggest/index.js';
import { NO_ANCHOR_SIMILARITY } from '../suggest/score.js';
import { createStemCache, termLeaders, topTerms } from '../text/index.js';
import type { PageFacts } from '../types.js';

/**
 * The suggestions `suggestLinks` would choose with `suggest.targets: 'all'`, in the order it
 * chooses them, before impact. (`centrality` and `traffic` of the input only serve importance,
 * which does not matter when every page is a target.)
 */
export function chooseLikeSuggest(input: SuggestInput, options: ResolvedOptions): Chosen[] {
  const { graph, ranking, index, related } = input;
  const n = graph.pages.length;
  const ordered = input.facts.length === n && input.facts.every((f, i) => f.file === graph.pages[i]!.file);
  const factsOf = (i: number): PageFacts | undefined => (ordered ? input.facts[i] : input.facts[graph.pages[i]!.factsIndex]);
  const { maxDepth } = options;
  const settings = options.suggest;

  const rankPct = pagerankPercentiles(graph, ranking);
  // The backtest's setting `suggest.targets: 'all'`: every page not excluded is a target.
  const targets = graph.pages.filter((p) => !p.meta.exclude).map((p) => p.id);
  const pairs = findCandidates(graph, related, targets, settings.minSimilarity);

  const cache = createStemCache();
  const names = new Map<number, TargetNames>();
  const leaders = termLeaders(index, STRONG_LEADERS);
  const df = (stem: string): number => {
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
      const keys = { all: ids.map((id) => index.terms[id]!), strong: ids.filter((id) => leads(id)).map((id) => index.terms[id]!) };
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
