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
import type { MentionIndex } from './mentions.js';
import type { Neighbours } from './proximity.js';
/** Mention candidates kept per target. */
export declare const MENTION_LIMIT = 100;
/** Graph-neighbourhood candidates kept per target. */
export declare const GRAPH_LIMIT = 30;
/** Neighbours linked with more pages than this bring no candidates (they link with nearly everything). */
export declare const HUB_DEGREE = 200;
/** A (source, target) pair of the TF-IDF neighbour source. */
export interface CandidatePair {
    readonly source: number;
    readonly target: number;
    readonly similarity: number;
}
/** True when `forward` has an edge from -> to carrying a content link (rows are sorted by target). */
export declare function hasContentLink(forward: Csr, from: number, to: number): boolean;
/**
 * The TF-IDF neighbour candidates of the given targets that do not link to them yet, sorted by
 * target then source (the candidates of the TF-IDF-only ranking the backtest compares with).
 * @param targets page ids, ascending
 */
export declare function findCandidates(graph: SiteGraph, related: readonly RelatedList[], targets: readonly number[], minSimilarity: number): CandidatePair[];
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
export declare function candidatePool(input: PoolInput): (target: number) => number[];
