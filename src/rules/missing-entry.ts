import type { Rule, RuleFinding } from './types.js';
import { nearest } from './nearest.js';

/**
 * `missing-entry`: every configured entry route (option `entry`) is a page of the site.
 *
 * Without its entry pages click depth has nowhere to start. The finding belongs to no file
 * (`file` is `''`, line 1, column 1); `route` and `target` are the entry route, and the message
 * offers the closest existing route.
 *
 * Options: none. Default level: `error`.
 *
 * @example ok: `entry: ["/"]` and the site has `index.md`.
 * @example not ok: `entry: ["/start/"]` on a site without such a page:
 * `1:1  error  No page has the entry route /start/; correct "entry" in the configuration (did
 * you mean /stars/?)`
 */
export const missingEntry: Rule = {
  id: 'missing-entry',
  description: 'Every entry route is a page of the site.',
  defaultSeverity: 'error',
  defaultOptions: {},
  check(ctx) {
    const routes = ctx.graph.pages.map((p) => p.route);
    const findings: RuleFinding[] = [];
    for (const route of ctx.graph.missingEntries) {
      const guess = nearest(route, routes);
      const hint = guess === null ? '' : ` (did you mean ${guess}?)`;
      findings.push({
        file: '',
        line: 1,
        column: 1,
        route,
        message: `No page has the entry route ${route}; correct "entry" in the configuration${hint}`,
        target: route,
      });
    }
    return findings;
  },
};
