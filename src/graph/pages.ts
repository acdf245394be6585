/**
 * Choosing the graph's pages from the parsed facts: drafts left out, routes made canonical,
 * one page per route (the first file by path keeps it), pages sorted by route.
 */
import type { PageFacts, PageNode } from '../types.js';
import { canonicalPath, encodeRouteSegment, routeKeyOf } from '../routes/index.js';
import { compareText } from '../util/index.js';
import type { RouteOptions } from '../routes/index.js';

/** A file that lost its route to another file. */
export interface DuplicateRoute {
  readonly file: string;
  readonly route: string;
  readonly keptFile: string;
}

/** The pages of a site and the files that did not become pages. */
export interface PageSelection {
  readonly pages: PageNode[];
  readonly duplicates: DuplicateRoute[];
  /** File path -> page id, for every non-draft file (a duplicate maps to the page that kept its route). */
  readonly fileToPage: Map<string, number>;
}

/**
 * Canonical form of a page route from the parse stage. A route that does not percent-decode
 * (a literal `%` in a file name) is taken as already decoded and encoded once.
 */
export function canonicalRoute(route: string): string {
  return canonicalPath(route) ?? canonicalPath(route.split('/').map(encodeRouteSegment).join('/'))!;
}

/**
 * Select and sort the pages of `facts`.
 * @param notPages files that are no pages of their own (pulled into another page)
 */
export function selectPages(facts: readonly PageFacts[], routes: RouteOptions, notPages: ReadonlySet<string> = new Set()): PageSelection {
  const candidates: { index: number; route: string; key: string; file: string; rank: number }[] = [];
  // Two index files of one folder (index.md and README.md): the earlier name in `indexNames`
  // wins, as generators choose (mkdocs 1.4 skips README.md beside index.md, with a warning).
  const indexRank = (file: string): number => {
    const stem = file.slice(file.lastIndexOf('/') + 1).replace(/\.[^.]*$/, '');
    const at = routes.indexNames.indexOf(stem);
    return at < 0 ? -1 : at;
  };
  for (let index = 0; index < facts.length; index++) {
    const f = facts[index];
    if (f.meta.draft || notPages.has(f.file)) continue;
    const route = canonicalRoute(f.route);
    candidates.push({ index, route, key: routeKeyOf(route, routes), file: f.file, rank: indexRank(f.file) });
  }
  candidates.sort((a, b) => compareText(a.key, b.key) || (a.rank >= 0 && b.rank >= 0 ? a.rank - b.rank : 0) || compareText(a.file, b.file) || a.index - b.index);

  const kept: typeof candidates = [];
  const lost: { file: string; route: string; keptIndex: number }[] = [];
  for (const c of candidates) {
    const last = kept[kept.length - 1];
    if (last !== undefined && last.key === c.key) lost.push({ file: c.file, route: c.route, keptIndex: kept.length - 1 });
    else kept.push(c);
  }
  const order = kept.map((_, i) => i);
  order.sort((a, b) => compareText(kept[a].route, kept[b].route) || compareText(kept[a].file, kept[b].file));
  const idOfKept = new Int32Array(kept.length);
  const pages: PageNode[] = order.map((k, id) => {
    idOfKept[k] = id;
    const c = kept[k];
    const f = facts[c.index];
    return { id, factsIndex: c.index, route: c.route, file: f.file, title: f.title, meta: f.meta };
  });

  const fileToPage = new Map<string, number>();
  for (const p of pages) if (!fileToPage.has(p.file)) fileToPage.set(p.file, p.id);
  const duplicates: DuplicateRoute[] = [];
  for (const d of lost) {
    const keptPage = pages[idOfKept[d.keptIndex]];
    duplicates.push({ file: d.file, route: d.route, keptFile: keptPage.file });
    if (!fileToPage.has(d.file)) fileToPage.set(d.file, keptPage.id);
  }
  duplicates.sort((a, b) => compareText(a.route, b.route) || compareText(a.file, b.file));
  return { pages, duplicates, fileToPage };
}
