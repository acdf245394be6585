/**
 * The choice part of the suggest stage, shared by `suggestLinks` and the backtest: the mention
 * index and the candidate pool -> the link model fitted on the site's own links -> every
 * candidate of the targets scored by the model -> anchors -> greedy choice under the
 * per-source and per-target caps (presentation limits, applied after ranking). Impact is not
 * part of it.
 */
import type { ResolvedOptions } from '../options.js';
import type { LinkModelReport } from '../types.js';
import type { LogisticModel } from './logistic.js';
import type { MentionIndex } from './mentions.js';
import type { Evidence } from './reason.js';
import type { Chosen } from './select.js';
import type { SuggestInput } from './types.js';
/** Key terms of a target that an anchor may match: its heaviest TF-IDF terms. */
export declare const KEY_TERMS = 5;
/** A key term is strong for a target among the pages it weighs most in (this many). */
export declare const STRONG_LEADERS = 3;
/** The choice and the model behind it. */
export interface ChooseResult {
    /** In the order they were chosen (best score first, caps applied). */
    readonly chosen: Chosen[];
    readonly model: LogisticModel;
    readonly modelReport: LinkModelReport;
    readonly mentions: MentionIndex;
    /** A target's candidate sources (ascending; linked ones included). */
    readonly candidatesOf: (target: number) => number[];
    /** The evidence of a chosen pair, for its reason text. */
    readonly evidenceOf: (chosen: Chosen) => Evidence;
}
/**
 * The suggestions chosen for `targets`.
 * @param rankPct PageRank percentile per page id
 */
export declare function chooseForTargets(input: SuggestInput, options: ResolvedOptions, targets: readonly number[], rankPct: ArrayLike<number>): ChooseResult;
