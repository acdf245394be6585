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

function rowsFor(length: number, rows?: Rows): Rows {
  if (rows !== undefined && rows.prev.length > length) return rows;
  return { prev: new Int32Array(length + 1), cur: new Int32Array(length + 1) };
}

/**
 * Levenshtein distance (insertions, deletions, substitutions of UTF-16 code units) between `a`
 * and `b`, or `max + 1` when it is larger than `max`. Only the band of cells within `max` of
 * the diagonal is computed (a cell outside it is always over the bound), so a call costs
 * O(max x length), not O(length squared).
 */
export function boundedDistance(a: string, b: string, max: number, scratch?: Rows): number {
  if (Math.abs(a.length - b.length) > max) return max + 1;
  if (a === b) return 0;
  const rows = rowsFor(b.length, scratch);
  let { prev, cur } = rows;
  const over = max + 1;
  for (let j = 0; j <= b.length; j++) prev[j] = j <= max ? j : over;
  for (let i = 1; i <= a.length; i++) {
    const lo = Math.max(1, i - max);
    const hi = Math.min(b.length, i + max);
    cur[lo - 1] = lo === 1 ? (i <= max ? i : over) : over;
    let rowMin = cur[lo - 1];
    const ca = a.charCodeAt(i - 1);
    for (let j = lo; j <= hi; j++) {
      const cost = ca === b.charCodeAt(j - 1) ? 0 : 1;
      let v = prev[j - 1] + cost;
      const up = prev[j] + 1;
      const left = cur[j - 1] + 1;
      if (up < v) v = up;
      if (left < v) v = left;
      if (v > over) v = over;
      cur[j] = v;
      if (v < rowMin) rowMin = v;
    }
    if (hi < b.length) cur[hi + 1] = over;
    if (rowMin > max) return over;
    const t = prev;
    prev = cur;
    cur = t;
  }
  const d = prev[b.length];
  return d > max ? over : d;
}

/** The largest edit distance still offered as "did you mean": a third of the word, 1 to 4 edits. */
export function distanceBound(word: string): number {
  return Math.max(1, Math.min(4, Math.floor(word.length / 3)));
}

/**
 * The candidate closest to `word` within `distanceBound(word)` edits; ties go to the candidate
 * that sorts first. `null` when none is close enough. `word` itself is never offered.
 */
export function nearest(word: string, candidates: Iterable<string>): string | null {
  const max = distanceBound(word);
  let best: string | null = null;
  let bestDistance = max + 1;
  let rows: Rows | undefined;
  for (const candidate of candidates) {
    if (candidate === word || Math.abs(candidate.length - word.length) > max) continue;
    rows = rowsFor(candidate.length, rows);
    const d = boundedDistance(word, candidate, Math.min(max, bestDistance), rows);
    if (d < bestDistance || (d === bestDistance && best !== null && d <= max && candidate < best)) {
      best = candidate;
      bestDistance = d;
    }
  }
  return bestDistance <= max ? best : null;
}
