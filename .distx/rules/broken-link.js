import { linkSource } from './place.js';
import { nearest } from './nearest.js';
/**
 * `broken-link`: every internal link leads to an existing page, alias, redirect or file.
 *
 * Reported at the link's own line and column, once per link (a broken link in a template
 * region is reported on every page that carries it). The message names the resolved target
 * (a route; for a link to a source file that does not exist, the file's path from the content
 * root; for a missing image or download, its path), the destination as written when it
 * differs, and the closest existing route (or source file) by edit distance when one is close.
 * `target` is the resolved target.
 *
 * Options: none. Default severity: `error`.
 *
 * @example ok (`guide/index.md`, the site has `guide/install.md`, route `/guide/install/`)
 * ```md
 * Read [the install guide](install.md) or [the install page](/guide/install/).
 * ```
 * @example not ok
 * ```md
 * Read [the install guide](instal.md) or [the install page](/guide/instal/).
 * ```
 * `guide/index.md:1:6  error  Unexpected link to missing file guide/instal.md (written
 * "instal.md"), expected an existing source file (did you mean guide/install.md?)  broken-link`
 * `guide/index.md:1:40  error  Unexpected link to missing page /guide/instal/, expected an
 * existing page (did you mean /guide/install/?)  broken-link`
 */
export const brokenLink = {
    id: 'broken-link',
    description: 'Internal links lead to pages that exist.',
    defaultSeverity: 'error',
    defaultOptions: {},
    check(ctx) {
        const routes = ctx.graph.pages.map((p) => p.route);
        const files = ctx.graph.pages.map((p) => p.file);
        const guesses = new Map();
        const findings = [];
        for (const link of ctx.graph.links) {
            if (link.status !== 'broken')
                continue;
            // The graph gives a missing source file as its path from the root (no leading slash),
            // a missing asset or page as a route.
            const sourceFile = !link.target.startsWith('/');
            const what = sourceFile ? 'file' : link.kind === 'asset' ? 'file' : 'page';
            const expected = sourceFile ? 'an existing source file' : link.kind === 'asset' ? 'an existing file' : 'an existing page';
            let guess = guesses.get(link.target);
            if (guess === undefined) {
                guess = link.kind === 'asset' ? null : nearest(link.target, sourceFile ? files : routes);
                guesses.set(link.target, guess);
            }
            const written = link.raw.href !== link.target ? ` (written "${link.raw.href}")` : '';
            const hint = guess === null ? '' : ` (did you mean ${guess}?)`;
            findings.push({
                ...linkSource(ctx, link),
                line: link.raw.line,
                column: link.raw.column,
                message: `Unexpected link to missing ${what} ${link.target}${written}, expected ${expected}${hint}`,
                target: link.target,
            });
        }
        return findings;
    },
};
