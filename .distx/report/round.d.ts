/**
 * Fixed precision of the numbers in the report, so the JSON is stable and readable:
 *
 * - `pagerank`: 10 decimals. The power iteration stops when the L1 change falls below 1e-10,
 *   so later digits carry no information.
 * - `rank` (pagerank x pages), `similarity`, `score`, the predicted target ranks of a
 *   suggestion: 4 decimals, enough to tell pages apart and short enough to read.
 *
 * Rounded values may not sum to exactly 1.
 */
/** Decimals of `pagerank`. */
export declare const PAGERANK_DECIMALS = 10;
/** Decimals of `rank`, `similarity`, `score` and suggestion ranks. */
export declare const RATIO_DECIMALS = 4;
/** `x` rounded half away from zero to `decimals` places; never `-0`, `NaN` or infinite (0 instead). */
export declare function roundTo(x: number, decimals: number): number;
