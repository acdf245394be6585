import { describe, it, expect } from 'vitest';
import { baseScore, withAnchor, NO_ANCHOR, REACH_TOO_DEEP, REACH_UNREACHABLE } from '../../src/suggest/score.js';
import { findCandidates, hasContentLink } from '../../src/suggest/candidates.js';
import { edgeGraph } from './helpers.js';

describe('baseScore', () => {
  const c = { similarity: 0.4, sourceRankPercentile: 1, sourceDepth: 1, targetNeedsDepth: true, maxDepth: 3 };

  it('is similarity x (0.5 + 0.5 x PageRank percentile) for a reachable source', () => {
    expect(baseScore(c)).toBeCloseTo(0.4, 12);
    expect(baseScore({ ...c, sourceRankPercentile: 0 })).toBeCloseTo(0.2, 12);
  });

  it('ranks a source that cannot fix depth, or is unreachable, lower', () => {
    expect(baseScore({ ...c, sourceDepth: 3 })).toBeCloseTo(0.4 * REACH_TOO_DEEP, 12);
    expect(baseScore({ ...c, sourceDepth: 3, targetNeedsDepth: false })).toBeCloseTo(0.4, 12);
    expect(baseScore({ ...c, sourceDepth: -1 })).toBeCloseTo(0.4 * REACH_UNREACHABLE, 12);
    expect(withAnchor(0.4, false)).toBeCloseTo(0.4 * NO_ANCHOR, 12);
  });

  it('lets a well-ranked related page beat a better-ranked but less related one only within a factor of 2', () => {
    const sibling = baseScore({ ...c, similarity: 0.5, sourceRankPercentile: 0.5 });
    const home = baseScore({ ...c, similarity: 0.2, sourceRankPercentile: 1, sourceDepth: 0 });
    expect(sibling).toBeGreaterThan(home);
  });
});

describe('findCandidates', () => {
  // 0 -> 1 (content), 0 -> 2 (template only); page 3 excluded.
  const graph = edgeGraph(4, [[0, 1, 1], [0, 2, 2]]);
  const excluded = { ...graph, pages: graph.pages.map((p) => (p.id === 3 ? { ...p, meta: { ...p.meta, exclude: true } } : p)) };
  const related = [
    { page: 0, related: [{ page: 1, similarity: 0.5 }, { page: 2, similarity: 0.4 }] },
    { page: 1, related: [{ page: 0, similarity: 0.5 }, { page: 3, similarity: 0.3 }] },
    { page: 2, related: [{ page: 0, similarity: 0.4 }] },
    { page: 3, related: [{ page: 1, similarity: 0.3 }, { page: 2, similarity: 0.05 }] },
  ];

  it('finds content links in the forward CSR', () => {
    expect(hasContentLink(graph.forward, 0, 1)).toBe(true);
    expect(hasContentLink(graph.forward, 0, 2)).toBe(false);
    expect(hasContentLink(graph.forward, 1, 0)).toBe(false);
  });

  it('keeps related, unlinked, not excluded sources above the similarity floor', () => {
    const pairs = findCandidates(excluded, related, [1, 2], 0.1);
    expect(pairs).toEqual([
      // target 1: page 0 links to it already; page 3 is excluded
      // target 2: page 0 has only a template link; page 3 lists it but below 0.1 (and is excluded)
      { source: 0, target: 2, similarity: 0.4 },
    ]);
    expect(findCandidates(excluded, related, [0], 0.1)).toEqual([
      { source: 1, target: 0, similarity: 0.5 },
      { source: 2, target: 0, similarity: 0.4 },
    ]);
  });
});
