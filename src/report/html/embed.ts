/**
 * The form in which the HTML report embeds its data: the long lists (pages, findings,
 * suggestions) as rows of values with one list of field names each, instead of objects that
 * repeat every key (about half the size at 5,000 pages). Booleans become 0/1. The page's
 * script turns the rows back into objects (`decodeRows` in client/data.ts does the same as
 * `decodeRows` here).
 */
import type { HtmlData, HtmlFinding, HtmlPage, HtmlSuggestion } from './data.js';

/** Field order of the page rows. */
export const PAGE_FIELDS = ['route', 'title', 'file', 'pagerank', 'rank', 'depth', 'inlinks', 'contentInlinks', 'outlinks', 'importance', 'orphan', 'nav', 'findings'] as const;
/** Field order of the finding rows. */
export const FINDING_FIELDS = ['rule', 'severity', 'file', 'line', 'column', 'route', 'message'] as const;
/** Field order of the suggestion rows. */
export const SUGGESTION_FIELDS = ['id', 'source', 'target', 'targetTitle', 'file', 'line', 'column', 'anchor', 'similarity', 'targetRankBefore', 'targetRankAfter', 'depthBefore', 'depthAfter', 'reason'] as const;

type Cell = string | number | null;

/** `HtmlData` with its lists as rows. */
export type EmbeddedData = Omit<HtmlData, 'pages' | 'findings' | 'suggestions'> & {
  readonly fields: { readonly pages: readonly string[]; readonly findings: readonly string[]; readonly suggestions: readonly string[] };
  readonly pages: readonly Cell[][];
  readonly findings: readonly Cell[][];
  readonly suggestions: readonly Cell[][];
};

function rows<T extends object>(items: readonly T[], fields: readonly (keyof T & string)[]): Cell[][] {
  return items.map((item) =>
    fields.map((f) => {
      const v = item[f] as unknown;
      return typeof v === 'boolean' ? (v ? 1 : 0) : (v as Cell);
    }),
  );
}

/**
 * Turn the HTML data into its embedded form.
 * @param data the report's HTML data
 */
export function embedData(data: HtmlData): EmbeddedData {
  return {
    ...data,
    fields: { pages: PAGE_FIELDS, findings: FINDING_FIELDS, suggestions: SUGGESTION_FIELDS },
    pages: rows<HtmlPage>(data.pages, [...PAGE_FIELDS]),
    findings: rows<HtmlFinding>(data.findings, [...FINDING_FIELDS]),
    suggestions: rows<HtmlSuggestion>(data.suggestions, [...SUGGESTION_FIELDS]),
  };
}

/**
 * Rows back to objects (booleans stay 0/1), as the page's script does.
 * @param list rows
 * @param fields field names, in row order
 */
export function decodeRows(list: readonly Cell[][], fields: readonly string[]): Record<string, Cell>[] {
  return list.map((row) => Object.fromEntries(fields.map((f, k) => [f, row[k] ?? null])));
}
