/**
 * Logistic regression with an L2 penalty, fitted by Newton's method (iteratively reweighted
 * least squares), and the area under the ROC curve. The product's core: written by hand because
 * it is small, must be deterministic to the bit (fixed summation order, no random start), and
 * runs in every `suggest`.
 *
 * Model: P(y = 1 | x) = 1 / (1 + exp(-(b0 + sum_j b_j z_j))), with z_j = (x_j - mean_j) / scale_j
 * (standardised features; scale = the sample standard deviation, 1 for a constant feature).
 * The fit maximises log-likelihood - (l2 / 2) * sum_j b_j^2 (the intercept is not penalised).
 */

export type { LogisticModel } from '../types.js';
import type { LogisticModel } from '../types.js';

/** Fit settings. */
export interface LogisticSettings {
  /** L2 penalty on the standardised weights. @default 1 */
  readonly l2?: number;
  /** @default 100 */
  readonly maxIterations?: number;
  /** Stop when no coefficient moves more than this in one Newton step. @default 1e-9 */
  readonly tolerance?: number;
}

/**
 * Fit a logistic regression.
 * @param rows feature vectors, all of length d
 * @param labels 1 = positive, 0 = negative, one per row
 */
export function fitLogistic(rows: readonly (readonly number[])[], labels: ArrayLike<number>, settings: LogisticSettings = {}): LogisticModel {
  const l2 = settings.l2 ?? 1;
  const maxIterations = settings.maxIterations ?? 100;
  const tolerance = settings.tolerance ?? 1e-9;
  const n = rows.length;
  const d = n === 0 ? 0 : rows[0].length;
  const means = new Array<number>(d).fill(0);
  const scales = new Array<number>(d).fill(1);
  for (let j = 0; j < d; j++) {
    let sum = 0;
    for (let i = 0; i < n; i++) sum += rows[i][j];
    const mean = n === 0 ? 0 : sum / n;
    let ss = 0;
    for (let i = 0; i < n; i++) ss += (rows[i][j] - mean) ** 2;
    const sd = n > 1 ? Math.sqrt(ss / (n - 1)) : 0;
    means[j] = mean;
    scales[j] = sd > 1e-12 ? sd : 1;
  }
  // z with a leading 1 for the intercept, row-major.
  const p = d + 1;
  const z = new Float64Array(n * p);
  for (let i = 0; i < n; i++) {
    z[i * p] = 1;
    for (let j = 0; j < d; j++) z[i * p + 1 + j] = (rows[i][j] - means[j]) / scales[j];
  }
  const beta = new Float64Array(p);
  let iterations = 0;
  let converged = false;
  const g = new Float64Array(p);
  const h = new Float64Array(p * p);
  while (iterations < maxIterations) {
    iterations++;
    g.fill(0);
    h.fill(0);
    for (let i = 0; i < n; i++) {
      const o = i * p;
      let eta = 0;
      for (let j = 0; j < p; j++) eta += beta[j] * z[o + j];
      const mu = sigmoid(eta);
      const w = mu * (1 - mu);
      const r = labels[i] - mu;
      for (let j = 0; j < p; j++) {
        const zj = z[o + j];
        g[j] += zj * r;
        const wz = w * zj;
        for (let k = 0; k <= j; k++) h[j * p + k] += wz * z[o + k];
      }
    }
    for (let j = 1; j < p; j++) {
      g[j] -= l2 * beta[j];
      h[j * p + j] += l2;
    }
    for (let j = 0; j < p; j++) for (let k = j + 1; k < p; k++) h[j * p + k] = h[k * p + j];
    const step = solveSymmetric(h, g, p);
    let move = 0;
    for (let j = 0; j < p; j++) {
      beta[j] += step[j];
      move = Math.max(move, Math.abs(step[j]));
    }
    if (!(move > tolerance)) {
      converged = Number.isFinite(move);
      break;
    }
  }
  return { intercept: beta[0], weights: Array.from(beta.subarray(1)), means, scales, iterations, converged };
}

/** The linear score b0 + sum_j b_j z_j of a feature vector. */
export function linearScore(model: LogisticModel, x: readonly number[]): number {
  let eta = model.intercept;
  for (let j = 0; j < model.weights.length; j++) eta += (model.weights[j] * (x[j] - model.means[j])) / model.scales[j];
  return eta;
}

/** The model's probability for a feature vector. */
export function predictLogistic(model: LogisticModel, x: readonly number[]): number {
  return sigmoid(linearScore(model, x));
}

/** Each feature's part of the linear score: b_j (x_j - mean_j) / scale_j. */
export function contributions(model: LogisticModel, x: readonly number[]): number[] {
  return model.weights.map((w, j) => (w * (x[j] - model.means[j])) / model.scales[j]);
}

/** 1 / (1 + e^-x), without overflow for large |x|. */
export function sigmoid(x: number): number {
  if (x >= 0) return 1 / (1 + Math.exp(-x));
  const e = Math.exp(x);
  return e / (1 + e);
}

/**
 * Area under the ROC curve: the probability that a random positive scores above a random
 * negative, ties counting one half (the Mann-Whitney U statistic / (positives x negatives)).
 * Null when either class is empty.
 */
export function areaUnderCurve(scores: readonly number[], labels: ArrayLike<number>): number | null {
  const order = scores.map((_, i) => i).sort((a, b) => scores[a] - scores[b] || a - b);
  let positives = 0;
  let rankSum = 0;
  for (let i = 0; i < order.length; ) {
    let j = i;
    while (j + 1 < order.length && scores[order[j + 1]] === scores[order[i]]) j++;
    const midRank = (i + j) / 2 + 1;
    for (let k = i; k <= j; k++) {
      if (labels[order[k]] === 1) {
        positives++;
        rankSum += midRank;
      }
    }
    i = j + 1;
  }
  const negatives = order.length - positives;
  if (positives === 0 || negatives === 0) return null;
  return (rankSum - (positives * (positives + 1)) / 2) / (positives * negatives);
}

/**
 * Solve H x = g for a symmetric positive (semi-)definite H by Cholesky; a tiny ridge is added
 * when a pivot is not positive (a feature that is constant in the training rows).
 */
function solveSymmetric(h: Float64Array, g: Float64Array, p: number): Float64Array {
  const l = new Float64Array(p * p);
  for (let j = 0; j < p; j++) {
    let sum = h[j * p + j];
    for (let k = 0; k < j; k++) sum -= l[j * p + k] ** 2;
    const pivot = sum > 1e-12 ? sum : sum + 1e-8 > 1e-12 ? sum + 1e-8 : 1e-8;
    l[j * p + j] = Math.sqrt(pivot);
    for (let i = j + 1; i < p; i++) {
      let s = h[i * p + j];
      for (let k = 0; k < j; k++) s -= l[i * p + k] * l[j * p + k];
      l[i * p + j] = s / l[j * p + j];
    }
  }
  const y = new Float64Array(p);
  for (let i = 0; i < p; i++) {
    let s = g[i];
    for (let k = 0; k < i; k++) s -= l[i * p + k] * y[k];
    y[i] = s / l[i * p + i];
  }
  const x = new Float64Array(p);
  for (let i = p - 1; i >= 0; i--) {
    let s = y[i];
    for (let k = i + 1; k < p; k++) s -= l[k * p + i] * x[k];
    x[i] = s / l[i * p + i];
  }
  return x;
}
