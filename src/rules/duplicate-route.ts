import type { Rule, RuleFinding } from './types.js';

/**
 * `duplicate-route`: no two source files produce the same route.
 *
 * The first file by path keeps the route; each other file is reported at its line 1,
 * column 1, naming the kept file. `target` is the reported file, so two duplicates of one
 * route stay apart in a baseline.
 *
 * Options: none. Default level: `error`.
 *
 * @example ok: `guide.md` and `guide/index.md` with `slug: /guide-overview/`.
 * @example not ok: `guide.md` and `guide/index.md` both map to `/guide/`:
 * `guide/index.md:1:1  error  Route /guide/ already belongs to guide.md; give this file another
 * route (a slug) or remove it`
 */
export const duplicateRoute: Rule = {
  id: 'duplicate-route',
  description: 'Every route comes from one source file.',
  defaultSeverity: 'error',
  defaultOptions: {},
  check(ctx) {
    const findings: RuleFinding[] = [];
    for (const dup of ctx.graph.duplicates) {
      findings.push({
        file: dup.file,
        line: 1,
        column: 1,
        route: dup.route,
        message: `Route ${dup.route} already belongs to ${dup.keptFile}; give this file another route (a slug) or remove it`,
        target: dup.file,
      });
    }
    return findings;
  },
};
