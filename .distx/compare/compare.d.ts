import type { Comparison, Report } from '../types.js';
import type { ReportFile } from './read.js';
/** Pages listed per kind of change. */
export declare const TOP_CHANGES = 10;
/** Least rank change listed. */
export declare const MIN_RANK_CHANGE = 0.005;
/**
 * Compare `head` (this run) with `base`.
 * @param base the base branch's report, as read by `parseReportFile`
 * @param head this run's report
 */
export declare function compareReports(base: ReportFile, head: Pick<Report, 'pages' | 'findings'>): Comparison;
