import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { pagerank } from '../../src/rank/pagerank.js';
import type { ExtraEdge } from '../../src/rank/pagerank.js';
import { pagerankScenarios } from '../../src/rank/pagerank-batch.js';
import { outWeightSums } from '../../src/graph/csr.js';
import { csrOf, prng, randomGraph } from './graphs.js';
import type { Edge } from './graphs.js';

const STRICT = { damping: 0.85, maxIterations: 1000, tolerance: 1e-10 };

/** A cold run (no warm start) on the graph with the scenario's edges really in the CSR. */
function coldWithEdges(n: number, edges: readonly Edge[], extra: readonly ExtraEdge[], teleport: Float64Array | undefined): Float64Array {
  const { forward, reverse } = csrOf(n, [...edges, ...extra.map((e): Edge => [e.from, e.to, e.weight])]);
  return pagerank(forward, reverse, n, { ...STRICT, ...(teleport === undefined ? {} : { teleport }) }).scores;
}

const allNodes = (n: number): number[] => Array.from({ length: n }, (_, v) => v);

/**
 * A random case: a small graph with dangling nodes and template edges (weight 0.25, exact in
 * float32, so a merged pair's weight is exact in the rebuilt CSR too), scenarios of one to three
 * extra edges drawn to hit the awkward cases on purpose: a dangling source, a source that already
 * links to the target (weights merge), a self-edge (dropped).
 */
const caseArb = fc.record({
  seed: fc.integer(),
  n: fc.integer({ min: 2, max: 50 }),
  degree: fc.integer({ min: 0, max: 5 }),
  scenarios: fc.integer({ min: 1, max: 30 }),
  lanes: fc.integer({ min: 1, max: 9 }),
  entryTeleport: fc.boolean(),
});

function makeCase(c: { seed: number; n: number; degree: number; scenarios: number; entryTeleport: boolean }) {
  const { n } = c;
  const rnd = prng(c.seed);
  const edges = randomGraph(n, c.seed, c.degree);
  const { forward } = csrOf(n, edges);
  const out = outWeightSums(forward, n);
  const dangling = allNodes(n).filter((u) => out[u] === 0);
  const pick = (list: readonly number[]): number => list[Math.floor(rnd() * list.length)]!;
  const extraEdge = (): ExtraEdge => {
    const kind = rnd();
    if (kind < 0.25 && dangling.length > 0) return { from: pick(dangling), to: Math.floor(rnd() * n), weight: 1 };
    if (kind < 0.5 && forward.targets.length > 0) {
      const e = Math.floor(rnd() * forward.targets.length);
      let u = 0;
      while (forward.offsets[u + 1]! <= e) u++;
      return { from: u, to: forward.targets[e]!, weight: 1 }; // an existing pair: weights merge
    }
    if (kind < 0.55) {
      const u = Math.floor(rnd() * n);
      return { from: u, to: u, weight: 1 }; // self-edge: dropped
    }
    return { from: Math.floor(rnd() * n), to: Math.floor(rnd() * n), weight: rnd() < 0.8 ? 1 : 0.25 };
  };
  const scenarios = Array.from({ length: c.scenarios }, () => Array.from({ length: 1 + Math.floor(rnd() * 3) }, extraEdge));
  let teleport: Float64Array | undefined;
  if (c.entryTeleport) {
    teleport = new Float64Array(n);
    teleport[0] = 1; // teleport 'entry' with entry pages 0 and (when there is one) 1
    if (n > 1) teleport[1] = 1;
  }
  return { edges, scenarios, teleport };
}

