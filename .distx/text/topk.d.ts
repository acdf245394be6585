/**
 * Bounded top-k selection over integer ids with float scores: a min-heap of size k, so picking
 * k of m candidates costs O(m log k) and allocates only the heap.
 */
/**
 * The `k` best of `ids[0..length)` by `score[id]` descending, ties by id ascending, best first.
 * @param ids candidate ids (distinct)
 * @param length how many entries of `ids` to consider
 * @param score scores indexed by id
 */
export declare function topKByScore(ids: ArrayLike<number>, length: number, score: ArrayLike<number>, k: number): number[];
/**
 * The k-th largest of `score[ids[i]]` for i < length (the smallest value a top-k entry can
 * have), or -Infinity when there are fewer than k.
 * @param heap scratch space of at least k entries, reused across calls
 */
export declare function kthLargest(ids: ArrayLike<number>, length: number, score: ArrayLike<number>, k: number, heap: Float64Array): number;
