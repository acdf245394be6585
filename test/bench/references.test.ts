import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as api from '../../src/index.js';
import * as collect from '../../src/collect/index.js';
import * as parse from '../../src/parse/index.js';
import * as graph from '../../src/graph/index.js';
import * as rank from '../../src/rank/index.js';
import * as text from '../../src/text/index.js';
import { bruteForceRelated, compareRelated } from '../../bench/brute-force.js';
import type { FrontResult } from '../../bench/front.js';
import { runFront } from '../../bench/front.js';
import { generateSite } from '../../bench/generate.js';
import { comparePagerank, edgesOf } from '../../bench/references.js';

let dir = '';
let front: FrontResult;
beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'lw-bench-ref-'));
  generateSite(dir, { pages: 200, seed: 4 });
  front = await runFront({ api, collect, parse, graph }, dir);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('bench references', () => {
  it('graphology-metrics pagerank, configured as the bench runs it, agrees with ours on a generated site (CHECKS.md: reference library)', () => {
    const edges = edgesOf(front.graph);
    expect(edges.n).toBe(200);
    expect(edges.from.length).toBeGreaterThan(1000);
    const { damping, pagerankTolerance, pagerankIterations } = front.options;
    const result = comparePagerank({ graph, rank }, edges, damping, pagerankTolerance, pagerankIterations);
    expect(result.graphologyError).toBeNull();
    expect(result.oursConverged).toBe(true);
    // Both stop at an L1 change below 1e-10, so they differ by far less than that per page.
    expect(result.maxAbsDiff).toBeLessThan(1e-10);
    expect(result.bytesPerIteration).toBe(4 * 201 + 8 * front.graph.reverse.targets.length + 16 * 200);
  });

  it('brute-force top-10 equals the inverted index on the same term index, similarities included', () => {
    const index = text.buildTermIndex(front.ordered.map((f) => f.text));
    const fast = text.relatedPages(index, 10);
    const slow = bruteForceRelated(index, 10);
    expect(slow).toEqual(fast);
    expect(slow.filter((l) => l.related.length === 10).length).toBeGreaterThan(150);
    expect(compareRelated(fast, slow)).toEqual({ differing: 0, differingBeyondTies: 0 });
  });

  it('counts pages whose related sets differ', () => {
    const index = text.buildTermIndex(front.ordered.map((f) => f.text));
    const fast = text.relatedPages(index, 10);
    const changed = fast.map((l, i) => (i === 7 ? { page: l.page, related: l.related.slice(0, 9) } : l));
    expect(compareRelated(fast, changed)).toEqual({ differing: 1, differingBeyondTies: 1 });
  });
});
