import { z } from 'zod';
import { pageFinding } from './place.js';
/**
 * `max-click-depth`: every reachable page is at most `max` clicks from an entry page.
 *
 * Unreachable pages are left to `unreachable-page`. Reported at line 1, column 1 of the
 * page's file; the message gives the page's depth and the limit.
 *
 * Options: `max` (default `null`: the `maxDepth` option, 3 by default). Default severity: `warning`.
 *
 * @example ok (max 3): `/` -> `/a/` -> `/a/b/` -> `/a/b/c/` (depth 3).
 * @example not ok: one more step, `/a/b/c/d/` at depth 4:
 * `a/b/c/d.md:1:1  warning  Unexpected click depth 4 for /a/b/c/d/, expected at most 3 clicks
 * from an entry page  max-click-depth`
 */
export const maxClickDepth = {
    id: 'max-click-depth',
    description: 'Every page is within a few clicks of an entry page.',
    defaultSeverity: 'warning',
    defaultOptions: { max: null },
    optionsSchema: z.strictObject({ max: z.number().int().min(0).nullable() }),
    check(ctx, options) {
        const max = options.max ?? ctx.options.maxDepth;
        const findings = [];
        for (const page of ctx.graph.pages) {
            const depth = ctx.ranking.depth[page.id];
            if (depth <= max)
                continue;
            const clicks = max === 1 ? 'click' : 'clicks';
            findings.push(pageFinding(page, `Unexpected click depth ${depth} for ${page.route}, expected at most ${max} ${clicks} from an entry page`));
        }
        return findings;
    },
};
