import { bareFragment, linkSource } from './place.js';
import { nearest } from './nearest.js';
/**
 * `broken-fragment`: every `#fragment` of an internal link names a heading slug or an
 * `id`/`name` on the target page.
 *
 * Reported at the link's line and column. The message names the fragment, the target page,
 * and the closest existing fragment of that page when one is close by edit distance.
 * `target` is `route#fragment`.
 *
 * Options: none. Default severity: `error`.
 *
 * @example ok (`/guide/install/` has a heading "Set up")
 * ```md
 * See [setting up](install.md#set-up).
 * ```
 * @example not ok
 * ```md
 * See [setting up](install.md#setup).
 * ```
 * `guide/index.md:1:5  error  Unexpected link to missing fragment #setup on /guide/install/,
 * expected a heading or id of that page (did you mean #set-up?)  broken-fragment`
 */
export const brokenFragment = {
    id: 'broken-fragment',
    description: 'Fragment links name a heading or id that exists on the target page.',
    defaultSeverity: 'error',
    defaultOptions: {},
    check(ctx) {
        const findings = [];
        for (const link of ctx.graph.links) {
            if (link.status !== 'broken-fragment')
                continue;
            const fragment = bareFragment(link.fragment);
            const page = link.to >= 0 ? ctx.graph.pages[link.to] : undefined;
            const ids = page === undefined ? [] : (ctx.facts[page.factsIndex]?.ids ?? []);
            const guess = nearest(fragment, ids);
            const hint = guess === null ? '' : ` (did you mean #${guess}?)`;
            findings.push({
                ...linkSource(ctx, link),
                line: link.raw.line,
                column: link.raw.column,
                message: `Unexpected link to missing fragment #${fragment} on ${link.target}, expected a heading or id of that page${hint}`,
                target: `${link.target}#${fragment}`,
            });
        }
        return findings;
    },
};
