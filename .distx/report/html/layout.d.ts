/**
 * Layout of the HTML report's overview graph, computed once in the formatter so the page is
 * byte-identical for the same report (no randomness at all: positions follow from the data).
 *
 * The layout is a radial tree by click depth: the entry page sits in the centre, each ring is
 * one click further, every page sits near the page that first reaches it (its BFS parent, the
 * in-neighbour one click closer with the highest PageRank), and pages that cannot be reached
 * are set apart in a box to the right. Small sites show pages; large ones show folders laid out
 * the same way (a folder's depth is that of its shallowest page).
 */
/** Width and height of the virtual drawing area; the page scales it to the canvas. */
export declare const OVERVIEW_WIDTH = 1000;
export declare const OVERVIEW_HEIGHT = 640;
/**
 * The ring geometry shared by both overview kinds. Rings are not evenly spaced: the gap before
 * ring d grows with the square root of the nodes on it, so crowded rings get room.
 */
export interface Rings {
    readonly cx: number;
    readonly cy: number;
    /** Radius of the ring of depth d (index d); `radii[0]` is 0 with one entry page. */
    readonly radii: readonly number[];
    /** Radius of the dashed limit ring, between ring maxDepth and the next. */
    readonly limit: number;
    /** Radius of the shaded zone's outer edge. */
    readonly outer: number;
}
/** The box that holds what cannot be reached, or null when everything can. */
export interface Box {
    readonly x: number;
    readonly y: number;
    readonly w: number;
    readonly h: number;
}
/** Overview of a small site: one node per page. */
export interface PageOverview {
    readonly kind: 'pages';
    readonly rings: Rings;
    readonly box: Box | null;
    /** Flat `[x0, y0, x1, y1, ...]` by page id. */
    readonly positions: readonly number[];
}
/** A folder node of the large-site overview. */
export interface FolderNode {
    readonly name: string;
    readonly pages: number;
    readonly pagerank: number;
    readonly minDepth: number | null;
    /** Pages deeper than the limit or unreachable. */
    readonly overLimit: number;
    readonly orphans: number;
    readonly x: number;
    readonly y: number;
}
/** Overview of a large site: one node per folder. */
export interface FolderOverview {
    readonly kind: 'folders';
    /** Folder path depth used for grouping (1 = top-level folders). */
    readonly level: number;
    readonly rings: Rings;
    readonly box: Box | null;
    readonly folders: readonly FolderNode[];
    /** Folder index by page id. */
    readonly pageFolder: readonly number[];
    /** Flat triples `[from, to, links]` between distinct folders, sorted. */
    readonly edges: readonly number[];
}
/** Either overview. */
export type Overview = PageOverview | FolderOverview;
/** What the layout needs to know of a page. */
export interface LayoutPage {
    readonly file: string;
    readonly pagerank: number;
    readonly depth: number | null;
    readonly orphan: boolean;
    readonly inlinks: number;
}
/**
 * Lay out the overview.
 * @param pages pages by id
 * @param edges flat `[from, to, flags]` triples
 * @param maxDepth configured depth limit (the limit ring is always inside the drawing)
 * @param pageLimit above this many pages, folders are shown
 */
export declare function buildOverview(pages: readonly LayoutPage[], edges: readonly number[], maxDepth: number, pageLimit: number): Overview;
/**
 * Folder of a file at a path depth: `a/b/c.md` at level 1 is `a`, at level 2 `a/b`;
 * files at the root are in `(root)`.
 */
export declare function folderAt(file: string, level: number): string;
