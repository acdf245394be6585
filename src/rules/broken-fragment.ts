import type { Rule, RuleFinding } from './types.js';
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
 * Options: none. Default level: `error`.
 *
 * @example ok (`/guide/install/` has a heading "Set up")
 * ```md
 * See [setting up](install.md#set-up).
 * ```
 * @example not ok
 * ```md
 * See [setting up](install.md#setup).
 * ```
 * `guide/index.md:1:5  error  Broken fragment: /guide/install/ has no heading or id "setup";
 * did you mean #set-up?`
 */
export const brokenFragment: Rule = {
  id: 'broken-fragment',
  description: 'Fragment links name a heading or id that exists on the target page.',
  defaultSeverity: 'error',
  defaultOptions: {},
  check(ctx) {
    const findings: RuleFinding[] = [];
    for (const link of ctx.graph.links) {
      if (link.status !== 'broken-fragment') continue;
      const fragment = bareFragment(link.fragment);
      const page = link.to >= 0 ? ctx.graph.pages[link.to] : undefined;
      const ids = page === undefined ? [] : (ctx.facts[page.factsIndex]?.ids ?? []);
      const guess = nearest(fragment, ids);
      const todo = guess === null ? 'fix the fragment or add the heading' : `did you mean #${guess}?`;
      findings.push({
        ...linkSource(ctx, link),
        line: link.raw.line,
        column: link.raw.column,
        message: `Broken fragment: ${link.target} has no heading or id "${fragment}"; ${todo}`,
        target: `${link.target}#${fragment}`,
      });
    }
    return findings;
  },
};
