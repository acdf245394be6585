import type { Rule, RuleFinding } from './types.js';
import { listRoutes, pageFinding } from './place.js';
import { isUnreachable } from './structure.js';

/**
 * `unreachable-page`: every page can be reached by following links from an entry page.
 *
 * Click depth follows content links, and template links when `depthCountsTemplate` is true.
 * An orphan page is unreachable too and gets both findings. When no entry page exists the rule
 * is silent: `missing-entry` reports the cause once instead of every page.
 * Reported at line 1, column 1 of the page's file.
 *
 * Options: none. Default severity: `error`.
 *
 * @example ok: `/` links to `/guide/`, which links to `/guide/install/`.
 * @example not ok: `/archive/` and `/archive/2019/` link to each other, nothing else links in:
 * `archive/index.md:1:1  error  Unexpected unreachable page /archive/, expected a path of
 * links to it from an entry page (/)  unreachable-page`
 */
export const unreachablePage: Rule = {
  id: 'unreachable-page',
  description: 'Every page can be reached by following links from an entry page.',
  defaultSeverity: 'error',
  defaultOptions: {},
  check(ctx) {
    if (ctx.graph.entries.length === 0) return [];
    const entries = listRoutes(ctx.graph.entries.map((id) => ctx.graph.pages[id]!.route));
    const findings: RuleFinding[] = [];
    for (const page of ctx.graph.pages) {
      if (!isUnreachable(ctx.ranking, page.id)) continue;
      findings.push(
        pageFinding(page, `Unexpected unreachable page ${page.route}, expected a path of links to it from an entry page (${entries})`),
      );
    }
    return findings;
  },
};
