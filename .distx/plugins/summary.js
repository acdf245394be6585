/**
 * What the build plugin prints and throws: a few lines a build log can carry (the counts and
 * the gate), and the error text naming every finding that failed the gate at its file:line.
 * Pure functions of the report.
 */
import { isAbsolute, join, relative, sep } from 'node:path';
import { describeFailure, problemsLine, summaryParts } from '../report/formatters/common.js';
/** Findings listed in a log message or an error; the rest are counted. */
export const MAX_LISTED_FINDINGS = 20;
/** "linkweave: 5 pages, 9 links, ... Gate passed." */
export function summaryOf(report, label) {
    const gate = report.gate.passed
        ? 'gate passed'
        : `gate failed: ${report.gate.failures.map((f) => describeFailure(f, report.gate.failOn)).join(', ')}`;
    return `${label}: ${summaryParts(report).join(', ')}. ${problemsLine(report)}; ${gate}.`;
}
/** The findings that fail the gate: those at or above `failOn`. */
export function failingFindings(report) {
    return report.findings.filter((f) => f.severity === 'error' || report.gate.failOn === 'warning');
}
/**
 * One line per finding, `file:line:column  severity  message  (rule)`, at most
 * `MAX_LISTED_FINDINGS`, then how many more.
 * @param cwd file paths are shown relative to it (so editors and terminals can open them)
 */
export function findingLines(report, findings, cwd) {
    const lines = findings
        .slice(0, MAX_LISTED_FINDINGS)
        .map((f) => `  ${shownPath(f.file, report.root, cwd)}:${f.line}:${f.column}  ${f.severity}  ${f.message}  (${f.rule})`);
    if (findings.length > MAX_LISTED_FINDINGS)
        lines.push(`  ... and ${findings.length - MAX_LISTED_FINDINGS} more`);
    return lines;
}
/** The error message of a failed gate: the summary, the findings that failed it, and how to pass anyway. */
export function gateErrorMessage(report, label, cwd) {
    const failing = failingFindings(report);
    return [
        summaryOf(report, label),
        ...(failing.length > 0 ? [`Findings that fail the gate (failOn: ${report.gate.failOn}):`, ...findingLines(report, failing, cwd)] : []),
        'Fix them, raise the limits in the configuration, or pass failBuild: false to report without failing the build.',
    ].join('\n');
}
/** A report path as a log shows it: relative to `cwd` when the file lies under it, else absolute. */
function shownPath(file, root, cwd) {
    const abs = join(root, file);
    const rel = relative(cwd, abs);
    return rel === '' || rel.startsWith(`..${sep}`) || isAbsolute(rel) ? abs : rel.split(sep).join('/');
}
