import { z } from 'zod';
import { pageFinding } from './place.js';
import { isDeadEnd } from './structure.js';
/**
 * `dead-end`: every page links on to at least one other page, so a reader never has to go back.
 *
 * Links to external sites, files and the page itself do not count. A one-page site has no
 * dead ends. Reported at line 1, column 1 of the page's file.
 *
 * Options: `countTemplateLinks` (default `false`). Default severity: `warning`.
 *
 * @example ok: `/guide/install/` ends with "Next: [configure](configure.md)".
 * @example not ok: `/guide/faq/` links only to an external site:
 * `guide/faq.md:1:1  warning  Unexpected dead end /guide/faq/ with no links to other pages,
 * expected at least one link onward  dead-end`
 */
/** Problems after which a page's links were never read. */
const UNREAD = new Set(['too-large', 'binary', 'unreadable']);
export const deadEnd = {
    id: 'dead-end',
    description: 'Every page links on to at least one other page.',
    defaultSeverity: 'warning',
    defaultOptions: { countTemplateLinks: false },
    optionsSchema: z.strictObject({ countTemplateLinks: z.boolean() }),
    check(ctx, options) {
        const findings = [];
        const which = options.countTemplateLinks ? 'links' : 'content links';
        for (const page of ctx.graph.pages) {
            // A file that was never read (too large, binary, unreadable) has no links to judge:
            // source-problem already reports it.
            if (ctx.facts[page.factsIndex]?.problems.some((p) => UNREAD.has(p.code)))
                continue;
            if (!isDeadEnd(ctx.graph, ctx.ranking, page.id, options.countTemplateLinks))
                continue;
            findings.push(pageFinding(page, `Unexpected dead end ${page.route} with no ${which} to other pages, expected at least one link onward`));
        }
        return findings;
    },
};
