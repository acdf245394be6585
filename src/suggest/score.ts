/**
 * Score of a candidate link source -> target (DESIGN section 7: similarity x source PageRank):
 *
 *   score = similarity x strength(source) x reach(source, target) x anchor
 *
 * - strength = 0.5 + 0.5 x (PageRank percentile of the source). Raw PageRank is heavy-tailed
 *   (the home page often has tens of times the average), so multiplying by it would make the
 *   home page the source of every suggestion; the percentile keeps PageRank's order but bounds
 *   its effect to a factor of 2, so similarity stays the first criterion and rank decides
 *   between sources of similar content.
 * - reach = 1 for a reachable source; {@link REACH_TOO_DEEP} when the target's problem is depth
 *   (unreachable or deeper than `maxDepth`) and the source is itself too deep to bring it within
 *   `maxDepth` (depth + 1 > maxDepth); {@link REACH_UNREACHABLE} for an unreachable source, which
 *   cannot help depth and passes on only the rank it has.
 * - anchor = 1 with an anchor phrase, {@link NO_ANCHOR} without ("no anchor phrase").
 *
 * A suggestion without an anchor asks the writer to compose a sentence, which is worth it only
 * for closely related pages: it needs {@link NO_ANCHOR_SIMILARITY} x `suggest.minSimilarity`.
 */

/** Factor of a reachable source that is too deep to fix the target's depth. */
export const REACH_TOO_DEEP = 0.6;
/** Factor of an unreachable source. */
export const REACH_UNREACHABLE = 0.3;
/** Factor of a suggestion without an anchor phrase. */
export const NO_ANCHOR = 0.5;
/** Multiple of `suggest.minSimilarity` that a suggestion without an anchor phrase needs. */
export const NO_ANCHOR_SIMILARITY = 2;

/** The parts of a candidate's score. */
export interface ScoreInput {
  readonly similarity: number;
  /** PageRank percentile of the source in [0, 1]. */
  readonly sourceRankPercentile: number;
  /** Click depth of the source, -1 unreachable. */
  readonly sourceDepth: number;
  /** True when the target is unreachable or deeper than maxDepth. */
  readonly targetNeedsDepth: boolean;
  readonly maxDepth: number;
}

/** Score of a candidate before the anchor factor. */
export function baseScore(c: ScoreInput): number {
  const strength = 0.5 + 0.5 * (Number.isNaN(c.sourceRankPercentile) ? 0 : c.sourceRankPercentile);
  let reach = 1;
  if (c.sourceDepth < 0) reach = REACH_UNREACHABLE;
  else if (c.targetNeedsDepth && c.sourceDepth + 1 > c.maxDepth) reach = REACH_TOO_DEEP;
  return c.similarity * strength * reach;
}

/** The full score: the base score times the anchor factor. */
export function withAnchor(base: number, hasAnchor: boolean): number {
  return hasAnchor ? base : base * NO_ANCHOR;
}
