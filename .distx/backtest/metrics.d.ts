import type { StemCache } from '../text/index.js';
import type { HeldOutPair, MethodId, MethodScores } from './types.js';
/** The cut-offs reported. */
export declare const K_VALUES: readonly [1, 5, 10];
/** Length of the ranked lists compared (the largest k). */
export declare const LIST_LENGTH = 10;
/** One proposed source of a ranked list. */
export interface RankedSource {
    readonly source: number;
    /** The proposed anchor phrase, or null (baselines, or a suggestion without a phrase). */
    readonly anchor: string | null;
    /** UTF-16 offsets of the anchor in the source file, -1 when there is none. */
    readonly offset: number;
    readonly endOffset: number;
    /** 1-based line of the anchor, -1 when there is none. */
    readonly line: number;
}
/** Held-out pairs grouped by target page, targets ascending. */
export declare function heldOutByTarget(heldOut: readonly HeldOutPair[]): Map<number, Map<number, HeldOutPair>>;
/** Which anchor metrics a method gets. */
export interface AnchorScoring {
    /** The method proposes anchors: compute `anchorOverlap` (else null). */
    readonly overlap: boolean;
    /** The held-out link texts were kept as prose: compute `anchorInPlace` (else null). */
    readonly inPlace: boolean;
}
/** Score one method's ranked lists against the held-out pairs. */
export declare function scoreMethod(method: MethodId, lists: ReadonlyMap<number, readonly RankedSource[]>, byTarget: ReadonlyMap<number, ReadonlyMap<number, HeldOutPair>>, anchors: AnchorScoring, cache: StemCache): MethodScores;
/** Mean and sample standard deviation (n - 1; 0 for one value) of the non-null values; null when there are none. */
export declare function spread(values: readonly (number | null)[]): {
    mean: number | null;
    sd: number | null;
};
