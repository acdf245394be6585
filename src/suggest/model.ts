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
 * - Fit cache: the fit is a function of the fitted rows and labels alone, so a {@link FitMemo}
 *   (the cache folder's, `src/cache/model.ts`) keeps the last fit under a sha256 of exactly
 *   those ({@link fitKey}); a run whose training rows are the same to the bit (no link and no
 *   feature input changed) takes it instead of fitting again, and gets the same model.
 * - Too few links to learn from (fewer than {@link MIN_POSITIVES} positives or negatives): the
 *   fixed weights {@link FIXED_WEIGHTS} are used instead, and the report says so.
 */
import { createHash } from 'node:crypto';
import type { FitMemo, LinkModelReport } from '../types.js';
import { shuffle, streamFor } from '../util/prng.js';
import { FEATURES } from './features.js';
import type { FeatureName } from './features.js';
import { areaUnderCurve, fitLogistic, linearScore } from './logistic.js';
import type { LogisticModel } from './logistic.js';

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
export const FIXED_WEIGHTS: Readonly<Record<FeatureName, number>> & { readonly intercept: number } = {
  intercept: -4,
  similarity: 6,
  'title-mention': 1.5,
  'anchor-text-mention': 2,
  'label-mention': 1,
  'alias-mention': 0.5,
  'heading-mention': 0.5,
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

/** A labelled training pair. */
export interface TrainingPair {
  readonly source: number;
  readonly target: number;
  readonly linked: boolean;
}

/** The training pairs and the share of each kind the sample kept. */
export interface TrainingSample {
  /** Sorted by target, then source. */
  readonly pairs: TrainingPair[];
  /** Linked candidate pairs kept / all of them (1 unless capped at {@link MAX_POSITIVES}). */
  readonly linkedRate: number;
  /** Unlinked candidate pairs kept / all of them. */
  readonly notLinkedRate: number;
}

/** The fitted (or fixed) model and what the report says of it. */
export interface LinkModel {
  readonly model: LogisticModel;
  readonly report: LinkModelReport;
}

/** The model with {@link FIXED_WEIGHTS}. */
export function fixedModel(): LogisticModel {
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
export function trainingPairs(
  targets: readonly number[],
  candidatesOf: (target: number) => readonly number[],
  isLinked: (source: number, target: number) => boolean,
  seed = TRAINING_SEED,
): TrainingSample {
  const sample = targets.length <= TRAIN_TARGETS ? [...targets] : shuffle(streamFor(seed, 10), [...targets]).slice(0, TRAIN_TARGETS).sort((a, b) => a - b);
  const positives: TrainingPair[] = [];
  const negatives: TrainingPair[] = [];
  for (const t of sample) {
    for (const s of candidatesOf(t)) {
      const linked = isLinked(s, t);
      (linked ? positives : negatives).push({ source: s, target: t, linked });
    }
  }
  const pos = positives.length <= MAX_POSITIVES ? positives : shuffle(streamFor(seed, 11), positives).slice(0, MAX_POSITIVES);
  const wantNeg = Math.max(MIN_POSITIVES, pos.length * NEGATIVES_PER_POSITIVE);
  const neg = negatives.length <= wantNeg ? negatives : shuffle(streamFor(seed, 12), negatives).slice(0, wantNeg);
  return {
    pairs: [...pos, ...neg].sort((a, b) => a.target - b.target || a.source - b.source),
    linkedRate: positives.length === 0 ? 1 : pos.length / positives.length,
    notLinkedRate: negatives.length === 0 ? 1 : neg.length / negatives.length,
  };
}

/** Whether a training pair is kept out of the fit to measure the AUC (a hash of the pair). */
export function heldOutForAuc(p: TrainingPair): boolean {
  let h = Math.imul(p.source + 0x9e3779b1, 0x85ebca6b) ^ Math.imul(p.target + 0x632be5ab, 0xc2b2ae35);
  h = Math.imul(h ^ (h >>> 15), 0x2c1b3c6d);
  return ((h ^ (h >>> 13)) >>> 0) % HOLDOUT_EVERY === 0;
}

/**
 * Fit the model on the training sample. The sample keeps only some of the unlinked pairs, which
 * raises the odds the fit sees by linkedRate / notLinkedRate; the intercept is corrected by
 * ln(notLinkedRate / linkedRate) (the prior correction for case-control samples, King and Zeng,
 * "Logistic regression in rare events data", 2001), so the score is the probability among the
 * candidates as they are.
 * @param featuresOf the feature vector of a pair
 */
export function fitLinkModel(sample: TrainingSample, featuresOf: (source: number, target: number) => number[], memo?: FitMemo): LinkModel {
  const { pairs } = sample;
  const fitRows: number[][] = [];
  const fitLabels: number[] = [];
  const testRows: number[][] = [];
  const testLabels: number[] = [];
  for (const p of pairs) {
    const x = featuresOf(p.source, p.target);
    if (heldOutForAuc(p)) {
      testRows.push(x);
      testLabels.push(p.linked ? 1 : 0);
    } else {
      fitRows.push(x);
      fitLabels.push(p.linked ? 1 : 0);
    }
  }
  const count = (labels: number[], v: number): number => labels.reduce((a, b) => a + (b === v ? 1 : 0), 0);
  const positives = count(fitLabels, 1);
  const negatives = count(fitLabels, 0);
  const enough = positives >= MIN_POSITIVES && negatives >= MIN_POSITIVES;
  const fit = enough ? memoFit(fitRows, fitLabels, memo) : fixedModel();
  const model = enough ? { ...fit, intercept: fit.intercept + Math.log(sample.notLinkedRate / sample.linkedRate) } : fit;
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
      anchorChoice: null,
    },
  };
}

export type { FitMemo } from '../types.js';

/**
 * The key of a fit: a sha256 of the fit's settings, the feature names and the rows and labels
 * as the fit reads them (each feature value as its 8 bytes, so equal keys mean equal input to
 * the bit). The code itself is not in it: the store keys on the code hash (`codeVersion`).
 */
export function fitKey(rows: readonly (readonly number[])[], labels: readonly number[]): string {
  const hash = createHash('sha256');
  hash.update(`link-model\nl2=${L2}\n${FEATURES.join(',')}\n${rows.length}\n`);
  const d = FEATURES.length;
  const chunk = new Float64Array(1024 * (d + 1));
  let at = 0;
  for (let i = 0; i < rows.length; i++) {
    const row = rows[i];
    if (row.length !== d) throw new Error(`fitKey: row ${i} has ${row.length} features, expected ${d}`);
    for (let j = 0; j < d; j++) chunk[at++] = row[j];
    chunk[at++] = labels[i];
    if (at === chunk.length) {
      hash.update(new Uint8Array(chunk.buffer, 0, at * 8));
      at = 0;
    }
  }
  hash.update(new Uint8Array(chunk.buffer, 0, at * 8));
  return hash.digest('hex');
}

/** `fitLogistic` on the rows, or the memo's model for the same rows. */
function memoFit(rows: number[][], labels: number[], memo: FitMemo | undefined): LogisticModel {
  if (memo === undefined) return fitLogistic(rows, labels, { l2: L2 });
  const key = fitKey(rows, labels);
  const kept = memo.get(key);
  if (kept !== null) return kept;
  const fit = fitLogistic(rows, labels, { l2: L2 });
  memo.set(key, fit);
  return fit;
}
