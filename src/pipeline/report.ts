/** The report stage: the report of a run from the stages' results (report/). */
import type { ResolvedOptions } from '../config/options.js';
import { buildReport } from '../report/index.js';
import type { SuggestResult } from '../suggest/index.js';
import type { Finding, Ranking, Report, SiteGraph } from '../types.js';
import { VERSION } from '../version.js';
import type { BaselineInput } from './types.js';

/** The report; `suggested` is null for `check`. */
export function reportOf(input: {
  readonly options: ResolvedOptions;
  readonly graph: SiteGraph;
  readonly ranking: Ranking;
  readonly findings: readonly Finding[];
  readonly suggested: SuggestResult | null;
  readonly files: number;
  readonly baseline?: BaselineInput | undefined;
}): Report {
  const { options, graph, ranking, findings, suggested, files, baseline } = input;
  return buildReport({
    options,
    graph,
    ranking,
    findings,
    suggestions: suggested?.suggestions ?? [],
    files,
    version: VERSION,
    ...(suggested === null ? {} : { importance: suggested.importance, repair: suggested.plan, model: suggested.model }),
    ...(baseline === undefined ? {} : { baseline }),
  });
}
