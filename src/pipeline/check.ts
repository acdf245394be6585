/** The check stage: every configured check run over the site (rules/), with the settings prepared once. */
import type { ResolvedOptions } from '../config/options.js';
import { runRules, rules as builtinRules } from '../rules/index.js';
import type { RuleSetting } from '../rules/index.js';
import type { Finding, PageFacts, Ranking, SiteGraph } from '../types.js';
import type { CollectedInputs } from './types.js';

/** The findings of the checks, sorted (file, line, column, check, message). */
export function checkSite(
  site: { readonly graph: SiteGraph; readonly ranking: Ranking; readonly facts: readonly PageFacts[] },
  collected: Pick<CollectedInputs, 'auxProblems'> & { readonly sources: Pick<CollectedInputs['sources'], 'warnings'> },
  options: ResolvedOptions,
  settings: readonly RuleSetting[],
): Finding[] {
  const { graph, ranking, facts } = site;
  return runRules({ graph, facts, ranking, options, warnings: collected.sources.warnings, auxProblems: collected.auxProblems }, builtinRules, settings);
}
