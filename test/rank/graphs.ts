/** Small graph builders and a seeded generator for the rank tests. */
import { buildCsr, createEdgeList, pushEdge, EDGE_CONTENT } from '../../src/graph/csr.js';
import type { Csr } from '../../src/types.js';

/** A weighted directed edge `[from, to, weight, flags]`. */
export type Edge = [number, number, number, number?];

/** Forward and reverse CSR of `n` nodes from an edge list (flags default: content). */
export function csrOf(n: number, edges: readonly Edge[]): { forward: Csr; reverse: Csr } {
  const list = createEdgeList(edges.length);
  for (const [f, t, w, flags] of edges) pushEdge(list, f, t, w, flags ?? EDGE_CONTENT);
  return buildCsr(list, n);
}

/** mulberry32: a tiny seeded PRNG (deterministic tests, no unseeded randomness). */
export function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * A random sparse graph with heavy-tailed out-degrees, some dangling nodes, repeated pairs and
 * self-links (so merging and dropping are exercised). Weights are 1 (content) or 0.25
 * (template), exact in float32.
 */
export function randomGraph(n: number, seed: number, meanDegree = 8): Edge[] {
  const rnd = prng(seed);
  const edges: Edge[] = [];
  for (let u = 0; u < n; u++) {
    if (rnd() < 0.05) continue; // dangling
    const degree = Math.min(n, Math.floor(meanDegree * -Math.log(1 - rnd() * 0.999)));
    for (let k = 0; k < degree; k++) {
      // Preferential-ish targets: low ids are popular.
      const v = Math.floor(n * rnd() ** 2);
      const template = rnd() < 0.3;
      edges.push([u, v, template ? 0.25 : 1, template ? 2 : 1]);
    }
  }
  return edges;
}
