/**
 * The Markdown writer: a pull-request comment. The verdict first (with what made the run fail),
 * then the counts, the findings (a table, errors first; past the first few, collapsed in
 * `<details>`), then the suggested links as a checklist a reviewer can tick, each with its id
 * for `apply`, the most useful (highest score) first, the related pages that need a sentence
 * written by hand (no checkbox: apply cannot write them), and the apply command to copy.
 *
 * With a base report (`--compare`) or a baseline (`--baseline`), the findings part becomes the
 * new findings, then the fixed ones, with every finding collapsed below; with a base report a
 * "structure changes" part follows (pages added and removed, a table of the pages whose rank or
 * depth changed most), before the suggestions.
 */
import { anchorForReading } from '../../parse/index.js';
import type { Comparison, Finding, PageChange, Report, Suggestion } from '../../types.js';
import type { Formatter } from '../types.js';
import {
  SCALE_NOTE,
  applyCommand,
  failureParts,
  formatDepth,
  formatRank,
  formatSimilarity,
  impactOf,
  plural,
  repairLine,
  splitByAnchor,
  summaryParts,
} from './common.js';

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
    '| Level | Location | Finding | Check |',
    '| --- | --- | --- | --- |',
    ...findings.map((f) => `| ${f.severity} | ${code(location(f))} | ${escapeMarkdown(f.message)} | ${code(f.rule)} |`),
  ];
}

/**
 * Most items of one list in the comment. A pull-request comment has a size limit (65,536
 * characters on the largest code host; common practice, no source), and a reviewer reads the
 * first screens: a long list stops here and points to the full reports.
 */
const LISTED = 60;

/**
 * `lines` as they are when short, else the first `SHOWN` and the rest in `<details>`, at most
 * `LISTED` items in all, then how many more there are.
 */
function collapse<T>(items: readonly T[], render: (part: readonly T[]) => string[], noun: string): string[] {
  if (items.length <= SHOWN + 2) return render(items);
  const listed = Math.min(items.length, LISTED);
  const unlisted = items.length - listed;
  return [
    ...render(items.slice(0, SHOWN)),
    '',
    '<details>',
    `<summary>${plural(items.length - SHOWN, `more ${noun}`, `more ${noun}s`)}</summary>`,
    '',
    ...render(items.slice(SHOWN, listed)),
    ...(unlisted === 0 ? [] : ['', `... and ${plural(unlisted, `more ${noun}`, `more ${noun}s`)}, not listed here: the JSON and HTML reports have them all.`]),
    '',
    '</details>',
  ];
}

function suggestionItem(s: Suggestion): string {
  return `- [ ] "${escapeMarkdown(anchorForReading(s.anchor ?? ''))}" in ${code(`${s.file}:${s.line}`)} -> ${code(s.target)} (${formatSimilarity(s.similarity)} similar; ${impactOf(s)}) id ${code(s.id)}`;
}

function handWrittenItem(s: Suggestion): string {
  return `- ${code(s.file)} -> ${code(s.target)} (${formatSimilarity(s.similarity)} similar; ${impactOf(s)}) id ${code(s.id)}`;
}

function verdictSection(report: Report): string[] {
  const { gate } = report;
  const known =
    report.baseline === undefined
      ? []
      : ['', `${plural(report.baseline.known, 'finding')} known from the baseline ${report.baseline.known === 1 ? 'does' : 'do'} not count; ${report.baseline.new.length} new.`];
  if (gate.passed) return [`### linkweave: this run passes`, '', `No finding at or above ${code(gate.failOn)} and no limit crossed.`, ...known];
  const rows = gate.failures.map((f) => {
    const { check, found, allowed } = failureParts(f, gate.failOn);
    return `| ${code(check)} | ${found} | ${allowed} |`;
  });
  return [
    `### linkweave: this run fails`,
    '',
    `A run fails on findings at or above ${code(gate.failOn)} and on the configured ${code('limits')}.`,
    '',
    '| Reason | Found | Allowed |',
    '| --- | --- | --- |',
    ...rows,
    ...known,
  ];
}

/** Errors before warnings, keeping the report's order otherwise. */
function errorsFirst(findings: readonly Finding[]): Finding[] {
  return [...findings].sort((a, b) => Number(a.severity !== 'error') - Number(b.severity !== 'error'));
}

/** New and fixed findings against the base report (preferred) or the baseline; every finding collapsed. */
function reviewSections(report: Report, against: 'base report' | 'baseline', added: readonly Finding[], fixed: readonly Finding[]): string[] {
  const out = ['', added.length === 0 ? `#### New findings: none (compared with the ${against})` : `#### New findings (${added.length}, not in the ${against})`];
  if (added.length > 0) out.push('', ...collapse(errorsFirst(added), findingsTable, 'finding'));
  out.push('', fixed.length === 0 ? '#### Fixed findings: none' : `#### Fixed findings (${fixed.length}, in the ${against}, gone now)`);
  if (fixed.length > 0) out.push('', ...collapse(errorsFirst(fixed), findingsTable, 'finding'));
  if (report.findings.length > 0) {
    out.push('', '<details>', `<summary>All ${plural(report.findings.length, 'finding')} of this run</summary>`, '', ...findingsTable(errorsFirst(report.findings)), '', '</details>');
  }
  return out;
}

