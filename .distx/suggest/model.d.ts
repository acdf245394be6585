/**
 * The link model: a logistic regression fitted in every run on the site's own content links
 * (DESIGN section 7), so the score of a candidate is the probability that this site's authors
 * would write that link.
 *
 * - Training pairs: for a seeded sample of target pages (all pages up to {@link TRAIN_TARGETS}),
 *   their candidate sources found as if no link existed yet. Candidates that do link to the
 *   target are the positives; the others are the negatives, a seeded sample of at most
 *   {@link NEGATIVES_PER_POSITIVE} per positive. At most {@link MAX_POSITIVES} positives
 *   (seeded sample). Features: `features.ts`, each as if the pair's own link were absent.
 * - Fit: standardised features, L2 penalty {@link L2}, Newton's method (`logistic.ts`).
 *   Deterministic: the sample is seeded, the fit has no random start.
 * - Quality: one pair in {@link HOLDOUT_EVERY} (by a hash of the pair, so the same pairs every
 *   run) is kept out of the fit; the model's AUC on them is reported.
 * - Too few links to learn from (fewer than {@link MIN_POSITIVES} positives or negatives): the
 *   fixed weights {@link FIXED_WEIGHTS} are used instead, and the report says so.
 */
import type { LinkModelReport } from '../types.js';
import type { FeatureName } from './features.js';
import type { LogisticModel } from './logistic.js';
/** Training targets sampled at most. */
export declare const TRAIN_TARGETS = 3000;
/** Positive pairs used at most. */
export declare const MAX_POSITIVES = 10000;
/** Negative pairs sampled per positive, at most. */
export declare const NEGATIVES_PER_POSITIVE = 3;
/** Fewer positives (or negatives) than this: fixed weights. */
export declare const MIN_POSITIVES = 20;
/** L2 penalty on the standardised weights. */
export declare const L2 = 1;
/** One training pair in this many is held out to measure the AUC. */
export declare const HOLDOUT_EVERY = 5;
/** Seed of the training sample. */
export declare const TRAINING_SEED = 7;
/**
 * Weights used when the site has too few links to learn from, on the features' own scales
 * (no standardisation): text similarity and a mention of the target's names first, then graph
 * proximity; written by hand, not fitted.
 */
export declare const FIXED_WEIGHTS: Readonly<Record<FeatureName, number>> & {
    readonly intercept: number;
};
/** A labelled training pair. */
export interface TrainingPair {
    readonly source: number;
    readonly target: number;
    readonly linked: boolean;
}
/** The fitted (or fixed) model and what the report says of it. */
export interface LinkModel {
    readonly model: LogisticModel;
    readonly report: LinkModelReport;
}
/** The model with {@link FIXED_WEIGHTS}. */
export declare function fixedModel(): LogisticModel;
/**
 * The training pairs: every candidate source of the sampled targets, labelled.
 * @param targets the pages that may be targets (ascending)
 * @param candidatesOf a target's candidate sources, linked ones included, ascending
 * @param isLinked whether the pair has a content link
 */
export declare function trainingPairs(targets: readonly number[], candidatesOf: (target: number) => readonly number[], isLinked: (source: number, target: number) => boolean, seed?: number): TrainingPair[];
/** Whether a training pair is kept out of the fit to measure the AUC (a hash of the pair). */
export declare function heldOutForAuc(p: TrainingPair): boolean;
/**
 * Fit the model on the training pairs.
 * @param featuresOf the feature vector of a pair
 */
export declare function fitLinkModel(pairs: readonly TrainingPair[], featuresOf: (source: number, target: number) => number[]): LinkModel;
