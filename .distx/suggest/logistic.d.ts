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
/** A fitted model. `weights[j]` is the weight of feature j on the standardised scale. */
export interface LogisticModel {
    readonly intercept: number;
    readonly weights: readonly number[];
    readonly means: readonly number[];
    readonly scales: readonly number[];
    readonly iterations: number;
    readonly converged: boolean;
}
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
export declare function fitLogistic(rows: readonly (readonly number[])[], labels: ArrayLike<number>, settings?: LogisticSettings): LogisticModel;
/** The linear score b0 + sum_j b_j z_j of a feature vector. */
export declare function linearScore(model: LogisticModel, x: readonly number[]): number;
/** The model's probability for a feature vector. */
export declare function predictLogistic(model: LogisticModel, x: readonly number[]): number;
/** Each feature's part of the linear score: b_j (x_j - mean_j) / scale_j. */
export declare function contributions(model: LogisticModel, x: readonly number[]): number[];
/** 1 / (1 + e^-x), without overflow for large |x|. */
export declare function sigmoid(x: number): number;
/**
 * Area under the ROC curve: the probability that a random positive scores above a random
 * negative, ties counting one half (the Mann-Whitney U statistic / (positives x negatives)).
 * Null when either class is empty.
 */
export declare function areaUnderCurve(scores: readonly number[], labels: ArrayLike<number>): number | null;
