import type { Rule } from './types.js';
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
export declare const brokenFragment: Rule;
