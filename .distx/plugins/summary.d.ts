import type { Finding, Report } from '../types.js';
/** Findings listed in a log message or an error; the rest are counted. */
export declare const MAX_LISTED_FINDINGS = 20;
/** "linkweave: 5 pages, 9 links, ... Gate passed." */
export declare function summaryOf(report: Report, label: string): string;
/** The findings that fail the gate: those at or above `failOn`. */
export declare function failingFindings(report: Report): Finding[];
/**
 * One line per finding, `file:line:column  severity  message  (rule)`, at most
 * `MAX_LISTED_FINDINGS`, then how many more.
 * @param cwd file paths are shown relative to it (so editors and terminals can open them)
 */
export declare function findingLines(report: Report, findings: readonly Finding[], cwd: string): string[];
/** The error message of a failed gate: the summary, the findings that failed it, and how to pass anyway. */
export declare function gateErrorMessage(report: Report, label: string, cwd: string): string;
