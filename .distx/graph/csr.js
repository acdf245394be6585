/** Flag bit of an edge with at least one content link. */
export const EDGE_CONTENT = 1;
/** Flag bit of an edge with at least one template link. */
export const EDGE_TEMPLATE = 2;
/** An empty edge list with room for `capacity` edges (it grows as needed). */
export function createEdgeList(capacity = 1024) {
    const c = Math.max(16, capacity);
    return { from: new Int32Array(c), to: new Int32Array(c), weight: new Float32Array(c), flags: new Uint8Array(c), length: 0 };
}
/** Append one link-level edge (duplicates are summed later by `buildCsr`). */
export function pushEdge(list, from, to, weight, flags) {
    if (list.length === list.from.length)
        grow(list);
    const i = list.length++;
    list.from[i] = from;
    list.to[i] = to;
    list.weight[i] = weight;
    list.flags[i] = flags;
}
function grow(list) {
    const c = list.from.length * 2;
    const from = new Int32Array(c);
    from.set(list.from);
    const to = new Int32Array(c);
    to.set(list.to);
    const weight = new Float32Array(c);
    weight.set(list.weight);
    const flags = new Uint8Array(c);
    flags.set(list.flags);
    list.from = from;
    list.to = to;
    list.weight = weight;
    list.flags = flags;
}
/**
 * Forward and reverse CSR of `n` nodes from an edge list. Edges whose ends are not in
 * [0, n) and self-edges are dropped; parallel edges are merged (weights summed in double
 * precision, then stored as float32; flags OR-ed).
 *
 * An LSD radix sort on (source, target) that moves the edge data itself, not edge indices:
 * each pass reads its input in order and scatters into buckets, so the only random accesses
 * are the bucket writes (indirect reads through an index array cost a cache miss per edge).
 */
export function buildCsr(edges, n) {
    const m = edges.length;
    const { from, to, weight, flags } = edges;
    // Pass 1: bucket the kept edges by target (stable); the target is implied by the bucket.
    const cursor = new Int32Array(n + 1);
    for (let e = 0; e < m; e++) {
        const f = from[e];
        const t = to[e];
        if (f !== t && f >= 0 && t >= 0 && f < n && t < n)
            cursor[t + 1]++;
    }
    for (let i = 0; i < n; i++)
        cursor[i + 1] += cursor[i];
    const kept = cursor[n];
    const byTarget = cursor.slice(); // byTarget[t] = start of bucket t, kept for pass 2
    const srcA = new Int32Array(kept);
    const wA = new Float32Array(kept);
    const flA = new Uint8Array(kept);
    for (let e = 0; e < m; e++) {
        const f = from[e];
        const t = to[e];
        if (f === t || f < 0 || t < 0 || f >= n || t >= n)
            continue;
        const p = cursor[t]++;
        srcA[p] = f;
        wA[p] = weight[e];
        flA[p] = flags[e];
    }
    // Pass 2: bucket by source (stable), visiting targets in order: rows come out sorted by target.
    cursor.fill(0);
    for (let k = 0; k < kept; k++)
        cursor[srcA[k] + 1]++;
    for (let i = 0; i < n; i++)
        cursor[i + 1] += cursor[i];
    const rowStart = cursor.slice();
    const tB = new Int32Array(kept);
    const wB = new Float32Array(kept);
    const flB = new Uint8Array(kept);
    for (let t = 0; t < n; t++) {
        const end = byTarget[t + 1];
        for (let k = byTarget[t]; k < end; k++) {
            const p = cursor[srcA[k]]++;
            tB[p] = t;
            wB[p] = wA[k];
            flB[p] = flA[k];
        }
    }
    // Pass 3: merge runs of one target within each row, in place (the write index never passes
    // the read index), summing weights in double precision.
    const offsets = new Int32Array(n + 1);
    let out = 0;
    for (let u = 0; u < n; u++) {
        const end = rowStart[u + 1];
        let k = rowStart[u];
        while (k < end) {
            const t = tB[k];
            let sum = wB[k];
            let fl = flB[k];
            k++;
            while (k < end && tB[k] === t) {
                sum += wB[k];
                fl |= flB[k];
                k++;
            }
            tB[out] = t;
            wB[out] = sum;
            flB[out] = fl;
            out++;
        }
        offsets[u + 1] = out;
    }
    const forward = {
        offsets,
        targets: out === kept ? tB : tB.slice(0, out),
        weights: out === kept ? wB : wB.slice(0, out),
        flags: out === kept ? flB : flB.slice(0, out),
    };
    return { forward, reverse: transpose(forward, n) };
}
/**
 * The transpose of a CSR: row `v` lists the sources of the edges into `v`, sorted by source
 * (a stable counting sort of the forward rows, which are visited in source order).
 */
export function transpose(csr, n) {
    const m = csr.targets.length;
    const offsets = new Int32Array(n + 1);
    for (let e = 0; e < m; e++)
        offsets[csr.targets[e] + 1]++;
    for (let i = 0; i < n; i++)
        offsets[i + 1] += offsets[i];
    const cursor = offsets.slice(0, n);
    const targets = new Int32Array(m);
    const weights = new Float32Array(m);
    const flags = new Uint8Array(m);
    for (let u = 0; u < n; u++) {
        const end = csr.offsets[u + 1];
        for (let e = csr.offsets[u]; e < end; e++) {
            const v = csr.targets[e];
            const p = cursor[v]++;
            targets[p] = u;
            weights[p] = csr.weights[e];
            flags[p] = csr.flags[e];
        }
    }
    return { offsets, targets, weights, flags };
}
/** Sum of the out-edge weights of every node (double precision), for PageRank. */
export function outWeightSums(forward, n) {
    const sums = new Float64Array(n);
    for (let u = 0; u < n; u++) {
        let s = 0;
        const end = forward.offsets[u + 1];
        for (let e = forward.offsets[u]; e < end; e++)
            s += forward.weights[e];
        sums[u] = s;
    }
    return sums;
}
