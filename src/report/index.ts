/** The report stage: the report object, the gate and the writers. */
export { buildReport } from './build.js';
export { evaluateGate } from './gate.js';
export { computeStats } from './stats.js';
export { PAGERANK_DECIMALS, RATIO_DECIMALS, roundTo } from './round.js';
export { formatReport, formatReportPieces, formatters, FORMAT_IDS, isFormatId } from './format.js';
export { textFormatter, summaryLines } from './formatters/text.js';
export { jsonFormatter } from './formatters/json.js';
export { markdownFormatter, escapeMarkdown } from './formatters/markdown.js';
export { sarifFormatter, toSarif, suggestionLink, SUGGESTION_RULE } from './formatters/sarif.js';
export { htmlFormatter, formatHtml } from './html/format.js';
export { writeFileAtomic, removeTempFilesSync, TEMP_PREFIX } from '../util/write-file.js';
export type { TempFileTracker, WriteData, WriteOptions } from '../util/write-file.js';
export type { FormatContext, FormatId, Formatter, GateStats, ReportInput } from './types.js';
export type { Importance } from './schema.js';
