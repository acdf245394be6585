/**
 * `buildGraph`: parsed facts -> the site's internal link graph (DESIGN sections 3-5).
 * Pure: every lookup is in indexes built here from the inputs.
 */
import type { ResolvedOptions } from '../config/options.js';
import type { PageFacts, ResolvedLink, SiteGraph } from '../types.js';
import type { GraphInput } from './types.js';
import { createEdgeList, pushEdge, buildCsr, EDGE_CONTENT, EDGE_TEMPLATE } from './csr.js';
import { extensionOf, isSourceExtension, lookupKey, normalizedBasePath, routeKeyOf } from '../routes/index.js';
import { selectPages } from './pages.js';
import { resolveLink } from './resolve.js';
import { navigationSource, pageSource } from './link-source.js';
import type { ResolveContext } from './resolve.js';
import { buildRouteIndex, resolveRouteValue } from './routes.js';
import { markTemplateLinks } from './template.js';
import { generatedEdges } from './generated.js';
import { applyHeadingIdStyle, PageIds } from './heading-ids.js';
import { resolveIncludes } from './includes.js';
import { bundleResources } from './bundles.js';
import { scopeContext } from './scope.js';

/** Pages with more ids than this get a Set for fragment checks; smaller ones are scanned. */
const ID_SET_THRESHOLD = 16;

/**
 * Build the link graph: pages sorted by route (drafts left out; one page per route, the first
 * file by path wins), the route index (routes, aliases, redirects), every link resolved
 * (sorted by page, line, column; navigation links first with `from: -1`), template links
 * marked, forward and reverse CSR, and the entry pages.
 */
export function buildGraph(input: GraphInput, options: ResolvedOptions): SiteGraph {
  const routes = options.routes;
  const basePath = normalizedBasePath(routes);
  const includes = resolveIncludes(input.pages, input.assets, options.generated.includeFolders);
  const included: ReadonlySet<string> = options.generated.includedPages ? new Set() : includes.includedFiles;
  // Hugo: leaf-bundle resources; Jekyll: `_includes/` files (pulled in by pages or layouts) are no pages.
  const notPages =
    routes.generator === 'hugo'
      ? new Set([...included, ...bundleResources(input.pages)])
      : routes.generator === 'jekyll'
        ? new Set([...included, ...input.pages.map((p) => p.file).filter((f) => f.startsWith('_includes/'))])
        : included;
  const { pages, duplicates, fileToPage } = selectPages(input.pages, routes, notPages);
  const facts: PageFacts[] = pages.map((p) => input.pages[p.factsIndex]);
  const unknownIds = new Set<number>();
  for (const p of pages) if (includes.unknown.has(p.factsIndex)) unknownIds.add(p.id);
  const layoutIds = pageLayoutIds(facts, options.generated.layoutIds, unknownIds);
  const pageIds = new PageIds(facts, pages.map((p) => includes.pulledIn.get(p.factsIndex) ?? []), unknownIds, layoutIds);
  const n = pages.length;

  const { routeIndex, redirectEnds } = buildRouteIndex(
    pages.map((p) => ({ route: p.route, aliases: p.meta.aliases })),
    input.redirects,
    routes,
    basePath,
  );
  const fold = routes.caseInsensitive ? (s: string) => s.toLowerCase() : (s: string) => s;
  const fileIndex = new Map<string, number>();
  for (const [file, id] of fileToPage) if (!fileIndex.has(fold(file))) fileIndex.set(fold(file), id);
  const assets = new Set(input.assets.map(fold));
  // Hugo's ref shortcodes also find a page by its file name alone, when only one page has it.
  let fileNames: Map<string, number> | undefined;
  if (routes.generator === 'hugo') {
    fileNames = new Map();
    for (const [file, id] of fileToPage) {
      const name = file.slice(file.lastIndexOf('/') + 1).toLowerCase();
      const known = fileNames.get(name);
      fileNames.set(name, known === undefined || known === id ? id : -1);
    }
  }
  const idSets: (Set<string> | undefined)[] = new Array(n);
  const ctx: ResolveContext = {
    routes,
    basePath,
    routeIndex,
    redirectEnds,
    fileIndex,
    assets,
    pageRoutes: pages.map((p) => p.route),
    scope: scopeContext(basePath, options.outside, options.generated.routes, routes.absoluteLinksUnderBase),
    ...(fileNames === undefined ? {} : { fileNames }),
    hasId(page, id) {
      if (unknownIds.has(page) || includes.pulledIn.has(pages[page].factsIndex) || layoutIds[page] !== undefined) return pageIds.has(page, id, 'github');
      const ids = facts[page].ids;
      if (ids.length <= ID_SET_THRESHOLD) return ids.includes(id);
      let set = idSets[page];
      if (set === undefined) idSets[page] = set = new Set(ids);
      return set.has(id);
    },
  };

  const resolved: ResolvedLink[] = [];
  const navTargets: number[] = [];
  if (input.navigation !== null) {
    const src = navigationSource(input.navigation.file, basePath);
    const navLinks = input.navigation.links.map((raw) => resolveLink(raw, src, ctx)).map((l) => withContext(l, 'template'));
    sortByPosition(navLinks);
    for (const l of navLinks) {
      resolved.push(l);
      if (l.to >= 0) navTargets.push(l.to);
    }
  }
  const navCount = resolved.length;
  for (let id = 0; id < n; id++) {
    const f = facts[id];
    const src = pageSource(id, f.kind, f.file, pages[id].route, f.baseHref);
    const start = resolved.length;
    for (const raw of f.links) resolved.push(resolveLink(raw, src, ctx));
    // An included file's text is part of the page: its links are the page's, resolved from the
    // page (the generator pastes the text in before it renders), placed in the included file.
    for (const inc of includes.pulledIn.get(pages[id].factsIndex) ?? []) {
      for (const raw of inc.links) resolved.push(resolveLink({ ...raw, file: inc.file }, src, ctx));
    }
    if (resolved.length - start > 1) sortRange(resolved, start);
  }
  const marked = resolved.slice(0, navCount).concat(markTemplateLinks(resolved.slice(navCount), n, options.templateShare));
  const { links, choice } = applyHeadingIdStyle(marked, pageIds, routes.headingIds, routes.headingIdsDefault);

  const uniqueNav = [...new Set(navTargets)].sort((a, b) => a - b);
  const edges = createEdgeList(links.length + uniqueNav.length * n + 2 * n);
  for (const l of links) {
    if (l.from < 0 || l.to < 0 || l.to === l.from) continue;
    if (l.context === 'template') pushEdge(edges, l.from, l.to, options.templateWeight, EDGE_TEMPLATE);
    else pushEdge(edges, l.from, l.to, 1, EDGE_CONTENT);
  }
  // The navigation file is the sidebar of every page: a template edge from each page to each target.
  for (const t of uniqueNav) for (let p = 0; p < n; p++) if (p !== t) pushEdge(edges, p, t, options.templateWeight, EDGE_TEMPLATE);
  // Links the generator puts on the pages it builds: section lists, previous/next post.
  const { entries, missingEntries } = resolveEntries(options.entry, basePath, ctx);
  for (const e of generatedEdges(pages, options.generated.sectionLists, options.generated.postFolders, entries)) {
    pushEdge(edges, e.from, e.to, options.templateWeight, EDGE_TEMPLATE);
  }
  const { forward, reverse } = buildCsr(edges, n);

  return {
    pages, routeIndex, links, forward, reverse, entries, missingEntries, duplicates,
    headingIds: choice,
    ...(includes.outside.length === 0 ? {} : { includesOutside: includes.outside }),
  };
}

