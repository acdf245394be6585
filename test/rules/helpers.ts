/**
 * Small hand-built sites for the rule and report tests: a compact description in, the
 * `SiteGraph`, `PageFacts[]` and `Ranking` the pipeline would hand the rules out.
 *
 * Links are resolved here by route only (the tests state targets as routes), edges and counts
 * follow DESIGN section 5, and click depth is a plain BFS; PageRank is uniform unless given.
 */
import { resolveOptions } from '../../src/options.js';
import type { Config, ResolvedOptions } from '../../src/options.js';
import type {
  Csr,
  LinkContext,
  LinkKind,
  LinkStatus,
  PageFacts,
  PageMeta,
  PageNode,
  Ranking,
  ResolvedLink,
  SiteGraph,
  SourceProblem,
} from '../../src/types.js';
import type { RuleContext, SourceWarning } from '../../src/rules/index.js';

/**
 * A link in a test site: `to` is a route (`/a/`, `/a/#frag`), an absolute URL, or, for a
 * broken link to a source file, the file's path from the root (`guide/x.md`), as the graph
 * gives it. A missing path with a file extension other than a source one is a missing asset.
 */
export interface LinkSpec {
  readonly to: string;
  readonly href?: string;
  readonly text?: string;
  readonly line?: number;
  readonly column?: number;
  readonly context?: LinkContext;
  readonly nofollow?: boolean;
}

/** A page of a test site. */
export interface PageSpec {
  readonly route: string;
  /** Default: the route turned into a Markdown path (`/a/b/` -> `a/b.md`, `/` -> `index.md`). */
  readonly file?: string;
  readonly title?: string;
  readonly links?: readonly (string | LinkSpec)[];
  readonly ids?: readonly string[];
  readonly exclude?: boolean;
  readonly importance?: 'high' | 'normal' | 'low';
  readonly problems?: readonly SourceProblem[];
}

/** A whole test site. */
export interface SiteSpec {
  readonly pages: readonly PageSpec[];
  /** Links of a navigation file (`_nav.md`), added as template edges from every page. */
  readonly navigation?: readonly (string | LinkSpec)[];
  readonly duplicates?: SiteGraph['duplicates'];
  readonly options?: Config;
  readonly warnings?: readonly SourceWarning[];
  /** PageRank per page in route order; default uniform. */
  readonly pagerank?: readonly number[];
  /** Extra facts that are not pages (drafts, files that failed to parse). */
  readonly extraFacts?: readonly PageFacts[];
}

/** Default file of a route. */
export function fileOf(route: string): string {
  return route === '/' ? 'index.md' : `${route.replace(/^\/|\/$/g, '')}.md`;
}

function meta(spec: PageSpec): PageMeta {
  return {
    draft: false,
    noindex: false,
    aliases: [],
    exclude: spec.exclude ?? false,
    ...(spec.importance === undefined ? {} : { importance: spec.importance }),
  };
}

/** Facts of a file as `parse` would give them (no text or spans). */
export function factsOf(spec: PageSpec, problems: readonly SourceProblem[] = spec.problems ?? []): PageFacts {
  return {
    file: spec.file ?? fileOf(spec.route),
    kind: 'markdown',
    hash: 'h',
    route: spec.route,
    title: spec.title ?? spec.route,
    meta: meta(spec),
    headings: [],
    ids: [...(spec.ids ?? [])].sort(),
    links: [],
    text: { title: '', headings: '', body: '' },
    spans: [],
    protected: [],
    problems,
  };
}

function linkOf(spec: string | LinkSpec): LinkSpec {
  return typeof spec === 'string' ? { to: spec } : spec;
}

function csr(n: number, edges: Map<string, { from: number; to: number; weight: number; flags: number }>, reverse: boolean): Csr {
  const rows: { to: number; weight: number; flags: number }[][] = Array.from({ length: n }, () => []);
  for (const e of edges.values()) {
    const [a, b] = reverse ? [e.to, e.from] : [e.from, e.to];
    rows[a]!.push({ to: b, weight: e.weight, flags: e.flags });
  }
  const offsets = new Int32Array(n + 1);
  const all = rows.flatMap((r, i) => {
    offsets[i + 1] = offsets[i]! + r.length;
    return r.sort((x, y) => x.to - y.to);
  });
  return {
    offsets,
    targets: Int32Array.from(all.map((e) => e.to)),
    weights: Float32Array.from(all.map((e) => e.weight)),
    flags: Uint8Array.from(all.map((e) => e.flags)),
  };
}

