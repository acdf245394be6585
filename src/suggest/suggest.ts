/**
 * `suggestLinks`: the suggest stage (DESIGN section 7) from under-linked pages to positioned,
 * impact-annotated link suggestions and a depth-repair plan.
 *
 * Steps: importance -> under-linked pages -> targets (under-linked, or all pages with
 * `suggest.targets: 'all'`) -> candidate sources -> anchors (each source tokenised once) ->
 * scores -> greedy choice under the per-source and per-target caps -> predicted PageRank and
 * depth per suggestion -> repair plan. Output sorted by file, line, column, target.
 */
import type { ResolvedOptions } from '../config/options.js';
import type { Suggestion } from '../types.js';
import { compareSuggestions } from '../util/index.js';
import { rankCandidates } from './rank-candidates.js';
import { suggestionId } from './id.js';
import { depthState, impactSelection, rankModel, targetRanksWithLinks } from './impact.js';
import { computeImportance } from './importance.js';
import { reasonText } from './reason.js';
import { repairPlan } from './repair.js';
import { factsByPage } from './facts-of.js';
import type { SuggestInput, SuggestResult } from './types.js';
import { findUnderlinked, pagerankPercentiles } from './underlinked.js';

/** Propose links for the site. Pure: same input, same output. */
export function suggestLinks(input: SuggestInput, options: ResolvedOptions): SuggestResult {
  const { graph, ranking, centrality, traffic } = input;
  const n = graph.pages.length;
  const factsOf = factsByPage(input);
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
  const choice = rankCandidates(input, options, targets, rankPct);
  const chosen = choice.chosen;
  const model = rankModel(graph, ranking, options);
  const depths = depthState(graph, ranking, options);
  const made = chosen.map((c): { suggestion: Suggestion; source: number; target: number } => {
    const { pair, anchor, score } = c;
    const { source, target } = pair;
    const sourcePage = graph.pages[source];
    const targetPage = graph.pages[target];
    const depthBefore = ranking.depth[target];
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
      targetRankBefore: ranking.pagerank[target] * n,
      targetRankAfter: null, // filled in below for the suggestions within the impact budget
      depthBefore: depthBefore < 0 ? null : depthBefore,
      depthAfter: depthAfter < 0 ? null : depthAfter,
      reason: reasonText(
        {
          reasons: reasonsOf.get(target) ?? [],
          depth: depthBefore,
          maxDepth,
          contentInlinks: ranking.contentInlinks[target],
          minInlinks: settings.minInlinks,
          rankPercentile: rankPct[target],
          importancePercentile: importance.score[target],
        },
        choice.evidenceOf(c),
      ),
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
  const after = targetRanksWithLinks(model, predict.map((m) => ({ from: m.source, to: m.target })), input.threads ?? 1);
  predict.forEach((m, j) => {
    m.suggestion = { ...m.suggestion, targetRankAfter: after[j] * n };
  });
  return { suggestions: made.map((m) => m.suggestion), underlinked, plan, importance: importance.level, model: choice.modelReport };
}
