/** Where a finding points: helpers shared by the rules. */
import type { PageNode, ResolvedLink } from '../types.js';
import type { RuleContext, RuleFinding } from './types.js';
import { navigationFile } from '../util/index.js';

/** A finding about a whole page: line 1, column 1 of its file. */
export function pageFinding(page: PageNode, message: string, target?: string): RuleFinding {
  return { file: page.file, line: 1, column: 1, route: page.route, message, ...(target === undefined ? {} : { target }) };
}

/**
 * File and route a link is written in. Navigation links (`from` -1) belong to the navigation
 * file, which is no page: route `''`.
 */
export function linkSource(ctx: RuleContext, link: ResolvedLink): { file: string; route: string } {
  if (link.from < 0) return { file: navigationFile(ctx.options), route: '' };
  const page = ctx.graph.pages[link.from];
  return { file: link.raw.file ?? page.file, route: page.route };
}

/** Fragment without its leading `#`. */
export function bareFragment(fragment: string): string {
  return fragment.startsWith('#') ? fragment.slice(1) : fragment;
}

/** A list of routes for a message: at most three, then "and N more". */
export function listRoutes(routes: readonly string[]): string {
  if (routes.length <= 3) return routes.join(', ');
  return `${routes.slice(0, 3).join(', ')} and ${routes.length - 3} more`;
}

/**
 * The nearest page up a page's route that a reader can reach (`/guide/` for `/guide/old/`, then
 * `/`), as a place to link the page from; null when there is none.
 */
export function parentPage(ctx: RuleContext, page: number): string | null {
  const route = ctx.graph.pages[page].route;
  const parts = route.split('/').filter((p) => p !== '');
  for (let n = parts.length - 1; n >= 0; n--) {
    const up = n === 0 ? '/' : `/${parts.slice(0, n).join('/')}/`;
    const id = ctx.graph.routeIndex.get(up) ?? ctx.graph.routeIndex.get(up.toLowerCase());
    if (id !== undefined && id !== page && ctx.ranking.depth[id] >= 0) return ctx.graph.pages[id].route;
  }
  return null;
}
