/**
 * The report's counts. Structural counts use the rules' own predicates (`rules/structure.ts`)
 * with the rules' default options, over the pages not marked `linkweave.exclude`, so a gate
 * limit reads the same thing the matching rule reports, whether that rule is on or off.
 */
import type { Finding, Ranking, Report, SiteGraph } from '../types.js';
import { entrySet, isChecked, isDeadEnd, isOrphan, isUnreachable } from '../rules/structure.js';
import type { GateStats } from './types.js';
import type { Importance } from './schema.js';

/** Counts of the report plus what the gate reads. */
export function computeStats(input: {
  readonly graph: SiteGraph;
  readonly ranking: Ranking;
  readonly findings: readonly Finding[];
  readonly files: number;
  readonly importance: readonly Importance[];
}): { stats: Report['stats']; gate: GateStats } {
  const { graph, ranking, findings, importance } = input;
  const entries = entrySet(graph);
  let orphans = 0;
  let unreachable = 0;
  let deadEnds = 0;
  let deepest: number | null = null;
  let fewestImportantInlinks: number | null = null;
  for (const page of graph.pages) {
    if (!isChecked(graph, page.id)) continue;
    if (isOrphan(graph, ranking, entries, page.id)) orphans++;
    if (isDeadEnd(graph, ranking, page.id)) deadEnds++;
    if (isUnreachable(ranking, page.id)) unreachable++;
    else deepest = Math.max(deepest ?? 0, ranking.depth[page.id]);
    if (importance[page.id] === 'high') {
      const inlinks = ranking.contentInlinks[page.id];
      fewestImportantInlinks = Math.min(fewestImportantInlinks ?? inlinks, inlinks);
    }
  }
  let internalLinks = 0;
  let brokenLinks = 0;
  let brokenFragments = 0;
  let outsideLinks = 0;
  let templatedLinks = 0;
  for (const link of graph.links) {
    if (link.status === 'outside') outsideLinks++;
    else if (link.status === 'templated') templatedLinks++;
    if (link.kind === 'internal') internalLinks++;
    if (link.from >= 0 && !isChecked(graph, link.from)) continue;
    if (link.status === 'broken') brokenLinks++;
    else if (link.status === 'broken-fragment') brokenFragments++;
  }
  const error = findings.filter((f) => f.severity === 'error').length;
  const stats: Report['stats'] = {
    files: input.files,
    pages: graph.pages.length,
    links: graph.links.length,
    internalLinks,
    brokenLinks,
    brokenFragments,
    outsideLinks,
    templatedLinks,
    includesOutside: graph.includesOutside?.length ?? 0,
    orphans,
    unreachable,
    deadEnds,
    maxDepth: deepest,
    iterations: ranking.iterations,
    converged: ranking.converged,
    findings: { error, warning: findings.length - error },
    headingIds: graph.headingIds ?? { style: 'github', how: 'set', fragmentLinks: 0, resolved: 0 },
  };
  return { stats, gate: { deepest, orphans, brokenLinks, brokenFragments, unreachable, fewestImportantInlinks } };
}
