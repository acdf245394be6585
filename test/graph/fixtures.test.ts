/**
 * Fixture sites (test/fixtures/graph-*): each a 3-8 page site with one purpose, given as the
 * facts the parser would produce (site.json), with the expected routes, edges, depths, orphans
 * and broken links written out by hand (expected.json).
 */
import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { buildGraph } from '../../src/graph/index.js';
import { rankGraph } from '../../src/rank/index.js';
import type { Config } from '../../src/config/options.js';
import type { FileKind, LinkContext, PageFacts, ResolvedLink, SiteGraph } from '../../src/types.js';
import { link, options, page } from './facts.js';

type LinkSpec = [href: string, text: string, line: number, context?: LinkContext];

interface SiteSpec {
  purpose: string;
  config?: Config;
  assets?: string[];
  redirects?: [string, string][];
  navigation?: { file: string; links: LinkSpec[] };
  pages: { file: string; route: string; kind?: FileKind; ids?: string[]; aliases?: string[]; draft?: boolean; baseHref?: string; links?: LinkSpec[] }[];
}

interface Expected {
  routes: string[];
  files?: string[];
  edges: [string, string, number, number][];
  depth: Record<string, number | null>;
  depthContentOnly?: Record<string, number | null>;
  inlinks?: Record<string, number>;
  contentInlinks?: Record<string, number>;
  pagerank?: Record<string, number>;
  orphans: string[];
  brokenLinks: [string, number, string][];
  brokenFragments: [string, number, string, string][];
  templateLinks: [string, number][];
  linkTargets?: [string, number, string, string][];
  routeIndex?: Record<string, string>;
  duplicates?: { file: string; route: string; keptFile: string }[];
  entries: string[];
  missingEntries: string[];
}

const root = join(import.meta.dirname, '..', 'fixtures');
const fixtures = readdirSync(root).filter((d) => d.startsWith('graph-')).sort();

const toRaw = ([href, text, line, context]: LinkSpec) => link(href, line, { text, context: context ?? 'content' });

function load(name: string): { site: SiteSpec; expected: Expected } {
  const read = (f: string) => JSON.parse(readFileSync(join(root, name, f), 'utf8'));
  return { site: read('site.json'), expected: read('expected.json') };
}

function build(site: SiteSpec, extra: Config = {}) {
  const facts: PageFacts[] = site.pages.map((p) =>
    page(p.file, p.route, {
      links: (p.links ?? []).map(toRaw),
      ...(p.ids ? { ids: p.ids } : {}),
      ...(p.kind ? { kind: p.kind } : {}),
      ...(p.aliases ? { aliases: p.aliases } : {}),
      ...(p.draft ? { draft: p.draft } : {}),
      ...(p.baseHref ? { baseHref: p.baseHref } : {}),
    }),
  );
  const opts = options({ ...site.config, ...extra });
  const graph = buildGraph(
    {
      pages: facts,
      assets: site.assets ?? [],
      navigation: site.navigation ? { file: site.navigation.file, links: site.navigation.links.map((l) => toRaw([l[0], l[1], l[2], 'content'])) } : null,
      redirects: (site.redirects ?? []).map(([from, to], i) => ({ from, to, line: i + 1 })),
    },
    opts,
  );
  return { graph, ranking: rankGraph(graph, opts), facts };
}

function fileOf(graph: SiteGraph, site: SiteSpec, l: ResolvedLink): string {
  return l.from < 0 ? site.navigation!.file : graph.pages[l.from]!.file;
}

function byRoute<T>(graph: SiteGraph, values: ArrayLike<number>, map: (v: number) => T): Record<string, T> {
  return Object.fromEntries(graph.pages.map((p) => [p.route, map(values[p.id]!)]));
}

