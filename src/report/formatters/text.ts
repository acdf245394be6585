/**
 * The terminal writer: findings grouped by file, each as `file:line:column  level  check-id`
 * with its message on the lines below (the location stays whole, so editors and CI logs can
 * link it), the suggested links grouped by source file the same way, the related pages that
 * need a sentence written by hand, the depth-repair plan and the apply command (one line, to
 * copy as it is), then (with `--baseline` or `--compare`) the new and fixed findings and the
 * structure changes, then the summary last, where a CI log ends: the site's counts, the
 * findings' count and the run's verdict with its exit code.
 *
 * Lines wrap at `ctx.width` (default 100) between words, never inside a quoted phrase, a route
 * or a command. Colour through picocolors, only when `ctx.color`.
 */
import { anchorForReading } from '../../parse/index.js';
import pc from 'picocolors';
import type { Comparison, Finding, PageChange, Report, Suggestion } from '../../types.js';
import type { FormatContext, Formatter } from '../types.js';
import {
  SCALE_NOTE,
  applyCommand,
  displayPath,
  findingsLine,
  formatDepth,
  formatRank,
  formatSimilarity,
  impactOf,
  plural,
  repairLine,
  splitByAnchor,
  summaryParts,
  verdictHead,
  verdictReasons,
} from './common.js';

/** Width when the caller gives none (a file, a pipe, a CI log). */
export const DEFAULT_WIDTH = 100;

type Paint = (s: string) => string;

/** A word of a wrapped line: its text, the separator before it, and its colour. */
interface Word {
  readonly text: string;
  readonly sep: string;
  readonly paint: Paint;
}

/**
 * Lay `words` out after `prefix` (already painted; `prefixWidth` visible columns): lines of at
 * most `width` columns, continuation lines indented by `indent`. `width` 0: one line.
 */
function wrap(prefix: string, prefixWidth: number, words: readonly Word[], width: number, indent: number): string[] {
  const lines: string[] = [];
  let line = prefix;
  let used = prefixWidth;
  let empty = true;
  for (const word of words) {
    let sep = empty ? '' : word.sep;
    if (width > 0 && !empty && used + sep.length + word.text.length > width) {
      lines.push(line);
      line = ' '.repeat(indent);
      used = indent;
      sep = '';
    }
    line += sep + word.paint(word.text);
    used += sep.length + word.text.length;
    empty = false;
  }
  lines.push(line);
  return lines;
}

/**
 * Control characters (a file name or anchor could carry terminal escapes) shown as U+FFFD, so
 * report text can never drive the terminal.
 */