/**
 * The ids each page's template writes (`generated.layoutIds`), by page id. A page's type is its
 * frontmatter `type`, else its top folder (`page` for a page at the root); index pages
 * (`_index.*`, rendered by list templates) get none. A type whose template computes ids makes
 * its pages' ids unknown (added to `unknown`).
 */
function pageLayoutIds(facts: readonly PageFacts[], entries: ResolvedOptions['generated']['layoutIds'], unknown: Set<number>): (readonly string[] | undefined)[] {
  const out: (readonly string[] | undefined)[] = new Array(facts.length);
  if (entries.length === 0) return out;
  const byType = new Map<string, (typeof entries)[number]>();
  for (const e of entries) if (!byType.has(e.type)) byType.set(e.type, e);
  for (let id = 0; id < facts.length; id++) {
    const f = facts[id];
    if (/(?:^|\/)_index\.[^/]+$/.test(f.file)) continue;
    const cut = f.file.indexOf('/');
    const type = f.meta.type ?? (cut < 0 ? 'page' : f.file.slice(0, cut));
    const e = byType.get(type) ?? byType.get('*');
    if (e === undefined) continue;
    if (e.ids.length > 0) out[id] = e.ids;
    if (e.computed) unknown.add(id);
  }
  return out;
}

/** Entry routes (or source file paths) -> page ids; the ones that match no page, as written. */
function resolveEntries(written: readonly string[], basePath: string, ctx: ResolveContext): { entries: number[]; missingEntries: string[] } {
  const ids = new Set<number>();
  const missingEntries: string[] = [];
  for (const entry of written) {
    let id: number | undefined;
    if (isSourceExtension(extensionOf(entry))) {
      const file = entry.replace(/^\/+/, '');
      id = ctx.fileIndex.get(ctx.routes.caseInsensitive ? file.toLowerCase() : file);
    }
    if (id === undefined) {
      const value = resolveRouteValue(entry, basePath);
      if (value !== null && value.kind === 'path') id = lookupKey(ctx.routeIndex, routeKeyOf(value.path, ctx.routes), ctx.routes);
    }
    if (id === undefined) missingEntries.push(entry);
    else ids.add(id);
  }
  return { entries: [...ids].sort((a, b) => a - b), missingEntries };
}

function withContext(link: ResolvedLink, context: 'template'): ResolvedLink {
  return link.context === context ? link : { ...link, context };
}

function comparePosition(a: ResolvedLink, b: ResolvedLink): number {
  const fa = a.raw.file ?? '';
  const fb = b.raw.file ?? '';
  if (fa !== fb) return fa < fb ? -1 : 1;
  return a.raw.line - b.raw.line || a.raw.column - b.raw.column;
}

function sortByPosition(links: ResolvedLink[]): void {
  links.sort(comparePosition);
}

/** Sort `links[start..]` by position in place (stable), skipping the copy when already sorted. */
function sortRange(links: ResolvedLink[], start: number): void {
  let sorted = true;
  for (let i = start + 1; i < links.length && sorted; i++) if (comparePosition(links[i - 1], links[i]) > 0) sorted = false;
  if (sorted) return;
  const part = links.slice(start).sort(comparePosition);
  for (let i = 0; i < part.length; i++) links[start + i] = part[i];
}