describe.each(fixtures)('fixture %s', (name) => {
  const { site, expected } = load(name);
  const { graph, ranking, facts } = build(site);
  const route = (id: number) => graph.pages[id]!.route;

  it(`${name}: pages and routes, sorted by route`, () => {
    expect(graph.pages.map((p) => p.route)).toEqual(expected.routes);
    if (expected.files) expect(graph.pages.map((p) => p.file)).toEqual(expected.files);
    for (const p of graph.pages) expect(facts[p.factsIndex]!.file).toBe(p.file);
    expect(graph.duplicates).toEqual(expected.duplicates ?? []);
  });

  it(`${name}: edges (one per pair, weights, flags)`, () => {
    const edges: [string, string, number, number][] = [];
    const { offsets, targets, weights, flags } = graph.forward;
    for (let u = 0; u < graph.pages.length; u++) {
      for (let e = offsets[u]!; e < offsets[u + 1]!; e++) edges.push([route(u), route(targets[e]!), Math.round(weights[e]! * 1e6) / 1e6, flags[e]!]);
    }
    expect(edges).toEqual(expected.edges);
  });

  it(`${name}: click depth, inlinks, orphans, PageRank`, () => {
    expect(byRoute(graph, ranking.depth, (d) => (d < 0 ? null : d))).toEqual(expected.depth);
    if (expected.depthContentOnly) {
      const contentOnly = build(site, { depthCountsTemplate: false }).ranking;
      expect(byRoute(graph, contentOnly.depth, (d) => (d < 0 ? null : d))).toEqual(expected.depthContentOnly);
    }
    if (expected.inlinks) expect(byRoute(graph, ranking.inlinks, (v) => v)).toEqual(expected.inlinks);
    if (expected.contentInlinks) expect(byRoute(graph, ranking.contentInlinks, (v) => v)).toEqual(expected.contentInlinks);
    expect(graph.pages.filter((p) => ranking.inlinks[p.id] === 0).map((p) => p.route)).toEqual(expected.orphans);
    if (expected.pagerank) {
      for (const p of graph.pages) expect(Math.abs(ranking.pagerank[p.id]! - expected.pagerank[p.route]!)).toBeLessThan(1e-9);
    }
    expect(ranking.converged).toBe(true);
  });

  it(`${name}: broken links, broken fragments, template links`, () => {
    const broken = graph.links.filter((l) => l.status === 'broken').map((l) => [fileOf(graph, site, l), l.raw.line, l.target]);
    expect(broken).toEqual(expected.brokenLinks);
    const fragments = graph.links.filter((l) => l.status === 'broken-fragment').map((l) => [fileOf(graph, site, l), l.raw.line, l.target, l.fragment]);
    expect(fragments).toEqual(expected.brokenFragments);
    const template = graph.links.filter((l) => l.context === 'template').map((l) => [fileOf(graph, site, l), l.raw.line]);
    expect(template).toEqual(expected.templateLinks);
    if (expected.linkTargets) {
      expect(graph.links.map((l) => [fileOf(graph, site, l), l.raw.line, l.target, l.status])).toEqual(expected.linkTargets);
    }
  });

  it(`${name}: entries and route index`, () => {
    expect(graph.entries.map(route)).toEqual(expected.entries);
    expect(graph.missingEntries).toEqual(expected.missingEntries);
    if (expected.routeIndex) {
      expect(Object.fromEntries([...graph.routeIndex].map(([k, id]) => [k, route(id)]))).toEqual(expected.routeIndex);
    }
  });
});

describe('graph output order', () => {
  it('links are sorted by (from, line, column), navigation first; input order does not matter', () => {
    const site = load('graph-navigation').site;
    const a = build(site).graph;
    const b = build({ ...site, pages: [...site.pages].reverse() }).graph;
    const key = (g: SiteGraph) => g.links.map((l) => [l.from, l.raw.line, l.raw.column, l.target, l.status, l.context]);
    expect(key(b)).toEqual(key(a));
    const positions = a.links.map((l) => [l.from, l.raw.line, l.raw.column] as const);
    for (let i = 1; i < positions.length; i++) {
      const [f0, l0, c0] = positions[i - 1]!;
      const [f1, l1, c1] = positions[i]!;
      expect(f0 < f1 || (f0 === f1 && (l0 < l1 || (l0 === l1 && c0 <= c1)))).toBe(true);
    }
    expect([...b.forward.targets]).toEqual([...a.forward.targets]);
  });
});
