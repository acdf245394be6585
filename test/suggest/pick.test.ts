import { describe, it, expect } from 'vitest';
import { pickUnderCaps } from '../../src/suggest/pick.js';
import type { ScoredPair } from '../../src/suggest/pick.js';
import type { AnchorMatch } from '../../src/suggest/anchor.js';

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
  features: [],
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
});
