import { describe, it, expect } from 'vitest';
import { buildGraph } from '../../src/graph/index.js';
import { rankGraph } from '../../src/rank/index.js';
import type { Config } from '../../src/options.js';
import { link, options, page } from '../graph/facts.js';

function ranked(config: Config = {}) {
  // / -> /a/ -> /b/ (template only) ; /c/ -> /a/ ; /b/ dangling.
  const pages = [
    page('index.md', '/', { links: [link('a.md', 1, { text: 'first' })] }),
    page('a.md', '/a/', { links: [link('b.md', 1, { context: 'template' }), link('b.md', 2, { context: 'template' })] }),
    page('b.md', '/b/'),
    page('c.md', '/c/', { links: [link('a.md', 1, { text: 'second' }), link('index.md', 2, { text: 'home' })] }),
  ];
  const opts = options(config);
  const graph = buildGraph({ pages, assets: [], navigation: null, redirects: [] }, opts);
  return { graph, ranking: rankGraph(graph, opts) };
}

describe('rankGraph', () => {
  it('inlinks, content inlinks, outlinks and depth per page id (by hand)', () => {
    const { graph, ranking } = ranked();
    expect(graph.pages.map((p) => p.route)).toEqual(['/', '/a/', '/b/', '/c/']);
    expect([...ranking.inlinks]).toEqual([1, 2, 1, 0]);
    expect([...ranking.contentInlinks]).toEqual([1, 2, 0, 0]);
    expect([...ranking.outlinks]).toEqual([1, 1, 0, 2]);
    expect([...ranking.depth]).toEqual([0, 1, 2, -1]);
    expect(ranking.converged).toBe(true);
    expect(ranking.iterations).toBeGreaterThan(1);
    expect(ranked({ depthCountsTemplate: false }).ranking.depth[2]).toBe(-1);
  });

  it('teleport "entry": the jumps land on the entry pages only, so a page no path from an entry reaches gets rank 0', () => {
    const uniform = ranked().ranking.pagerank;
    const entry = ranked({ teleport: 'entry' }).ranking.pagerank;
    // No inlinks: only the jumps, (1 - d) / n plus d / n of the dangling page /b/'s rank.
    expect(uniform[3]).toBeCloseTo((0.15 + 0.85 * uniform[2]!) / 4, 10);
    expect(entry[3]).toBe(0);
    expect(entry[0]).toBeGreaterThan(uniform[0]!);
    let s = 0;
    for (const x of entry) s += x;
    expect(s).toBeCloseTo(1, 12);
  });

  it('teleport "entry" without any entry page falls back to uniform', () => {
    const none = ranked({ teleport: 'entry', entry: ['/nowhere/'] });
    expect(none.graph.entries).toEqual([]);
    expect([...none.ranking.pagerank]).toEqual([...ranked().ranking.pagerank]);
    expect([...none.ranking.depth]).toEqual([-1, -1, -1, -1]);
  });

  it('the iteration limit comes from the options and is reported', () => {
    const r = ranked({ pagerankIterations: 2 }).ranking;
    expect(r).toMatchObject({ iterations: 2, converged: false });
  });
});