function change(before: string, after: string): string {
  return before === after ? after : `${before} -> ${after}`;
}

/** One row of the structure table; a rank change below 0.005 (0.00 at two decimals) shows as none. */
function changeRow(c: PageChange): string {
  const rank =
    Math.abs(c.rankChange) < 0.005
      ? formatRank(c.rankAfter)
      : `${formatRank(c.rankBefore)} -> ${formatRank(c.rankAfter)} (${c.rankChange > 0 ? '+' : '-'}${formatRank(Math.abs(c.rankChange))})`;
  return `| ${code(c.route)} | ${rank} | ${change(formatDepth(c.depthBefore), formatDepth(c.depthAfter))} |`;
}

function pageList(pages: Comparison['pagesAdded']): string[] {
  return pages.map((p) => `- ${code(p.route)} (${code(p.file)})`);
}

/** Pages added and removed, then the pages whose depth or rank changed most, in one table. */
function structureSection(report: Report, c: Comparison): string[] {
  const out = ['', '#### Structure changes', ''];
  const head = `${plural(report.pages.length, 'page')} (base ${c.base.pages}): ${c.pagesAdded.length} added, ${c.pagesRemoved.length} removed; ${plural(c.changedPages.depth, 'page')} changed click depth, ${c.changedPages.rank} changed rank.`;
  out.push(head);
  if (c.pagesAdded.length > 0) out.push('', `Added (${c.pagesAdded.length}):`, '', ...collapse(c.pagesAdded, pageList, 'page'));
  if (c.pagesRemoved.length > 0) out.push('', `Removed (${c.pagesRemoved.length}):`, '', ...collapse(c.pagesRemoved, pageList, 'page'));
  const seen = new Set<string>();
  const rows = [...c.depthChanges, ...c.rankChanges].filter((p) => !seen.has(p.route) && seen.add(p.route));
  if (rows.length > 0) {
    out.push('', 'Biggest changes (depth first, then rank):', '');
    out.push(...collapse(rows, (part) => ['| Page | Rank | Depth |', '| --- | --- | --- |', ...part.map(changeRow)], 'page'));
  }
  return out;
}

/** The Markdown formatter. */
export const markdownFormatter: Formatter = {
  id: 'markdown',
  fileExtension: '.md',
  format(report, ctx) {
    const out = [...verdictSection(report), '', `${summaryParts(report).join(' · ')}.`];
    const { error, warning } = report.stats.findings;
    const counts = error + warning === 0 ? 'none' : `${plural(error, 'error')}, ${plural(warning, 'warning')}`;
    const { comparison, baseline } = report;
    if (comparison !== undefined) out.push(...reviewSections(report, 'base report', comparison.newFindings, comparison.fixedFindings));
    else if (baseline !== undefined) out.push(...reviewSections(report, 'baseline', baseline.new, baseline.fixed));
    else {
      out.push('', `#### Findings: ${counts}`);
      // Stable sorts over the report's order: errors before warnings, best suggestions first.
      const findings = errorsFirst(report.findings);
      if (findings.length > 0) out.push('', ...collapse(findings, findingsTable, 'finding'));
    }
    if (comparison !== undefined) out.push(...structureSection(report, comparison));
    if (report.suggestions.length > 0) {
      const byScore = [...report.suggestions].sort((a, b) => b.score - a.score || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
      const { anchored, handWritten } = splitByAnchor(byScore);
      const repair = repairLine(report, code);
      if (anchored.length > 0) {
        out.push('', `#### Suggested links (${anchored.length})`, '');
        if (repair !== null) out.push(repair, '');
        out.push(`${SCALE_NOTE}.`, '');
        out.push(...collapse(anchored, (part) => part.map(suggestionItem), 'suggestion'));
      }
      if (handWritten.length > 0) {
        out.push('', `#### Needs a sentence written by hand (${handWritten.length})`, '');
        if (anchored.length === 0 && repair !== null) out.push(repair, '');
        out.push('Related pages, but no phrase in the source names the target: `apply` cannot write these; add a sentence that links.', '');
        out.push(...collapse(handWritten, (part) => part.map(handWrittenItem), 'page'));
      }
      const command = applyCommand(report, ctx.cwd, ctx.applyArgs);
      if (command !== null) {
        out.push('', 'Apply the suggested links from the repository (add `--dry-run` to see the diff first; pick ids to apply fewer):', '', '```sh', command, '```');
      }
    }
    return `${out.join('\n')}\n`;
  },
};
