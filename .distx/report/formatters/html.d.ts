import type { Report } from '../../types.js';
import type { Formatter } from '../types.js';
/** The page's script: the parts in one function scope, run once the document is parsed. */
export declare const CLIENT_SCRIPT: string;
/**
 * Render the HTML report.
 * @param report the report
 * @returns the whole HTML document
 */
export declare function formatHtml(report: Report): string;
/** The `html` formatter (`--format html --output report.html`). */
export declare const htmlFormatter: Formatter;
