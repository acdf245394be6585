/**
 * The metric definitions on hand-computed lists. Recall and precision at k and the reciprocal
 * rank are the usual ranked-retrieval measures (Manning, Raghavan and Schuetze, "Introduction to
 * Information Retrieval", 2008, ch. 8; mean reciprocal rank as in the TREC-8 question answering
 * track, Voorhees 1999) (from memory); every expected value below is worked out by hand in the
 * comments.
 */
import { describe, expect, it } from 'vitest';
import { heldOutByTarget, scoreMethod, spread } from '../../src/backtest/index.js';
import type { HeldOutPair, RankedSource } from '../../src/backtest/index.js';
import { createStemCache } from '../../src/text/index.js';

const pair = (source: number, target: number, text = 'x', offset = -1): HeldOutPair => ({
  source,
  target,
  links: [{ line: 1, textLine: 1, column: 1, text, offset, endOffset: offset < 0 ? -1 : offset + text.length }],
});
const item = (source: number, anchor: string | null = null, offset = -1, line = -1): RankedSource => ({
  source,
  anchor,
  offset,
  endOffset: anchor === null || offset < 0 ? -1 : offset + anchor.length,
  line,
});

describe('scoreMethod', () => {
  // Target 100: held-out sources {1, 2}; list 1, 9, 2, then seven misses.
  // Target 200: held-out source {3}; list 5, 6, ..., 3 at rank 6.
  // Target 300: held-out source {4}; empty list.
  const truth = heldOutByTarget([
    pair(1, 100, 'Cache eviction rules', 10),
    pair(2, 100, 'eviction'),
    pair(3, 200, 'Warming the tile cache', 40),
    pair(4, 300),
  ]);
  const lists = new Map<number, RankedSource[]>([
    [100, [item(1, 'evicting entries', 50), item(9), item(2, 'the home page', 0), ...[10, 11, 12, 13, 14, 15, 16].map((s) => item(s))]],
    [200, [5, 6, 7, 8, 9].map((s) => item(s)).concat([item(3, 'tile cache', 52)])],
  ]);

  it('computes recall, precision and MRR as means over the targets with held-out inlinks', () => {
    const m = scoreMethod('linkweave', lists, truth, { overlap: true, inPlace: true }, createStemCache());
    // hits@1: 1, 0, 0 -> recall (1/2 + 0 + 0) / 3 = 1/6; precision (1 + 0 + 0) / 3 = 1/3
    // hits@5: 2, 0, 0 -> recall (2/2) / 3 = 1/3; precision (2/5) / 3 = 2/15
    // hits@10: 2, 1, 0 -> recall (1 + 1 + 0) / 3 = 2/3; precision (2/10 + 1/10) / 3 = 1/10
    expect(m.recall[0]).toBeCloseTo(1 / 6, 12);
    expect(m.recall[1]).toBeCloseTo(1 / 3, 12);
    expect(m.recall[2]).toBeCloseTo(2 / 3, 12);
    expect(m.precision[0]).toBeCloseTo(1 / 3, 12);
    expect(m.precision[1]).toBeCloseTo(2 / 15, 12);
    expect(m.precision[2]).toBeCloseTo(1 / 10, 12);
    // first hits at ranks 1, 6, none -> (1 + 1/6 + 0) / 3 = 7/18
    expect(m.mrr).toBeCloseTo(7 / 18, 12);
    expect(m.recovered).toBe(3);
  });

  it('computes anchor overlap on Porter stems and anchor place on offsets, over recovered pairs', () => {
    const m = scoreMethod('linkweave', lists, truth, { overlap: true, inPlace: true }, createStemCache());
    // "evicting entries" vs "Cache eviction rules": stems evict/entri vs cach/evict/rule -> overlap
    // "the home page" vs "eviction": none; "tile cache" vs "Warming the tile cache": tile, cach
    expect(m.anchorOverlap).toBeCloseTo(2 / 3, 12);
    // in place: [50, 66) vs [10, 30) no; pair 2's text has no place; [52, 62) vs [40, 62) yes
    expect(m.anchorInPlace).toBeCloseTo(1 / 3, 12);
  });

  it('computes line match over recovered pairs: an anchor on a held-out link line matches, none does not', () => {
    // Held-out links are all on line 1. Target 400: sources 1 (anchor on line 1), 2 (line 3),
    // 3 (no anchor) recovered; source 9 is not held out and does not count.
    const truth400 = heldOutByTarget([pair(1, 400), pair(2, 400), pair(3, 400)]);
    const lists400 = new Map([[400, [item(9, 'a', 0, 1), item(1, 'b', 5, 1), item(2, 'c', 9, 3), item(3)]]]);
    const m = scoreMethod('linkweave', lists400, truth400, { overlap: true, inPlace: false }, createStemCache());
    expect(m.recovered).toBe(3);
    expect(m.lineMatch).toBeCloseTo(1 / 3, 12);
    expect(scoreMethod('tfidf', lists400, truth400, { overlap: false, inPlace: false }, createStemCache()).lineMatch).toBeNull();
  });

  it('gives null anchor metrics to a method without anchors, and ignores list entries past ten', () => {
    const long = new Map([[300, [...Array.from({ length: 10 }, (_, i) => item(50 + i)), item(4)]]]);
    const m = scoreMethod('random', long, heldOutByTarget([pair(4, 300)]), { overlap: false, inPlace: false }, createStemCache());
    expect(m.anchorOverlap).toBeNull();
    expect(m.anchorInPlace).toBeNull();
    expect(m.recall).toEqual([0, 0, 0]);
    expect(m.mrr).toBe(0);
  });
});

describe('spread', () => {
  it('gives the mean and the sample standard deviation', () => {
    // 2, 4, 4, 4, 5, 5, 7, 9: mean 5, squared deviations sum 32, sample sd sqrt(32 / 7)
    // (the population sd of this textbook example is 2; from memory, re-derived by hand)
    const s = spread([2, 4, 4, 4, 5, 5, 7, 9]);
    expect(s.mean).toBe(5);
    expect(s.sd).toBeCloseTo(Math.sqrt(32 / 7), 12);
    expect(spread([0.25])).toEqual({ mean: 0.25, sd: 0 });
    expect(spread([null, 1, null, 3])).toEqual({ mean: 2, sd: Math.SQRT2 });
    expect(spread([null])).toEqual({ mean: null, sd: null });
  });
});
