/**
 * `suggestLinks`: the suggest stage (DESIGN section 7) from under-linked pages to positioned,
 * impact-annotated link suggestions and a depth-repair plan.
 *
 * Steps: importance -> under-linked pages -> targets (under-linked, or all pages with
 * `suggest.targets: 'all'`) -> candidate sources -> anchors (each source tokenised once) ->
 * scores -> greedy choice under the per-source and per-target caps -> predicted PageRank and
 * depth per suggestion -> repair plan. Output sorted by file, line, column, target.
 */
import type { ResolvedOptions } from '../options.js';
import type { PageFacts, Suggestion } from '../types.js';
import { createStemCache } from '../text/tokenize.js';
import { termLeaders, topTerms } from '../text/tfidf.js';
import { findAnchors, prepareSource } from './anchor.js';
import { targetNames } from './names.js';
import type { TargetNames } from './names.js';
import { findCandidates } from './candidates.js';
import { suggestionId } from './id.js';
import { depthState, impactSelection, rankModel, targetRanksWithLinks } from './impact.js';
import { computeImportance } from './importance.js';
import { reasonText } from './reason.js';
import { repairPlan } from './repair.js';
import { baseScore, NO_ANCHOR_SIMILARITY } from './score.js';
import { chooseSuggestions } from './select.js';
import type { ScoredPair } from './select.js';
import type { SuggestInput, SuggestResult } from './types.js';
import { findUnderlinked, pagerankPercentiles } from './underlinked.js';

/** Key terms of a target that an anchor may match: its heaviest TF-IDF terms. */
export const KEY_TERMS = 5;
/** A key term is strong for a target among the pages it weighs most in (this many). */
export const STRONG_LEADERS = 3;

/** Propose links for the site. Pure: same input, same output. */
export function suggestLinks(input: SuggestInput, options: ResolvedOptions): SuggestResult {
  const { graph, ranking, index, related, centrality, traffic } = input;
  const n = graph.pages.length;
  const ordered = input.facts.length === n && input.facts.every((f, i) => f.file === graph.pages[i]!.file);
  const factsOf = (i: number): PageFacts | undefined => (ordered ? input.facts[i] : input.facts[graph.pages[i]!.factsIndex]);
  const { maxDepth } = options;
  const settings = options.suggest;

  const importance = computeImportance(graph, options, traffic, centrality);
  const rankPct = pagerankPercentiles(graph, ranking);
  const underlinked = findUnderlinked(graph, ranking, importance, rankPct, options);
  const reasonsOf = new Map(underlinked.map((u) => [u.page, u.reasons]));
  const targets =
    settings.targets === 'all'
      ? graph.pages.filter((p) => !p.meta.exclude).map((p) => p.id)
      : underlinked.map((u) => u.page);
  const pairs = findCandidates(graph, related, targets, settings.minSimilarity);

  // Anchors: each source's spans tokenised once, for all its targets.
  const cache = createStemCache();
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

  const chosen = chooseSuggestions(scored, settings.maxNewLinksPerPage, settings.perTarget, minSimilarityWithoutAnchor);
  const model = rankModel(graph, ranking, options);
  const depths = depthState(graph, ranking, options);
  const made = chosen.map(({ pair, anchor, score }): { suggestion: Suggestion; source: number; target: number } => {
    const { source, target } = pair;
    const sourcePage = graph.pages[source]!;
    const targetPage = graph.pages[target]!;
    const depthBefore = ranking.depth[target]!;
    const depthAfter = depths.depthWith(source, target);
    const anchorText = anchor === null ? null : anchor.text;
    const suggestion: Suggestion = {
      id: suggestionId(sourcePage.route, targetPage.route, anchorText),
      source: sourcePage.route,
      target: targetPage.route,
      file: sourcePage.file,
      line: anchor === null ? 1 : anchor.line,
      column: anchor === null ? 1 : anchor.column,
      offset: anchor === null ? -1 : anchor.offset,
      endOffset: anchor === null ? -1 : anchor.endOffset,
      anchor: anchorText,
      similarity: pair.similarity,
      score,
      targetRankBefore: ranking.pagerank[target]! * n,
      targetRankAfter: null, // filled in below for the suggestions within the impact budget
      depthBefore: depthBefore < 0 ? null : depthBefore,
      depthAfter: depthAfter < 0 ? null : depthAfter,
      reason: reasonText({
        reasons: reasonsOf.get(target) ?? [],
        depth: depthBefore,
        maxDepth,
        contentInlinks: ranking.contentInlinks[target]!,
        minInlinks: settings.minInlinks,
        rankPercentile: rankPct[target]!,
        importancePercentile: importance.score[target]!,
        anchor: anchor === null ? null : anchor.kind,
      }),
      sourceHash: factsOf(source)?.hash ?? '',
    };
    return { suggestion, source, target };
  });
  made.sort((a, b) => compareSuggestions(a.suggestion, b.suggestion));

  const plan = repairPlan(
    graph,
    ranking,
    options,
    made.map((m) => ({ id: m.suggestion.id, source: m.source, target: m.target, score: m.suggestion.score })),
  );
  // PageRank after: for the best `impactLimit` by score and the plan, in one batched run.
  const selected = impactSelection(made.map((m) => m.suggestion), plan.suggestionIds, settings.impactLimit);
  const predict = made.filter((_, i) => selected[i] === 1);
  const after = targetRanksWithLinks(model, predict.map((m) => ({ from: m.source, to: m.target })));
  predict.forEach((m, j) => {
    m.suggestion = { ...m.suggestion, targetRankAfter: after[j]! * n };
  });
  return { suggestions: made.map((m) => m.suggestion), underlinked, plan, importance: importance.level };
}

/** Output order: file, line, column, then target route (code-unit order). */
export function compareSuggestions(a: Suggestion, b: Suggestion): number {
  return cmp(a.file, b.file) || a.line - b.line || a.column - b.column || cmp(a.target, b.target) || cmp(a.id, b.id);
}

function cmp(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
