/**
 * Builders for the suggest tests: pages through the real parse stage (`parseSource`), then the
 * real graph, rank and text stages; random graphs built straight as CSR for the impact tests.
 * `parseMarkdown` (remark directly) is only for tests that check positions against an
 * independent Markdown tree.
 */
import { createHash } from 'node:crypto';
import { unified } from 'unified';
import remarkParse from 'remark-parse';
import remarkGfm from 'remark-gfm';
import remarkFrontmatter from 'remark-frontmatter';
import type { Root } from 'mdast';
import { resolveOptions } from '../../src/config/options.js';
import type { Config, ResolvedOptions } from '../../src/config/options.js';
import { buildCsr, buildGraph, createEdgeList, pushEdge } from '../../src/graph/index.js';
import { parseSource } from '../../src/parse/index.js';
import { rankGraph } from '../../src/rank/index.js';
import { buildTermIndex, contentCentrality, relatedPages } from '../../src/text/index.js';
import type { PageFacts, PageMeta, PageNode, SiteGraph } from '../../src/types.js';
import type { SuggestInput } from '../../src/suggest/index.js';
import { buildMentionIndex } from '../../src/suggest/mentions.js';
import type { MentionIndex } from '../../src/suggest/mentions.js';
import { factsByPage } from '../../src/suggest/facts-of.js';
import { createStemCache } from '../../src/text/index.js';

const processor = unified().use(remarkParse).use(remarkGfm).use(remarkFrontmatter);

/** Parse Markdown to mdast (positions included), independently of the parse stage. */
export function parseMarkdown(source: string): Root {
  return processor.parse(source) as Root;
}

/**
 * PageFacts of a source file from the parse stage (`.html`/`.htm` as HTML, else Markdown), with
 * `meta` fields laid over what the frontmatter gave.
 */
export function markdownPage(file: string, source: string, meta: Partial<PageMeta> = {}, options: ResolvedOptions = testOptions()): PageFacts {
  const facts = parseSource(
    {
      path: file,
      kind: /\.html?$/.test(file) ? 'html' : 'markdown',
      bytes: Buffer.byteLength(source),
      hash: createHash('sha256').update(source).digest('hex'),
      text: source,
      problems: [],
    },
    options,
  );
  return { ...facts, meta: { ...facts.meta, ...meta } };
}

/** Options for a test site (root `/site`). */
export function testOptions(config: Config = {}): ResolvedOptions {
  return resolveOptions(config, '/site', 'test');
}

/** Everything `suggestLinks` takes, from pages through the real graph, rank and text stages. */
export function siteInput(pages: readonly PageFacts[], options: ResolvedOptions, traffic: ReadonlyMap<string, number> | null = null): SuggestInput {
  const graph = buildGraph({ pages, assets: [], navigation: null, redirects: [] }, options);
  const ranking = rankGraph(graph, options);
  const facts = graph.pages.map((p) => pages[p.factsIndex]!);
  const index = buildTermIndex(facts.map((f) => f.text));
  const related = relatedPages(index, options.suggest.relatedK);
  return { graph, facts, ranking, index, related, centrality: contentCentrality(related, graph.pages.length), traffic };
}

/** A seeded generator (mulberry32) for random test data. */
export function random(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A graph of `n` pages (routes /p0/, /p1/, ...) from a list of [from, to, flags] edges (weights: content 1, template 0.2). */
export function edgeGraph(n: number, edges: readonly (readonly [number, number, number])[], entries: readonly number[] = [0]): SiteGraph {
  const list = createEdgeList(edges.length);
  for (const [from, to, flags] of edges) pushEdge(list, from, to, flags === 2 ? 0.2 : 1, flags);
  const { forward, reverse } = buildCsr(list, n);
  const pages: PageNode[] = Array.from({ length: n }, (_, i) => ({
    id: i,
    factsIndex: i,
    route: `/p${String(i).padStart(3, '0')}/`,
    file: `p${String(i).padStart(3, '0')}.md`,
    title: `Page ${i}`,
    meta: { draft: false, noindex: false, aliases: [], exclude: false },
  }));
  return {
    pages,
    routeIndex: new Map(pages.map((p) => [p.route, p.id])),
    links: [],
    forward,
    reverse,
    entries,
    missingEntries: [],
    duplicates: [],
  };
}

/** The same graph with content edges added (as if the links had been written), CSR rebuilt from scratch. */
export function withEdges(graph: SiteGraph, added: readonly { from: number; to: number }[]): SiteGraph {
  const n = graph.pages.length;
  const list = createEdgeList();
  const { offsets, targets, weights, flags } = graph.forward;
  for (let u = 0; u < n; u++) for (let e = offsets[u]!; e < offsets[u + 1]!; e++) pushEdge(list, u, targets[e]!, weights[e]!, flags[e]!);
  for (const a of added) pushEdge(list, a.from, a.to, 1, 1);
  const { forward, reverse } = buildCsr(list, n);
  return { ...graph, forward, reverse };
}

/** A random graph: `n` pages, about `degree` out-edges each, some template edges. */
export function randomGraph(rnd: () => number, n: number, degree: number): SiteGraph {
  const edges: [number, number, number][] = [];
  for (let u = 0; u < n; u++) {
    const k = Math.floor(rnd() * (2 * degree + 1));
    for (let i = 0; i < k; i++) edges.push([u, Math.floor(rnd() * n), rnd() < 0.2 ? 2 : 1]);
  }
  return edgeGraph(n, edges, [0]);
}

/** The site of `pages` (`siteInput`), its mention index, and the page id of a route. */
export function mentionsOf(pages: readonly PageFacts[], options: ResolvedOptions = testOptions()): { input: SuggestInput; index: MentionIndex; id: (route: string) => number } {
  const input = siteInput(pages, options);
  const id = (route: string): number => input.graph.pages.findIndex((p) => p.route === route);
  return { input, index: buildMentionIndex(input.graph, factsByPage(input), createStemCache()), id };
}
