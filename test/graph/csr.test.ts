import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { buildCsr, createEdgeList, pushEdge, transpose, EDGE_CONTENT, EDGE_TEMPLATE } from '../../src/graph/csr.js';
import type { Csr } from '../../src/types.js';

function rows(csr: Csr): [number, number, number, number][] {
  const out: [number, number, number, number][] = [];
  for (let u = 0; u < csr.offsets.length - 1; u++) {
    for (let e = csr.offsets[u]!; e < csr.offsets[u + 1]!; e++) out.push([u, csr.targets[e]!, csr.weights[e]!, csr.flags[e]!]);
  }
  return out;
}

function build(n: number, edges: [number, number, number, number][]) {
  const list = createEdgeList(2); // tiny on purpose: growth is exercised
  for (const [f, t, w, fl] of edges) pushEdge(list, f, t, w, fl);
  return buildCsr(list, n);
}

describe('CSR construction (DESIGN section 5)', () => {
  it('one edge per pair: weights add up, flags OR, self-links and out-of-range ends dropped, rows sorted', () => {
    const { forward } = build(4, [
      [0, 2, 1, EDGE_CONTENT],
      [0, 1, 1, EDGE_CONTENT],
      [0, 2, 1, EDGE_CONTENT], // two content links: weight 2
      [0, 2, 0.2, EDGE_TEMPLATE], // plus a template link: 2.2, flags 3
      [1, 1, 1, EDGE_CONTENT], // self-link
      [1, -1, 1, EDGE_CONTENT], // no page
      [3, 9, 1, EDGE_CONTENT], // no page
      [3, 0, 0.2, EDGE_TEMPLATE],
    ]);
    expect([...forward.offsets]).toEqual([0, 2, 2, 2, 3]);
    expect(rows(forward)).toEqual([
      [0, 1, 1, 1],
      [0, 2, Math.fround(2.2), 3],
      [3, 0, Math.fround(0.2), 2],
    ]);
  });

  it('the reverse CSR is the transpose, rows sorted by source (property, fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 30 }),
        fc.array(fc.tuple(fc.nat(29), fc.nat(29), fc.constantFrom(1, 0.2), fc.constantFrom(1, 2)), { maxLength: 200 }),
        (n, raw) => {
          const edges = raw.map(([a, b, w, f]): [number, number, number, number] => [a % n, b % n, w, f]);
          const { forward, reverse } = build(n, edges);
          // Reference: a Map per pair.
          const pairs = new Map<string, [number, number, number, number]>();
          for (const [a, b, w, f] of edges) {
            if (a === b) continue;
            const p = pairs.get(`${a},${b}`);
            if (p) { p[2] += w; p[3] |= f; } else pairs.set(`${a},${b}`, [a, b, w, f]);
          }
          const expected = [...pairs.values()].map(([a, b, w, f]) => [a, b, Math.fround(w), f]).sort((x, y) => x[0]! - y[0]! || x[1]! - y[1]!);
          expect(rows(forward)).toEqual(expected);
          const back = rows(reverse).map(([v, u, w, f]) => [u, v, w, f]);
          expect(back.sort((x, y) => x[0]! - y[0]! || x[1]! - y[1]!)).toEqual(expected);
          for (const r of [forward, reverse]) {
            for (let u = 0; u < n; u++) for (let e = r.offsets[u]! + 1; e < r.offsets[u + 1]!; e++) expect(r.targets[e]!).toBeGreaterThan(r.targets[e - 1]!);
          }
          expect(rows(transpose(reverse, n))).toEqual(rows(forward));
        },
      ),
      { numRuns: 200, seed: 3 },
    );
  });
});
