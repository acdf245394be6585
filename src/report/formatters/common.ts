/** Wording shared by the human-readable formatters (text, Markdown, SARIF messages). */
import { isAbsolute, join, relative } from 'node:path';
import type { GateFailure, Report, Suggestion } from '../../types.js';

/** `1 page`, `2 pages`. */
export function plural(count: number, singular: string, pluralForm = `${singular}s`): string {
  return `${count} ${count === 1 ? singular : pluralForm}`;
}

/** A rank (pagerank x pages) for reading: two decimals below 10, one below 100, none above. */
export function formatRank(rank: number): string {
  if (rank >= 100) return rank.toFixed(0);
  if (rank >= 10) return rank.toFixed(1);
  return rank.toFixed(2);
}

/** A similarity for reading, as a percentage of cosine similarity ("22%"; 100% = the same words in the same weights). */
export function formatSimilarity(similarity: number): string {
  return `${Math.round(similarity * 100)}%`;
}

/** A click depth for reading; `null` is unreachable. */
export function formatDepth(depth: number | null): string {
  return depth === null ? 'unreachable' : String(depth);
}

/** What the scale of the numbers means, said once above a list of suggestions. */
export const SCALE_NOTE =
  'rank = PageRank x pages (1 = an average page); similar = TF-IDF cosine similarity of source and target (100% = the same words)';

/** What a link does to its target's click depth, as a phrase: "becomes reachable at 3 clicks", "2 clicks instead of 5". */
export function depthChange(before: number | null, after: number | null): string {
  if (before === after) return before === null ? 'still unreachable' : `stays at ${plural(before, 'click')}`;
  if (before === null) return `becomes reachable at ${plural(after!, 'click')}`;
  if (after === null) return 'unreachable';
  return `${plural(after, 'click')} instead of ${before}`;
}

/**
 * "rank 0.15 -> 0.39; becomes reachable at 3 clicks": what a suggestion is predicted to
 * change ("rank 0.15 -> not computed" outside the impact budget).
 */
export function impactOf(s: Suggestion): string {
  const after = s.targetRankAfter === null ? 'not computed' : formatRank(s.targetRankAfter);
  return `rank ${formatRank(s.targetRankBefore)} -> ${after}; ${depthChange(s.depthBefore, s.depthAfter)}`;
}

/** Whether a failure is a site limit (`limits.<key>`) rather than a check's findings. */
export function isLimitFailure(failure: GateFailure): boolean {
  return failure.rule.startsWith('limits.');
}

/** One failure in three parts: what was checked, what was found, what is allowed. */
export function failureParts(failure: GateFailure, failOn: Report['gate']['failOn']): { check: string; found: string; allowed: string } {
  if (!isLimitFailure(failure)) {
    const found = plural(failure.actual, failOn === 'error' ? 'error' : 'finding');
    return { check: failure.rule, found, allowed: 'none' };
  }
  const bound = failure.rule === 'limits.importantPageInlinks' ? 'at least' : 'at most';
  return { check: failure.rule, found: String(failure.actual), allowed: `${bound} ${failure.limit}` };
}

/** One failure in words: "broken-link 6 errors", "limits.orphans 3 (at most 1)". */
export function describeFailure(failure: GateFailure, failOn: Report['gate']['failOn']): string {
  const { check, found, allowed } = failureParts(failure, failOn);
  return isLimitFailure(failure) ? `${check} ${found} (${allowed})` : `${check} ${found}`;
}

/** The counts of the site as phrases ("42 pages", "3 broken links", ...); the PageRank iterations only when it did not converge. */
export function summaryParts(report: Report): string[] {
  const s = report.stats;
  const parts = [
    plural(s.pages, 'page'),
    plural(s.links, 'link'),
    plural(s.brokenLinks, 'broken link'),
    plural(s.brokenFragments, 'broken fragment'),
    ...(s.outsideLinks > 0 ? [`${plural(s.outsideLinks, 'link')} outside the content`] : []),
    ...(s.templatedLinks > 0 ? [`${plural(s.templatedLinks, 'templated link')}`] : []),
    plural(s.orphans, 'orphan page'),
    `${s.unreachable} unreachable`,
    plural(s.deadEnds, 'dead end'),
    s.maxDepth === null ? 'no page reachable' : `deepest page ${plural(s.maxDepth, 'click')} (limit ${report.options.maxDepth})`,
  ];
  if (!s.converged) parts.push(`PageRank did not settle in ${plural(s.iterations, 'round')}`);
  return parts;
}

