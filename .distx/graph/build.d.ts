/**
 * `buildGraph`: parsed facts -> the site's internal link graph (DESIGN sections 3-5).
 * Pure: every lookup is in indexes built here from the inputs.
 */
import type { ResolvedOptions } from '../options.js';
import type { SiteGraph } from '../types.js';
import type { GraphInput } from './types.js';
/**
 * Build the link graph: pages sorted by route (drafts left out; one page per route, the first
 * file by path wins), the route index (routes, aliases, redirects), every link resolved
 * (sorted by page, line, column; navigation links first with `from: -1`), template links
 * marked, forward and reverse CSR, and the entry pages.
 */
export declare function buildGraph(input: GraphInput, options: ResolvedOptions): SiteGraph;
