import type { ResolvedOptions } from '../options.js';
import type { SiteGraph } from '../types.js';
import type { ImportanceLevel } from './types.js';
/** Percentile from which a page is `high` without an explicit level. */
export declare const HIGH_PERCENTILE = 0.9;
/** Percentile below which a page is `low` without an explicit level. */
export declare const LOW_PERCENTILE = 0.3;
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
export declare function viewsPerPage(graph: SiteGraph, traffic: ReadonlyMap<string, number>, routes: ResolvedOptions['routes']): Float64Array;
/**
 * Importance of every page.
 * @param centrality content centrality per page (the fallback signal)
 * @param traffic views per route, or null
 */
export declare function computeImportance(graph: SiteGraph, options: ResolvedOptions, traffic: ReadonlyMap<string, number> | null, centrality: Float64Array): Importance;
