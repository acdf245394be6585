import { describe, expect, it } from 'vitest';
import { buildReport, roundTo } from '../../src/report/index.js';
import { runRules } from '../../src/rules/index.js';
import { buildSite } from '../rules/helpers.js';
import { DirectedGraph } from 'graphology';
import pagerankModule from 'graphology-metrics/centrality/pagerank.js';
import { fixtureReport, SITE, SUGGESTIONS } from './fixture.js';

// A CommonJS module: under NodeNext its default import is the function itself.
const graphologyPagerank = pagerankModule as unknown as typeof pagerankModule.default;

/**
 * PageRank of the fixture's links by graphology-metrics (an independent implementation): its
 * content links, the two links of /guide/ to /guide/install/ as one edge of weight 2.
 */
function graphologyRanks(): Record<string, number> {
  const graph = new DirectedGraph();
  const edges: [string, string, number][] = [
    ['/', '/guide/', 1],
    ['/', '/reference/', 1],
    ['/guide/', '/guide/install/', 2],
    ['/guide/install/', '/guide/configure/', 1],
    ['/guide/configure/', '/guide/configure/advanced/', 1],
    ['/guide/configure/advanced/', '/guide/configure/advanced/tuning/', 1],
    ['/reference/', '/', 1],
    ['/notes/old/', '/', 1],
  ];
  for (const p of SITE.pages) graph.addNode(p.route);
  for (const [from, to, weight] of edges) graph.addDirectedEdge(from, to, { weight });
  return graphologyPagerank(graph, { alpha: 0.85, tolerance: 1e-13, maxIterations: 1000, getEdgeWeight: 'weight' });
}

describe('buildReport on the fixture site (values worked out by hand from the site in fixture.ts)', () => {
  const report = fixtureReport();
  const expected = graphologyRanks();

  it('carries the schema, tool, root and configured maxDepth', () => {
    expect(report.schema).toBe('linkweave/report@1');
    expect(report.tool).toEqual({ name: 'linkweave', version: '0.1.0' });
    expect(report.root).toBe('/work/docs');
    expect(report.options).toEqual({ maxDepth: 3 });
  });

  it('counts pages, links and problems', () => {
    expect(report.stats).toEqual({
      files: 8,
      pages: 8,
      links: 11,
      internalLinks: 10,
      brokenLinks: 1,
      brokenFragments: 1,
      outsideLinks: 0,
      templatedLinks: 0,
      includesOutside: 0,
      // The fixture's one fragment link (to #missing) is broken under every style: github, the default, stays.
      headingIds: { style: 'github', how: 'auto', fragmentLinks: 1, resolved: 0 },
      orphans: 1,
      unreachable: 1,
      deadEnds: 1,
      maxDepth: 5,
      iterations: report.stats.iterations,
      converged: true,
      findings: { error: 3, warning: 3 },
    });
  });

  it('lists pages by route with rounded pagerank, rank = pagerank x N, depth null when unreachable', () => {
    expect(report.pages.map((p) => p.route)).toEqual([
      '/',
      '/guide/',
      '/guide/configure/',
      '/guide/configure/advanced/',
      '/guide/configure/advanced/tuning/',
      '/guide/install/',
      '/notes/old/',
      '/reference/',
    ]);
    expect(report.pages[0]).toEqual({
      route: '/',
      file: 'index.md',
      title: 'Lantern docs',
      pagerank: roundTo(expected['/']!, 10),
      rank: roundTo(expected['/']! * 8, 4),
      depth: 0,
      inlinks: 2,
      contentInlinks: 2,
      outlinks: 2,
      importance: 'normal',
    });
    // Within graphology-metrics' PageRank of the same links (its tolerance), rounded to 10 and 4 decimals.
    for (const p of report.pages) {
      expect(p.pagerank, p.route).toBeCloseTo(expected[p.route]!, 9);
      expect(p.rank, p.route).toBeCloseTo(expected[p.route]! * 8, 4);
      expect(p.pagerank).toBe(roundTo(p.pagerank, 10));
    }
    expect(report.pages[6]).toMatchObject({ route: '/notes/old/', depth: null, inlinks: 0 });
    // By hand: nothing links to /notes/old/, so its PageRank is the teleport share (1 - 0.85) / 8
    // plus its eighth of the rank of the dangling page /guide/configure/advanced/tuning/.
    const tuning = report.pages[4]!.pagerank;
    expect(report.pages[6]!.pagerank).toBeCloseTo(0.15 / 8 + (0.85 * tuning) / 8, 9);
    expect(report.pages[4]).toMatchObject({ depth: 5, outlinks: 0, importance: 'high' });
  });

  it('sorts links by from, file, line, column and adds the fragment to `to`', () => {
    const fromIndex = report.links.filter((l) => l.from === '/');
    expect(fromIndex.map((l) => [l.line, l.to, l.status, l.kind])).toEqual([
      [3, '/guide/', 'ok', 'internal'],
      [4, '/reference/', 'ok', 'internal'],
      [9, 'guide/instal.md', 'broken', 'internal'],
      [11, 'https://example.org/lantern', 'external', 'external'],
    ]);
    expect(report.links.find((l) => l.status === 'broken-fragment')).toEqual({
      from: '/guide/',
      to: '/guide/install/#setup',
      file: 'guide/index.md',
      line: 14,
      column: 10,
      text: 'setting up',
      context: 'content',
      kind: 'internal',
      status: 'broken-fragment',
      nofollow: false,
    });
    const keys = report.links.map((l) => `${l.from}\u0000${l.file}\u0000${String(l.line).padStart(5)}`);
    expect(keys).toEqual([...keys].sort());
  });

  it('sorts suggestions by file, line, column and rounds their numbers to 4 decimals', () => {
    expect(report.suggestions.map((s) => s.id)).toEqual(['0f3a9e71', 'b7e1c2d4']);
    expect(report.suggestions[1]).toEqual({ ...SUGGESTIONS[0], similarity: 0.4219, score: 0.0844, targetRankAfter: 1.3246 });
  });

  it('gates on the error findings, one failure per rule', () => {
    expect(report.gate).toEqual({
      passed: false,
      failOn: 'error',
      failures: [
        { rule: 'broken-fragment', limit: 0, actual: 1 },
        { rule: 'broken-link', limit: 0, actual: 1 },
        { rule: 'orphan-page', limit: 0, actual: 1 },
      ],
    });
  });
});

