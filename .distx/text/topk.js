/**
 * Bounded top-k selection over integer ids with float scores: a min-heap of size k, so picking
 * k of m candidates costs O(m log k) and allocates only the heap.
 */
/** True when (sa, a) ranks below (sb, b): lower score, or equal score and larger id. */
function worse(sa, a, sb, b) {
    return sa < sb || (sa === sb && a > b);
}
/**
 * The `k` best of `ids[0..length)` by `score[id]` descending, ties by id ascending, best first.
 * @param ids candidate ids (distinct)
 * @param length how many entries of `ids` to consider
 * @param score scores indexed by id
 */
export function topKByScore(ids, length, score, k) {
    if (k <= 0 || length === 0)
        return [];
    const heap = [];
    for (let i = 0; i < length; i++) {
        const id = ids[i];
        const s = score[id];
        if (heap.length < k) {
            heap.push(id);
            siftUp(heap, heap.length - 1, score);
        }
        else if (worse(score[heap[0]], heap[0], s, id)) {
            heap[0] = id;
            siftDown(heap, 0, score);
        }
    }
    return heap.sort((a, b) => score[b] - score[a] || a - b);
}
function siftUp(heap, at, score) {
    let i = at;
    while (i > 0) {
        const parent = (i - 1) >> 1;
        if (!worse(score[heap[i]], heap[i], score[heap[parent]], heap[parent]))
            break;
        [heap[i], heap[parent]] = [heap[parent], heap[i]];
        i = parent;
    }
}
function siftDown(heap, at, score) {
    let i = at;
    for (;;) {
        const l = 2 * i + 1;
        const r = l + 1;
        let min = i;
        if (l < heap.length && worse(score[heap[l]], heap[l], score[heap[min]], heap[min]))
            min = l;
        if (r < heap.length && worse(score[heap[r]], heap[r], score[heap[min]], heap[min]))
            min = r;
        if (min === i)
            return;
        [heap[i], heap[min]] = [heap[min], heap[i]];
        i = min;
    }
}
/**
 * The k-th largest of `score[ids[i]]` for i < length (the smallest value a top-k entry can
 * have), or -Infinity when there are fewer than k.
 * @param heap scratch space of at least k entries, reused across calls
 */
export function kthLargest(ids, length, score, k, heap) {
    if (length < k || k <= 0)
        return -Infinity;
    let size = 0;
    for (let i = 0; i < length; i++) {
        const s = score[ids[i]];
        if (size < k) {
            let j = size++;
            heap[j] = s;
            while (j > 0) {
                const p = (j - 1) >> 1;
                if (heap[p] <= heap[j])
                    break;
                const tmp = heap[p];
                heap[p] = heap[j];
                heap[j] = tmp;
                j = p;
            }
        }
        else if (s > heap[0]) {
            heap[0] = s;
            let j = 0;
            for (;;) {
                const l = 2 * j + 1;
                const r = l + 1;
                let m = j;
                if (l < k && heap[l] < heap[m])
                    m = l;
                if (r < k && heap[r] < heap[m])
                    m = r;
                if (m === j)
                    break;
                const tmp = heap[m];
                heap[m] = heap[j];
                heap[j] = tmp;
                j = m;
            }
        }
    }
    return heap[0];
}
