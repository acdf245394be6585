/**
 * The page's data: the JSON the formatter embeds (`embed.ts` writes it as rows), read once and
 * turned back into objects, with the adjacency lists built from the flat edge triples. Every
 * other module of the page reads the data from here.
 */
import type { HtmlFinding, HtmlPage, HtmlSuggestion } from '../data.js';
import type { EmbeddedData } from '../embed.js';
import type { FolderOverview, Overview } from '../layout.js';

type Cell = string | number | null;

/** A page as the script uses it: the embedded row, its 0/1 flags as booleans, its top folder. */
export type Page = HtmlPage & { readonly folder: string };
/** A finding row with the top folder of its file (the folder filter). */
export type Finding = HtmlFinding & { readonly folder: string };
/** A suggestion row with the top folder of the file where the link goes. */
export type Suggestion = HtmlSuggestion & { readonly folder: string };
export type { FolderOverview, Overview };

/** The decoded data: the embedded JSON with its lists as objects again. */
export type PageData = Omit<EmbeddedData, 'pages' | 'findings' | 'suggestions'> & {
  readonly pages: readonly Page[];
  readonly findings: readonly Finding[];
  readonly suggestions: readonly Suggestion[];
};

/** A neighbour in the adjacency lists: [page id, flag bits (1 content, 2 template)]. */
export type Edge = readonly [number, number];

/** Rows of values back to objects (embed.ts writes them). */
function decodeRows(rows: readonly Cell[][], fields: readonly string[]): Record<string, Cell>[] {
  return rows.map((row) => {
    const o: Record<string, Cell> = {};
    for (let k = 0; k < fields.length; k++) o[fields[k]] = row[k] === undefined ? null : row[k];
    return o;
  });
}

/** Top-level source folder: 'guide' for guide/a/b.md, '(root)' for a file at the root. */
function topFolder(file: string): string {
  const slash = file.indexOf('/');
  return slash < 0 ? '(root)' : file.slice(0, slash);
}

function readData(): PageData {
  const raw = JSON.parse(document.getElementById('lw-data')!.textContent!) as EmbeddedData;
  const pages = decodeRows(raw.pages, raw.fields.pages).map((p) => ({ ...p, orphan: p['orphan'] === 1, nav: p['nav'] === 1, folder: topFolder(p['file'] as string) }));
  const findings = decodeRows(raw.findings, raw.fields.findings).map((f) => ({ ...f, folder: topFolder(f['file'] as string) }));
  const suggestions = decodeRows(raw.suggestions, raw.fields.suggestions).map((s) => ({ ...s, folder: topFolder(s['file'] as string) }));
  return {
    ...raw,
    pages: pages as unknown as Page[],
    findings: findings as unknown as Finding[],
    suggestions: suggestions as unknown as Suggestion[],
  };
}

export const DATA: PageData = readData();
export const PAGES: readonly Page[] = DATA.pages;
export const N = PAGES.length;
export const MAX_DEPTH = DATA.maxDepth;
export const BY_ROUTE = new Map<string, number>();
PAGES.forEach((p, i) => { BY_ROUTE.set(p.route, i); });

/** OUT[i] and IN[i] hold [page, flags] pairs, from the flat [from, to, flags] triples. */
export const OUT: Edge[][] = [];
export const IN: Edge[][] = [];
for (let i = 0; i < N; i++) { OUT.push([]); IN.push([]); }
for (let e = 0; e < DATA.edges.length; e += 3) {
  const a = DATA.edges[e], b = DATA.edges[e + 1], f = DATA.edges[e + 2];
  OUT[a].push([b, f]);
  IN[b].push([a, f]);
}
