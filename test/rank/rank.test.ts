import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { buildGraph } from '../../src/graph/index.js';
import { rankGraph } from '../../src/rank/index.js';
import type { Config } from '../../src/config/options.js';
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

describe('random sites through buildGraph and rankGraph (fast-check)', () => {
  it('PageRank sums to 1 and click depth equals a BFS over the resolved links', () => {
    const site = fc.integer({ min: 1, max: 12 }).chain((n) =>
      fc.tuple(
        fc.constant(n),
        fc.array(fc.array(fc.tuple(fc.nat(n - 1), fc.constantFrom('file', 'route', 'external', 'broken'), fc.boolean()), { maxLength: 8 }), { minLength: n, maxLength: n }),
      ),
    );
    fc.assert(
      fc.property(site, fc.boolean(), ([n, linkLists], countTemplate) => {
        const pages = linkLists.map((ls, i) =>
          page(i === 0 ? 'index.md' : `s/p${i}.md`, i === 0 ? '/' : `/s/p${i}/`, {
            links: ls.map(([j, how, template], k) =>
              link(
                how === 'file' ? (i === 0 ? '' : '../') + (j === 0 ? 'index.md' : `s/p${j}.md`) : how === 'route' ? (j === 0 ? '/' : `/s/p${j}/`) : how === 'external' ? 'https://example.test/' : '/nope/',
                k + 1,
                { context: template ? 'template' : 'content', text: `t${i}-${k}` },
              ),
            ),
          }),
        );
        const opts = options({ depthCountsTemplate: countTemplate });
        const graph = buildGraph({ pages, assets: [], navigation: null, redirects: [] }, opts);
        const ranking = rankGraph(graph, opts);
        let s = 0;
        for (const x of ranking.pagerank) s += x;
        expect(Math.abs(s - 1)).toBeLessThan(1e-12);
        // Reference BFS straight from the resolved links.
        const adj: number[][] = Array.from({ length: n }, () => []);
        for (const l of graph.links) if (l.from >= 0 && l.to >= 0 && l.to !== l.from && (countTemplate || l.context === 'content')) adj[l.from]!.push(l.to);
        const depth = new Array<number>(n).fill(-1);
        const queue = [...graph.entries];
        for (const e of queue) depth[e] = 0;
        while (queue.length > 0) {
          const u = queue.shift()!;
          for (const v of adj[u]!) if (depth[v] === -1) { depth[v] = depth[u]! + 1; queue.push(v); }
        }
        expect([...ranking.depth]).toEqual(depth);
        expect(graph.entries).toEqual([0]);
      }),
      { numRuns: 150, seed: 23 },
    );
  });
});
