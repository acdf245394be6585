/**
 * `rankGraph`: the ranking stage (DESIGN section 5): PageRank, click depth, inlinks and outlinks.
 */
import type { ResolvedOptions } from '../options.js';
import type { Ranking, SiteGraph } from '../types.js';
/**
 * The teleport vector of `options.teleport`: null for uniform; for `entry`, mass on the entry
 * pages only (uniform again when no entry page exists, so the ranking is still defined).
 */
export declare function teleportVector(graph: SiteGraph, options: ResolvedOptions): Float64Array | null;
/** The flag mask click depth follows: content links, plus template links when `depthCountsTemplate`. */
export declare function depthMask(options: ResolvedOptions): number;
/** Rank the pages of a graph. Arrays are indexed by page id. */
export declare function rankGraph(graph: SiteGraph, options: ResolvedOptions): Ranking;
