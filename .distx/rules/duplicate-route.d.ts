import type { Rule } from './types.js';
/**
 * `duplicate-route`: no two source files produce the same route.
 *
 * The first file by path keeps the route; each other file is reported at its line 1,
 * column 1, naming the kept file. `target` is the reported file, so two duplicates of one
 * route stay apart in a baseline.
 *
 * Options: none. Default severity: `error`.
 *
 * @example ok: `guide.md` and `guide/index.md` with `slug: /guide-overview/`.
 * @example not ok: `guide.md` and `guide/index.md` both map to `/guide/`:
 * `guide/index.md:1:1  error  Unexpected second file for route /guide/, expected one file per
 * route (guide.md has it)  duplicate-route`
 */
export declare const duplicateRoute: Rule;
