/**
 * Graph proximity of a (source, target) pair over the site's content links, each computed as if
 * the pair's own link were absent (the link model trains on existing links, so a feature that
 * saw the link would teach it nothing):
 *
 * - Adamic-Adar (Liben-Nowell and Kleinberg, "The link-prediction problem for social networks",
 *   2007): sum over the common neighbours z of s and t (content links either way) of
 *   1 / ln(degree z). A link s-t makes s and t neighbours of each other, never a common
 *   neighbour, so the sum is the same with or without it.
 * - Common neighbours: the count of those z (same reference).
 * - Two-step paths: the number of pages x with s -> x -> t (truncated Katz proximity, paths of
 *   length 2; the direct link is a path of length 1 and never counts).
 * - Target depth without the pair: min over the target's other content or template in-pages u
 *   of depth(u) + 1 (0 for an entry page): the target's depth if s did not link to it, up to
 *   paths that themselves run through that link (rare; not corrected).
 * - Shared folders: the number of leading route segments the two routes share.
 */
import { EDGE_CONTENT } from '../graph/csr.js';
import type { Csr, Ranking, SiteGraph } from '../types.js';

/** Undirected content-link neighbours: CSR with sorted, distinct rows. */
export interface Neighbours {
  readonly offsets: Int32Array;
  readonly targets: Int32Array;
}

/** The undirected neighbour lists of the content-link graph (template links left out). */
export function contentNeighbours(graph: SiteGraph): Neighbours {
  const n = graph.pages.length;
  const rows: number[][] = Array.from({ length: n }, () => []);
  const add = (csr: Csr): void => {
    for (let i = 0; i < n; i++) {
      for (let e = csr.offsets[i]; e < csr.offsets[i + 1]; e++) {
        if ((csr.flags[e] & EDGE_CONTENT) !== 0) rows[i].push(csr.targets[e]);
      }
    }
  };
  add(graph.forward);
  add(graph.reverse);
  const offsets = new Int32Array(n + 1);
  let total = 0;
  for (let i = 0; i < n; i++) {
    const row = rows[i].sort((a, b) => a - b);
    let w = 0;
    for (let k = 0; k < row.length; k++) if (k === 0 || row[k] !== row[k - 1]) row[w++] = row[k];
    row.length = w;
    total += w;
    offsets[i + 1] = total;
  }
  const targets = new Int32Array(total);
  for (let i = 0; i < n; i++) targets.set(rows[i], offsets[i]);
  return { offsets, targets };
}

/** Degree of a page in the undirected content graph. */
export function degree(nb: Neighbours, page: number): number {
  return nb.offsets[page + 1] - nb.offsets[page];
}

/** Adamic-Adar and common-neighbour counts of s and t (sorted-row merge). */
export function adamicAdar(nb: Neighbours, s: number, t: number): { adamicAdar: number; common: number } {
  let i = nb.offsets[s];
  const iEnd = nb.offsets[s + 1];
  let j = nb.offsets[t];
  const jEnd = nb.offsets[t + 1];
  let aa = 0;
  let common = 0;
  while (i < iEnd && j < jEnd) {
    const a = nb.targets[i];
    const b = nb.targets[j];
    if (a === b) {
      if (a !== s && a !== t) {
        common++;
        aa += 1 / Math.log(degree(nb, a));
      }
      i++;
      j++;
    } else if (a < b) i++;
    else j++;
  }
  return { adamicAdar: aa, common };
}

/** Pages x with content links s -> x and x -> t (forward row of s merged with reverse row of t). */
export function twoStepPaths(graph: SiteGraph, s: number, t: number): number {
  const f = graph.forward;
  const r = graph.reverse;
  let i = f.offsets[s];
  const iEnd = f.offsets[s + 1];
  let j = r.offsets[t];
  const jEnd = r.offsets[t + 1];
  let count = 0;
  while (i < iEnd && j < jEnd) {
    const a = f.targets[i];
    const b = r.targets[j];
    if (a === b) {
      if (a !== s && a !== t && (f.flags[i] & EDGE_CONTENT) !== 0 && (r.flags[j] & EDGE_CONTENT) !== 0) count++;
      i++;
      j++;
    } else if (a < b) i++;
    else j++;
  }
  return count;
}

