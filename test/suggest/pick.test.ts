import { describe, it, expect } from 'vitest';
import { pickUnderCaps } from '../../src/suggest/pick.js';
import type { Chosen, ScoredPair } from '../../src/suggest/pick.js';
import { aboveFloor, bestOfStranded } from '../../src/suggest/rank-candidates.js';
import type { AnchorMatch } from '../../src/suggest/anchor.js';
import { random } from './helpers.js';

const anchor = (offset: number, endOffset: number): AnchorMatch => ({
  offset,
  endOffset,
  line: 1,
  column: offset + 1,
  text: 'x'.repeat(endOffset - offset),
  kind: 'title',
  words: 1,
  quality: 1,
});
const pair = (source: number, target: number, base: number, anchors: AnchorMatch[] = [anchor(source * 100, source * 100 + 5)]): ScoredPair => ({
  source,
  target,
  similarity: base,
  score: base,
  // As if the source did not mention the target: the model's score without the name evidence.
  scoreWithoutAnchor: base / 4,
  anchors,
});

describe('pickUnderCaps', () => {
  it('takes the best scores first under the per-source and per-target caps', () => {
    const pairs = [
      pair(1, 10, 0.9, [anchor(0, 5)]),
      pair(1, 11, 0.8, [anchor(10, 15)]),
      pair(1, 12, 0.7, [anchor(20, 25)]),
      pair(2, 10, 0.6),
      pair(3, 10, 0.5),
    ];
    const chosen = pickUnderCaps(pairs, 2, 2);
    expect(chosen.map((c) => [c.pair.source, c.pair.target])).toEqual([
      [1, 10],
      [1, 11],
      [2, 10],
    ]);
  });

  it('gives a second target of the same source the next phrase, or none at a lower score', () => {
    const shared = [anchor(0, 12), anchor(40, 52)];
    const chosen = pickUnderCaps([pair(1, 10, 0.9, [anchor(0, 12)]), pair(1, 11, 0.8, shared), pair(1, 12, 0.7, [anchor(5, 9)])], 5, 5);
    expect(chosen.map((c) => [c.pair.target, c.anchor?.offset ?? null, c.score])).toEqual([
      [10, 0, 0.9],
      [11, 40, 0.8],
      [12, null, 0.7 / 4],
    ]);
  });

  it('ranks a pair without anchor below a weaker pair with one', () => {
    const chosen = pickUnderCaps([pair(1, 10, 0.5, []), pair(2, 10, 0.3)], 5, 1);
    expect(chosen.map((c) => c.pair.source)).toEqual([2]);
  });

  it('breaks equal scores by target, then source', () => {
    const chosen = pickUnderCaps([pair(3, 11, 0.5), pair(2, 11, 0.5), pair(4, 10, 0.5)], 5, 5);
    expect(chosen.map((c) => [c.pair.target, c.pair.source])).toEqual([
      [10, 4],
      [11, 2],
      [11, 3],
    ]);
  });

  it('chooses as the plain greedy rule does (best remaining first, by a search of every entry) on random pairs', () => {
    // The rule written the slow, obvious way: every step searches all waiting entries.
    const greedy = (pairs: readonly ScoredPair[], maxPerSource: number, maxPerTarget: number): [number, number, number | null, number][] => {
      const waiting = pairs.map((p, i) => ({ i, score: p.anchors.length > 0 ? p.score : Math.min(p.score, p.scoreWithoutAnchor), option: p.anchors.length > 0 ? 0 : -1 }));
      const perSource = new Map<number, number>();
      const perTarget = new Map<number, number>();
      const taken = new Map<number, [number, number][]>();
      const out: [number, number, number | null, number][] = [];
      while (waiting.length > 0) {
        let best = 0;
        for (let k = 1; k < waiting.length; k++) {
          const a = waiting[k]!;
          const b = waiting[best]!;
          const pa = pairs[a.i]!;
          const pb = pairs[b.i]!;
          if (a.score > b.score || (a.score === b.score && (pa.target < pb.target || (pa.target === pb.target && pa.source < pb.source)))) best = k;
        }
        const e = waiting.splice(best, 1)[0]!;
        const p = pairs[e.i]!;
        if ((perSource.get(p.source) ?? 0) >= maxPerSource || (perTarget.get(p.target) ?? 0) >= maxPerTarget) continue;
        let at: number | null = null;
        if (e.option >= 0) {
          const used = taken.get(p.source) ?? [];
          const free = p.anchors.find((a) => !used.some(([s, t]) => a.offset < t && s < a.endOffset));
          if (free === undefined) {
            waiting.push({ i: e.i, score: Math.min(p.score, p.scoreWithoutAnchor), option: -1 });
            continue;
          }
          used.push([free.offset, free.endOffset]);
          taken.set(p.source, used);
          at = free.offset;
        }
        perSource.set(p.source, (perSource.get(p.source) ?? 0) + 1);
        perTarget.set(p.target, (perTarget.get(p.target) ?? 0) + 1);
        out.push([p.source, p.target, at, e.score]);
      }
      return out;
    };
    for (let seed = 1; seed <= 20; seed++) {
      const rnd = random(seed);
      const pairs: ScoredPair[] = [];
      for (let s = 0; s < 25; s++) {
        for (let t = 0; t < 25; t++) {
          if (s === t || rnd() < 0.6) continue;
          // Scores on a coarse grid, so ties are common; anchors that overlap within a source.
          const score = Math.floor(rnd() * 8) / 8;
          const anchors = Array.from({ length: Math.floor(rnd() * 3) }, () => {
            const at = Math.floor(rnd() * 6) * 10;
            return anchor(at, at + 5 + Math.floor(rnd() * 10));
          });
          pairs.push({ ...pair(s, t, score, anchors), scoreWithoutAnchor: Math.floor(rnd() * 8) / 8 });
        }
      }
      const perSource = 1 + Math.floor(rnd() * 3);
      const perTarget = 1 + Math.floor(rnd() * 3);
      const chosen = pickUnderCaps(pairs, perSource, perTarget).map((c) => [c.pair.source, c.pair.target, c.anchor?.offset ?? null, c.score]);
      expect(chosen.length).toBeGreaterThan(10);
      expect(chosen).toEqual(greedy(pairs, perSource, perTarget));
    }
  });
});

