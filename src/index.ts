/**
 * linkweave's Node API.
 *
 * ```ts
 * import { analyze, formatReport } from 'linkweave';
 * const report = await analyze({ root: 'docs', command: 'suggest' });
 * console.log(formatReport(report, 'markdown'));
 * ```
 */
export { analyze, finishAnalysis } from './analyze.js';
export type { AnalyzeHooks, AnalyzeInput, StageName, CollectedInputs } from './analyze.js';
export { resolveOptions, DEFAULT_OPTIONS } from './config/options.js';
export type { Config, ResolvedOptions } from './config/options.js';
export { EngineError, isEngineError } from './errors.js';
export type { ErrorCode } from './errors.js';
export { formatReport, formatReportPieces, formatters, FORMAT_IDS, isFormatId, writeFileAtomic } from './report/index.js';
export type { FormatContext, FormatId, Formatter, WriteData, WriteOptions } from './report/index.js';
export type { CacheConfig, CheckConfig, Level, LimitsConfig, LinkPatternConfig, RoutesConfig, SuggestConfig } from './config/config.js';
export { applySuggestions } from './apply/index.js';
export type { ApplyInput, ApplyResult, AppliedLink, FileStyle, LinkStyle, NotApplied, RefusalCode, Selection } from './apply/index.js';
export { VERSION } from './version.js';
/** The public JSON report contract. */
export type * from './report/schema.js';
