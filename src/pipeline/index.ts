/**
 * The pipeline: named stage functions (prepare, collect, parse, site = graph + rank, text,
 * suggest, check, report) and the runner that calls them in order with the hooks. Every
 * command composes these; none reaches into another command's code.
 */
export { prepare, prepareConfig } from './prepare.js';
export type { OptionsOverride, RunSettings } from './prepare.js';
export { collect, collectInputs } from './collect.js';
export { parseAll } from './parse.js';
export { graphOf, graphNotes, rankOf, siteInputs } from './site.js';
export type { SiteInputs } from './site.js';
export { textOf } from './text.js';
export type { TextResults } from './text.js';
export { suggestFor } from './suggest.js';
export { checkSite } from './check.js';
export { reportOf } from './report.js';
export { stage, readSite, runPipeline, runPrepared, finishAnalysis } from './run.js';
export type { FinishInput } from './run.js';
export type { AnalyzeHooks, AnalyzeInput, BaselineInput, CollectedInputs, PreparedRun, ReportCommand, StageName } from './types.js';