describe('pagerankScenarios', () => {
  it('each scenario equals a cold pagerank run on the graph with its edges added, within 1e-9', () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const { n } = c;
        const { edges, scenarios, teleport } = makeCase(c);
        const { forward, reverse } = csrOf(n, edges);
        const opts = { ...STRICT, ...(teleport === undefined ? {} : { teleport }) };
        const base = pagerank(forward, reverse, n, opts).scores;
        const result = pagerankScenarios(forward, reverse, n, { ...opts, lanes: c.lanes }, scenarios, base, scenarios.map(() => allNodes(n)));
        scenarios.forEach((extra, s) => {
          expect(result.converged[s]).toBe(1);
          const cold = coldWithEdges(n, edges, extra, teleport);
          for (let v = 0; v < n; v++) expect(Math.abs(result.values[s]![v]! - cold[v]!)).toBeLessThan(1e-9);
        });
      }),
      { numRuns: 80 },
    );
  });

  it('gives the same numbers, bit for bit, whatever the lane count and as pagerank with start and extraEdges', () => {
    const n = 400;
    const edges = randomGraph(n, 7, 6);
    const { forward, reverse } = csrOf(n, edges);
    const base = pagerank(forward, reverse, n, STRICT).scores;
    const rnd = prng(11);
    const scenarios = Array.from({ length: 37 }, (): ExtraEdge[] => [{ from: Math.floor(rnd() * n), to: Math.floor(rnd() * n), weight: 1 }]);
    const at = scenarios.map(() => allNodes(n));
    const one = pagerankScenarios(forward, reverse, n, { ...STRICT, lanes: 1 }, scenarios, base, at);
    for (const lanes of [4, 16, 64]) {
      const many = pagerankScenarios(forward, reverse, n, { ...STRICT, lanes }, scenarios, base, at);
      expect(many.values).toEqual(one.values);
      expect([...many.iterations]).toEqual([...one.iterations]);
    }
    // The single-run path, warm-started the same way, agrees far inside the tolerance.
    scenarios.forEach((extra, s) => {
      const warm = pagerank(forward, reverse, n, { ...STRICT, start: base, extraEdges: extra });
      for (let v = 0; v < n; v++) expect(Math.abs(one.values[s]![v]! - warm.scores[v]!)).toBeLessThan(1e-12);
      expect(Math.abs(one.iterations[s]! - warm.iterations)).toBeLessThanOrEqual(1);
    });
  });

  it('reports the targets of each scenario by default, and a dangling source stops dangling', () => {
    // 0 -> 1, page 1 dangling. Adding 1 -> 0 makes a 2-cycle: 1/2 each (hand-derived).
    const { forward, reverse } = csrOf(2, [[0, 1, 1]]);
    const base = pagerank(forward, reverse, 2, STRICT).scores;
    const r = pagerankScenarios(forward, reverse, 2, STRICT, [[{ from: 1, to: 0, weight: 1 }], [{ from: 0, to: 1, weight: 1 }]], base);
    expect(r.values[0]!.length).toBe(1);
    expect(r.values[0]![0]).toBeCloseTo(0.5, 10);
    // 0 -> 1 again (weights merge, shares unchanged): page 1 keeps its rank.
    expect(r.values[1]![0]).toBeCloseTo(base[1]!, 10);
    expect(r.iterations[1]).toBe(1);
  });

  it('stops a scenario at maxIterations and says it did not converge', () => {
    const n = 300;
    const { forward, reverse } = csrOf(n, randomGraph(n, 3));
    const uniform = new Float64Array(n).fill(1 / n);
    const r = pagerankScenarios(forward, reverse, n, { ...STRICT, maxIterations: 2 }, [[{ from: 5, to: 9, weight: 1 }]], uniform);
    expect(r.iterations[0]).toBe(2);
    expect(r.converged[0]).toBe(0);
  });

  it('returns empty results for no scenarios and rejects bad input with an EngineError', () => {
    const { forward, reverse } = csrOf(3, [[0, 1, 1]]);
    const start = new Float64Array(3).fill(1 / 3);
    expect(pagerankScenarios(forward, reverse, 3, STRICT, [], start).values).toEqual([]);
    expect(() => pagerankScenarios(forward, reverse, 3, STRICT, [[{ from: 0, to: 9, weight: 1 }]], start)).toThrow(/scenario 0: extra edge 0 -> 9/);
    expect(() => pagerankScenarios(forward, reverse, 4, STRICT, [], new Float64Array(4))).toThrow(/forward CSR has 3 nodes, expected 4/);
    expect(() => pagerankScenarios(forward, reverse, 3, STRICT, [[]], new Float64Array(2))).toThrow(/start has 2 nodes/);
    expect(() => pagerankScenarios(forward, reverse, 3, STRICT, [[]], start, [[7]])).toThrow(/node 7 to report/);
  });
});