describe('buildReport choices', () => {
  it('navigation links have from "" and the navigation file, and sort first', () => {
    const ctx = buildSite({
      pages: [{ route: '/', links: ['/a/'] }, { route: '/a/' }],
      navigation: [
        { to: '/', line: 1, column: 3, text: 'Home' },
        { to: '/a/', line: 2, column: 3, text: 'A' },
        { to: '/b/', line: 3, column: 3, text: 'B' },
      ],
    });
    const report = buildReport({ ...ctx, findings: runRules(ctx), suggestions: [], files: 2, version: '0.1.0' });
    expect(report.links.slice(1, 3)).toEqual([
      { from: '', to: '/a/', file: '_nav.md', line: 2, column: 3, text: 'A', context: 'template', kind: 'internal', status: 'ok', nofollow: false },
      { from: '', to: '/b/', file: '_nav.md', line: 3, column: 3, text: 'B', context: 'template', kind: 'internal', status: 'broken', nofollow: false },
    ]);
    expect(report.links[0]).toMatchObject({ from: '', to: '/', line: 1 });
    expect(report.links[3]).toMatchObject({ from: '/', to: '/a/', file: 'index.md' });
    expect(report.stats.brokenLinks).toBe(1);
    expect(report.findings.map((f) => `${f.file}:${f.line}:${f.column} ${f.rule}`)).toEqual([
      '_nav.md:3:3 broken-link',
      // a.md's only links are the navigation's (template links): a dead end in its content.
      'a.md:1:1 dead-end',
    ]);
  });

  it('importance from the suggest stage wins over frontmatter; else frontmatter, else normal', () => {
    const given = fixtureReport({ importance: ['low', 'low', 'low', 'low', 'low', 'low', 'high', 'low'] });
    expect(given.pages.map((p) => p.importance)).toEqual(['low', 'low', 'low', 'low', 'low', 'low', 'high', 'low']);
    const fallback = fixtureReport();
    expect(fallback.pages.filter((p) => p.importance === 'high').map((p) => p.route)).toEqual(['/guide/configure/advanced/tuning/']);
  });

  it('excluded pages count in no structural statistic', () => {
    const ctx = buildSite({ pages: [{ route: '/', links: ['/a/'] }, { route: '/a/', links: ['/'] }, { route: '/old/', exclude: true, links: ['/gone/'] }] });
    const report = buildReport({ ...ctx, findings: runRules(ctx), suggestions: [], files: 3, version: '0.1.0' });
    expect(report.stats).toMatchObject({ pages: 3, orphans: 0, unreachable: 0, brokenLinks: 0, maxDepth: 1 });
    expect(report.pages.find((p) => p.route === '/old/')).toMatchObject({ depth: null, inlinks: 0 });
    expect(report.gate.passed).toBe(true);
  });

  it('leaves its inputs untouched (frozen arrays in, sorted copies out)', () => {
    const ctx = buildSite({ pages: [{ route: '/', links: ['/b/', '/a/'] }, { route: '/a/', links: ['/'] }, { route: '/b/', links: ['/'] }] });
    const findings = Object.freeze([...runRules(ctx)].reverse());
    const suggestions = Object.freeze([...SUGGESTIONS]);
    const report = buildReport({ ...ctx, findings, suggestions, files: 3, version: '0.1.0' });
    expect(suggestions[0]!.similarity).toBe(0.42187);
    expect(report.suggestions[1]!.similarity).toBe(0.4219);
  });

  it('no reachable page: maxDepth null', () => {
    const ctx = buildSite({ pages: [{ route: '/a/' }], options: { entry: ['/'] } });
    const report = buildReport({ ...ctx, findings: runRules(ctx), suggestions: [], files: 1, version: '0.1.0' });
    expect(report.stats.maxDepth).toBeNull();
    // With no entry page nothing is exempt from orphan-page; unreachable-page stays silent.
    expect(report.findings.map((f) => f.rule)).toEqual(['missing-entry', 'orphan-page']);
  });
});

describe('roundTo', () => {
  it('rounds half away from zero and never gives -0', () => {
    expect(roundTo(0.12345, 4)).toBe(0.1235);
    expect(roundTo(-0.00001, 4)).toBe(0);
    expect(Object.is(roundTo(-0.00001, 4), 0)).toBe(true);
    expect(roundTo(1 / 3, 10)).toBe(0.3333333333);
  });
});
