import type { Rule, RuleFinding } from './types.js';
import { linkSource } from './place.js';
import { nearest } from './nearest.js';

/**
 * `broken-link`: every internal link leads to an existing page, alias, redirect or file.
 *
 * Reported at the link's own line and column, once per link (a broken link in a template
 * region is reported on every page that carries it). The message names the resolved target,
 * the destination as written when it differs, and the closest existing route by edit distance
 * when one is close. `target` is the resolved route.
 *
 * Options: none. Default severity: `error`.
 *
 * @example ok (`guide/index.md`, the site has `/guide/install/`)
 * ```md
 * Read [the install guide](install.md).
 * ```
 * @example not ok
 * ```md
 * Read [the install guide](instal.md).
 * ```
 * `guide/index.md:1:6  error  Unexpected link to missing page /guide/instal/ (written "instal.md"),
 * expected an existing page (did you mean /guide/install/?)  broken-link`
 */
export const brokenLink: Rule = {
  id: 'broken-link',
  description: 'Internal links lead to pages that exist.',
  defaultSeverity: 'error',
  defaultOptions: {},
  check(ctx) {
    const routes = ctx.graph.pages.map((p) => p.route);
    const guesses = new Map<string, string | null>();
    const findings: RuleFinding[] = [];
    for (const link of ctx.graph.links) {
      if (link.status !== 'broken') continue;
      let guess = guesses.get(link.target);
      if (guess === undefined) {
        guess = nearest(link.target, routes);
        guesses.set(link.target, guess);
      }
      const written = link.raw.href !== link.target ? ` (written "${link.raw.href}")` : '';
      const what = looksLikeFile(link.target) ? 'page or file' : 'page';
      const hint = guess === null ? '' : ` (did you mean ${guess}?)`;
      findings.push({
        ...linkSource(ctx, link),
        line: link.raw.line,
        column: link.raw.column,
        message: `Unexpected link to missing ${what} ${link.target}${written}, expected an existing ${what}${hint}`,
        target: link.target,
      });
    }
    return findings;
  },
};

/** A path whose last segment has an extension other than .html/.htm names a file (an image, a PDF). */
function looksLikeFile(target: string): boolean {
  const last = target.slice(target.lastIndexOf('/') + 1);
  return /\.[A-Za-z0-9]+$/.test(last) && !/\.html?$/i.test(last);
}
