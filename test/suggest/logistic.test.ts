/**
 * The link model's regression and its quality measure, against published worked examples.
 */
import { describe, expect, it } from 'vitest';
import { areaUnderCurve, contributions, fitLogistic, linearScore, predictLogistic } from '../../src/suggest/logistic.js';

describe('fitLogistic', () => {
  it('finds the maximum-likelihood coefficients of the "hours studied vs. pass" example (20 students)', () => {
    // Source: the worked example of the Wikipedia article "Logistic regression" (section
    // "Example"): 20 students, hours of study and pass/fail; maximum-likelihood estimates
    // intercept -4.0777 and hours 1.5046 (the article prints -4.1 and 1.5; the four-decimal
    // values are re-derived here by an independent Newton iteration written by hand).
    const hours = [0.5, 0.75, 1, 1.25, 1.5, 1.75, 1.75, 2, 2.25, 2.5, 2.75, 3, 3.25, 3.5, 4, 4.25, 4.5, 4.75, 5, 5.5];
    const pass = [0, 0, 0, 0, 0, 0, 1, 0, 1, 0, 1, 0, 1, 0, 1, 1, 1, 1, 1, 1];
    const model = fitLogistic(hours.map((h) => [h]), pass, { l2: 0 });
    const slope = model.weights[0]! / model.scales[0]!;
    const intercept = model.intercept - slope * model.means[0]!;
    expect(intercept).toBeCloseTo(-4.0777, 3);
    expect(slope).toBeCloseTo(1.5046, 3);
    expect(model.converged).toBe(true);
    // The article's table: 2 hours of study -> probability of passing 0.26; 4 hours -> 0.87.
    expect(predictLogistic(model, [2])).toBeCloseTo(0.26, 2);
    expect(predictLogistic(model, [4])).toBeCloseTo(0.87, 2);
  });

  it('shrinks the weights towards 0 as the L2 penalty grows, never the intercept', () => {
    const xs = [[0], [1], [2], [3], [4], [5], [6], [7]];
    const ys = [0, 0, 1, 0, 1, 1, 0, 1];
    const w = [0, 1, 10, 100].map((l2) => Math.abs(fitLogistic(xs, ys, { l2 }).weights[0]!));
    expect(w[1]).toBeLessThan(w[0]!);
    expect(w[2]).toBeLessThan(w[1]!);
    expect(w[3]).toBeLessThan(w[2]!);
    // With a huge penalty the model predicts the base rate (4 of 8) everywhere.
    const flat = fitLogistic(xs, ys, { l2: 1e9 });
    expect(predictLogistic(flat, [0])).toBeCloseTo(0.5, 3);
  });

  it('gives the same coefficients to the bit on every run (no random start)', () => {
    const rows = Array.from({ length: 200 }, (_, i) => [Math.sin(i), Math.cos(i * 0.7), (i % 7) / 7]);
    const labels = rows.map((r) => (r[0]! + 0.5 * r[1]! > 0.1 ? 1 : 0));
    expect(fitLogistic(rows, labels)).toEqual(fitLogistic(rows, labels));
  });

  it('splits the linear score into one part per feature', () => {
    const model = fitLogistic([[0, 1], [1, 0], [2, 2], [3, 1], [1, 1], [0, 3]], [0, 0, 1, 1, 0, 1], { l2: 0.5 });
    const x = [2, 1];
    const parts = contributions(model, x);
    expect(model.intercept + parts[0]! + parts[1]!).toBeCloseTo(linearScore(model, x), 12);
  });
});

describe('areaUnderCurve', () => {
  it('is the probability that a positive outranks a negative (scikit-learn roc_auc_score doc example: 0.75)', () => {
    // Source: scikit-learn's documentation of roc_auc_score: y = [0, 0, 1, 1], scores
    // [0.1, 0.4, 0.35, 0.8] -> 0.75 (from memory; re-counted by hand: of the 4 positive-negative
    // pairs, 3 are ordered right).
    expect(areaUnderCurve([0.1, 0.4, 0.35, 0.8], [0, 0, 1, 1])).toBe(0.75);
  });

  it('counts ties as one half, and is null without both kinds', () => {
    expect(areaUnderCurve([0.5, 0.5], [0, 1])).toBe(0.5);
    expect(areaUnderCurve([1, 2, 3], [0, 1, 1])).toBe(1);
    expect(areaUnderCurve([1, 2], [1, 1])).toBeNull();
  });
});
