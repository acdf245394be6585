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
export const OVERVIEW_WIDTH = 1000;
export const OVERVIEW_HEIGHT = 640;

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
export function buildOverview(pages: readonly LayoutPage[], edges: readonly number[], maxDepth: number, pageLimit: number): Overview {
  if (pages.length <= pageLimit) return pageOverview(pages, edges, maxDepth);
  return folderOverview(pages, edges, maxDepth);
}

function pageOverview(pages: readonly LayoutPage[], edges: readonly number[], maxDepth: number): PageOverview {
  const n = pages.length;
  const depth = pages.map((p) => p.depth);
  // Parent = in-neighbour one click closer with the highest PageRank (ties: lower id).
  const parent = new Int32Array(n).fill(-1);
  for (let e = 0; e < edges.length; e += 3) {
    const from = edges[e];
    const to = edges[e + 1];
    const df = depth[from];
    const dt = depth[to];
    if (df === null || dt === null || dt === 0 || df !== dt - 1) continue;
    const cur = parent[to];
    if (cur < 0 || pages[from].pagerank > pages[cur].pagerank) parent[to] = from;
  }
  const unreachable = pages.map((p, i) => (p.depth === null ? i : -1)).filter((i) => i >= 0);
  unreachable.sort((a, b) => Number(pages[b].orphan) - Number(pages[a].orphan) || a - b);
  const { rings, box } = frame(depth, maxDepth, unreachable.length > 0);
  const positions = new Array<number>(2 * n).fill(0);
  radialTree(depth, parent, rings, positions);
  if (box !== null) gridInBox(unreachable, box, positions);
  return { kind: 'pages', rings, box, positions: positions.map(round1) };
}

function folderOverview(pages: readonly LayoutPage[], edges: readonly number[], maxDepth: number): FolderOverview {
  const level = chooseFolderLevel(pages.map((p) => p.file));
  const names = [...new Set(pages.map((p) => folderAt(p.file, level)))].sort();
  const index = new Map(names.map((name, i) => [name, i]));
  const pageFolder = pages.map((p) => index.get(folderAt(p.file, level))!);
  const f = names.length;
  const count = new Int32Array(f);
  const pr = new Float64Array(f);
  const over = new Int32Array(f);
  const orphans = new Int32Array(f);
  const minDepth: (number | null)[] = new Array<number | null>(f).fill(null);
  pages.forEach((p, i) => {
    const k = pageFolder[i];
    count[k]++;
    pr[k] += p.pagerank;
    if (p.depth === null || p.depth > maxDepth) over[k]++;
    if (p.orphan) orphans[k]++;
    if (p.depth !== null && (minDepth[k] === null || p.depth < minDepth[k])) minDepth[k] = p.depth;
  });
  const links = new Map<number, number>();
  for (let e = 0; e < edges.length; e += 3) {
    const a = pageFolder[edges[e]];
    const b = pageFolder[edges[e + 1]];
    if (a !== b) links.set(a * f + b, (links.get(a * f + b) ?? 0) + 1);
  }
  const keys = [...links.keys()].sort((a, b) => a - b);
  const folderEdges: number[] = [];
  for (const key of keys) folderEdges.push(Math.floor(key / f), key % f, links.get(key)!);
  // Parent folder: the folder one ring closer sending the most links (ties: lower index).
  const parent = new Int32Array(f).fill(-1);
  const best = new Int32Array(f);
  for (let e = 0; e < folderEdges.length; e += 3) {
    const [a, b, c] = [folderEdges[e], folderEdges[e + 1], folderEdges[e + 2]];
    if (minDepth[a] === null || minDepth[b] === null || minDepth[b] !== minDepth[a] + 1) continue;
    if (parent[b] < 0 || c > best[b]) {
      parent[b] = a;
      best[b] = c;
    }
  }
  const unreachable = names.map((_, i) => (minDepth[i] === null ? i : -1)).filter((i) => i >= 0);
  const { rings, box } = frame(minDepth, maxDepth, unreachable.length > 0);
  const positions = new Array<number>(2 * f).fill(0);
  radialTree(minDepth, parent, rings, positions);
  if (box !== null) gridInBox(unreachable, box, positions);
  const folders: FolderNode[] = names.map((name, i) => ({
    name,
    pages: count[i],
    pagerank: pr[i],
    minDepth: minDepth[i] ?? null,
    overLimit: over[i],
    orphans: orphans[i],
    x: round1(positions[2 * i]),
    y: round1(positions[2 * i + 1]),
  }));
  return { kind: 'folders', level, rings, box, folders, pageFolder, edges: folderEdges };
}

/**
 * Folder of a file at a path depth: `a/b/c.md` at level 1 is `a`, at level 2 `a/b`;
 * files at the root are in `(root)`.
 */