/**
 * The target's click depth if `s` did not link to it: 0 for an entry page, else the smallest
 * depth(u) + 1 over its other reachable in-pages u; -1 when there is none.
 */
export function depthWithout(graph: SiteGraph, ranking: Ranking, isEntry: Uint8Array, s: number, t: number): number {
  if (isEntry[t] === 1) return 0;
  const r = graph.reverse;
  let best = -1;
  for (let e = r.offsets[t]; e < r.offsets[t + 1]; e++) {
    const u = r.targets[e];
    if (u === s) continue;
    const du = ranking.depth[u];
    if (du >= 0 && (best < 0 || du + 1 < best)) best = du + 1;
  }
  return best;
}

/** Leading route folders two routes share (`/a/b/c/` and `/a/b/d/` share 2). */
export function sharedFolders(a: string, b: string): number {
  return sharedSegments(routeFolders(a), routeFolders(b));
}

/** The folders of a route: its segments but the last, which is the page itself. */
export function routeFolders(route: string): string[] {
  const segments = route.split('/').filter((s) => s !== '');
  segments.pop();
  return segments;
}

/** Leading entries two folder lists share. */
export function sharedSegments(x: readonly string[], y: readonly string[]): number {
  let k = 0;
  while (k < x.length && k < y.length && x[k] === y[k]) k++;
  return k;
}

/** Reusable buffers for {@link graphNeighbourhood}: one score per page and the pages touched. */
export interface NeighbourhoodScratch {
  readonly score: Float64Array;
  readonly touched: Int32Array;
}

/** Buffers for a site of `n` pages. */
export function neighbourhoodScratch(n: number): NeighbourhoodScratch {
  return { score: new Float64Array(n), touched: new Int32Array(n) };
}

/**
 * Pages near `t` in the content graph: every page sharing a neighbour with it, found through its
 * neighbours of degree at most `hubDegree` (a page linked with nearly everything brings nearly
 * everything and says little), best Adamic-Adar first, at most `limit`, ties by page id.
 * Accumulates in `scratch` (left zeroed again), so a call costs the pages it touches, not n.
 */
export function graphNeighbourhood(nb: Neighbours, t: number, limit: number, hubDegree: number, scratch: NeighbourhoodScratch = neighbourhoodScratch(nb.offsets.length - 1)): number[] {
  const { score, touched } = scratch;
  let count = 0;
  for (let e = nb.offsets[t]; e < nb.offsets[t + 1]; e++) {
    const z = nb.targets[e];
    const dz = degree(nb, z);
    if (dz > hubDegree || dz < 2) continue;
    const w = 1 / Math.log(dz);
    for (let f = nb.offsets[z]; f < nb.offsets[z + 1]; f++) {
      const s = nb.targets[f];
      if (s === t) continue;
      if (score[s] === 0) touched[count++] = s;
      score[s] += w;
    }
  }
  // The best `limit` kept in order as they come (insertion into a short sorted list), instead of
  // sorting every touched page: the same list, at a cost of the touched pages, not their log.
  const out: number[] = [];
  for (let k = 0; k < count; k++) {
    const s = touched[k];
    const v = score[s];
    let at = out.length;
    while (at > 0 && (score[out[at - 1]] < v || (score[out[at - 1]] === v && out[at - 1] > s))) at--;
    if (at >= limit) continue;
    out.splice(at, 0, s);
    if (out.length > limit) out.pop();
  }
  for (let k = 0; k < count; k++) score[touched[k]] = 0;
  return out;
}
