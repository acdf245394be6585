/**
 * The site stage: the link graph of the parsed pages (graph/) and its ranking (rank/:
 * PageRank and click depth), with the notes a user should see about how links were read.
 */
import { buildGraph } from '../graph/index.js';
import type { GraphInput } from '../graph/index.js';
import type { ResolvedOptions } from '../config/options.js';
import { rankGraph } from '../rank/index.js';
import type { PageFacts, Ranking, SiteGraph } from '../types.js';
import type { CollectedInputs } from './types.js';

/** What the graph is built from besides the pages: the assets, navigation and redirects. */
export type SiteInputs = Omit<GraphInput, 'pages'>;

/** The graph's inputs besides the pages, from what was collected. */
export function siteInputs(collected: Pick<CollectedInputs, 'navigation' | 'redirects'> & { readonly sources: { readonly assets: readonly string[] } }): SiteInputs {
  return { assets: collected.sources.assets, navigation: collected.navigation, redirects: collected.redirects };
}

/** The link graph of `facts` (in the order given; `PageNode.factsIndex` indexes it). */
export function graphOf(facts: readonly PageFacts[], inputs: SiteInputs, options: ResolvedOptions): SiteGraph {
  return buildGraph({ ...inputs, pages: facts }, options);
}

/** The notes about a built graph: the heading-id style chosen, includes outside the sources. */
export function graphNotes(graph: SiteGraph): string[] {
  const notes: string[] = [];
  const ids = graph.headingIds;
  if (ids !== undefined && ids.fragmentLinks > 0) {
    const how = ids.how === 'auto' ? 'chosen by the fragment links' : 'set by routes.headingIds';
    notes.push(`heading ids: ${ids.style} style (${how}), ${ids.resolved} of ${ids.fragmentLinks} fragment links resolve`);
  }
  for (const inc of graph.includesOutside ?? []) {
    notes.push(`${inc.file}:${inc.line}:${inc.column}: included file "${inc.written}" is outside the sources; its ids and links are unknown`);
  }
  return notes;
}

/** The ranking of a graph: PageRank and click depth. */
export function rankOf(graph: SiteGraph, options: ResolvedOptions): Ranking {
  return rankGraph(graph, options);
}
