/**
 * Compressed sparse rows for the link graph (DESIGN sections 2 and 5): one edge per
 * (from, to) pair, weight = sum of the pair's link weights, flags = OR of the links' contexts
 * (1 content, 2 template); self-edges and edges to non-pages dropped; rows sorted by target.
 *
 * Built with two stable counting sorts (by target, then by source), so construction is O(E + n)
 * with a handful of typed arrays and no object per edge.
 */
import type { Csr } from '../types.js';
import type { EdgeList } from './types.js';
/** Flag bit of an edge with at least one content link. */
export declare const EDGE_CONTENT = 1;
/** Flag bit of an edge with at least one template link. */
export declare const EDGE_TEMPLATE = 2;
/** An empty edge list with room for `capacity` edges (it grows as needed). */
export declare function createEdgeList(capacity?: number): EdgeList;
/** Append one link-level edge (duplicates are summed later by `buildCsr`). */
export declare function pushEdge(list: EdgeList, from: number, to: number, weight: number, flags: number): void;
/**
 * Forward and reverse CSR of `n` nodes from an edge list. Edges whose ends are not in
 * [0, n) and self-edges are dropped; parallel edges are merged (weights summed in double
 * precision, then stored as float32; flags OR-ed).
 *
 * An LSD radix sort on (source, target) that moves the edge data itself, not edge indices:
 * each pass reads its input in order and scatters into buckets, so the only random accesses
 * are the bucket writes (indirect reads through an index array cost a cache miss per edge).
 */
export declare function buildCsr(edges: EdgeList, n: number): {
    forward: Csr;
    reverse: Csr;
};
/**
 * The transpose of a CSR: row `v` lists the sources of the edges into `v`, sorted by source
 * (a stable counting sort of the forward rows, which are visited in source order).
 */
export declare function transpose(csr: Csr, n: number): Csr;
/** Sum of the out-edge weights of every node (double precision), for PageRank. */
export declare function outWeightSums(forward: Csr, n: number): Float64Array;
