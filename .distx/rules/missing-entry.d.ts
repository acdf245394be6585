import type { Rule } from './types.js';
/**
 * `missing-entry`: every configured entry route (option `entry`) is a page of the site.
 *
 * Without its entry pages click depth has nowhere to start. The finding belongs to no file
 * (`file` is `''`, line 1, column 1); `route` and `target` are the entry route, and the message
 * offers the closest existing route.
 *
 * Options: none. Default severity: `error`.
 *
 * @example ok: `entry: ["/"]` and the site has `index.md`.
 * @example not ok: `entry: ["/start/"]` on a site without such a page:
 * `1:1  error  Unexpected entry route /start/ that matches no page, expected the route of an
 * existing page in "entry" (did you mean /stars/?)  missing-entry`
 */
export declare const missingEntry: Rule;
