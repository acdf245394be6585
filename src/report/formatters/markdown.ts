/**
 * The Markdown writer: a pull-request comment. Gate result first (with the limits crossed),
 * then the counts, the findings (a table, errors first; past the first few, collapsed in
 * `<details>`), then the suggested links as a checklist a reviewer can tick, each with its id
 * for `apply`, the most useful (highest score) first.
 */
import type { Finding, Report, Suggestion } from '../../types.js';
import type { Formatter } from '../types.js';
import { failureParts, formatSimilarity, impactOf, plural, summaryParts } from './common.js';

/** Rows shown before the rest is collapsed. */
const SHOWN = 10;

/** Escape text for Markdown (ASCII punctuation that could start markup); keeps it on one line. */
export function escapeMarkdown(text: string): string {
  return text.replace(/\s+/g, ' ').replace(/[\\`*_[\]<>|~&]/g, (ch) => `\\${ch}`);
}

/** Inline code that survives backticks inside. */
function code(text: string): string {
  const ticks = text.includes('`') ? '``' : '`';
  const pad = text.startsWith('`') || text.endsWith('`') ? ' ' : '';
  return `${ticks}${pad}${text.replace(/\s+/g, ' ')}${pad}${ticks}`;
}

function location(f: { file: string; line: number; column?: number }, withColumn = true): string {
  const place = withColumn && f.column !== undefined ? `${f.line}:${f.column}` : `${f.line}`;
  return f.file === '' ? '(site)' : `${f.file}:${place}`;
}

function findingsTable(findings: readonly Finding[]): string[] {
  return [
    '| Severity | Location | Finding | Rule |',
    '| --- | --- | --- | --- |',
    ...findings.map((f) => `| ${f.severity} | ${code(location(f))} | ${escapeMarkdown(f.message)} | ${code(f.rule)} |`),
  ];
}

/** `lines` as they are when short, else the first `SHOWN` and the rest in `<details>`. */
function collapse<T>(items: readonly T[], render: (part: readonly T[]) => string[], noun: string): string[] {
  if (items.length <= SHOWN + 2) return render(items);
  return [
    ...render(items.slice(0, SHOWN)),
    '',
    '<details>',
    `<summary>${plural(items.length - SHOWN, `more ${noun}`, `more ${noun}s`)}</summary>`,
    '',
    ...render(items.slice(SHOWN)),
    '',
    '</details>',
  ];
}

function suggestionItem(s: Suggestion): string {
  const what = s.anchor === null ? `a link (no anchor phrase found) in ${code(`${s.file}:${s.line}`)}` : `"${escapeMarkdown(s.anchor)}" in ${code(`${s.file}:${s.line}`)}`;
  return `- [ ] ${what} -> ${code(s.target)} (${impactOf(s)}; similarity ${formatSimilarity(s.similarity)}) id ${code(s.id)}`;
}

function gateSection(report: Report): string[] {
  const { gate } = report;
  if (gate.passed) return [`### linkweave: gate passed`, '', `Nothing at or above ${code(gate.failOn)} and no limit crossed.`];
  const rows = gate.failures.map((f) => {
    const { check, found, allowed } = failureParts(f, gate.failOn);
    return `| ${code(check)} | ${found} | ${allowed} |`;
  });
  return [
    `### linkweave: gate failed`,
    '',
    `The gate fails on findings at or above ${code(gate.failOn)} and on the configured limits.`,
    '',
    '| Check | Found | Allowed |',
    '| --- | --- | --- |',
    ...rows,
  ];
}

/** The Markdown formatter. */
export const markdownFormatter: Formatter = {
  id: 'markdown',
  fileExtension: '.md',
  format(report) {
    const out = [...gateSection(report), '', `${summaryParts(report).join(' · ')}.`];
    const { error, warning } = report.stats.findings;
    const counts = error + warning === 0 ? 'none' : `${plural(error, 'error')}, ${plural(warning, 'warning')}`;
    out.push('', `#### Findings: ${counts}`);
    // Stable sorts over the report's order: errors before warnings, best suggestions first.
    const findings = [...report.findings].sort((a, b) => Number(a.severity !== 'error') - Number(b.severity !== 'error'));
    if (findings.length > 0) out.push('', ...collapse(findings, findingsTable, 'finding'));
    if (report.suggestions.length > 0) {
      const suggestions = [...report.suggestions].sort((a, b) => b.score - a.score || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
      out.push('', `#### Suggested links (${suggestions.length})`, '');
      out.push(...collapse(suggestions, (part) => part.map(suggestionItem), 'suggestion'));
      const ids = suggestions.slice(0, 2).map((s) => s.id).join(',');
      out.push('', `Accept links by id: ${code(`linkweave apply --ids ${ids}`)}`);
    }
    return `${out.join('\n')}\n`;
  },
};
