/**
 * The Node API entry point: `analyze(config) -> Promise<Report>`.
 *
 * The stages and their order are the pipeline's (src/pipeline/); this file is the public name
 * for a whole run.
 */
import { runPipeline } from './pipeline/index.js';
import type { AnalyzeHooks, AnalyzeInput } from './pipeline/index.js';
import type { Report } from './types.js';

export { finishAnalysis } from './pipeline/index.js';
export type { AnalyzeHooks, AnalyzeInput, CollectedInputs, FinishInput, StageName } from './pipeline/index.js';

/**
 * Analyse a site: collect its sources, build the link graph, rank it, run the checks (and, for
 * `command: 'suggest'`, propose links) and return the report.
 * @throws EngineError with code `E_CONFIG_INVALID` (bad configuration) or `E_IO` (unreadable root
 *   or auxiliary file). A bad source file is a finding, never a throw.
 */
export function analyze(input: AnalyzeInput, hooks: AnalyzeHooks = {}): Promise<Report> {
  return runPipeline(input, hooks);
}