export function folderAt(file: string, level: number): string {
  const parts = file.split('/');
  parts.pop();
  if (parts.length === 0) return '(root)';
  return parts.slice(0, level).join('/');
}

/** The first folder depth (1..3) that gives at least 12 folders without exceeding 120. */
function chooseFolderLevel(files: readonly string[]): number {
  let level = 1;
  for (let l = 1; l <= 3; l++) {
    const size = new Set(files.map((f) => folderAt(f, l))).size;
    if (size > 120) break;
    level = l;
    if (size >= 12) break;
  }
  return level;
}

function frame(depth: readonly (number | null)[], maxDepth: number, withBox: boolean): { rings: Rings; box: Box | null } {
  let deepest = 1;
  for (const d of depth) if (d !== null && d > deepest) deepest = d;
  const count = Math.max(deepest, Math.min(maxDepth + 1, deepest + 1));
  const perRing = new Array<number>(count + 1).fill(0);
  for (const d of depth) if (d !== null) perRing[d]++;
  const radius = OVERVIEW_HEIGHT / 2 - 40;
  const gaps = perRing.map((c, d) => (d === 0 ? 0 : (d === 1 ? 2.5 : 1.5) + Math.sqrt(c)));
  const total = gaps.reduce((a, b) => a + b, 0);
  const radii: number[] = [];
  let sum = 0;
  for (let d = 0; d <= count; d++) {
    sum += gaps[d];
    radii.push((radius * sum) / total);
  }
  if (perRing[0] > 1) radii[0] = radii[1] * 0.35;
  const half = (d: number): number => (radius * gaps[d]) / total / 2;
  const limit = maxDepth + 1 <= count ? radii[maxDepth] + half(maxDepth + 1) : radii[count] + half(count);
  const cx = withBox ? radius + 50 : OVERVIEW_WIDTH / 2;
  const rings: Rings = { cx, cy: OVERVIEW_HEIGHT / 2, radii: radii.map(round1), limit: round1(limit), outer: round1(radius + half(count)) };
  const left = cx + radius + 60;
  const box = withBox ? { x: left, y: 30, w: OVERVIEW_WIDTH - left - 20, h: OVERVIEW_HEIGHT - 60 } : null;
  return { rings, box };
}

/**
 * Radial tree: each node gets an angular sector proportional to the leaves below it, children
 * ordered by id; a node sits in the middle of its sector on the ring of its depth.
 */
function radialTree(depth: readonly (number | null)[], parent: Int32Array, rings: Rings, out: number[]): void {
  const n = depth.length;
  const children: number[][] = Array.from({ length: n + 1 }, () => []);
  const order: number[] = [];
  for (let i = 0; i < n; i++) {
    if (depth[i] === null) continue;
    order.push(i);
    children[parent[i] < 0 ? n : parent[i]].push(i);
  }
  order.sort((a, b) => depth[a]! - depth[b]! || a - b);
  const leaves = new Float64Array(n + 1);
  for (let k = order.length - 1; k >= 0; k--) {
    const i = order[k];
    let sum = 0;
    for (const c of children[i]) sum += leaves[c];
    leaves[i] = Math.max(1, sum);
  }
  const start = new Float64Array(n + 1);
  const span = new Float64Array(n + 1);
  start[n] = -Math.PI / 2;
  span[n] = 2 * Math.PI;
  const assign = (node: number): void => {
    const kids = children[node];
    let total = 0;
    for (const c of kids) total += leaves[c];
    let a = start[node];
    for (const c of kids) {
      const share = total > 0 ? (span[node] * leaves[c]) / total : 0;
      start[c] = a;
      span[c] = share;
      a += share;
    }
  };
  assign(n);
  for (const i of order) {
    assign(i);
    const r = rings.radii[depth[i]!]!;
    const angle = start[i] + span[i] / 2;
    out[2 * i] = rings.cx + r * Math.cos(angle);
    out[2 * i + 1] = rings.cy + r * Math.sin(angle);
  }
}

/** Unreachable nodes on a grid inside the box (below its caption), in the given order. */
function gridInBox(ids: readonly number[], box: Box, out: number[]): void {
  const top = box.y + 44;
  const h = box.h - 54;
  const cols = Math.max(1, Math.ceil(Math.sqrt((ids.length * box.w) / h)));
  const rows = Math.max(1, Math.ceil(ids.length / cols));
  const cw = box.w / cols;
  const ch = Math.min(h / rows, cw * 1.2);
  ids.forEach((id, k) => {
    out[2 * id] = box.x + cw * ((k % cols) + 0.5);
    out[2 * id + 1] = top + ch * (Math.floor(k / cols) + 0.5);
  });
}

function round1(v: number): number {
  return Math.round(v * 10) / 10;
}
