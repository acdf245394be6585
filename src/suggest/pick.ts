/**
 * Greedy choice of suggestions across all targets: best score first, at most `suggest.perSource`
 * new links per source and `suggest.perTarget` per target, and no two targets anchored on
 * overlapping text of the same source. When a pair's phrase is taken, its next phrase is used;
 * when none is left it falls back to no anchor, with the model's score of the pair as if the
 * source did not mention the target, and waits for its turn again.
 */
import type { AnchorMatch } from './anchor.js';

/** A candidate pair, its scores and its anchor options (best first). */
export interface ScoredPair {
  readonly source: number;
  readonly target: number;
  /** TF-IDF cosine similarity. */
  readonly similarity: number;
  /** The model's probability for the pair. */
  readonly score: number;
  /** The probability with the name evidence taken away (used when no anchor is left). */
  readonly scoreWithoutAnchor: number;
  readonly anchors: readonly AnchorMatch[];
}

/** A chosen pair with its anchor (or none) and its final score. */
export interface Chosen {
  readonly pair: ScoredPair;
  readonly anchor: AnchorMatch | null;
  readonly score: number;
}

interface Entry {
  readonly pair: number;
  readonly score: number;
  /** Index into the pair's anchors, or -1 for no anchor. */
  readonly option: number;
}

/**
 * Choose suggestions greedily.
 *
 * The pairs are taken in one fixed order: score (best first), then target, then source. Each
 * pair's first entry is in a sorted array of indices (typed arrays, sorted once); only a pair
 * that lost its phrases to an earlier choice comes back, at a lower score, through a small heap,
 * and the two are merged as they are read. A heap of every pair (a million entries on a
 * 50,000-page site) spent most of its time on cache misses: 26 s there, against 0.3 s for the
 * 220,000 pairs of 10,000 pages.
 * @returns chosen pairs in the order they were chosen
 */
export function pickUnderCaps(pairs: readonly ScoredPair[], maxPerSource: number, maxPerTarget: number): Chosen[] {
  const count = pairs.length;
  const firstScore = new Float64Array(count);
  const target = new Int32Array(count);
  const source = new Int32Array(count);
  for (let i = 0; i < count; i++) {
    const p = pairs[i];
    firstScore[i] = p.anchors.length > 0 ? p.score : Math.min(p.score, p.scoreWithoutAnchor);
    target[i] = p.target;
    source[i] = p.source;
  }
  // Score first (best first), then target, then source: a total order, since a pair appears once.
  const order = new Int32Array(count);
  for (let i = 0; i < count; i++) order[i] = i;
  order.sort((a, b) => (firstScore[a] !== firstScore[b] ? firstScore[b] - firstScore[a] : target[a] !== target[b] ? target[a] - target[b] : source[a] - source[b]));
  const before = (a: Entry, b: Entry): boolean => {
    if (a.score !== b.score) return a.score > b.score;
    return target[a.pair] !== target[b.pair] ? target[a.pair] < target[b.pair] : source[a.pair] < source[b.pair];
  };
  const again = new Heap<Entry>(before);
  let at = 0;
  const next = (): Entry | undefined => {
    const queued = again.peek();
    if (at < count) {
      const i = order[at];
      const first: Entry = { pair: i, score: firstScore[i], option: pairs[i].anchors.length > 0 ? 0 : -1 };
      if (queued === undefined || !before(queued, first)) {
        at++;
        return first;
      }
    }
    return again.pop();
  };
  const perSource = new Map<number, number>();
  const perTarget = new Map<number, number>();
  const used = new Map<number, [number, number][]>();
  const out: Chosen[] = [];
  for (let e = next(); e !== undefined; e = next()) {
    const pair = pairs[e.pair];
    if ((perSource.get(pair.source) ?? 0) >= maxPerSource || (perTarget.get(pair.target) ?? 0) >= maxPerTarget) continue;
    let anchor: AnchorMatch | null = null;
    if (e.option >= 0) {
      const taken = used.get(pair.source) ?? [];
      const free = (a: AnchorMatch): boolean => !taken.some(([s, t]) => a.offset < t && s < a.endOffset);
      let k = e.option;
      while (k < pair.anchors.length && !free(pair.anchors[k])) k++;
      if (k === pair.anchors.length) {
        again.push({ pair: e.pair, score: Math.min(pair.score, pair.scoreWithoutAnchor), option: -1 });
        continue;
      }
      anchor = pair.anchors[k];
      taken.push([anchor.offset, anchor.endOffset]);
      used.set(pair.source, taken);
    }
    perSource.set(pair.source, (perSource.get(pair.source) ?? 0) + 1);
    perTarget.set(pair.target, (perTarget.get(pair.target) ?? 0) + 1);
    out.push({ pair, anchor, score: e.score });
  }
  return out;
}

/** A binary heap; `before(a, b)` is true when a comes out first. */
class Heap<T> {
  private readonly items: T[] = [];

  constructor(private readonly before: (a: T, b: T) => boolean) {}

  /** The item that would come out next, left in place. */
  peek(): T | undefined {
    return this.items[0];
  }

  push(item: T): void {
    const items = this.items;
    items.push(item);
    let i = items.length - 1;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (!this.before(items[i], items[parent])) break;
      [items[i], items[parent]] = [items[parent], items[i]];
      i = parent;
    }
  }

  pop(): T | undefined {
    const items = this.items;
    if (items.length === 0) return undefined;
    const top = items[0];
    const last = items.pop()!;
    if (items.length > 0) {
      items[0] = last;
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        const r = l + 1;
        let best = i;
        if (l < items.length && this.before(items[l], items[best])) best = l;
        if (r < items.length && this.before(items[r], items[best])) best = r;
        if (best === i) break;
        [items[i], items[best]] = [items[best], items[i]];
        i = best;
      }
    }
    return top;
  }
}
