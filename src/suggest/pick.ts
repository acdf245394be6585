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
  /** The pair's feature vector (`features.ts`), for the reason text. */
  readonly features: readonly number[];
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
 * @returns chosen pairs in the order they were chosen
 */
export function pickUnderCaps(pairs: readonly ScoredPair[], maxPerSource: number, maxPerTarget: number): Chosen[] {
  const before = (a: Entry, b: Entry): boolean => {
    if (a.score !== b.score) return a.score > b.score;
    const pa = pairs[a.pair];
    const pb = pairs[b.pair];
    return pa.target !== pb.target ? pa.target < pb.target : pa.source < pb.source;
  };
  const heap = new Heap<Entry>(before);
  pairs.forEach((p, i) => heap.push({ pair: i, score: p.anchors.length > 0 ? p.score : Math.min(p.score, p.scoreWithoutAnchor), option: p.anchors.length > 0 ? 0 : -1 }));
  const perSource = new Map<number, number>();
  const perTarget = new Map<number, number>();
  const used = new Map<number, [number, number][]>();
  const out: Chosen[] = [];
  for (let e = heap.pop(); e !== undefined; e = heap.pop()) {
    const pair = pairs[e.pair];
    if ((perSource.get(pair.source) ?? 0) >= maxPerSource || (perTarget.get(pair.target) ?? 0) >= maxPerTarget) continue;
    let anchor: AnchorMatch | null = null;
    if (e.option >= 0) {
      const taken = used.get(pair.source) ?? [];
      const free = (a: AnchorMatch): boolean => !taken.some(([s, t]) => a.offset < t && s < a.endOffset);
      let k = e.option;
      while (k < pair.anchors.length && !free(pair.anchors[k])) k++;
      if (k === pair.anchors.length) {
        heap.push({ pair: e.pair, score: Math.min(pair.score, pair.scoreWithoutAnchor), option: -1 });
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
