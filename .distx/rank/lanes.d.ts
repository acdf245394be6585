/**
 * The per-iteration kernels of `pagerankScenarios` (./pagerank-batch.ts) over node-major lane
 * state: `a[v * lanes + k]` is scenario k's value at node v.
 */
/**
 * The link part of one iteration for every lane: `next[v, k] = sum over in-edges (u, v) of
 * contrib[u, k] * w` (damping applied in `settleLanes`). Lanes go in blocks of eight, then four,
 * then one; within a block an edge is read once and its lanes are contiguous in both arrays.
 */
export declare function pullLanes(offsets: Int32Array, sources: Int32Array, weights: Float32Array, contrib: Float64Array, next: Float64Array, n: number, lanes: number): void;
/**
 * The node part of one iteration for every lane: damping and jumps, per-lane L1 change, sum and
 * dangling rank, and `contrib = next / out-weight` of the graph (lane patches are applied after).
 */
export declare function settleLanes(next: Float64Array, x: Float64Array, inv: Float64Array, contrib: Float64Array, n: number, lanes: number, damping: number, jump: Float64Array, uniform: number, teleport: Float64Array | null, change: Float64Array, dangling: Float64Array, sums: Float64Array): void;
