/**
 * `buildReport`: the stages' outputs -> the one `Report` object (DESIGN section 8).
 *
 * Deterministic: every array is sorted, numbers are rounded to a fixed precision
 * (`round.ts`), nothing depends on the clock. Field choices:
 * - `pages`: by route; `rank` = pagerank x number of pages (1.0 = an average page), from the
 *   unrounded PageRank; `depth` null when unreachable.
 * - `links`: every resolved link, sorted by `from`, file, line, column, `to`, text. `from` is
 *   the route of the page the link is on; navigation links (written once in the navigation
 *   file, the sidebar of every page) have `from: ""` (no page) and `file` = the navigation
 *   file. `to` is the graph's resolved target: a route (with `#fragment` when there is one),
 *   an absolute URL, the path from the root of a missing source file, or the destination as
 *   written when it could not be resolved. `context` is the effective context after template
 *   detection.
 * - `findings`: by file, line, column, rule, message.
 * - `suggestions`: by file, line, column, target, id.
 * - `baseline` (only with `input.baseline`): findings matched against it (`baseline/match.ts`);
 *   the gate's severity failures and `gate.maxWarnings` count the new ones only.
 */
import type { Finding, LinkModelReport, Report, ReportLink, ReportPage, ResolvedLink, Suggestion } from '../types.js';
import { matchFindings } from '../baseline/match.js';
import { compareFindings, compareSuggestions, compareText, navigationFile } from '../util/index.js';
import { evaluateGate } from './gate.js';
import { PAGERANK_DECIMALS, RATIO_DECIMALS, roundTo } from './round.js';
import { computeStats } from './stats.js';
import type { ReportInput } from './types.js';
import type { Importance } from './schema.js';

/** Build the report. Pure; the inputs are not changed. */
export function buildReport(input: ReportInput): Report {
  const { options, graph, ranking } = input;
  const n = graph.pages.length;
  const importance: Importance[] = graph.pages.map((p) => input.importance?.[p.id] ?? p.meta.importance ?? 'normal');
  const pages: ReportPage[] = graph.pages
    .map((p) => {
      const depth = ranking.depth[p.id];
      return {
        route: p.route,
        file: p.file,
        title: p.title,
        pagerank: roundTo(ranking.pagerank[p.id], PAGERANK_DECIMALS),
        rank: roundTo(ranking.pagerank[p.id] * n, RATIO_DECIMALS),
        depth: depth < 0 ? null : depth,
        inlinks: ranking.inlinks[p.id],
        contentInlinks: ranking.contentInlinks[p.id],
        outlinks: ranking.outlinks[p.id],
        importance: importance[p.id],
      };
    })
    .sort((a, b) => compareText(a.route, b.route) || compareText(a.file, b.file));

  const navFile = navigationFile(options);
  const links = graph.links
    .map((l) => reportLink(l, l.from < 0 ? { route: '', file: navFile } : graph.pages[l.from]))
    .sort(compareLinks);

  const findings: Finding[] = [...input.findings].sort(compareFindings);
  const suggestions = input.suggestions.map(roundSuggestion).sort(compareSuggestions);
  const { stats, gate } = computeStats({ graph, ranking, findings, files: input.files, importance });
  const matched = input.baseline === undefined ? null : matchFindings(findings, input.baseline.findings);

  return {
    schema: 'linkweave/report@1',
    tool: { name: 'linkweave', version: input.version },
    root: options.root,
    stats,
    pages,
    links,
    findings,
    suggestions,
    gate: evaluateGate(matched?.new ?? findings, gate, options),
    options: { maxDepth: options.maxDepth },
    ...(matched === null ? {} : { baseline: { known: matched.known.length, new: matched.new, fixed: matched.fixed } }),
    ...(input.repair === undefined ? {} : { repair: { ...input.repair, suggestionIds: [...input.repair.suggestionIds] } }),
    ...(input.model === undefined ? {} : { model: roundModel(input.model) }),
  };
}

function reportLink(link: ResolvedLink, from: { route: string; file: string }): ReportLink {
  const fragment = link.fragment.startsWith('#') ? link.fragment.slice(1) : link.fragment;
  const to = link.kind === 'internal' && fragment !== '' && !link.target.includes('#') ? `${link.target}#${fragment}` : link.target;
  return {
    from: from.route,
    to: to === '' ? link.raw.href : to,
    file: link.raw.file ?? from.file,
    line: link.raw.line,
    column: link.raw.column,
    text: link.raw.text,
    context: link.context,
    kind: link.kind,
    status: link.status,
    nofollow: link.raw.nofollow,
  };
}

function compareLinks(a: ReportLink, b: ReportLink): number {
  return (
    compareText(a.from, b.from) ||
    compareText(a.file, b.file) ||
    a.line - b.line ||
    a.column - b.column ||
    compareText(a.to, b.to) ||
    compareText(a.text, b.text)
  );
}

function roundSuggestion(s: Suggestion): Suggestion {
  return {
    ...s,
    similarity: roundTo(s.similarity, RATIO_DECIMALS),
    score: roundTo(s.score, RATIO_DECIMALS),
    targetRankBefore: roundTo(s.targetRankBefore, RATIO_DECIMALS),
    targetRankAfter: s.targetRankAfter === null ? null : roundTo(s.targetRankAfter, RATIO_DECIMALS),
  };
}

/** The model with its numbers rounded to 6 decimals (the report's rule for floats). */
function roundModel(m: LinkModelReport): LinkModelReport {
  const r = (x: number): number => roundTo(x, 6);
  return {
    ...m,
    intercept: r(m.intercept),
    weights: m.weights.map(r),
    means: m.means.map(r),
    scales: m.scales.map(r),
    auc: m.auc === null ? null : r(m.auc),
    anchorChoice:
      m.anchorChoice === null
        ? null
        : { ...m.anchorChoice, intercept: r(m.anchorChoice.intercept), weights: m.anchorChoice.weights.map(r), means: m.anchorChoice.means.map(r), scales: m.anchorChoice.scales.map(r) },
  };
}
