import type { Rule, RuleFinding } from './types.js';
import { pageFinding } from './place.js';

/**
 * `click-depth`: every reachable page is at most `maxDepth` clicks from an entry page.
 *
 * The limit is the top-level `maxDepth` option (and so the `--max-depth` flag), the one depth
 * limit that the depth-repair plan and the reports read too; the check has no limit of its own.
 * Unreachable pages are left to `unreachable-page`. Reported at line 1, column 1 of the page's
 * file; the message gives the page's depth and the limit.
 *
 * Options: none (the limit is `maxDepth`, 3 by default). Default level: `warning`.
 *
 * @example ok (maxDepth 3): `/` -> `/a/` -> `/a/b/` -> `/a/b/c/` (depth 3).
 * @example not ok: one more step, `/a/b/c/d/` at depth 4:
 * `a/b/c/d.md:1:1  warning  /a/b/c/d/ is 4 clicks from an entry page, over the limit of 3;
 * link it from a page nearer the top`
 */
export const clickDepth: Rule = {
  id: 'click-depth',
  description: 'Every page is within maxDepth clicks of an entry page.',
  defaultSeverity: 'warning',
  defaultOptions: {},
  check(ctx) {
    const max = ctx.options.maxDepth;
    const findings: RuleFinding[] = [];
    for (const page of ctx.graph.pages) {
      const depth = ctx.ranking.depth[page.id];
      if (depth <= max) continue;
      findings.push(
        pageFinding(page, `${page.route} is ${depth} clicks from an entry page, over the limit of ${max}; link it from a page nearer the top`),
      );
    }
    return findings;
  },
};
