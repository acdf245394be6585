import type { Ranking, SiteGraph } from '../types.js';
/** Undirected content-link neighbours: CSR with sorted, distinct rows. */
export interface Neighbours {
    readonly offsets: Int32Array;
    readonly targets: Int32Array;
}
/** The undirected neighbour lists of the content-link graph (template links left out). */
export declare function contentNeighbours(graph: SiteGraph): Neighbours;
/** Degree of a page in the undirected content graph. */
export declare function degree(nb: Neighbours, page: number): number;
/** Adamic-Adar and common-neighbour counts of s and t (sorted-row merge). */
export declare function adamicAdar(nb: Neighbours, s: number, t: number): {
    adamicAdar: number;
    common: number;
};
/** Pages x with content links s -> x and x -> t (forward row of s merged with reverse row of t). */
export declare function twoStepPaths(graph: SiteGraph, s: number, t: number): number;
/**
 * The target's click depth if `s` did not link to it: 0 for an entry page, else the smallest
 * depth(u) + 1 over its other reachable in-pages u; -1 when there is none.
 */
export declare function depthWithout(graph: SiteGraph, ranking: Ranking, isEntry: Uint8Array, s: number, t: number): number;
/** Leading route folders two routes share (`/a/b/c/` and `/a/b/d/` share 2). */
export declare function sharedFolders(a: string, b: string): number;
/** The folders of a route: its segments but the last, which is the page itself. */
export declare function routeFolders(route: string): string[];
/** Leading entries two folder lists share. */
export declare function sharedSegments(x: readonly string[], y: readonly string[]): number;
/** Reusable buffers for {@link graphNeighbourhood}: one score per page and the pages touched. */
export interface NeighbourhoodScratch {
    readonly score: Float64Array;
    readonly touched: Int32Array;
}
/** Buffers for a site of `n` pages. */
export declare function neighbourhoodScratch(n: number): NeighbourhoodScratch;
/**
 * Pages near `t` in the content graph: every page sharing a neighbour with it, found through its
 * neighbours of degree at most `hubDegree` (a page linked with nearly everything brings nearly
 * everything and says little), best Adamic-Adar first, at most `limit`, ties by page id.
 * Accumulates in `scratch` (left zeroed again), so a call costs the pages it touches, not n.
 */
export declare function graphNeighbourhood(nb: Neighbours, t: number, limit: number, hubDegree: number, scratch?: NeighbourhoodScratch): number[];
