import { shuffle, streamFor } from '../util/prng.js';
import { FEATURES } from './features.js';
import { areaUnderCurve, fitLogistic, linearScore } from './logistic.js';
/** Training targets sampled at most. */
export const TRAIN_TARGETS = 3000;
/** Positive pairs used at most. */
export const MAX_POSITIVES = 10000;
/** Negative pairs sampled per positive, at most. */
export const NEGATIVES_PER_POSITIVE = 3;
/** Fewer positives (or negatives) than this: fixed weights. */
export const MIN_POSITIVES = 20;
/** L2 penalty on the standardised weights. */
export const L2 = 1;
/** One training pair in this many is held out to measure the AUC. */
export const HOLDOUT_EVERY = 5;
/** Seed of the training sample. */
export const TRAINING_SEED = 7;
/**
 * Weights used when the site has too few links to learn from, on the features' own scales
 * (no standardisation): text similarity and a mention of the target's names first, then graph
 * proximity; written by hand, not fitted.
 */
export const FIXED_WEIGHTS = {
    intercept: -4,
    similarity: 6,
    'title-mention': 1.5,
    'anchor-text-mention': 2,
    'label-mention': 1,
    'alias-mention': 0.5,
    mentions: 0.5,
    'name-words': 0.2,
    'link-probability': 1,
    commonness: 1,
    'adamic-adar': 0.5,
    'two-step-paths': 0.3,
    'shared-folders': 0.3,
    'target-inlinks': 0.2,
    'source-outlinks': 0.1,
    'source-rank': 0.5,
    'target-depth': 0,
};
/** The model with {@link FIXED_WEIGHTS}. */
export function fixedModel() {
    return {
        intercept: FIXED_WEIGHTS.intercept,
        weights: FEATURES.map((f) => FIXED_WEIGHTS[f]),
        means: FEATURES.map(() => 0),
        scales: FEATURES.map(() => 1),
        iterations: 0,
        converged: true,
    };
}
/**
 * The training pairs: every candidate source of the sampled targets, labelled.
 * @param targets the pages that may be targets (ascending)
 * @param candidatesOf a target's candidate sources, linked ones included, ascending
 * @param isLinked whether the pair has a content link
 */
export function trainingPairs(targets, candidatesOf, isLinked, seed = TRAINING_SEED) {
    const sample = targets.length <= TRAIN_TARGETS ? [...targets] : shuffle(streamFor(seed, 10), [...targets]).slice(0, TRAIN_TARGETS).sort((a, b) => a - b);
    const positives = [];
    const negatives = [];
    for (const t of sample) {
        for (const s of candidatesOf(t)) {
            const linked = isLinked(s, t);
            (linked ? positives : negatives).push({ source: s, target: t, linked });
        }
    }
    const pos = positives.length <= MAX_POSITIVES ? positives : shuffle(streamFor(seed, 11), positives).slice(0, MAX_POSITIVES);
    const wantNeg = Math.max(MIN_POSITIVES, pos.length * NEGATIVES_PER_POSITIVE);
    const neg = negatives.length <= wantNeg ? negatives : shuffle(streamFor(seed, 12), negatives).slice(0, wantNeg);
    return [...pos, ...neg].sort((a, b) => a.target - b.target || a.source - b.source);
}
/** Whether a training pair is kept out of the fit to measure the AUC (a hash of the pair). */
export function heldOutForAuc(p) {
    let h = Math.imul(p.source + 0x9e3779b1, 0x85ebca6b) ^ Math.imul(p.target + 0x632be5ab, 0xc2b2ae35);
    h = Math.imul(h ^ (h >>> 15), 0x2c1b3c6d);
    return ((h ^ (h >>> 13)) >>> 0) % HOLDOUT_EVERY === 0;
}
/**
 * Fit the model on the training pairs.
 * @param featuresOf the feature vector of a pair
 */
export function fitLinkModel(pairs, featuresOf) {
    const fitRows = [];
    const fitLabels = [];
    const testRows = [];
    const testLabels = [];
    for (const p of pairs) {
        const x = featuresOf(p.source, p.target);
        if (heldOutForAuc(p)) {
            testRows.push(x);
            testLabels.push(p.linked ? 1 : 0);
        }
        else {
            fitRows.push(x);
            fitLabels.push(p.linked ? 1 : 0);
        }
    }
    const count = (labels, v) => labels.reduce((a, b) => a + (b === v ? 1 : 0), 0);
    const positives = count(fitLabels, 1);
    const negatives = count(fitLabels, 0);
    const enough = positives >= MIN_POSITIVES && negatives >= MIN_POSITIVES;
    const model = enough ? fitLogistic(fitRows, fitLabels, { l2: L2 }) : fixedModel();
    const auc = areaUnderCurve(testRows.map((x) => linearScore(model, x)), testLabels);
    return {
        model,
        report: {
            source: enough ? 'fitted' : 'fixed',
            features: [...FEATURES],
            intercept: model.intercept,
            weights: [...model.weights],
            means: [...model.means],
            scales: [...model.scales],
            trainingPairs: { linked: positives, notLinked: negatives },
            heldOutPairs: { linked: count(testLabels, 1), notLinked: count(testLabels, 0) },
            auc,
            iterations: model.iterations,
            converged: model.converged,
        },
    };
}
