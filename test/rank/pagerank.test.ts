import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { DirectedGraph } from 'graphology';
import pagerankModule from 'graphology-metrics/centrality/pagerank.js';
import { pagerank } from '../../src/rank/index.js';
import { outWeightSums } from '../../src/graph/csr.js';
import { csrOf, randomGraph } from './graphs.js';
import type { Edge } from './graphs.js';

// A CommonJS module: under NodeNext its default import is `module.exports`, the function itself,
// while its .d.ts describes an ES default export.
const graphologyPagerank = pagerankModule as unknown as typeof pagerankModule.default;

const STRICT = { damping: 0.85, maxIterations: 1000, tolerance: 1e-10 };

function run(n: number, edges: readonly Edge[], opts: Partial<typeof STRICT> & { teleport?: Float64Array } = {}) {
  const { forward, reverse } = csrOf(n, edges);
  return pagerank(forward, reverse, n, { ...STRICT, ...opts });
}

function sum(v: Float64Array): number {
  let s = 0;
  for (const x of v) s += x;
  return s;
}

describe('PageRank against published and hand-derived values', () => {
  it('Manning, Raghavan and Schuetze (2008) ch. 21 example, damping 0.5: (5/18, 4/9, 5/18)', () => {
    // Pages 1 -> 2, 2 -> 1, 2 -> 3, 3 -> 2 (ids 0, 1, 2 here).
    const r = run(3, [[0, 1, 1], [1, 0, 1], [1, 2, 1], [2, 1, 1]], { damping: 0.5 });
    expect(r.converged).toBe(true);
    expect(r.scores[0]).toBeCloseTo(5 / 18, 9);
    expect(r.scores[1]).toBeCloseTo(4 / 9, 9);
    expect(r.scores[2]).toBeCloseTo(5 / 18, 9);
  });

  it('a directed cycle gives every page 1/n, for any damping (common practice, no source)', () => {
    for (const damping of [0.15, 0.5, 0.85, 0.99]) {
      const n = 7;
      const r = run(n, Array.from({ length: n }, (_, i): Edge => [i, (i + 1) % n, 1]), { damping });
      for (const x of r.scores) expect(x).toBeCloseTo(1 / n, 10);
    }
  });

  it('a star whose leaves link to the hub ranks the hub highest (common practice, no source)', () => {
    const n = 9;
    const r = run(n, Array.from({ length: n - 1 }, (_, i): Edge => [i + 1, 0, 1]));
    for (let i = 1; i < n; i++) expect(r.scores[0]).toBeGreaterThan(r.scores[i]! * 4);
    expect(sum(r.scores)).toBeCloseTo(1, 12);
  });

  it('dangling mass goes back through the teleport vector (two pages, derived by hand)', () => {
    // 0 -> 1, page 1 dangling, d = 0.85, uniform: x0 = 0.075 + 0.425 x1, x0 + x1 = 1 -> x0 = 20/57.
    const r = run(2, [[0, 1, 1]]);
    expect(r.scores[0]).toBeCloseTo(20 / 57, 10);
    expect(r.scores[1]).toBeCloseTo(37 / 57, 10);
  });

  it('an entry teleport vector puts the jumps (and the dangling mass) on the entry pages (derived by hand)', () => {
    // 0 -> 1 -> 2, 2 dangling, teleport all on 0, d = 0.5: x0 = 0.5 + 0.5 x2, x1 = 0.5 x0, x2 = 0.5 x1.
    // -> x0 = 0.5 + x0 / 8 -> x0 = 4/7, x1 = 2/7, x2 = 1/7.
    const r = run(3, [[0, 1, 1], [1, 2, 1]], { damping: 0.5, teleport: new Float64Array([1, 0, 0]) });
    expect(r.scores[0]).toBeCloseTo(4 / 7, 10);
    expect(r.scores[1]).toBeCloseTo(2 / 7, 10);
    expect(r.scores[2]).toBeCloseTo(1 / 7, 10);
  });

  it('weights split a page\'s rank in proportion (derived by hand)', () => {
    // 0 -> 1 (weight 3), 0 -> 2 (weight 1), 1 -> 0, 2 -> 0; d = 0.5, uniform.
    // x1 = 1/6 + 0.5 * 0.75 x0, x2 = 1/6 + 0.5 * 0.25 x0, x0 = 1/6 + 0.5 (x1 + x2) = 1/6 + 0.5 (1 - x0)
    // -> x0 = 4/9, x1 = 1/6 + 1/6 = 1/3, x2 = 1/6 + 1/18 = 2/9.
    const r = run(3, [[0, 1, 3], [0, 2, 1], [1, 0, 1], [2, 0, 1]], { damping: 0.5 });
    expect(r.scores[0]).toBeCloseTo(4 / 9, 10);
    expect(r.scores[1]).toBeCloseTo(1 / 3, 10);
    expect(r.scores[2]).toBeCloseTo(2 / 9, 10);
  });

  it('an empty graph, a graph with no edges, and a run cut short', () => {
    expect(run(0, []).scores).toHaveLength(0);
    const lone = run(4, []);
    for (const x of lone.scores) expect(x).toBeCloseTo(0.25, 12);
    const short = run(500, randomGraph(500, 3), { maxIterations: 3 });
    expect(short).toMatchObject({ iterations: 3, converged: false });
    expect(sum(short.scores)).toBeCloseTo(1, 12);
  });
});

