/**
 * `buildReport`: the stages' outputs -> the one `Report` object (DESIGN section 8).
 *
 * Deterministic: every array is sorted, numbers are rounded to a fixed precision
 * (`round.ts`), nothing depends on the clock. Field choices:
 * - `pages`: by route; `rank` = pagerank x number of pages (1.0 = an average page), from the
 *   unrounded PageRank; `depth` null when unreachable.
 * - `links`: every resolved link, sorted by `from`, file, line, column, `to`, text. `from` is
 *   the route of the page the link is on; navigation links (written once in the navigation
 *   file, the sidebar of every page) have `from: ""` (no page) and `file` = the navigation
 *   file. `to` is the graph's resolved target: a route (with `#fragment` when there is one),
 *   an absolute URL, the path from the root of a missing source file, or the destination as
 *   written when it could not be resolved. `context` is the effective context after template
 *   detection.
 * - `findings`: by file, line, column, rule, message.
 * - `suggestions`: by file, line, column, target, id.
 * - `baseline` (only with `input.baseline`): findings matched against it (`baseline/match.ts`);
 *   the gate's severity failures and `gate.maxWarnings` count the new ones only.
 */
import type { Report } from '../types.js';
import type { ReportInput } from './types.js';
/** Build the report. Pure; the inputs are not changed. */
export declare function buildReport(input: ReportInput): Report;
