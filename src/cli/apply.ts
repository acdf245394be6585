/**
 * `linkweave apply [root]`: write chosen suggestions into the sources as links in the site's
 * prevailing style. The suggestions come from `--from report.json` or from a `suggest` run
 * made now. Planning is the pure `apply/` stage; this file reads, checks and writes files.
 *
 * Reading, checking and writing the files is `applySuggestions` (src/apply/run.ts); this file
 * reads the flags, prints and picks the exit code.
 *
 * Output: the applied links, then each suggestion not applied with the reason in plain words
 * ("inside a shortcode", "the source changed since the report", "no anchor phrase: needs a
 * sentence written by hand"), on stdout; with `--dry-run` the unified diff on stdout (so it can
 * be piped to `git apply`) and that summary on stderr, and nothing written (not even the parse
 * cache).
 *
 * Exit codes: 0 every chosen suggestion was applied (with `--all`, suggestions without an
 * anchor phrase are listed but do not count, unless none at all could be applied); 1 some were
 * refused (the file changed since the report, an anchor inside a protected region, overlapping
 * anchors, ...), an id given with `--ids` has no anchor phrase, or `--all` applied nothing of
 * what it found: the rest were applied; 2 usage (no `--ids`/`--all`, an unknown id), an
 * unreadable or invalid `--from` report, or a file that could not be written.
 */
import { applySuggestions, LINK_STYLES } from '../apply/index.js';
import type { AppliedLink, ApplyResult, LinkStyle, Selection } from '../apply/index.js';
import { parseReportFile } from '../compare/index.js';
import { EngineError } from '../errors.js';
import { runPrepared } from '../pipeline/index.js';
import type { PreparedRun } from '../pipeline/index.js';
import { displayPath } from '../report/formatters/common.js';
import type { FlagSpec } from './args.js';
import type { CommandContext } from './context.js';
import { readUserFile } from './review.js';

/** One line of help for `apply`. */
export const APPLY_SUMMARY = 'write chosen suggestions into the sources as links (--ids ID,ID or --all; --dry-run prints a diff)';

/** Flags of `apply`. */
export const APPLY_FLAGS: readonly FlagSpec[] = [
  { name: 'ids', kind: 'string', value: 'ID,ID', description: 'apply the suggestions with these ids' },
  { name: 'all', kind: 'boolean', description: 'apply every suggestion that has an anchor phrase' },
  { name: 'from', kind: 'string', value: 'FILE', description: 'take the suggestions from a JSON report (default: run suggest now)' },
  { name: 'dry-run', kind: 'boolean', description: 'print a unified diff of the changes; write nothing' },
  {
    name: 'link-style',
    kind: 'string',
    value: 'STYLE',
    choices: LINK_STYLES,
    description: "how links name their target (default: as the file's own links do, else the site's)",
  },
];

/** Run `apply`; returns the exit code. */
export async function runApplyCommand(ctx: CommandContext): Promise<number> {
  const { io, values } = ctx;
  for (const flag of ['format', 'output'] as const) {
    if (values[flag] !== undefined) throw new EngineError('E_USAGE', `flag --${flag} is not used by "apply" (it prints a summary, or a diff with --dry-run)`);
  }
  const selection = selectionOf(values);
  const dryRun = values['dry-run'] === true;
  const linkStyle = typeof values['link-style'] === 'string' ? (values['link-style'] as LinkStyle) : null;
  // Prepared once by the CLI: the same options (generator preset included) as check and suggest.
  const { options } = ctx.run;
  const fromPath = typeof values.from === 'string' ? values.from : null;
  const report = fromPath === null ? await suggestNow(ctx.run, dryRun) : parseReportFile(readUserFile(io.cwd, fromPath, 'from'), fromPath);
  const show = (f: string) => displayPath(f, options.root, io.cwd);
  const result = await applySuggestions({
    options,
    report,
    selection,
    dryRun,
    linkStyle,
    showPath: show,
    ...(io.tempFiles === undefined ? {} : { tempFiles: io.tempFiles }),
  });
  if (result.unknown.length > 0) {
    const where = fromPath === null ? "this run's suggestions" : `"${fromPath}"`;
    throw new EngineError('E_USAGE', `flag --ids: no suggestion with id ${result.unknown.map((id) => `"${id}"`).join(', ')} in ${where}; nothing was written`);
  }
  if (dryRun) io.stdout.write(result.diffs.join(''));
  if (!ctx.flags.quiet) (dryRun ? io.stderr : io.stdout).write(summary(result, dryRun, show));
  return exitCode(result, selection);
}

