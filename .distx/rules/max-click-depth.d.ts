import type { Rule } from './types.js';
/** Options of `max-click-depth`. */
export interface MaxClickDepthOptions {
    /**
     * Deepest click depth allowed. `null` takes the top-level `maxDepth` option (and so the
     * `--max-depth` flag).
     * @default null
     */
    readonly max: number | null;
}
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
export declare const maxClickDepth: Rule<MaxClickDepthOptions>;
