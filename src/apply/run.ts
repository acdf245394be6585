/**
 * `applySuggestions`: the Node API of `apply`. It reads each source a report names (refusing
 * paths that are not source files under the root), re-parses it as it is now (its protected
 * regions included), plans the edits (`planFile`, pure) and writes each changed file atomically,
 * or, in a dry run, returns the unified diffs and writes nothing. The `apply` command is a thin
 * shell over it.
 */
import fs from 'node:fs';
import { join } from 'node:path';
import { collectSources, kindOfPath, readSource } from '../collect/index.js';
import type { ResolvedOptions } from '../config/options.js';
import { parseSource } from '../parse/index.js';
import type { TempFileTracker } from '../util/write-file.js';
import { writeFileAtomic } from '../util/write-file.js';
import type { ReportPage, SourceFile, Suggestion } from '../types.js';
import { encodeText, hadBom } from './bytes.js';
import { unifiedDiff } from './diff.js';
import { hrefFor } from './markup.js';
import { planFile } from './plan.js';
import { groupByFile, selectSuggestions } from './select.js';
import type { Selection } from './select.js';
import { addCounts, chooseStyle, countStyles, majority } from './style.js';
import type { StyleOrigin } from './style.js';
import type { AppliedLink, LinkStyle, NotApplied, StyleCounts } from './types.js';

/** What `applySuggestions` needs. */
export interface ApplyInput {
  /** Resolved options (`root` is the content root the report's paths are relative to). */
  readonly options: ResolvedOptions;
  /** The report's suggestions and pages (a `suggest` run's `Report` will do). */
  readonly report: { readonly suggestions: readonly Suggestion[]; readonly pages: readonly Pick<ReportPage, 'route' | 'file'>[] };
  /** Which suggestions: by id, or all. */
  readonly selection: Selection;
  /** Plan and diff only; write nothing. @default false */
  readonly dryRun?: boolean;
  /** Style for every new link; null follows the file, then the site. @default null */
  readonly linkStyle?: LinkStyle | null;
  /** How diffs and write errors name a file (e.g. relative to the working folder). @default the report's path */
  readonly showPath?: (file: string) => string;
  /** Records temp files while they exist. */
  readonly tempFiles?: TempFileTracker;
}

/** The link style used in one file and where it came from. */
export interface FileStyle {
  readonly style: LinkStyle;
  readonly origin: StyleOrigin;
}

/** What `applySuggestions` did (or, in a dry run, would do). */
export interface ApplyResult {
  /** Links inserted (or that would be), by file then offset. */
  readonly applied: readonly AppliedLink[];
  /** Suggestions not applied, with the reason, by file then id. */
  readonly notApplied: readonly NotApplied[];
  /** Ids asked for that the report does not have (nothing is planned then). */
  readonly unknown: readonly string[];
  /** Link style of each file that got links. */
  readonly styles: ReadonlyMap<string, FileStyle>;
  /** Unified diff of each changed file, in path order (also in a real run). */
  readonly diffs: readonly string[];
  /** A file could not be written (its suggestions are in `notApplied` as `write-failed`). */
  readonly writeFailed: boolean;
}

/**
 * Apply chosen suggestions to the sources under `options.root`.
 * Never throws for one file's problem: it becomes a `notApplied` entry and the rest go on.
 */
