/** Percentile ranks, the common scale on which importance and PageRank are compared. */

/**
 * Mid-rank percentile of each value among the included entries, in [0, 1]: (number of
 * included values below + half the number of other included values equal) / (count - 1).
 * The smallest value gets 0, the largest 1, equal values the same percentile; a single
 * included entry gets 0.5. Entries not included get NaN.
 * @param values one value per page
 * @param include which pages take part (default: all)
 */
export function percentiles(values: ArrayLike<number>, include: (i: number) => boolean = () => true): Float64Array {
  const ids: number[] = [];
  for (let i = 0; i < values.length; i++) if (include(i)) ids.push(i);
  const out = new Float64Array(values.length).fill(Number.NaN);
  if (ids.length === 1) out[ids[0]] = 0.5;
  if (ids.length <= 1) return out;
  ids.sort((a, b) => values[a] - values[b] || a - b);
  let i = 0;
  while (i < ids.length) {
    let j = i;
    while (j + 1 < ids.length && values[ids[j + 1]] === values[ids[i]]) j++;
    const p = (i + (j - i) / 2) / (ids.length - 1);
    for (let x = i; x <= j; x++) out[ids[x]] = p;
    i = j + 1;
  }
  return out;
}
