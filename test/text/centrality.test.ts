import { describe, it, expect } from 'vitest';
import { contentCentrality } from '../../src/text/centrality.js';
import type { RelatedList } from '../../src/types.js';

const list = (page: number, ...related: [number, number][]): RelatedList => ({
  page,
  related: related.map(([p, similarity]) => ({ page: p, similarity })),
});

describe('contentCentrality', () => {
  it('is a distribution that favours the page every other page resembles', () => {
    // Page 0 resembles pages 1-4; they resemble only page 0 (a star in the similarity graph).
    const related = [
      list(0, [1, 0.5], [2, 0.5], [3, 0.5], [4, 0.5]),
      list(1, [0, 0.5]),
      list(2, [0, 0.5]),
      list(3, [0, 0.5]),
      list(4, [0, 0.5]),
    ];
    const c = contentCentrality(related, 5);
    expect(c.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
    for (let p = 1; p < 5; p++) expect(c[0]).toBeGreaterThan(c[p]!);
    expect(c[1]).toBeCloseTo(c[4]!, 12);
  });

  it('matches the hand-computed walk on a pair plus a page without related pages', () => {
    // Pages 0 and 1 list each other (one undirected edge); page 2 is dangling. With damping d and
    // uniform teleport: x2 = (1 - d)/3 + d * x2/3, so x2 = (1 - d)/(3 - d); x0 = x1 = (1 - x2)/2.
    const d = 0.85;
    const c = contentCentrality([list(0, [1, 0.3]), list(1, [0, 0.3]), list(2)], 3);
    const x2 = (1 - d) / (3 - d);
    expect(c[2]).toBeCloseTo(x2, 9);
    expect(c[0]).toBeCloseTo((1 - x2) / 2, 9);
    expect(c[1]).toBeCloseTo((1 - x2) / 2, 9);
  });

  it('counts a pair listed by both pages once, like a pair listed by one', () => {
    const both = contentCentrality([list(0, [1, 0.4]), list(1, [0, 0.4], [2, 0.2]), list(2, [1, 0.2])], 3);
    const once = contentCentrality([list(0, [1, 0.4]), list(1, [2, 0.2]), list(2)], 3);
    [...both].forEach((x, i) => expect(x).toBeCloseTo(once[i]!, 12));
  });

  it('gives every page the same share when nothing is related', () => {
    expect([...contentCentrality([list(0), list(1)], 2)]).toEqual([0.5, 0.5]);
  });
});
