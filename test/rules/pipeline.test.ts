/**
 * The rules and the report over the real graph and rank stages: facts as `parse` would give
 * them (links as written), through `buildGraph` and `rankGraph`.
 */
import { describe, expect, it } from 'vitest';
import { buildGraph } from '../../src/graph/index.js';
import { resolveOptions } from '../../src/config/options.js';
import type { Config } from '../../src/config/options.js';
import { rankGraph } from '../../src/rank/index.js';
import { buildReport } from '../../src/report/index.js';
import { runRules } from '../../src/rules/index.js';
import type { PageFacts, RawLink } from '../../src/types.js';
import { factsOf } from './helpers.js';

const link = (href: string, line: number, column: number, text = 'x'): RawLink => ({
  href,
  text,
  line,
  column,
  context: 'content',
  nofollow: false,
  origin: 'markdown',
});

function page(file: string, route: string, links: RawLink[], ids: string[] = []): PageFacts {
  return { ...factsOf({ route, file, ids }), links };
}

function run(pages: PageFacts[], navigation: { file: string; links: RawLink[] } | null = null, config: Config = {}) {
  const options = resolveOptions({ ...config, ...(navigation === null ? {} : { navigation: navigation.file }) }, '/site');
  const graph = buildGraph({ pages, assets: ['img/logo.png'], navigation, redirects: [] }, options);
  const ranking = rankGraph(graph, options);
  const findings = runRules({ graph, facts: pages, ranking, options, warnings: [] });
  return { graph, findings, report: buildReport({ options, graph, ranking, findings, suggestions: [], files: pages.length, version: '0.1.0' }) };
}

describe('rules over buildGraph + rankGraph', () => {
  it('finds the broken link, the broken fragment, the orphan and the deep page where they are written', () => {
    const { findings, report } = run([
      page('index.md', '/', [link('guide/index.md', 3, 1), link('guide/instal.md', 5, 7), link('img/logo.png', 6, 1)]),
      page('guide/index.md', '/guide/', [link('install.md#setup', 2, 4), link('../', 9, 1)]),
      page('guide/install.md', '/guide/install/', [link('deep/a.md', 1, 1)], ['requirements', 'set-up']),
      page('guide/deep/a.md', '/guide/deep/a/', [link('b.md', 1, 1)]),
      page('guide/deep/b.md', '/guide/deep/b/', [link('../../index.md', 1, 1)]),
      page('lost.md', '/lost/', [link('index.md', 1, 1)]),
    ]);
    // Three pages link to / with the same text: a template link (templateShare 0.5), so the two
    // whose only link it is are dead ends in their content.
    expect(findings.map((f) => `${f.file}:${f.line}:${f.column} ${f.severity} ${f.rule}: ${f.message}`)).toEqual([
      'guide/deep/b.md:1:1 warning click-depth: /guide/deep/b/ is 4 clicks from an entry page, over the limit of 3; link it from a page nearer the top',
      'guide/deep/b.md:1:1 warning dead-end: Dead end: /guide/deep/b/ has no content links to other pages; add a link onward',
      'guide/index.md:2:4 error broken-fragment: Broken fragment: /guide/install/ has no heading or id "setup"; did you mean #set-up?',
      'index.md:5:7 error broken-link: Broken link: no source file guide/instal.md; did you mean guide/install.md?',
      'lost.md:1:1 warning dead-end: Dead end: /lost/ has no content links to other pages; add a link onward',
      'lost.md:1:1 error orphan-page: No page links to /lost/; link it from /',
    ]);
    expect(report.stats).toMatchObject({ pages: 6, links: 9, brokenLinks: 1, brokenFragments: 1, orphans: 1, unreachable: 1, deadEnds: 2, maxDepth: 4 });
    expect(report.links.find((l) => l.status === 'broken-fragment')!.to).toBe('/guide/install/#setup');
    const sum = report.pages.reduce((s, p) => s + p.pagerank, 0);
    expect(sum).toBeCloseTo(1, 8);
  });

  it('a broken navigation link is reported in the navigation file, with no route; a page the sidebar links is no orphan', () => {
    const { findings, report } = run(
      [page('index.md', '/', []), page('a.md', '/a/', []), page('b.md', '/b/', [])],
      { file: '_sidebar.md', links: [{ ...link('a.md', 1, 3), context: 'template', origin: 'navigation' }, { ...link('c.md', 2, 3), context: 'template', origin: 'navigation' }] },
    );
    expect(findings.map((f) => `${f.file}:${f.line}:${f.column} ${f.rule}`)).toEqual([
      '_sidebar.md:2:3 broken-link',
      // Sidebar links are template links: no page links onward in its content.
      'a.md:1:1 dead-end',
      'b.md:1:1 dead-end',
      'b.md:1:1 orphan-page',
      'index.md:1:1 dead-end',
    ]);
    expect(findings[0]!.route).toBe('');
    expect(report.links.filter((l) => l.from === '').map((l) => [l.file, l.to, l.context])).toEqual([
      ['_sidebar.md', '/a/', 'template'],
      // A missing source file is named by its path from the root, as the graph resolves it.
      ['_sidebar.md', 'c.md', 'template'],
    ]);
  });

  it('a second file with the same route and a missing entry are reported', () => {
    const { findings } = run(
      [page('guide.md', '/guide/', [link('index.md', 1, 1)]), page('guide/index.md', '/guide/', []), page('index.md', '/', [link('guide.md', 1, 1)])],
      null,
      { entry: ['/', '/start/'] },
    );
    expect(findings.filter((f) => f.rule === 'duplicate-route' || f.rule === 'missing-entry').map((f) => `${f.file}|${f.route}|${f.rule}`)).toEqual([
      '|/start/|missing-entry',
      'guide/index.md|/guide/|duplicate-route',
    ]);
  });
});
