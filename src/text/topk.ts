/**
 * Bounded top-k selection over integer ids with float scores: a min-heap of size k, so picking
 * k of m candidates costs O(m log k) and allocates only the heap.
 */

/** True when (sa, a) ranks below (sb, b): lower score, or equal score and larger id. */
function worse(sa: number, a: number, sb: number, b: number): boolean {
  return sa < sb || (sa === sb && a > b);
}

/**
 * The `k` best of `ids[0..length)` by `score[id]` descending, ties by id ascending, best first.
 * @param ids candidate ids (distinct)
 * @param length how many entries of `ids` to consider
 * @param score scores indexed by id
 */
export function topKByScore(ids: ArrayLike<number>, length: number, score: ArrayLike<number>, k: number): number[] {
  if (k <= 0 || length === 0) return [];
  const heap: number[] = [];
  for (let i = 0; i < length; i++) {
    const id = ids[i];
    const s = score[id];
    if (heap.length < k) {
      heap.push(id);
      siftUp(heap, heap.length - 1, score);
    } else if (worse(score[heap[0]], heap[0], s, id)) {
      heap[0] = id;
      siftDown(heap, 0, score);
    }
  }
  return heap.sort((a, b) => score[b] - score[a] || a - b);
}

function siftUp(heap: number[], at: number, score: ArrayLike<number>): void {
  let i = at;
  while (i > 0) {
    const parent = (i - 1) >> 1;
    if (!worse(score[heap[i]], heap[i], score[heap[parent]], heap[parent])) break;
    [heap[i], heap[parent]] = [heap[parent], heap[i]];
    i = parent;
  }
}

function siftDown(heap: number[], at: number, score: ArrayLike<number>): void {
  let i = at;
  for (;;) {
    const l = 2 * i + 1;
    const r = l + 1;
    let min = i;
    if (l < heap.length && worse(score[heap[l]], heap[l], score[heap[min]], heap[min])) min = l;
    if (r < heap.length && worse(score[heap[r]], heap[r], score[heap[min]], heap[min])) min = r;
    if (min === i) return;
    [heap[i], heap[min]] = [heap[min], heap[i]];
    i = min;
  }
}

/**
 * The k-th largest of `score[ids[i]]` for i < length (the smallest value a top-k entry can
 * have), or -Infinity when there are fewer than k.
 * @param heap scratch space of at least k entries, reused across calls
 */
export function kthLargest(ids: ArrayLike<number>, length: number, score: ArrayLike<number>, k: number, heap: Float64Array): number {
  if (length < k || k <= 0) return -Infinity;
  let size = 0;
  for (let i = 0; i < length; i++) {
    const s = score[ids[i]];
    if (size < k) minHeapPush(heap, 0, size++, s);
    else if (s > heap[0]) minHeapReplaceTop(heap, 0, k, s);
  }
  return heap[0];
}

/** The k-th best of the exact scores met so far for one query (a min-heap of the k best values). */
export class ExactTopK {
  private readonly heap: Float64Array;
  private size = 0;

  constructor(private readonly k: number) {
    this.heap = new Float64Array(Math.max(1, k));
  }

  /** Forget every score (for the next query). */
  reset(): void {
    this.size = 0;
  }

  /** The k-th best score so far, or -Infinity while fewer than k were added. */
  kth(): number {
    return this.size < this.k ? -Infinity : this.heap[0];
  }

  /** Offer one score. */
  add(s: number): void {
    const { heap, k } = this;
    if (this.size < k) minHeapPush(heap, 0, this.size++, s);
    else if (s > heap[0]) minHeapReplaceTop(heap, 0, k, s);
  }
}

/**
 * For every page, the k best exact scores met so far with any other page (k values a page, in
 * one typed array of min-heaps): the k-th of them is a lower bound of the page's k-th best
 * similarity before its own search starts.
 */
export class KnownScores {
  private readonly heaps: Float64Array;
  private readonly sizes: Int32Array;

  constructor(n: number, private readonly k: number) {
    this.heaps = new Float64Array(Math.max(0, n * k));
    this.sizes = new Int32Array(n);
  }

  /** The k-th best known score of `page`, or -Infinity while fewer than k are known. */
  kth(page: number): number {
    return this.sizes[page] < this.k ? -Infinity : this.heaps[page * this.k];
  }

  /** Offer a score of `page` with some other page (offered once per pair and search). */
  offer(page: number, s: number): void {
    const { heaps, k } = this;
    const at = page * k;
    const size = this.sizes[page];
    if (size < k) {
      this.sizes[page] = size + 1;
      minHeapPush(heaps, at, size, s);
    } else if (s > heaps[at]) minHeapReplaceTop(heaps, at, k, s);
  }
}

/** Add `s` to the min-heap of `size` values at `heap[at...]` (the caller counts the new size). */
function minHeapPush(heap: Float64Array, at: number, size: number, s: number): void {
  let j = size;
  heap[at + j] = s;
  while (j > 0) {
    const p = (j - 1) >> 1;
    if (heap[at + p] <= heap[at + j]) return;
    const tmp = heap[at + p];
    heap[at + p] = heap[at + j];
    heap[at + j] = tmp;
    j = p;
  }
}

/** Replace the least of the full min-heap of `k` values at `heap[at...]` by `s`, and restore the order. */
function minHeapReplaceTop(heap: Float64Array, at: number, k: number, s: number): void {
  heap[at] = s;
  let j = 0;
  for (;;) {
    const l = 2 * j + 1;
    const r = l + 1;
    let m = j;
    if (l < k && heap[at + l] < heap[at + m]) m = l;
    if (r < k && heap[at + r] < heap[at + m]) m = r;
    if (m === j) return;
    const tmp = heap[at + m];
    heap[at + m] = heap[at + j];
    heap[at + j] = tmp;
    j = m;
  }
}
