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
export { resolveOptions, DEFAULT_OPTIONS } from './options.js';
export { EngineError, isEngineError } from './errors.js';
export { formatReport, formatReportPieces, formatters, FORMAT_IDS, isFormatId, writeFileAtomic } from './report/index.js';
export { VERSION } from './version.js';
