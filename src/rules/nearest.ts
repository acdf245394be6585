/**
 * "Did you mean" support: the closest string by edit distance.
 *
 * Hand-written because it runs once per broken link against every route of the site: a
 * distance bounded by `max` lets most candidates be skipped on length alone, and the
 * two-row dynamic programme stops as soon as a row's minimum passes the bound.
 */

/**
 * Levenshtein distance (insertions, deletions, substitutions of UTF-16 code units) between `a`
 * and `b`, or `max + 1` when it is larger than `max`.
 */
export function boundedDistance(a: string, b: string, max: number): number {
  if (Math.abs(a.length - b.length) > max) return max + 1;
  if (a === b) return 0;
  let prev = new Int32Array(b.length + 1);
  let cur = new Int32Array(b.length + 1);
  for (let j = 0; j <= b.length; j++) prev[j] = j;
  for (let i = 1; i <= a.length; i++) {
    cur[0] = i;
    let rowMin = i;
    const ca = a.charCodeAt(i - 1);
    for (let j = 1; j <= b.length; j++) {
      const cost = ca === b.charCodeAt(j - 1) ? 0 : 1;
      const v = Math.min(prev[j]! + 1, cur[j - 1]! + 1, prev[j - 1]! + cost);
      cur[j] = v;
      if (v < rowMin) rowMin = v;
    }
    if (rowMin > max) return max + 1;
    [prev, cur] = [cur, prev];
  }
  const d = prev[b.length]!;
  return d > max ? max + 1 : d;
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
  for (const candidate of candidates) {
    if (candidate === word) continue;
    const d = boundedDistance(word, candidate, Math.min(max, bestDistance));
    if (d < bestDistance || (d === bestDistance && best !== null && d <= max && candidate < best)) {
      best = candidate;
      bestDistance = d;
    }
  }
  return bestDistance <= max ? best : null;
}
