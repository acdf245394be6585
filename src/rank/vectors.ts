/** Checks and scaling of the input vectors both PageRank functions share. */
import { EngineError } from '../errors.js';

/**
 * Throws `E_INTERNAL` when a vector has the wrong length.
 * @param who the function named in the message (`pagerank`, `pagerankScenarios`)
 */
export function checkLength(who: string, actual: number, n: number, what: string): void {
  if (actual !== n) throw new EngineError('E_INTERNAL', `${who}: ${what} has ${actual} nodes, expected ${n}`);
}

/**
 * A copy of `v` scaled to sum 1; null when it has no positive mass. Throws `E_INTERNAL` on a
 * wrong length or an entry that is not a non-negative number.
 * @param who the function named in the message (`pagerank`, `pagerankScenarios`)
 */
export function distribution(who: string, v: Float64Array, n: number, what: string): Float64Array | null {
  checkLength(who, v.length, n, what);
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const value = v[i];
    if (!(value >= 0)) throw new EngineError('E_INTERNAL', `${who}: ${what}[${i}] is ${value}, expected a non-negative number`);
    sum += value;
  }
  if (!(sum > 0) || !Number.isFinite(sum)) return null;
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = v[i] / sum;
  return out;
}
