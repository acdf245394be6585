/**
 * Importance of each page (DESIGN section 7), first rule that applies:
 * 1. frontmatter `linkweave.importance` (high / normal / low);
 * 2. config `important`: a pattern starting with `/` is matched against the page's route, any
 *    other against its file path (picomatch globs, so a plain route or path matches itself);
 *    a match is `high` (a route pattern may leave out the trailing slash);
 * 3. otherwise the page's percentile on the traffic CSV's views when one is given (pages the
 *    CSV does not list have 0 views), else on its content centrality: the top 10% (percentile
 *    >= 0.9) are `high`, the bottom 30% (< 0.3) `low`, the rest `normal`.
 *
 * The numeric importance (compared with the PageRank percentile for `rank-below-importance`) is
 * that percentile, moved into the band of an explicit level: 1 for explicit `high`, 0 for
 * explicit `low`, and clamped into [0.3, 0.9) for explicit `normal`.
 */
import picomatch from 'picomatch';
import type { ResolvedOptions } from '../config/options.js';
import type { SiteGraph } from '../types.js';
import { lookupRoute } from '../routes/index.js';
import { percentiles } from './percentile.js';
import type { Importance as ImportanceLevel } from '../types.js';

/** Percentile from which a page is `high` without an explicit level. */
export const HIGH_PERCENTILE = 0.9;
/** Percentile below which a page is `low` without an explicit level. */
export const LOW_PERCENTILE = 0.3;

/** Where a page's importance came from. */
export type ImportanceSource = 'frontmatter' | 'config' | 'traffic' | 'centrality';

/** Importance of every page, indexed by page id. */
export interface Importance {
  /** Importance percentile in [0, 1]. */
  readonly score: Float64Array;
  readonly level: ImportanceLevel[];
  readonly source: ImportanceSource[];
}

/**
 * Views per page id: each CSV route looked up in the graph's route index (aliases and
 * redirects included; with or without a trailing slash); routes matching no page are ignored.
 */
export function viewsPerPage(graph: SiteGraph, traffic: ReadonlyMap<string, number>, routes: ResolvedOptions['routes']): Float64Array {
  const views = new Float64Array(graph.pages.length);
  for (const [route, count] of traffic) {
    const page = lookupRoute(graph.routeIndex, route, routes);
    if (page !== undefined && page >= 0 && page < views.length) views[page] += count;
  }
  return views;
}

/**
 * Importance of every page.
 * @param centrality content centrality per page (the fallback signal)
 * @param traffic views per route, or null
 */
export function computeImportance(
  graph: SiteGraph,
  options: ResolvedOptions,
  traffic: ReadonlyMap<string, number> | null,
  centrality: Float64Array,
): Importance {
  const n = graph.pages.length;
  const signal = traffic === null ? centrality : viewsPerPage(graph, traffic, options.routes);
  const base = percentiles(signal);
  const byRoute = options.important.filter((p) => p.startsWith('/'));
  const byFile = options.important.filter((p) => !p.startsWith('/'));
  const routeMatch = byRoute.length === 0 ? null : picomatch(byRoute, { dot: true });
  const fileMatch = byFile.length === 0 ? null : picomatch(byFile, { dot: true });
  const score = new Float64Array(n);
  const level: ImportanceLevel[] = new Array(n);
  const source: ImportanceSource[] = new Array(n);
  for (let i = 0; i < n; i++) {
    const page = graph.pages[i];
    const p = Number.isNaN(base[i]) ? 0.5 : base[i];
    const explicit = page.meta.importance;
    if (explicit !== undefined) {
      level[i] = explicit;
      source[i] = 'frontmatter';
      score[i] = explicit === 'high' ? 1 : explicit === 'low' ? 0 : Math.min(Math.max(p, LOW_PERCENTILE), HIGH_PERCENTILE - 1e-9);
    } else if (matchesRoute(routeMatch, page.route) || fileMatch?.(page.file) === true) {
      level[i] = 'high';
      source[i] = 'config';
      score[i] = 1;
    } else {
      level[i] = p >= HIGH_PERCENTILE ? 'high' : p < LOW_PERCENTILE ? 'low' : 'normal';
      source[i] = traffic === null ? 'centrality' : 'traffic';
      score[i] = p;
    }
  }
  return { score, level, source };
}

/** A route pattern matches the route with or without its trailing slash. */
function matchesRoute(match: ((s: string) => boolean) | null, route: string): boolean {
  if (match === null) return false;
  return match(route) || (route.length > 1 && route.endsWith('/') && match(route.slice(0, -1)));
}