export async function applySuggestions(input: ApplyInput): Promise<ApplyResult> {
  const { options } = input;
  const root = options.root;
  const show = input.showPath ?? ((f: string) => f);
  const dryRun = input.dryRun ?? false;
  const forced = input.linkStyle ?? null;
  const selected = selectSuggestions(input.report.suggestions, input.selection);
  const empty = { applied: [], notApplied: [], styles: new Map(), diffs: [], writeFailed: false };
  if (selected.unknown.length > 0) return { ...empty, unknown: selected.unknown };

  // A page row without a route or file (a hand-edited report) gives no address to link to: its
  // suggestions are refused as targets that are not pages of the report.
  const pages = new Map(input.report.pages.filter((p) => p.route.startsWith('/') && p.file !== '').map((p) => [p.route, { route: p.route, file: p.file }]));
  const applied: AppliedLink[] = [];
  const notApplied: NotApplied[] = [...selected.skipped];
  const styles = new Map<string, FileStyle>();
  const diffs: string[] = [];
  let writeFailed = false;
  const realRoot = fs.realpathSync(root);
  let site: StyleCounts | null = null;

  for (const [rel, group] of groupByFile(selected.chosen)) {
    const read = readForApply(rel, root, realRoot, options);
    if ('reason' in read) {
      for (const s of group) notApplied.push({ id: s.id, file: rel, code: read.code, reason: read.reason });
      continue;
    }
    const facts = parseSource(read.file, options);
    const own = countStyles(facts.links, read.file.kind);
    if (forced === null && majority(own) === null) site ??= await countSite(options);
    const chosen = chooseStyle(own, () => site!, forced);
    const from = { file: rel, kind: read.file.kind, route: facts.route, ...(facts.baseHref === undefined ? {} : { baseHref: facts.baseHref }) };
    const hrefs = new Map<string, string>();
    for (const s of group) {
      const target = pages.get(s.target);
      if (target !== undefined) hrefs.set(s.id, hrefFor(from, target, chosen.style));
    }
    const plan = planFile({ file: read.file, suggestions: group, hrefs, style: chosen.style, options, regions: facts.protected, links: facts.links, ...(facts.codeSpans === undefined ? {} : { codeSpans: facts.codeSpans }) });
    notApplied.push(...plan.refused);
    if (plan.applied.length === 0) continue;
    styles.set(rel, chosen);
    diffs.push(unifiedDiff(show(rel), plan.before, plan.after));
    if (dryRun) {
      applied.push(...plan.applied);
      continue;
    }
    try {
      await writeFileAtomic(read.real, encodeText(plan.after, hadBom(read.file)), {
        label: show(rel),
        ...(input.tempFiles === undefined ? {} : { tracker: input.tempFiles }),
      });
      applied.push(...plan.applied);
    } catch (error) {
      writeFailed = true;
      diffs.pop();
      styles.delete(rel);
      for (const a of plan.applied) notApplied.push({ id: a.id, file: rel, code: 'write-failed', reason: (error as Error).message });
    }
  }
  notApplied.sort((a, b) => (a.file < b.file ? -1 : a.file > b.file ? 1 : a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  return { applied, notApplied, unknown: [], styles, diffs, writeFailed };
}

/**
 * Read one source named by a report, refusing paths that are not a source file inside the
 * root (a report is input: it could name anything). The real path is where the write goes,
 * so a symlink inside the root is written through, never replaced.
 */
function readForApply(
  rel: string,
  root: string,
  realRoot: string,
  options: ResolvedOptions,
): { file: SourceFile; real: string } | { code: 'bad-path' | 'unreadable'; reason: string } {
  const kind = kindOfPath(rel);
  const segments = rel.split('/');
  if (kind === null || rel.startsWith('/') || rel.includes('\\') || rel.includes('\0') || segments.some((s) => s === '..' || s === '.' || s === '')) {
    return { code: 'bad-path', reason: `"${rel}" is not the path of a source file under the content root` };
  }
  let real: string;
  try {
    real = fs.realpathSync(join(root, ...segments));
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    return { code: 'unreadable', reason: code === 'ENOENT' ? `"${rel}" does not exist (any more)` : `"${rel}" cannot be read (${code ?? 'error'})` };
  }
  const read = readSource(real, rel, kind, { realRoot, maxFileBytes: options.maxFileBytes });
  if ('warning' in read) return { code: 'unreadable', reason: read.warning.message };
  return { file: read.file, real };
}

/** The link styles of every source of the site (read only when a file has no links of its own). */
async function countSite(options: ResolvedOptions): Promise<StyleCounts> {
  const { files } = await collectSources(options);
  let counts: StyleCounts = { relative: 0, absolute: 0, 'route-relative': 0 };
  for (const file of files) counts = addCounts(counts, countStyles(parseSource(file, options).links, file.kind));
  return counts;
}
