import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { DepthState, pagerankWithLinks, rankModel } from '../../src/suggest/impact.js';
import { clickDepth, depthMask, pagerank, rankGraph, teleportVector } from '../../src/rank/index.js';
import { edgeGraph, random, randomGraph, testOptions, withEdges } from './helpers.js';

const graphArb = fc.record({ seed: fc.integer(), n: fc.integer({ min: 2, max: 60 }), degree: fc.integer({ min: 0, max: 4 }) });

describe('predicted PageRank', () => {
  it('equals a cold recomputation on the modified graph within 1e-9', () => {
    for (const teleport of ['uniform', 'entry'] as const) {
      const options = testOptions({ teleport });
      fc.assert(
        fc.property(graphArb, fc.integer(), ({ seed, n, degree }, pick) => {
          const rnd = random(seed);
          const graph = randomGraph(rnd, n, degree);
          const ranking = rankGraph(graph, options);
          const from = Math.abs(pick) % n;
          // A target the source has no edge to yet (as for a suggestion), so that the rebuilt CSR
          // holds the new weight exactly (a merged weight would be rounded to float32).
          const linked = new Set(graph.forward.targets.subarray(graph.forward.offsets[from], graph.forward.offsets[from + 1]));
          const free = Array.from({ length: n }, (_, v) => v).filter((v) => v !== from && !linked.has(v));
          if (free.length === 0) return;
          const to = free[Math.abs(pick >> 8) % free.length]!;
          const predicted = pagerankWithLinks(rankModel(graph, ranking, options), [{ from, to }]);
          const modified = withEdges(graph, [{ from, to }]);
          const t = teleportVector(modified, options);
          const cold = pagerank(modified.forward, modified.reverse, n, {
            damping: options.damping,
            maxIterations: options.pagerankIterations,
            tolerance: options.pagerankTolerance,
            ...(t === null ? {} : { teleport: t }),
          }).scores;
          for (let v = 0; v < n; v++) expect(Math.abs(predicted[v]! - cold[v]!)).toBeLessThan(1e-9);
        }),
        { numRuns: 60 },
      );
    }
  });

  it('raises the target of the new link', () => {
    // 0 -> 1 -> 2, 2 -> 0; page 3 only links to 0. Adding 0 -> 3 raises page 3.
    const options = testOptions();
    const graph = edgeGraph(4, [[0, 1, 1], [1, 2, 1], [2, 0, 1], [3, 0, 1]]);
    const ranking = rankGraph(graph, options);
    const after = pagerankWithLinks(rankModel(graph, ranking, options), [{ from: 0, to: 3 }]);
    expect(after[3]).toBeGreaterThan(ranking.pagerank[3]!);
    expect(after.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
  });
});

describe('predicted click depth', () => {
  it('equals BFS on the modified graph, link by link', () => {
    for (const depthCountsTemplate of [true, false]) {
      const options = testOptions({ depthCountsTemplate });
      const mask = depthMask(options);
      fc.assert(
        fc.property(graphArb, fc.array(fc.tuple(fc.nat(), fc.nat()), { minLength: 1, maxLength: 6 }), ({ seed, n, degree }, picks) => {
          const graph = randomGraph(random(seed), n, degree);
          const ranking = rankGraph(graph, options);
          const state = new DepthState(graph.forward, ranking.depth, mask);
          const added: { from: number; to: number }[] = [];
          for (const [a, b] of picks) {
            const link = { from: a % n, to: b % n };
            if (link.from === link.to) continue;
            const withLink = clickDepth(graph.forward, graph.entries, mask, [...added, link]);
            expect(state.depthWith(link.from, link.to)).toBe(withLink[link.to]);
            // gain: pages brought within maxDepth, from the full BFS before and after
            const before = clickDepth(graph.forward, graph.entries, mask, added);
            const out = (d: number): boolean => d < 0 || d > options.maxDepth;
            let fixed = 0;
            for (let v = 0; v < n; v++) if (out(before[v]!) && !out(withLink[v]!)) fixed++;
            expect(state.gain(link.from, link.to, options.maxDepth, () => true)).toBe(fixed);
            state.add(link.from, link.to);
            added.push(link);
            expect([...state.depth]).toEqual([...withLink]);
          }
        }),
        { numRuns: 100 },
      );
    }
  });
});
