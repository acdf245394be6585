import { kthLargest, topKByScore } from './topk.js';
/** Slack for comparing bounds computed in a different summation order. */
const EPS = 1e-9;
/** Largest document frequency of a term that relates pages. */
export function maxRelatingDf(n) {
    return Math.max(2, Math.floor(n / 2));
}
/** 1 for each term id that relates pages (2 <= df <= {@link maxRelatingDf}), else 0. */
export function relatingTerms(index) {
    const n = index.docOffsets.length - 1;
    const maxDf = maxRelatingDf(n);
    const mask = new Uint8Array(index.terms.length);
    for (let t = 0; t < mask.length; t++)
        mask[t] = index.df[t] >= 2 && index.df[t] <= maxDf ? 1 : 0;
    return mask;
}
/**
 * Top-k related pages of every page, most similar first, ties by page id (pages are sorted by
 * route, so ties go by route). Pages sharing no relating term are never listed.
 * @param index the term index (row i = page i)
 * @param k pages kept per page
 */
export function relatedPages(index, k) {
    return relatedPagesWithStats(index, k).lists;
}
/** {@link relatedPages} with counters of the work done. */
export function relatedPagesWithStats(index, k) {
    const n = index.docOffsets.length - 1;
    const { docOffsets, docTerms, docWeights } = index;
    const relating = relatingTerms(index);
    const t = index.terms.length;
    // Inverted index over relating terms: postings in page order, plus each term's largest weight.
    const postOffsets = new Int32Array(t + 1);
    for (let term = 0; term < t; term++)
        postOffsets[term + 1] = postOffsets[term] + (relating[term] === 1 ? index.df[term] : 0);
    const postDocs = new Int32Array(postOffsets[t]);
    const postWeights = new Float32Array(postOffsets[t]);
    const maxWeight = new Float64Array(t);
    const fill = postOffsets.slice(0, t);
    let longestRow = 0;
    for (let d = 0; d < n; d++) {
        longestRow = Math.max(longestRow, docOffsets[d + 1] - docOffsets[d]);
        for (let e = docOffsets[d]; e < docOffsets[d + 1]; e++) {
            const term = docTerms[e];
            if (relating[term] === 0)
                continue;
            const at = fill[term];
            fill[term] = at + 1;
            postDocs[at] = d;
            postWeights[at] = docWeights[e];
            if (docWeights[e] > maxWeight[term])
                maxWeight[term] = docWeights[e];
        }
    }
    const acc = new Float64Array(n);
    const stamp = new Int32Array(n).fill(-1);
    const touched = new Int32Array(n);
    const qDense = new Float64Array(t);
    const qTerm = new Int32Array(longestRow);
    const qWeight = new Float64Array(longestRow);
    const impact = new Float64Array(longestRow);
    const order = new Int32Array(longestRow);
    const suffix = new Float64Array(longestRow + 1);
    const heap = new Float64Array(Math.max(1, k));
    const byImpact = (a, b) => impact[b] - impact[a] || qTerm[a] - qTerm[b];
    const out = new Array(n);
    let postingsRead = 0;
    let postingsSkipped = 0;
    let pagesScored = 0;
    for (let q = 0; q < n; q++) {
        let m = 0;
        for (let e = docOffsets[q]; e < docOffsets[q + 1]; e++) {
            const term = docTerms[e];
            if (relating[term] === 0)
                continue;
            qTerm[m] = term;
            qWeight[m] = docWeights[e];
            impact[m] = docWeights[e] * maxWeight[term];
            order[m] = m;
            qDense[term] = docWeights[e];
            m++;
        }
        if (m === 0 || k <= 0) {
            for (let i = 0; i < m; i++)
                qDense[qTerm[i]] = 0;
            out[q] = { page: q, related: [] };
            continue;
        }
        const sorted = order.subarray(0, m).sort(byImpact);
        suffix[m] = 0;
        for (let i = m - 1; i >= 0; i--)
            suffix[i] = suffix[i + 1] + impact[sorted[i]];
        // Phase 1: accumulate postings until untouched pages can no longer reach the top k.
        let count = 0;
        let cutoff = m;
        for (let i = 0; i < m; i++) {
            const slot = sorted[i];
            const term = qTerm[slot];
            const from = postOffsets[term];
            const to = postOffsets[term + 1];
            if (count >= k && (to - from) * 4 >= count) {
                const kth = kthLargest(touched, count, acc, k, heap);
                if (kth > suffix[i] * (1 + EPS)) {
                    cutoff = i;
                    for (let j = i; j < m; j++)
                        postingsSkipped += postOffsets[qTerm[sorted[j]] + 1] - postOffsets[qTerm[sorted[j]]];
                    break;
                }
            }
            const w = qWeight[slot];
            postingsRead += to - from;
            for (let a = from; a < to; a++) {
                const p = postDocs[a];
                if (p === q)
                    continue;
                if (stamp[p] !== q) {
                    stamp[p] = q;
                    acc[p] = 0;
                    touched[count++] = p;
                }
                acc[p] += w * postWeights[a];
            }
        }
        // Keep the pages that can still reach the k-th best, then score them exactly.
        const rest = suffix[cutoff] * (1 + EPS);
        const kth = kthLargest(touched, count, acc, k, heap);
        const floor = kth === -Infinity ? -Infinity : kth * (1 - EPS) - rest;
        let kept = 0;
        for (let i = 0; i < count; i++) {
            const p = touched[i];
            if (acc[p] < floor)
                continue;
            let s = 0;
            for (let e = docOffsets[p]; e < docOffsets[p + 1]; e++) {
                const v = qDense[docTerms[e]];
                if (v !== 0)
                    s += v * docWeights[e];
            }
            acc[p] = s;
            touched[kept++] = p;
        }
        pagesScored += kept;
        const best = topKByScore(touched, kept, acc, k);
        out[q] = { page: q, related: best.map((p) => ({ page: p, similarity: acc[p] })) };
        for (let i = 0; i < m; i++)
            qDense[qTerm[i]] = 0;
    }
    return { lists: out, postingsRead, postingsSkipped, pagesScored };
}
