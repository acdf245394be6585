/**
 * Content centrality (DESIGN section 6): PageRank over the similarity graph, the LexRank idea
 * (Erkan and Radev 2004) applied to whole pages. A page that many other pages resemble gets a
 * high score whatever its links; it is the importance of last resort in the suggest stage.
 *
 * The graph: an undirected edge between a page and each of its related pages, weighted by
 * their cosine similarity (a pair listed by both pages counts once). Pages without related
 * pages are dangling and keep the teleport share. The walk uses the ranking stage's PageRank
 * with the configured defaults for damping, iterations and tolerance.
 */
import { DEFAULT_OPTIONS } from '../config/options.js';
import type { RelatedList } from '../types.js';
import { buildCsr, createEdgeList, pushEdge } from '../graph/csr.js';
import { pagerank } from '../rank/pagerank.js';

/** Settings of the walk; the defaults are those of the link PageRank (`src/config/options.ts`). */
export interface CentralityOptions {
  readonly damping: number;
  readonly maxIterations: number;
  readonly tolerance: number;
}

/**
 * Content centrality of `n` pages from their related lists: a distribution (sums to 1) indexed
 * by page id.
 */
export function contentCentrality(
  related: readonly RelatedList[],
  n: number,
  options: CentralityOptions = {
    damping: DEFAULT_OPTIONS.damping,
    maxIterations: DEFAULT_OPTIONS.pagerankIterations,
    tolerance: DEFAULT_OPTIONS.pagerankTolerance,
  },
): Float64Array {
  if (n === 0) return new Float64Array(0);
  const listed = (of: number, page: number): boolean => (related[of]?.related ?? []).some((r) => r.page === page);
  const edges = createEdgeList(related.length * 4);
  for (const list of related) {
    const p = list.page;
    if (p < 0 || p >= n) continue;
    for (const { page: q, similarity } of list.related) {
      if (q < 0 || q >= n || q === p || !(similarity > 0)) continue;
      if (q < p && related[q]?.page === q && listed(q, p)) continue; // pushed from q's list already
      pushEdge(edges, p, q, similarity, 1);
      pushEdge(edges, q, p, similarity, 1);
    }
  }
  const { forward, reverse } = buildCsr(edges, n);
  return pagerank(forward, reverse, n, options).scores;
}
