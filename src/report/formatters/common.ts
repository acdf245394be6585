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

/** A similarity for reading: two decimals. */
export function formatSimilarity(similarity: number): string {
  return similarity.toFixed(2);
}

/** A click depth for reading; `null` is unreachable. */
export function formatDepth(depth: number | null): string {
  return depth === null ? 'unreachable' : String(depth);
}

/** "rank 0.80 -> 1.3, depth 5 -> 2": what a suggestion is predicted to change ("rank 0.80 -> not computed" outside the impact budget). */
export function impactOf(s: Suggestion, rankLabel = 'rank'): string {
  const after = s.targetRankAfter === null ? 'not computed' : formatRank(s.targetRankAfter);
  const rank = `${rankLabel} ${formatRank(s.targetRankBefore)} -> ${after}`;
  const depth =
    s.depthBefore === s.depthAfter ? `depth ${formatDepth(s.depthAfter)}` : `depth ${formatDepth(s.depthBefore)} -> ${formatDepth(s.depthAfter)}`;
  return `${rank}, ${depth}`;
}

/** One gate failure in three parts: what was checked, what was found, what is allowed. */
export function failureParts(failure: GateFailure, failOn: Report['gate']['failOn']): { check: string; found: string; allowed: string } {
  if (!failure.rule.startsWith('gate.')) {
    const found = plural(failure.actual, failOn === 'error' ? 'error' : 'finding');
    return { check: failure.rule, found, allowed: 'none' };
  }
  const bound = failure.rule === 'gate.minInlinksForImportant' ? 'at least' : 'at most';
  return { check: failure.rule, found: String(failure.actual), allowed: `${bound} ${failure.limit}` };
}

/** One gate failure in words: "broken-link (1 error)", "gate.maxOrphans (3, at most 1)". */
export function describeFailure(failure: GateFailure, failOn: Report['gate']['failOn']): string {
  const { check, found, allowed } = failureParts(failure, failOn);
  return failure.rule.startsWith('gate.') ? `${check} (${found}, ${allowed})` : `${check} (${found})`;
}

/** The counts of a run as phrases ("42 pages", "3 broken links", ...). */
export function summaryParts(report: Report): string[] {
  const s = report.stats;
  const parts = [
    plural(s.pages, 'page'),
    plural(s.links, 'link'),
    plural(s.brokenLinks, 'broken link'),
    plural(s.brokenFragments, 'broken fragment'),
    ...(s.outsideLinks > 0 ? [`${plural(s.outsideLinks, 'link')} outside the content`] : []),
    ...(s.templatedLinks > 0 ? [`${plural(s.templatedLinks, 'templated link')}`] : []),
    plural(s.orphans, 'orphan'),
    `${s.unreachable} unreachable`,
    plural(s.deadEnds, 'dead end'),
    s.maxDepth === null ? 'no page reachable' : `deepest page ${plural(s.maxDepth, 'click')} (limit ${report.options.maxDepth})`,
    s.converged ? `PageRank ${plural(s.iterations, 'iteration')}` : `PageRank did not converge in ${plural(s.iterations, 'iteration')}`,
  ];
  return parts;
}

/** "5 problems (3 errors, 2 warnings)" or "No problems found". */
export function problemsLine(report: Report): string {
  const { error, warning } = report.stats.findings;
  if (error + warning === 0) return 'No problems found';
  return `${plural(error + warning, 'problem')} (${plural(error, 'error')}, ${plural(warning, 'warning')})`;
}

/**
 * A report path (relative to the content root) as the user should see it: relative to `cwd`
 * when one is given, with `/` separators. `''` (no file) stays `''`.
 */
export function displayPath(file: string, root: string, cwd: string | undefined): string {
  if (file === '' || cwd === undefined || !isAbsolute(root)) return file;
  return relative(cwd, join(root, file)).replace(/\\/g, '/');
}

/**
 * The depth-repair plan in one sentence, or null when the report has none or it would add
 * nothing: "3 links (ids a, b, c) bring the pages deeper than 3 clicks or unreachable from 7 to 2."
 */
export function repairLine(report: Report, code: (s: string) => string = (s) => s): string | null {
  const plan = report.repair;
  if (plan === undefined || plan.suggestionIds.length === 0) return null;
  const ids = plan.suggestionIds.map(code).join(', ');
  return (
    `Depth repair: ${plural(plan.suggestionIds.length, 'link')} (${ids}) bring the pages deeper than ` +
    `${plural(plan.maxDepth, 'click')} or unreachable from ${plan.tooDeepBefore} to ${plan.tooDeepAfter}.`
  );
}
