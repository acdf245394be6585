import { z } from 'zod';
import { pageFinding } from './place.js';
import { entrySet, isOrphan } from './structure.js';
/**
 * `orphan-page`: every page has at least one inlink from another page.
 *
 * Entry pages are exempt. Reported at line 1, column 1 of the page's file.
 *
 * Options: `countTemplateLinks` (default `true`). Default severity: `error`: nothing leads a
 * reader to an orphan page, so it is unreachable too.
 *
 * @example ok: `index.md` links to `about.md`, so `/about/` is no orphan.
 * @example not ok: nothing links to `old/notes.md`:
 * `old/notes.md:1:1  error  Unexpected orphan page /old/notes/, expected a link to it from
 * at least one other page  orphan-page`
 */
export const orphanPage = {
    id: 'orphan-page',
    description: 'Every page is linked from at least one other page.',
    defaultSeverity: 'error',
    defaultOptions: { countTemplateLinks: true },
    optionsSchema: z.strictObject({ countTemplateLinks: z.boolean() }),
    check(ctx, options) {
        const entries = entrySet(ctx.graph);
        const findings = [];
        for (const page of ctx.graph.pages) {
            if (!isOrphan(ctx.graph, ctx.ranking, entries, page.id, options.countTemplateLinks))
                continue;
            const which = options.countTemplateLinks ? 'a link' : 'a content link';
            findings.push(pageFinding(page, `Unexpected orphan page ${page.route}, expected ${which} to it from at least one other page`));
        }
        return findings;
    },
};
