/** Comparing two runs: a base report read back, and what changed between it and this run. */
export { compareReports, TOP_CHANGES, MIN_RANK_CHANGE } from './compare.js';
export { parseReportFile, REPORT_SCHEMA } from './read.js';
export type { ReportFile } from './read.js';
