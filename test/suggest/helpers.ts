/**
 * Builders for the suggest tests. Until the parse stage lands, Markdown is turned into
 * `PageFacts` here with unified + remark-parse directly (spans = text nodes outside links,
 * headings, code, images and HTML; `text === source.slice(offset, ...)`); the rest of the
 * pipeline is the real graph, rank and text stages.
 */
import { unified } from 'unified';
import remarkParse from 'remark-parse';
import remarkGfm from 'remark-gfm';
import remarkFrontmatter from 'remark-frontmatter';
import type { Root, Nodes } from 'mdast';
import { resolveOptions } from '../../src/options.js';
import type { Config, ResolvedOptions } from '../../src/options.js';
import { buildCsr, buildGraph, createEdgeList, pushEdge } from '../../src/graph/index.js';
import { rankGraph } from '../../src/rank/index.js';
import { buildTermIndex, contentCentrality, relatedPages } from '../../src/text/index.js';
import type { PageFacts, PageMeta, PageNode, RawLink, SiteGraph, TextSpan } from '../../src/types.js';
import type { SuggestInput } from '../../src/suggest/index.js';

const processor = unified().use(remarkParse).use(remarkGfm).use(remarkFrontmatter);

/** Parse Markdown to mdast (positions included). */
export function parseMarkdown(source: string): Root {
  return processor.parse(source) as Root;
}

const NO_SPANS = new Set(['link', 'linkReference', 'heading', 'image', 'imageReference', 'code', 'inlineCode', 'html', 'definition', 'yaml']);

function plain(node: Nodes): string {
  if ('value' in node && typeof node.value === 'string') return node.type === 'code' || node.type === 'inlineCode' ? '' : node.value;
  if ('children' in node) return (node.children as Nodes[]).map(plain).join(' ');
  return '';
}

function walk(node: Nodes, ancestors: Nodes[], fn: (node: Nodes, ancestors: readonly Nodes[]) => void): void {
  fn(node, ancestors);
  if ('children' in node) for (const child of node.children as Nodes[]) walk(child, [...ancestors, node], fn);
}

/** Route of a Markdown file (directory style): `a/b.md` -> `/a/b/`, `a/index.md` -> `/a/`. */
export function routeOf(file: string): string {
  const noExt = file.replace(/\.md$/, '');
  if (noExt === 'index') return '/';
  if (noExt.endsWith('/index')) return `/${noExt.slice(0, -'/index'.length)}/`;
  return `/${noExt}/`;
}

/** PageFacts of a Markdown source, the way the parse stage is specified to give them. */
export function markdownPage(file: string, source: string, meta: Partial<PageMeta> = {}): PageFacts {
  const tree = parseMarkdown(source);
  const spans: TextSpan[] = [];
  const links: RawLink[] = [];
  const headings: string[] = [];
  const body: string[] = [];
  let title = '';
  walk(tree, [], (n, ancestors) => {
    if (n.type === 'heading') {
      const text = plain(n);
      if (n.depth === 1 && title === '') title = text;
      else headings.push(text);
    }
    if (n.type === 'link') {
      links.push({
        href: n.url,
        text: plain(n),
        line: n.position!.start.line,
        column: n.position!.start.column,
        context: 'content',
        nofollow: false,
        origin: 'markdown',
      });
    }
    if (n.type === 'text') {
      const inside = ancestors.some((a) => NO_SPANS.has(a.type));
      if (!ancestors.some((a) => a.type === 'heading')) body.push(n.value);
      if (!inside) {
        const start = n.position!.start;
        const end = n.position!.end;
        spans.push({ text: source.slice(start.offset!, end.offset!), offset: start.offset!, line: start.line, column: start.column });
      }
    }
  });
  return {
    file,
    kind: 'markdown',
    hash: `hash-of-${file}`,
    route: routeOf(file),
    title: title || file,
    meta: { draft: false, noindex: false, aliases: [], exclude: false, ...meta },
    headings: [],
    ids: [],
    links,
    text: { title: title || file, headings: headings.join('\n'), body: body.join('\n') },
    spans,
    problems: [],
  };
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
