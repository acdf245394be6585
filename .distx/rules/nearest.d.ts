/**
 * "Did you mean" support: the closest string by edit distance.
 *
 * Hand-written because it runs once per broken link against every route of the site: a
 * distance bounded by `max` lets most candidates be skipped on length alone, and the
 * two-row dynamic programme stops as soon as a row's minimum passes the bound.
 */
/** Two rows of the distance table, reused across candidates by one `nearest` call. */
interface Rows {
    prev: Int32Array;
    cur: Int32Array;
}
/**
 * Levenshtein distance (insertions, deletions, substitutions of UTF-16 code units) between `a`
 * and `b`, or `max + 1` when it is larger than `max`. Only the band of cells within `max` of
 * the diagonal is computed (a cell outside it is always over the bound), so a call costs
 * O(max x length), not O(length squared).
 */
export declare function boundedDistance(a: string, b: string, max: number, scratch?: Rows): number;
/** The largest edit distance still offered as "did you mean": a third of the word, 1 to 4 edits. */
export declare function distanceBound(word: string): number;
/**
 * The candidate closest to `word` within `distanceBound(word)` edits; ties go to the candidate
 * that sorts first. `null` when none is close enough. `word` itself is never offered.
 */
export declare function nearest(word: string, candidates: Iterable<string>): string | null;
export {};
