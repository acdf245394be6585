/**
 * Greedy choice of suggestions across all targets: best score first, at most `suggest.perSource`
 * new links per source and `suggest.perTarget` per target, and no two targets anchored on
 * overlapping text of the same source. When a pair's phrase is taken, its next phrase is used;
 * when none is left it falls back to no anchor, with the model's score of the pair as if the
 * source did not mention the target, and waits for its turn again.
 */
import type { AnchorMatch } from './anchor.js';
/** A candidate pair, its scores and its anchor options (best first). */
export interface ScoredPair {
    readonly source: number;
    readonly target: number;
    /** TF-IDF cosine similarity. */
    readonly similarity: number;
    /** The model's probability for the pair. */
    readonly score: number;
    /** The probability with the name evidence taken away (used when no anchor is left). */
    readonly scoreWithoutAnchor: number;
    readonly anchors: readonly AnchorMatch[];
    /** The pair's feature vector (`features.ts`), for the reason text. */
    readonly features: readonly number[];
}
/** A chosen pair with its anchor (or none) and its final score. */
export interface Chosen {
    readonly pair: ScoredPair;
    readonly anchor: AnchorMatch | null;
    readonly score: number;
}
/**
 * Choose suggestions greedily.
 * @returns chosen pairs in the order they were chosen
 */
export declare function chooseSuggestions(pairs: readonly ScoredPair[], maxPerSource: number, maxPerTarget: number): Chosen[];
