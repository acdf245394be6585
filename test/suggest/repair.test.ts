import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { repairPlan } from '../../src/suggest/repair.js';
import { clickDepth, depthMask, rankGraph } from '../../src/rank/index.js';
import { edgeGraph, random, randomGraph, testOptions } from './helpers.js';

const options = testOptions({ maxDepth: 3 });

describe('repairPlan', () => {
  // 0 -> 1 -> 2 -> 3 -> 4 -> 5 -> 6 (4, 5, 6 too deep); 7 -> 8 -> 9 unreachable.
  const graph = edgeGraph(10, [[0, 1, 1], [1, 2, 1], [2, 3, 1], [3, 4, 1], [4, 5, 1], [5, 6, 1], [7, 8, 1], [8, 9, 1]]);
  const ranking = rankGraph(graph, options);

  it('takes the one link that fixes a whole chain rather than several partial ones', () => {
    const plan = repairPlan(graph, ranking, options, [
      { id: 'b', source: 1, target: 5, score: 0.9 },
      { id: 'a', source: 0, target: 4, score: 0.1 },
      { id: 'c', source: 2, target: 6, score: 0.9 },
    ]);
    expect(plan).toEqual({ maxDepth: 3, tooDeepBefore: 6, tooDeepAfter: 3, suggestionIds: ['a'] });
  });

  it('uses a link whose source only becomes reachable through another link of the plan', () => {
    // 0 -> 8 brings 8 (depth 1) and 9 (2); then 9 -> 7 brings 7 (3). 7 -> 4 alone would do nothing first.
    const plan = repairPlan(graph, ranking, options, [
      { id: 'x', source: 9, target: 7, score: 0.5 },
      { id: 'y', source: 0, target: 8, score: 0.5 },
      { id: 'z', source: 0, target: 4, score: 0.5 },
    ]);
    expect(plan.suggestionIds).toEqual(['z', 'y', 'x']);
    expect(plan.tooDeepAfter).toBe(0);
  });

  it('reports what a full BFS with every chosen link gives, on random graphs', () => {
    const mask = depthMask(options);
    fc.assert(
      fc.property(fc.integer(), fc.integer({ min: 3, max: 50 }), (seed, n) => {
        const rnd = random(seed);
        const g = randomGraph(rnd, n, 1);
        const r = rankGraph(g, options);
        const candidates = Array.from({ length: 12 }, (_, i) => ({
          id: `s${i}`,
          source: Math.floor(rnd() * n),
          target: Math.floor(rnd() * n),
          score: rnd(),
        })).filter((c) => c.source !== c.target);
        const plan = repairPlan(g, r, options, candidates);
        const links = plan.suggestionIds.map((id) => candidates.find((c) => c.id === id)!).map((c) => ({ from: c.source, to: c.target }));
        const count = (d: Int32Array): number => [...d].filter((x) => x < 0 || x > 3).length;
        expect(plan.tooDeepBefore).toBe(count(r.depth));
        expect(plan.tooDeepAfter).toBe(count(clickDepth(g.forward, g.entries, mask, links)));
        // every chosen link fixed something when it was chosen: dropping the plan's last link loses a fix
        if (links.length > 0) {
          expect(count(clickDepth(g.forward, g.entries, mask, links.slice(0, -1)))).toBeGreaterThan(plan.tooDeepAfter);
        }
        // no remaining candidate would fix anything more
        for (const c of candidates) {
          expect(count(clickDepth(g.forward, g.entries, mask, [...links, { from: c.source, to: c.target }]))).toBe(plan.tooDeepAfter);
        }
      }),
      { numRuns: 100 },
    );
  });
});
