/**
 * The suggestion stage's choice of suggestions with every page a target, without the impact
 * prediction (which changes no choice and no score, and would cost a PageRank per suggestion):
 * the same `rankCandidates` that `suggestLinks` runs. test/backtest/choose.test.ts checks the
 * result equals `suggestLinks`' own suggestions on a generated site.
 */
import type { ResolvedOptions } from '../config/options.js';
import { rankCandidates, pagerankPercentiles } from '../suggest/index.js';
import type { RankedCandidates, SuggestInput } from '../suggest/index.js';

/**
 * The suggestions `suggestLinks` would choose with `suggest.targets: 'all'`, in the order it
 * chooses them, before impact. (`centrality` and `traffic` of the input only serve importance,
 * which does not matter when every page is a target.)
 */
export function chooseLikeSuggest(input: SuggestInput, options: ResolvedOptions): RankedCandidates {
  const { graph, ranking } = input;
  const targets = graph.pages.filter((p) => !p.meta.exclude).map((p) => p.id);
  return rankCandidates(input, options, targets, pagerankPercentiles(graph, ranking));
}