/**
 * 2 a write failed; 1 a suggestion was refused, an id given with `--ids` has no anchor phrase,
 * or `--all` found suggestions but could apply none of them; 0 otherwise.
 */
function exitCode(result: ApplyResult, selection: Selection): number {
  if (result.writeFailed) return 2;
  const refused = result.notApplied.filter((n) => n.code !== 'no-anchor');
  if (refused.length > 0) return 1;
  if (selection !== 'all') return result.notApplied.length > 0 ? 1 : 0;
  return result.applied.length === 0 && result.notApplied.length > 0 ? 1 : 0;
}

function selectionOf(values: CommandContext['values']): Selection {
  const ids = typeof values.ids === 'string' ? values.ids : null;
  const all = values.all === true;
  if (ids !== null && all) throw new EngineError('E_USAGE', 'flags --ids and --all: give one of them, not both');
  if (all) return 'all';
  if (ids === null) throw new EngineError('E_USAGE', '"apply" needs --ids ID,ID (from the suggest output) or --all');
  const list = ids.split(',').map((id) => id.trim()).filter((id) => id !== '');
  if (list.length === 0) throw new EngineError('E_USAGE', `flag --ids: expected suggestion ids separated by commas; got "${ids}"`);
  return { ids: list };
}

/** A `suggest` run now; in a dry run without the cache, so nothing at all is written. */
async function suggestNow(run: PreparedRun, dryRun: boolean) {
  const options = dryRun ? { ...run.options, cache: { ...run.options.cache, enabled: false } } : run.options;
  return runPrepared({ ...run, options, command: 'suggest' });
}

const ORIGIN_WORDS = { flag: '--link-style', file: "the file's own links", site: "the site's links", default: 'default' } as const;

/** The summary: applied links (with the markup and style), then every suggestion not applied and why. */
function summary(result: ApplyResult, dryRun: boolean, shown: (file: string) => string): string {
  const files = new Set(result.applied.map((a) => a.file)).size;
  const verb = dryRun ? 'Would apply' : 'Applied';
  const lines = [`${verb} ${count(result.applied.length, 'link')} in ${count(files, 'file')}${dryRun ? ' (dry run: nothing written)' : ''}`];
  const byFile = new Map<string, AppliedLink[]>();
  for (const a of result.applied) byFile.set(a.file, [...(byFile.get(a.file) ?? []), a]);
  for (const [file, links] of byFile) {
    const style = result.styles.get(file)!;
    lines.push(`  ${shown(file)}  link style ${style.style} (${ORIGIN_WORDS[style.origin]})`);
    for (const a of links) lines.push(`    ${a.line}:${a.column}  ${a.open}${a.anchor}${a.close}  -> ${a.target}  id ${a.id}`);
  }
  const not = result.notApplied;
  if (not.length > 0) {
    lines.push(`${dryRun ? 'Would not apply' : 'Did not apply'} ${count(not.length, 'suggestion')}:`);
    for (const n of not) lines.push(`  ${shown(n.file)}  id ${n.id}: ${n.reason}`);
  }
  return `${lines.join('\n')}\n`;
}

function count(n: number, noun: string): string {
  return `${n} ${noun}${n === 1 ? '' : 's'}`;
}
