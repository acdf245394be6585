import type { Log } from 'sarif';
import type { Report, Suggestion } from '../../types.js';
import type { Formatter } from '../types.js';
/** Rule id of suggestion results. */
export declare const SUGGESTION_RULE = "link-suggestion";
/**
 * The link the fix inserts around the anchor: in Markdown a link to the target's source file
 * relative to the source (how authors link Markdown files), else to the target route; in HTML
 * an `<a href>` to the route.
 */
export declare function linkMarkup(s: Suggestion & {
    anchor: string;
}, targetFile: string | undefined): string;
/** The SARIF log of a report, as an object (the formatter stringifies it). */
export declare function toSarif(report: Report): Log;
/** The SARIF formatter. */
export declare const sarifFormatter: Formatter;
