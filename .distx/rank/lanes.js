/**
 * The per-iteration kernels of `pagerankScenarios` (./pagerank-batch.ts) over node-major lane
 * state: `a[v * lanes + k]` is scenario k's value at node v.
 */
/**
 * The link part of one iteration for every lane: `next[v, k] = sum over in-edges (u, v) of
 * contrib[u, k] * w` (damping applied in `settleLanes`). Lanes go in blocks of eight, then four,
 * then one; within a block an edge is read once and its lanes are contiguous in both arrays.
 */
export function pullLanes(offsets, sources, weights, contrib, next, n, lanes) {
    let block = 0;
    for (; block + 8 <= lanes; block += 8)
        pullBlock8(offsets, sources, weights, contrib, next, n, lanes, block);
    for (; block + 4 <= lanes; block += 4)
        pullBlock4(offsets, sources, weights, contrib, next, n, lanes, block);
    for (; block < lanes; block++)
        pullBlock1(offsets, sources, weights, contrib, next, n, lanes, block);
}
/**
 * `pullLanes` for lanes `block .. block + 7`, unrolled by hand (the engine does not vectorise a
 * loop over lanes): eight sums held in locals, one 64-byte gather per edge.
 */
function pullBlock8(offsets, sources, weights, contrib, next, n, lanes, block) {
    let start = offsets[0];
    for (let v = 0, row = block; v < n; v++, row += lanes) {
        const end = offsets[v + 1];
        let a0 = 0;
        let a1 = 0;
        let a2 = 0;
        let a3 = 0;
        let a4 = 0;
        let a5 = 0;
        let a6 = 0;
        let a7 = 0;
        for (let e = start; e < end; e++) {
            const w = weights[e];
            const j = sources[e] * lanes + block;
            a0 += contrib[j] * w;
            a1 += contrib[j + 1] * w;
            a2 += contrib[j + 2] * w;
            a3 += contrib[j + 3] * w;
            a4 += contrib[j + 4] * w;
            a5 += contrib[j + 5] * w;
            a6 += contrib[j + 6] * w;
            a7 += contrib[j + 7] * w;
        }
        start = end;
        next[row] = a0;
        next[row + 1] = a1;
        next[row + 2] = a2;
        next[row + 3] = a3;
        next[row + 4] = a4;
        next[row + 5] = a5;
        next[row + 6] = a6;
        next[row + 7] = a7;
    }
}
/** {@link pullBlock8} for four lanes. */
function pullBlock4(offsets, sources, weights, contrib, next, n, lanes, block) {
    let start = offsets[0];
    for (let v = 0, row = block; v < n; v++, row += lanes) {
        const end = offsets[v + 1];
        let a0 = 0;
        let a1 = 0;
        let a2 = 0;
        let a3 = 0;
        for (let e = start; e < end; e++) {
            const w = weights[e];
            const j = sources[e] * lanes + block;
            a0 += contrib[j] * w;
            a1 += contrib[j + 1] * w;
            a2 += contrib[j + 2] * w;
            a3 += contrib[j + 3] * w;
        }
        start = end;
        next[row] = a0;
        next[row + 1] = a1;
        next[row + 2] = a2;
        next[row + 3] = a3;
    }
}
/** {@link pullBlock8} for one lane. */
function pullBlock1(offsets, sources, weights, contrib, next, n, lanes, block) {
    let start = offsets[0];
    for (let v = 0, row = block; v < n; v++, row += lanes) {
        const end = offsets[v + 1];
        let a0 = 0;
        for (let e = start; e < end; e++)
            a0 += contrib[sources[e] * lanes + block] * weights[e];
        start = end;
        next[row] = a0;
    }
}
/**
 * The node part of one iteration for every lane: damping and jumps, per-lane L1 change, sum and
 * dangling rank, and `contrib = next / out-weight` of the graph (lane patches are applied after).
 */
export function settleLanes(next, x, inv, contrib, n, lanes, damping, jump, uniform, teleport, change, dangling, sums) {
    change.fill(0);
    dangling.fill(0);
    sums.fill(0);
    for (let v = 0, row = 0; v < n; v++, row += lanes) {
        const share = teleport === null ? uniform : teleport[v];
        const iv = inv[v];
        const dangles = iv === 0;
        for (let k = 0, i = row; k < lanes; k++, i++) {
            const value = damping * next[i] + jump[k] * share;
            next[i] = value;
            change[k] += Math.abs(value - x[i]);
            sums[k] += value;
            contrib[i] = value * iv;
            if (dangles)
                dangling[k] += value;
        }
    }
}