/** "Findings: 14 errors and 3 warnings from 5 checks" or "Findings: none". */
export function findingsLine(report: Report): string {
  const { error, warning } = report.stats.findings;
  if (error + warning === 0) return 'Findings: none';
  const checks = new Set(report.findings.map((f) => f.rule)).size;
  return `Findings: ${plural(error, 'error')} and ${plural(warning, 'warning')} from ${plural(checks, 'check')}`;
}

/** The verdict's head: "This run passes (exit 0)" / "This run fails (exit 1)". */
export function verdictHead(report: Report): string {
  return report.gate.passed ? 'This run passes (exit 0)' : 'This run fails (exit 1)';
}

/** Why the run passes or fails, after the head: "no errors, no limit crossed" or the failures. */
export function verdictReasons(report: Report): string[] {
  const { gate } = report;
  if (gate.passed) return [gate.failOn === 'error' ? 'no errors, no limit crossed' : 'no errors or warnings, no limit crossed'];
  return gate.failures.map((f) => describeFailure(f, gate.failOn));
}

/** The verdict in one sentence: "This run fails (exit 1): broken-link 6 errors, limits.orphans 3 (at most 1)." */
export function verdictLine(report: Report): string {
  return `${verdictHead(report)}: ${verdictReasons(report).join(', ')}.`;
}

/**
 * A report path (relative to the content root) as the user should see it: relative to `cwd`
 * when one is given, with `/` separators. `''` (no file) stays `''`.
 */
export function displayPath(file: string, root: string, cwd: string | undefined): string {
  if (file === '' || cwd === undefined || !isAbsolute(root)) return file;
  return relative(cwd, join(root, file)).replace(/\\/g, '/');
}

/** Suggestions that have an anchor phrase (apply can write them), and those that need a sentence written by hand. */
export function splitByAnchor(suggestions: readonly Suggestion[]): { anchored: Suggestion[]; handWritten: Suggestion[] } {
  return { anchored: suggestions.filter((s) => s.anchor !== null), handWritten: suggestions.filter((s) => s.anchor === null) };
}

/** The content root as the user wrote it: relative to `cwd` (`.` for the working folder itself); the report's own root without a `cwd`. */
export function displayRoot(root: string, cwd: string | undefined): string {
  if (cwd === undefined || !isAbsolute(root)) return root;
  const rel = relative(cwd, root).replace(/\\/g, '/');
  return rel === '' ? '.' : rel;
}

/** Most ids written out in a printed apply command; with more, the command says `--all`. */
export const APPLY_IDS_LISTED = 20;

/** A command-line word quoted for a POSIX shell when it needs it. */
function shellWord(word: string): string {
  return /^[\w./:@%+=,-]+$/.test(word) ? word : `'${word.replace(/'/g, `'\\''`)}'`;
}

/**
 * The apply command for this report's suggestions with an anchor phrase, runnable exactly as
 * printed from `cwd`: the root, and every id (or `--all` past `APPLY_IDS_LISTED`, which applies
 * the same set). Null when no suggestion has an anchor phrase.
 */
export function applyCommand(report: Report, cwd: string | undefined, extra: readonly string[] = []): string | null {
  const { anchored } = splitByAnchor(report.suggestions);
  if (anchored.length === 0) return null;
  const root = shellWord(displayRoot(report.root, cwd));
  const which = anchored.length > APPLY_IDS_LISTED ? '--all' : `--ids ${anchored.map((s) => s.id).join(',')}`;
  return ['linkweave', 'apply', root, ...extra.map(shellWord), which].join(' ');
}

/**
 * The depth-repair plan in one sentence, or null when the report has none or it would add
 * nothing: "3 links bring the pages deeper than 3 clicks or unreachable from 7 to 2: a, b
 * (needs a sentence written by hand), c."
 */
export function repairLine(report: Report, code: (s: string) => string = (s) => s): string | null {
  const plan = report.repair;
  if (plan === undefined || plan.suggestionIds.length === 0) return null;
  const byId = new Map(report.suggestions.map((s) => [s.id, s]));
  const ids = plan.suggestionIds.map((id) => (byId.get(id)?.anchor === null ? `${code(id)} (needs a sentence written by hand)` : code(id))).join(', ');
  return (
    `Depth repair: ${plural(plan.suggestionIds.length, 'link')} ${plan.suggestionIds.length === 1 ? 'brings' : 'bring'} the pages deeper than ` +
    `${plural(plan.maxDepth, 'click')} or unreachable from ${plan.tooDeepBefore} to ${plan.tooDeepAfter}: ${ids}.`
  );
}
