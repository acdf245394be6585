/** Percentile ranks, the common scale on which importance and PageRank are compared. */
/**
 * Mid-rank percentile of each value among the included entries, in [0, 1]: (number of
 * included values below + half the number of other included values equal) / (count - 1).
 * The smallest value gets 0, the largest 1, equal values the same percentile; a single
 * included entry gets 0.5. Entries not included get NaN.
 * @param values one value per page
 * @param include which pages take part (default: all)
 */
export declare function percentiles(values: ArrayLike<number>, include?: (i: number) => boolean): Float64Array;
