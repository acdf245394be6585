import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { clickDepth } from '../../src/rank/index.js';
import { csrOf } from './graphs.js';
import type { Edge } from './graphs.js';

/** Reference BFS on adjacency lists (plain arrays, Array#shift queue): the textbook algorithm. */
function referenceDepth(n: number, edges: readonly Edge[], entries: readonly number[], mask: number, extra: readonly [number, number][] = []): number[] {
  const adj: number[][] = Array.from({ length: n }, () => []);
  for (const [u, v, , f] of edges) if (u !== v && ((f ?? 1) & mask) !== 0) adj[u]!.push(v);
  for (const [u, v] of extra) adj[u]!.push(v);
  const depth = new Array<number>(n).fill(-1);
  const queue: number[] = [];
  for (const e of entries) if (depth[e] === -1) { depth[e] = 0; queue.push(e); }
  while (queue.length > 0) {
    const u = queue.shift()!;
    for (const v of adj[u]!) if (depth[v] === -1) { depth[v] = depth[u]! + 1; queue.push(v); }
  }
  return depth;
}

describe('click depth', () => {
  it('a chain, a branch and an unreachable page (by hand)', () => {
    // 0 -> 1 -> 2 -> 3, 0 -> 4, 5 alone, 3 -> 0 back.
    const { forward } = csrOf(6, [[0, 1, 1], [1, 2, 1], [2, 3, 1], [0, 4, 1], [3, 0, 1]]);
    expect([...clickDepth(forward, [0], 1)]).toEqual([0, 1, 2, 3, 1, -1]);
    expect([...clickDepth(forward, [2], 1)]).toEqual([2, 3, 0, 1, 3, -1]);
    expect([...clickDepth(forward, [0, 5], 1)]).toEqual([0, 1, 2, 3, 1, 0]);
    expect([...clickDepth(forward, [], 1)]).toEqual([-1, -1, -1, -1, -1, -1]);
  });

  it('the flag mask: template-only edges count only with mask 3', () => {
    // 0 -(template)-> 1 -(content)-> 2; 0 -(content and template)-> 3.
    const { forward } = csrOf(4, [[0, 1, 0.2, 2], [1, 2, 1, 1], [0, 3, 1, 1], [0, 3, 0.2, 2]]);
    expect([...clickDepth(forward, [0], 1)]).toEqual([0, -1, -1, 1]);
    expect([...clickDepth(forward, [0], 3)]).toEqual([0, 1, 2, 1]);
    expect([...clickDepth(forward, [0], 2)]).toEqual([0, 1, -1, 1]);
  });

  it('extra edges are followed whatever the mask', () => {
    const { forward } = csrOf(4, [[0, 1, 1], [1, 2, 1]]);
    expect([...clickDepth(forward, [0], 1, [{ from: 0, to: 3 }])]).toEqual([0, 1, 2, 1]);
    expect([...clickDepth(forward, [0], 1, [{ from: 2, to: 3 }, { from: 0, to: 2 }])]).toEqual([0, 1, 1, 2]);
  });

  it('equals a reference BFS on random graphs (fast-check), masks 1 and 3, with extra edges', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 40 }),
        fc.array(fc.tuple(fc.nat(39), fc.nat(39), fc.constantFrom(1, 2, 3)), { maxLength: 160 }),
        fc.array(fc.nat(39), { maxLength: 3 }),
        fc.array(fc.tuple(fc.nat(39), fc.nat(39)), { maxLength: 4 }),
        fc.constantFrom(1, 3),
        (n, raw, rawEntries, rawExtra, mask) => {
          const edges = raw.map(([a, b, f]): Edge => [a % n, b % n, 1, f]);
          const entries = rawEntries.map((e) => e % n);
          const extra = rawExtra.map(([a, b]): [number, number] => [a % n, b % n]);
          const { forward } = csrOf(n, edges);
          const ours = clickDepth(forward, entries, mask, extra.map(([from, to]) => ({ from, to })));
          expect([...ours]).toEqual(referenceDepth(n, edges, entries, mask, extra));
        },
      ),
      { numRuns: 300, seed: 5 },
    );
  });
});