describe('PageRank properties', () => {
  it('sums to 1 on random graphs, with dangling pages, any damping (Brin and Page 1998: a distribution)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 60 }),
        fc.array(fc.tuple(fc.nat(59), fc.nat(59), fc.constantFrom(1, 0.25, 0.5, 2)), { maxLength: 300 }),
        fc.double({ min: 0.05, max: 0.95, noNaN: true }),
        (n, raw, damping) => {
          const edges = raw.map(([a, b, w]): Edge => [a % n, b % n, w]);
          const r = run(n, edges, { damping });
          expect(r.converged).toBe(true);
          expect(Math.abs(sum(r.scores) - 1)).toBeLessThan(1e-12);
          for (const x of r.scores) expect(x).toBeGreaterThan(0);
        },
      ),
      { numRuns: 200, seed: 11 },
    );
  });

  it('agrees with graphology-metrics pagerank on seeded random graphs of 2,000-3,000 nodes', () => {
    // graphology-metrics (read in node_modules/graphology-metrics/centrality/pagerank.js):
    // dangling rank is spread uniformly (= our uniform teleport), weights come from the edge
    // attribute `weight` and are normalised by the node's weight sum (= ours), and it stops when
    // the L1 change < N * tolerance, so tolerance 1e-10 / N is our L1 change < 1e-10.
    for (const [n, seed] of [[2000, 1], [2500, 2], [3000, 3]] as const) {
      const edges = randomGraph(n, seed);
      const graph = new DirectedGraph();
      for (let i = 0; i < n; i++) graph.addNode(String(i));
      for (const [u, v, w] of edges) {
        if (u === v) continue; // neither side keeps self-links
        const key = `${u}>${v}`;
        if (graph.hasEdge(key)) graph.updateEdgeAttribute(key, 'weight', (x: number) => x + w);
        else graph.addDirectedEdgeWithKey(key, String(u), String(v), { weight: w });
      }
      const theirs = graphologyPagerank(graph, { alpha: 0.85, tolerance: 1e-10 / n, maxIterations: 1000, getEdgeWeight: 'weight' });
      const ours = run(n, edges);
      expect(ours.converged).toBe(true);
      let l1 = 0;
      let worst = 0;
      for (let i = 0; i < n; i++) {
        const d = Math.abs(ours.scores[i]! - theirs[String(i)]!);
        l1 += d;
        worst = Math.max(worst, d);
      }
      // Each run is within change * d / (1 - d) < 5.7e-10 (L1) of the fixed point.
      expect(l1).toBeLessThan(1.2e-9);
      expect(worst).toBeLessThan(1e-10);
    }
  });

  it('warm start + extra edges equals a cold run on the graph with the edges really added', () => {
    const n = 1500;
    const edges = randomGraph(n, 21);
    const base = run(n, edges);
    const extra = [
      { from: 1200, to: 1499, weight: 1 },
      { from: 7, to: 3, weight: 1 }, // likely an existing pair: the weights add up
      { from: 1400, to: 1400, weight: 1 }, // self-edge: dropped, as in the graph
    ];
    const { forward, reverse } = csrOf(n, edges);
    const warm = pagerank(forward, reverse, n, { ...STRICT, start: base.scores, extraEdges: extra, outWeights: outWeightSums(forward, n) });
    const cold = run(n, [...edges, ...extra.map((e): Edge => [e.from, e.to, e.weight])]);
    expect(warm.converged).toBe(true);
    expect(warm.iterations).toBeLessThan(cold.iterations);
    for (let i = 0; i < n; i++) expect(Math.abs(warm.scores[i]! - cold.scores[i]!)).toBeLessThan(1e-9);
    expect(warm.scores[1499]).toBeGreaterThan(base.scores[1499]!);
  });

  it('extra edges from a dangling page take it out of the dangling set', () => {
    // 0 -> 1, 1 dangling; adding 1 -> 0 makes a 2-cycle: 1/2 each.
    const { forward, reverse } = csrOf(2, [[0, 1, 1]]);
    const r = pagerank(forward, reverse, 2, { ...STRICT, extraEdges: [{ from: 1, to: 0, weight: 1 }] });
    expect(r.scores[0]).toBeCloseTo(0.5, 10);
    expect(r.scores[1]).toBeCloseTo(0.5, 10);
  });

  it('rejects inputs of the wrong size with an EngineError', () => {
    const { forward, reverse } = csrOf(3, [[0, 1, 1]]);
    expect(() => pagerank(forward, reverse, 4, STRICT)).toThrow(/forward CSR has 3 nodes, expected 4/);
    expect(() => pagerank(forward, reverse, 3, { ...STRICT, teleport: new Float64Array(2) })).toThrow(/teleport/);
    expect(() => pagerank(forward, reverse, 3, { ...STRICT, extraEdges: [{ from: 0, to: 9, weight: 1 }] })).toThrow(/extra edge/);
  });
});
