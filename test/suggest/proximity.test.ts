/**
 * Graph proximity features, computed by hand from their definitions (Liben-Nowell and
 * Kleinberg, "The link-prediction problem for social networks", 2007: common neighbours
 * |N(x) ∩ N(y)| and Adamic-Adar sum over z in N(x) ∩ N(y) of 1 / log |N(z)|).
 */
import { describe, expect, it } from 'vitest';
import { adamicAdar, contentNeighbours, graphNeighbourhood, sharedFolders, twoStepPaths } from '../../src/suggest/proximity.js';
import { edgeGraph } from './helpers.js';

describe('Adamic-Adar and common neighbours', () => {
  // 0 -> 1, 0 -> 2, 3 -> 1, 3 -> 2, 2 -> 4, 4 -> 3: undirected N(0) = {1, 2}, N(3) = {1, 2, 4},
  // N(1) = {0, 3}, N(2) = {0, 3, 4}, N(4) = {2, 3}.
  const graph = edgeGraph(5, [
    [0, 1, 1],
    [0, 2, 1],
    [3, 1, 1],
    [3, 2, 1],
    [2, 4, 1],
    [4, 3, 1],
  ]);
  const nb = contentNeighbours(graph);

  it('matches the hand computation for 0 and 3: common {1, 2}, AA = 1/ln 2 + 1/ln 3', () => {
    const r = adamicAdar(nb, 0, 3);
    expect(r.common).toBe(2);
    expect(r.adamicAdar).toBeCloseTo(1 / Math.log(2) + 1 / Math.log(3), 12);
  });

  it('is symmetric and never counts the pair itself: 2 and 3 (linked) share only 4', () => {
    expect(adamicAdar(nb, 2, 3)).toEqual(adamicAdar(nb, 3, 2));
    expect(adamicAdar(nb, 2, 3).common).toBe(1);
    expect(adamicAdar(nb, 2, 3).adamicAdar).toBeCloseTo(1 / Math.log(2), 12);
  });

  it('counts directed two-step paths s -> x -> t without the direct link', () => {
    // 0 -> 2 -> 4: one path; 3 -> 2 -> 4 and the direct link 4 -> 3 does not count for (4, 3).
    expect(twoStepPaths(graph, 0, 4)).toBe(1);
    expect(twoStepPaths(graph, 3, 4)).toBe(1);
    expect(twoStepPaths(graph, 4, 3)).toBe(0);
  });

  it('lists the graph neighbourhood best Adamic-Adar first', () => {
    // Neighbours of 0 are 1 and 2; through them: 3 (via 1 and 2), 4 (via 2).
    expect(graphNeighbourhood(nb, 0, 10, 100)).toEqual([3, 4]);
    expect(graphNeighbourhood(nb, 0, 1, 100)).toEqual([3]);
  });
});

describe('sharedFolders', () => {
  it('counts the leading folders two routes share, not the page itself', () => {
    expect(sharedFolders('/a/b/c/', '/a/b/d/')).toBe(2);
    expect(sharedFolders('/a/x/', '/a/y/')).toBe(1);
    expect(sharedFolders('/a/', '/a/')).toBe(0);
    expect(sharedFolders('/guide/', '/api/')).toBe(0);
  });
});
