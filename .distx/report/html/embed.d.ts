/**
 * The form in which the HTML report embeds its data: the long lists (pages, findings,
 * suggestions) as rows of values with one list of field names each, instead of objects that
 * repeat every key (about half the size at 5,000 pages). Booleans become 0/1. The page's
 * script turns the rows back into objects (`decodeRows` in client-core.ts does the same as
 * `decodeRows` here).
 */
import type { HtmlData } from './data.js';
/** Field order of the page rows. */
export declare const PAGE_FIELDS: readonly ['route', 'title', 'file', 'pagerank', 'rank', 'depth', 'inlinks', 'contentInlinks', 'outlinks', 'importance', 'orphan', 'nav', 'findings'];
/** Field order of the finding rows. */
export declare const FINDING_FIELDS: readonly ['rule', 'severity', 'file', 'line', 'column', 'route', 'message'];
/** Field order of the suggestion rows. */
export declare const SUGGESTION_FIELDS: readonly ['id', 'source', 'target', 'targetTitle', 'file', 'line', 'column', 'anchor', 'similarity', 'targetRankBefore', 'targetRankAfter', 'depthBefore', 'depthAfter', 'reason'];
type Cell = string | number | null;
/** `HtmlData` with its lists as rows. */
export type EmbeddedData = Omit<HtmlData, 'pages' | 'findings' | 'suggestions'> & {
    readonly fields: {
        readonly pages: readonly string[];
        readonly findings: readonly string[];
        readonly suggestions: readonly string[];
    };
    readonly pages: readonly Cell[][];
    readonly findings: readonly Cell[][];
    readonly suggestions: readonly Cell[][];
};
/**
 * Turn the HTML data into its embedded form.
 * @param data the report's HTML data
 */
export declare function embedData(data: HtmlData): EmbeddedData;
/**
 * Rows back to objects (booleans stay 0/1), as the page's script does.
 * @param list rows
 * @param fields field names, in row order
 */
export declare function decodeRows(list: readonly Cell[][], fields: readonly string[]): Record<string, Cell>[];
export {};
