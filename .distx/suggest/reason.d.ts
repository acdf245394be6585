/**
 * The `reason` text of a suggestion, in plain words: why the target wants links, then the
 * strongest evidence the link model weighed for this pair (its largest positive parts of the
 * score), e.g. `orphan page (no inlinks); mentions "trait objects" twice (its title); 4 pages are
 * linked with both; same folder`. No internal key name is ever shown.
 */
import type { UnderlinkedReason } from '../types.js';
import type { AnchorMatch } from './anchor.js';
/** Facts about the target that the reason mentions. */
export interface ReasonFacts {
    readonly reasons: readonly UnderlinkedReason[];
    readonly depth: number;
    readonly maxDepth: number;
    readonly contentInlinks: number;
    readonly minInlinks: number;
    readonly rankPercentile: number;
    readonly importancePercentile: number;
}
/** The pair's evidence: its features, each feature's part of the score, and the anchor. */
export interface Evidence {
    readonly features: readonly number[];
    readonly contributions: readonly number[];
    /** Per feature: the pair's value is above the training pairs' mean (the words say "high", "often"). */
    readonly above: readonly boolean[];
    readonly anchor: AnchorMatch | null;
    /** Pages linked with both (content links either way). */
    readonly commonNeighbours: number;
    /** Pages the source links to that link to the target. */
    readonly twoStep: number;
    /** The folder the two routes share ('' for none). */
    readonly folder: string;
}
/** Evidence items shown at most. */
export declare const EVIDENCE_SHOWN = 3;
/** The whole reason: why the target, then the evidence for this source. */
export declare function reasonText(f: ReasonFacts, e: Evidence): string;
/** Why the target wants links, e.g. `orphan page (no inlinks), 5 clicks deep (limit 3)`. */
export declare function targetReasons(f: ReasonFacts): string;
/** The strongest positive parts of the score, in words, largest first. */
export declare function evidenceWords(e: Evidence): string[];
