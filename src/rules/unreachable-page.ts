import type { Rule, RuleFinding } from './types.js';
import { listRoutes, pageFinding } from './place.js';
import { entrySet, isOrphan, isUnreachable } from './structure.js';

/**
 * `unreachable-page`: every page can be reached by following links from an entry page.
 *
 * Click depth follows content links, and template links when `depthCountsTemplate` is true.
 * An orphan page is unreachable too, but `orphan-page` already says why, so this rule reports
 * only the pages that do have inlinks (from pages that are unreachable themselves, or through
 * links that click depth does not follow); the message names those pages, which is where the
 * fix goes. When no entry page exists the rule
 * is silent: `missing-entry` reports the cause once instead of every page.
 * Reported at line 1, column 1 of the page's file.
 *
 * Options: none. Default level: `error`.
 *
 * @example ok: `/` links to `/guide/`, which links to `/guide/install/`.
 * @example not ok: `/archive/` and `/archive/2019/` link to each other, nothing else links in:
 * `archive/index.md:1:1  error  /archive/ cannot be reached from /: only /archive/2019/ links to it;
 * link it from a reachable page`
 */
export const unreachablePage: Rule = {
  id: 'unreachable-page',
  description: 'Every page can be reached by following links from an entry page.',
  defaultSeverity: 'error',
  defaultOptions: {},
  check(ctx) {
    if (ctx.graph.entries.length === 0) return [];
    const entries = listRoutes(ctx.graph.entries.map((id) => ctx.graph.pages[id].route));
    const entryIds = entrySet(ctx.graph);
    const findings: RuleFinding[] = [];
    const { reverse } = ctx.graph;
    for (const page of ctx.graph.pages) {
      if (!isUnreachable(ctx.ranking, page.id) || isOrphan(ctx.graph, ctx.ranking, entryIds, page.id)) continue;
      const from: string[] = [];
      for (let e = reverse.offsets[page.id]; e < reverse.offsets[page.id + 1]; e++) {
        if (reverse.targets[e] !== page.id) from.push(ctx.graph.pages[reverse.targets[e]].route);
      }
      findings.push(
        pageFinding(
          page,
          `${page.route} cannot be reached from ${entries}: only ${listRoutes(from)} ${from.length === 1 ? 'links' : 'link'} to it; ` +
            'link it from a reachable page',
        ),
      );
    }
    return findings;
  },
};
