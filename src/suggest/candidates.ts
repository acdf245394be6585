/**
 * Candidate sources of a target (DESIGN section 7), recall first: the union of
 *
 * - the pages whose prose mentions one of the target's names (`mentions.ts`; for a linked pair,
 *   its own link text counts, so the training pairs see the site as if the link were absent),
 *   at most {@link MENTION_LIMIT} (most mentions first);
 * - its TF-IDF neighbours: the pages in its related list or listing it in theirs
 *   (`suggest.relatedK` per page) with similarity >= `suggest.minSimilarity`;
 * - its graph neighbourhood: pages sharing a content-link neighbour with it, best Adamic-Adar
 *   first, at most {@link GRAPH_LIMIT}, through neighbours of degree at most {@link HUB_DEGREE}.
 *
 * Each comes from an index (the mention index, the related lists, the neighbour lists), never
 * from a scan of all pairs. Excluded pages (`linkweave.exclude`) and the target itself are never
 * sources. Whether a candidate already links to the target is the caller's question.
 */
import type { Csr, RelatedList, SiteGraph } from '../types.js';
import { EDGE_CONTENT } from '../graph/csr.js';
import type { MentionIndex } from './mentions.js';
import type { Neighbours } from './proximity.js';
import { graphNeighbourhood, neighbourhoodScratch } from './proximity.js';

/** Mention candidates kept per target. */
export const MENTION_LIMIT = 100;
/** Graph-neighbourhood candidates kept per target. */
export const GRAPH_LIMIT = 30;
/** Neighbours linked with more pages than this bring no candidates (they link with nearly everything). */
export const HUB_DEGREE = 200;

/** A (source, target) pair of the TF-IDF neighbour source. */
export interface CandidatePair {
  readonly source: number;
  readonly target: number;
  readonly similarity: number;
}

/** True when `forward` has an edge from -> to carrying a content link (rows are sorted by target). */
export function hasContentLink(forward: Csr, from: number, to: number): boolean {
  let lo = forward.offsets[from];
  let hi = forward.offsets[from + 1] - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const t = forward.targets[mid];
    if (t === to) return (forward.flags[mid] & EDGE_CONTENT) !== 0;
    if (t < to) lo = mid + 1;
    else hi = mid - 1;
  }
  return false;
}

/** Pages listing each page in their related lists (similarity is symmetric, so the value is the same). */
function listedBy(related: readonly RelatedList[], n: number): { page: number; similarity: number }[][] {
  const out: { page: number; similarity: number }[][] = Array.from({ length: n }, () => []);
  for (const list of related) {
    for (const r of list.related) if (r.page >= 0 && r.page < n) out[r.page].push({ page: list.page, similarity: r.similarity });
  }
  return out;
}

/**
 * The TF-IDF neighbour candidates of the given targets that do not link to them yet, sorted by
 * target then source (the candidates of the TF-IDF-only ranking the backtest compares with).
 * @param targets page ids, ascending
 */
export function findCandidates(graph: SiteGraph, related: readonly RelatedList[], targets: readonly number[], minSimilarity: number): CandidatePair[] {
  const n = graph.pages.length;
  const by = listedBy(related, n);
  const out: CandidatePair[] = [];
  for (const target of targets) {
    const seen = new Map<number, number>();
    for (const r of related[target]?.related ?? []) seen.set(r.page, r.similarity);
    for (const r of by[target]) if (!seen.has(r.page)) seen.set(r.page, r.similarity);
    const sources = [...seen.keys()].sort((a, b) => a - b);
    for (const source of sources) {
      const similarity = seen.get(source)!;
      if (source === target || source < 0 || source >= n || !(similarity >= minSimilarity)) continue;
      if (graph.pages[source].meta.exclude || hasContentLink(graph.forward, source, target)) continue;
      out.push({ source, target, similarity });
    }
  }
  return out;
}

/** What the candidate pool is built from. */
export interface PoolInput {
  readonly graph: SiteGraph;
  readonly related: readonly RelatedList[];
  readonly mentions: MentionIndex;
  readonly neighbours: Neighbours;
  readonly minSimilarity: number;
}

/**
 * A function giving a target's candidate sources (ascending page ids), linked ones included.
 */
export function candidatePool(input: PoolInput): (target: number) => number[] {
  const { graph, related, mentions, neighbours, minSimilarity } = input;
  const n = graph.pages.length;
  const by = listedBy(related, n);
  // Mention candidates per target, most mentions first.
  const mentioned: { source: number; count: number }[][] = Array.from({ length: n }, () => []);
  mentions.bySource.forEach((hits, s) => {
    for (const [t, hit] of hits) mentioned[t].push({ source: s, count: hit.count });
  });
  const fromLinkText: number[][] = Array.from({ length: n }, () => []);
  mentions.linkMatches.forEach((matches, s) => {
    for (const m of matches) {
      if (mentions.phrases[m.phrase].names.some((r) => r.target === m.target)) fromLinkText[m.target].push(s);
    }
  });
  // Most mentions first, at most MENTION_LIMIT, once for all calls.
  const mentionedBest = mentioned.map((m) =>
    m
      .sort((a, b) => b.count - a.count || a.source - b.source)
      .slice(0, MENTION_LIMIT)
      .map((x) => x.source),
  );
  const hubDegree = Math.max(HUB_DEGREE, Math.ceil(Math.sqrt(n)));
  const scratch = neighbourhoodScratch(n);
  return (t: number): number[] => {
    const set = new Set<number>(mentionedBest[t]);
    for (const s of fromLinkText[t]) set.add(s);
    for (const r of related[t]?.related ?? []) if (r.similarity >= minSimilarity) set.add(r.page);
    for (const r of by[t]) if (r.similarity >= minSimilarity) set.add(r.page);
    for (const s of graphNeighbourhood(neighbours, t, GRAPH_LIMIT, hubDegree, scratch)) set.add(s);
    const out: number[] = [];
    for (const s of set) if (s !== t && s >= 0 && s < n && !graph.pages[s].meta.exclude) out.push(s);
    return out.sort((a, b) => a - b);
  };
}