function clean(text: string): string {
  // eslint-disable-next-line no-control-regex
  return text.replace(/[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/g, '\uFFFD');
}

/**
 * The words of `text` for wrapping: split at spaces, except inside a quoted phrase ("...",
 * with what follows it up to the next space), which stays one word.
 */
function words(text: string, paint: Paint, firstSep = ' '): Word[] {
  const tokens = clean(text).match(/(?:"[^"]*"|[^\s"]+|")+/g) ?? [];
  return tokens.map((t, i) => ({ text: t, sep: i === 0 ? firstSep : ' ', paint }));
}

/** Phrases kept whole when wrapping, each but the last followed by `punct`. */
function phrases(list: readonly string[], punct: string): Word[] {
  return list.map((p, i) => ({ text: i < list.length - 1 ? `${p}${punct}` : p, sep: ' ', paint: (s: string) => s }));
}

/** Consecutive items with the same file, in order. */
function groupByFile<T extends { readonly file: string }>(items: readonly T[]): T[][] {
  const groups: T[][] = [];
  for (const item of items) {
    const last = groups[groups.length - 1];
    if (last !== undefined && last[0].file === item.file) last.push(item);
    else groups.push([item]);
  }
  return groups;
}

/** Message lines sit under their location, indented by this much. */
const BODY_INDENT = 4;

type Colors = ReturnType<typeof pc.createColors>;

function findingLines(report: Report, ctx: FormatContext, c: Colors, width: number): string[] {
  const loc = (f: Finding): string => `${clean(displayPath(f.file, report.root, ctx.cwd)) || '(site)'}:${f.line}:${f.column}`;
  const out: string[] = [];
  const shown = report.findings.slice(0, ctx.maxItems ?? report.findings.length);
  for (const group of groupByFile(shown)) {
    if (out.length > 0) out.push('');
    for (const f of group) {
      const location = loc(f);
      const paintLevel = f.severity === 'error' ? (x: string) => c.bold(c.magenta(x)) : c.cyan;
      const cut = location.lastIndexOf(':', location.lastIndexOf(':') - 1);
      out.push(`${location.slice(0, cut)}${c.dim(location.slice(cut))}  ${paintLevel(f.severity)}  ${c.dim(f.rule)}`);
      append(out, wrap(' '.repeat(BODY_INDENT), BODY_INDENT, words(f.message, (s) => s), width, BODY_INDENT));
    }
  }
  if (shown.length < report.findings.length) out.push('', c.dim(moreLine(report.findings.length - shown.length, 'finding')));
  return out;
}

/** The line after a cut list. */
function moreLine(count: number, noun: string): string {
  return `... and ${plural(count, `more ${noun}`)}, in the full report`;
}

/** "22% similar; rank 0.15 -> 0.39; becomes reachable at 3 clicks; id 32de213704c4", as words. */
function suggestionDetail(s: Suggestion, c: Colors): Word[] {
  const impact = `${formatSimilarity(s.similarity)} similar; ${impactOf(s)};`;
  return [...words(impact, c.dim, ''), { text: `id ${s.id}`, sep: ' ', paint: () => `${c.dim('id')} ${c.bold(s.id)}` }];
}

function suggestionLines(report: Report, ctx: FormatContext, c: Colors, width: number): string[] {
  const where = (s: Suggestion): string => clean(displayPath(s.file, report.root, ctx.cwd));
  const { anchored, handWritten } = splitByAnchor(report.suggestions);
  const limit = ctx.maxItems ?? report.suggestions.length;
  const plain = (x: string): string => x;
  const out: string[] = [];
  const note = wrap('', 0, words(SCALE_NOTE, c.dim, ''), width, 0);
  if (anchored.length > 0) {
    out.push(c.bold(`Suggested links (${anchored.length})`));
    append(out, note);
    for (const group of groupByFile(anchored.slice(0, limit))) {
      out.push('');
      for (const s of group) {
        const location = `${where(s)}:${s.line}:${s.column}`;
        const head: Word[] = [
          { text: 'link', sep: '', paint: c.green },
          { text: `"${clean(anchorForReading(s.anchor!))}"`, sep: ' ', paint: plain },
          { text: '->', sep: ' ', paint: plain },
          { text: clean(s.target), sep: ' ', paint: c.cyan },
        ];
        append(out, wrap(`${location}  `, location.length + 2, head, width, BODY_INDENT));
        append(out, wrap(' '.repeat(BODY_INDENT), BODY_INDENT, suggestionDetail(s, c), width, BODY_INDENT));
      }
    }
    if (anchored.length > limit) out.push('', c.dim(moreLine(anchored.length - limit, 'suggested link')));
  }
  if (handWritten.length > 0) {
    // No phrase of the source names the target: apply cannot write these, a writer adds a
    // sentence that links. Apart from the others, without a position.
    if (out.length > 0) out.push('');
    append(out, wrap('', 0, words(`Needs a sentence written by hand (${handWritten.length}): related pages, but no phrase in the source names the target`, c.bold, ''), width, 0));
    if (anchored.length === 0) append(out, note);
    out.push('');
    for (const s of handWritten.slice(0, limit)) {
      const head = `${where(s)} -> `;
      append(out, wrap(head, head.length, [{ text: clean(s.target), sep: '', paint: c.cyan }], width, BODY_INDENT));
      append(out, wrap(' '.repeat(BODY_INDENT), BODY_INDENT, suggestionDetail(s, c), width, BODY_INDENT));
    }
    if (handWritten.length > limit) out.push('', c.dim(moreLine(handWritten.length - limit, 'related page')));
  }
  const repair = repairLine(report);
  if (repair !== null) append(out, ['', ...wrap('', 0, words(repair, plain, ''), width, 0)]);
  const command = applyCommand(report, ctx.cwd, ctx.applyArgs);
  if (command !== null) {
    out.push('');
    append(out, wrap('', 0, words(`Apply the ${plural(anchored.length, 'suggested link')} (add --dry-run to see the diff first; pick ids to apply fewer):`, plain, ''), width, 0));
    out.push(`  ${c.bold(command)}`);
  }
  return out;
}

/** New and fixed findings, one line each: `file:line:column  rule  message`. */
function changedFindings(title: string, list: readonly Finding[], report: Report, ctx: FormatContext, c: Colors, width: number): string[] {
  if (list.length === 0) return [];
  const out = [`${title} (${list.length}):`];
  for (const f of list) {
    const location = `  ${clean(displayPath(f.file, report.root, ctx.cwd)) || '(site)'}:${f.line}:${f.column}  `;
    const width0 = location.length + f.rule.length + 2;
    append(out, wrap(`${location}${c.dim(f.rule)}  `, width0, words(f.message, (x) => x, ''), width, BODY_INDENT));
  }
  return out;
}

function pageChangeLine(p: PageChange): string {
  const rank = p.rankBefore === p.rankAfter ? `rank ${formatRank(p.rankAfter)}` : `rank ${formatRank(p.rankBefore)} -> ${formatRank(p.rankAfter)}`;
  const depth = p.depthBefore === p.depthAfter ? `depth ${formatDepth(p.depthAfter)}` : `depth ${formatDepth(p.depthBefore)} -> ${formatDepth(p.depthAfter)}`;
  return `  ${clean(p.route)}  ${rank}, ${depth}`;
}

/** The baseline's and the base report's new and fixed findings, and the structure changes. */
function reviewLines(report: Report, ctx: FormatContext, c: Colors, width: number): string[] {
  const out: string[] = [];
  const { baseline, comparison } = report;
  if (baseline !== undefined) {
    out.push(c.bold(`Against the baseline: ${baseline.known} known, ${baseline.new.length} new, ${baseline.fixed.length} fixed`));
    append(out, changedFindings('New', baseline.new, report, ctx, c, width));
    append(out, changedFindings('Fixed', baseline.fixed, report, ctx, c, width));
  }
  if (comparison !== undefined) {
    if (out.length > 0) out.push('');
    const { newFindings, fixedFindings, pagesAdded, pagesRemoved } = comparison;
    out.push(
      c.bold(
        `Compared with the base report: ${plural(newFindings.length, 'new finding')}, ${fixedFindings.length} fixed, ${plural(pagesAdded.length, 'page')} added, ${pagesRemoved.length} removed`,
      ),
    );
    append(out, changedFindings('New', newFindings, report, ctx, c, width));
    append(out, changedFindings('Fixed', fixedFindings, report, ctx, c, width));
    const routes = (title: string, pages: Comparison['pagesAdded']) =>
      pages.length === 0 ? [] : wrap(`${title}: `, title.length + 2, phrases(pages.map((p) => clean(p.route)), ','), width, BODY_INDENT);
    append(out, routes('Pages added', pagesAdded));
    append(out, routes('Pages removed', pagesRemoved));
    const seen = new Set<string>();
    const rows = [...comparison.depthChanges, ...comparison.rankChanges].filter((p) => !seen.has(p.route) && seen.add(p.route));
    if (rows.length > 0) append(out, ['Biggest changes (depth first, then rank):', ...rows.map(pageChangeLine)]);
  }
  return out;
}

/**
 * Add `lines` (and `extra`) to `out` one by one: `out.push(...lines)` passes every line as an
 * argument, which overflows the call stack past about 100,000 lines (a large site's findings).
 */
function append(out: string[], lines: readonly string[], ...extra: string[]): void {
  for (const line of lines) out.push(line);
  for (const line of extra) out.push(line);
}

/**
 * The summary that ends every terminal report, and that the command line prints alone after
 * writing a report file: the site's counts, the findings' count and the verdict.
 */
export function summaryLines(report: Report, ctx: FormatContext): string[] {
  const c = pc.createColors(ctx.color);
  const width = ctx.width ?? DEFAULT_WIDTH;
  const out: string[] = [];
  append(out, wrap(`${c.bold('Site:')} `, 6, phrases(summaryParts(report), ','), width, 2));
  out.push(findingsLine(report).replace(/^Findings:/, c.bold('Findings:')));
  const head = `${verdictHead(report)}:`;
  append(out, wrap(`${c.bold(head)} `, head.length + 1, phrases(verdictReasons(report), ','), width, 2));
  return out;
}

/** The terminal formatter. */
export const textFormatter: Formatter = {
  id: 'text',
  fileExtension: '.txt',
  format(report, ctx) {
    const c = pc.createColors(ctx.color);
    const width = ctx.width ?? DEFAULT_WIDTH;
    const out: string[] = [];
    if (report.findings.length > 0) append(out, findingLines(report, ctx, c, width), '');
    if (report.suggestions.length > 0) append(out, suggestionLines(report, ctx, c, width), '');
    if (report.baseline !== undefined || report.comparison !== undefined) append(out, reviewLines(report, ctx, c, width), '');
    append(out, summaryLines(report, ctx));
    return `${out.join('\n')}\n`;
  },
};
