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
export const PAGERANK_DECIMALS = 10;
/** Decimals of `rank`, `similarity`, `score` and suggestion ranks. */
export const RATIO_DECIMALS = 4;
/** `x` rounded half away from zero to `decimals` places; never `-0`, `NaN` or infinite (0 instead). */
export function roundTo(x, decimals) {
    if (!Number.isFinite(x))
        return 0;
    const scale = 10 ** decimals;
    const r = Math.sign(x) * Math.round(Math.abs(x) * scale) / scale;
    return r === 0 ? 0 : r;
}