/** Build the rule context of a test site. */
export function buildSite(spec: SiteSpec): RuleContext {
  const options: ResolvedOptions = resolveOptions(
    { ...(spec.navigation === undefined ? {} : { navigation: '_nav.md' }), ...spec.options },
    '/site',
  );
  const sorted = [...spec.pages].sort((a, b) => (a.route < b.route ? -1 : a.route > b.route ? 1 : 0));
  // Facts in file order (as collect sorts), pages in route order: factsIndex maps between them.
  const factsSpecs = [...spec.pages].sort((a, b) => {
    const fa = a.file ?? fileOf(a.route);
    const fb = b.file ?? fileOf(b.route);
    return fa < fb ? -1 : fa > fb ? 1 : 0;
  });
  const facts = [...factsSpecs.map((s) => factsOf(s)), ...(spec.extraFacts ?? [])];
  const pages: PageNode[] = sorted.map((s, id) => ({
    id,
    factsIndex: factsSpecs.indexOf(s),
    route: s.route,
    file: s.file ?? fileOf(s.route),
    title: s.title ?? s.route,
    meta: meta(s),
  }));
  const routeIndex = new Map(pages.map((p) => [p.route, p.id]));
  const n = pages.length;
  const links: ResolvedLink[] = [];
  const edges = new Map<string, { from: number; to: number; weight: number; flags: number }>();
  const addEdge = (from: number, to: number, context: LinkContext): void => {
    if (from === to) return;
    const key = `${from}>${to}`;
    const e = edges.get(key) ?? { from, to, weight: 0, flags: 0 };
    e.weight += context === 'content' ? 1 : options.templateWeight;
    e.flags |= context === 'content' ? 1 : 2;
    edges.set(key, e);
  };
  const resolve = (from: number, l: LinkSpec, defaultContext: LinkContext): ResolvedLink => {
    const [path, fragment = ''] = l.to.split('#');
    const external = /^[a-z]+:/.test(l.to);
    const to = external ? -1 : (routeIndex.get(path!) ?? -1);
    let status: LinkStatus = external ? 'external' : to < 0 ? 'broken' : 'ok';
    if (to >= 0 && from === to && fragment === '') status = 'self';
    if (to >= 0 && fragment !== '' && !facts[pages[to]!.factsIndex]!.ids.includes(fragment)) status = 'broken-fragment';
    const asset = /\.[A-Za-z0-9]+$/.test(path!) && !/\.(md|markdown|mdx|html?)$/i.test(path!);
    const kind: LinkKind = external ? 'external' : asset ? 'asset' : 'internal';
    const context = l.context ?? defaultContext;
    return {
      from,
      to,
      target: external ? l.to : path!,
      fragment,
      kind,
      status,
      context,
      raw: {
        href: l.href ?? l.to,
        text: l.text ?? 'link',
        line: l.line ?? 1,
        column: l.column ?? 1,
        context,
        nofollow: l.nofollow ?? false,
        origin: from < 0 ? 'navigation' : 'markdown',
      },
    };
  };
  for (const page of pages) {
    for (const l of sorted[page.id]!.links ?? []) {
      const link = resolve(page.id, linkOf(l), 'content');
      links.push(link);
      if (link.to >= 0) addEdge(page.id, link.to, link.context);
    }
  }
  for (const l of spec.navigation ?? []) {
    const link = resolve(-1, linkOf(l), 'template');
    links.push(link);
    if (link.to >= 0) for (const page of pages) addEdge(page.id, link.to, 'template');
  }
  const forward = csr(n, edges, false);
  const reverse = csr(n, edges, true);
  const entries: number[] = [];
  const missingEntries: string[] = [];
  for (const route of options.entry) {
    const id = routeIndex.get(route);
    if (id === undefined) missingEntries.push(route);
    else entries.push(id);
  }
  const graph: SiteGraph = {
    pages,
    routeIndex,
    links,
    forward,
    reverse,
    entries,
    missingEntries,
    duplicates: spec.duplicates ?? [],
  };
  return { graph, facts, ranking: rankOf(graph, options, spec.pagerank), options, warnings: spec.warnings ?? [] };
}

function rankOf(graph: SiteGraph, options: ResolvedOptions, pagerank?: readonly number[]): Ranking {
  const n = graph.pages.length;
  const { forward, reverse } = graph;
  const count = (c: Csr, i: number, mask: number): number => {
    let k = 0;
    for (let e = c.offsets[i]!; e < c.offsets[i + 1]!; e++) if ((c.flags[e]! & mask) !== 0) k++;
    return k;
  };
  const depth = new Int32Array(n).fill(-1);
  const queue = [...graph.entries];
  for (const e of queue) depth[e] = 0;
  const mask = options.depthCountsTemplate ? 3 : 1;
  for (let q = 0; q < queue.length; q++) {
    const u = queue[q]!;
    for (let e = forward.offsets[u]!; e < forward.offsets[u + 1]!; e++) {
      const v = forward.targets[e]!;
      if ((forward.flags[e]! & mask) !== 0 && depth[v] === -1) {
        depth[v] = depth[u]! + 1;
        queue.push(v);
      }
    }
  }
  return {
    pagerank: pagerank === undefined ? new Float64Array(n).fill(1 / n) : Float64Array.from(pagerank),
    depth,
    inlinks: Int32Array.from({ length: n }, (_, i) => count(reverse, i, 3)),
    contentInlinks: Int32Array.from({ length: n }, (_, i) => count(reverse, i, 1)),
    outlinks: Int32Array.from({ length: n }, (_, i) => count(forward, i, 3)),
    iterations: 12,
    converged: true,
  };
}