describe('the least score, and the pages no entry page reaches', () => {
  const chosen = (source: number, target: number, score: number, anchored = true): Chosen => ({ pair: pair(source, target, score), anchor: anchored ? anchor(source * 100, source * 100 + 5) : null, score });
  // Pages 0-2 are reached from an entry page; 3, 4 and 5 are not (depth -1).
  const depth = [0, 1, 2, -1, -1, -1];
  const at = (list: Chosen[]) => list.map((c) => [c.pair.source, c.pair.target]);

  it('keeps what reaches the floor, and for a stranded target whose suggestions all fall under it those that reach a fifth of it', () => {
    const list = [chosen(0, 1, 0.5), chosen(2, 1, 0.03), chosen(0, 3, 0.03), chosen(1, 3, 0.04), chosen(2, 3, 0.005), chosen(0, 4, 0.2), chosen(1, 4, 0.02), chosen(0, 5, 0.009)];
    // Target 1 is reached from an entry page, target 4 has a suggestion over the floor: their
    // weak ones go. Target 5's best is under a fifth of the floor.
    expect(at(aboveFloor(list, 0.05, depth))).toEqual([
      [0, 1],
      [0, 3],
      [1, 3],
      [0, 4],
    ]);
    expect(at(aboveFloor(list, 0.05, null))).toEqual([
      [0, 1],
      [0, 4],
    ]);
  });

  it('then keeps one of a stranded target, the best with an anchor phrase', () => {
    const list = [chosen(0, 1, 0.5), chosen(0, 3, 0.03), chosen(1, 3, 0.04, false), chosen(2, 3, 0.03), chosen(1, 4, 0.02, false)];
    expect(at(bestOfStranded(list, 0.05))).toEqual([
      [0, 1],
      [0, 3],
    ]);
  });
});
