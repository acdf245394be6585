/**
 * Candidate sources of each target (DESIGN section 7): pages related to it (in its related
 * list, or listing it in theirs) with similarity >= `suggest.minSimilarity`, that are not the
 * target, not excluded (`linkweave.exclude`) and have no content link to it yet (a template
 * link alone, such as a sidebar entry, does not count: a link in the text is what is proposed).
 */
import type { Csr, RelatedList, SiteGraph } from '../types.js';
import { EDGE_CONTENT } from '../graph/csr.js';

/** A (source, target) pair worth a suggestion. */
export interface CandidatePair {
  readonly source: number;
  readonly target: number;
  readonly similarity: number;
}

/** True when `forward` has an edge from -> to carrying a content link (rows are sorted by target). */
export function hasContentLink(forward: Csr, from: number, to: number): boolean {
  let lo = forward.offsets[from]!;
  let hi = forward.offsets[from + 1]! - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const t = forward.targets[mid]!;
    if (t === to) return (forward.flags[mid]! & EDGE_CONTENT) !== 0;
    if (t < to) lo = mid + 1;
    else hi = mid - 1;
  }
  return false;
}

/**
 * Candidate pairs for the given targets, sorted by target then source.
 * @param targets page ids, ascending
 */
export function findCandidates(
  graph: SiteGraph,
  related: readonly RelatedList[],
  targets: readonly number[],
  minSimilarity: number,
): CandidatePair[] {
  const n = graph.pages.length;
  // Pages listing each page in their related lists (similarity is symmetric, so the value is the same).
  const listedBy: { page: number; similarity: number }[][] = Array.from({ length: n }, () => []);
  for (const list of related) {
    for (const r of list.related) if (r.page >= 0 && r.page < n) listedBy[r.page]!.push({ page: list.page, similarity: r.similarity });
  }
  const out: CandidatePair[] = [];
  for (const target of targets) {
    const seen = new Map<number, number>();
    for (const r of related[target]?.related ?? []) seen.set(r.page, r.similarity);
    for (const r of listedBy[target]!) if (!seen.has(r.page)) seen.set(r.page, r.similarity);
    const sources = [...seen.keys()].sort((a, b) => a - b);
    for (const source of sources) {
      const similarity = seen.get(source)!;
      if (source === target || source < 0 || source >= n || !(similarity >= minSimilarity)) continue;
      if (graph.pages[source]!.meta.exclude || hasContentLink(graph.forward, source, target)) continue;
      out.push({ source, target, similarity });
    }
  }
  return out;
}
