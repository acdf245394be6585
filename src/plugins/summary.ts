/**
 * What the build plugin prints and throws: a few lines a build log can carry (the counts and
 * the gate), and the error text naming every finding that failed the gate at its file:line.
 * Pure functions of the report.
 */
import { isAbsolute, join, relative, sep } from 'node:path';
import { findingsLine, summaryParts, verdictReasons } from '../report/formatters/common.js';
import type { Finding, Report } from '../types.js';

/** Findings listed in a log message or an error; the rest are counted. */
export const MAX_LISTED_FINDINGS = 20;

/** "linkweave: 5 pages, 9 links, ... Findings: none. The build passes: no errors, no limit crossed." */
export function summaryOf(report: Report, label: string): string {
  const verdict = report.gate.passed ? 'The build passes' : 'The build fails';
  return `${label}: ${summaryParts(report).join(', ')}. ${findingsLine(report)}. ${verdict}: ${verdictReasons(report).join(', ')}.`;
}

/** The findings that fail the gate: those at or above `failOn`. */
export function failingFindings(report: Report): Finding[] {
  return report.findings.filter((f) => f.severity === 'error' || report.gate.failOn === 'warning');
}

/**
 * One line per finding, `file:line:column  severity  message  (rule)`, at most
 * `MAX_LISTED_FINDINGS`, then how many more.
 * @param cwd file paths are shown relative to it (so editors and terminals can open them)
 */
export function findingLines(report: Report, findings: readonly Finding[], cwd: string): string[] {
  const lines = findings
    .slice(0, MAX_LISTED_FINDINGS)
    .map((f) => `  ${shownPath(f.file, report.root, cwd)}:${f.line}:${f.column}  ${f.severity}  ${f.message}  (${f.rule})`);
  if (findings.length > MAX_LISTED_FINDINGS) lines.push(`  ... and ${findings.length - MAX_LISTED_FINDINGS} more`);
  return lines;
}

/** The error message of a failed gate: the summary, the findings that failed it, and how to pass anyway. */
export function gateErrorMessage(report: Report, label: string, cwd: string): string {
  const failing = failingFindings(report);
  return [
    summaryOf(report, label),
    ...(failing.length > 0 ? [`Findings that fail the build (failOn: ${report.gate.failOn}):`, ...findingLines(report, failing, cwd)] : []),
    'Fix them, raise the limits in the configuration, or pass failBuild: false to report without failing the build.',
  ].join('\n');
}

/** A report path as a log shows it: relative to `cwd` when the file lies under it, else absolute. */
function shownPath(file: string, root: string, cwd: string): string {
  const abs = join(root, file);
  const rel = relative(cwd, abs);
  return rel === '' || rel.startsWith(`..${sep}`) || isAbsolute(rel) ? abs : rel.split(sep).join('/');
}
