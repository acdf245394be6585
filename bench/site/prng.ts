/**
 * Seeded pseudo-random numbers for the synthetic site generator. Every draw the generator makes
 * comes from one of these streams, so the same seed gives the same bytes on every machine.
 */

// The generator is the project's own (the backtest and the link model sample with it too): one
// copy of mulberry32 and of the shuffle, on the ground floor.
import { mulberry32, shuffle } from '../../src/util/prng.js';
import type { Random } from '../../src/util/prng.js';

export { mulberry32, shuffle };
export type { Random };

/**
 * Mix two integers into a seed (for an independent stream per page, so pages can be rendered in
 * any order and still come out the same).
 */
export function mixSeed(seed: number, index: number): number {
  let h = (seed ^ Math.imul(index + 1, 0x9e3779b1)) >>> 0;
  h = Math.imul(h ^ (h >>> 16), 0x85ebca6b) >>> 0;
  h = Math.imul(h ^ (h >>> 13), 0xc2b2ae35) >>> 0;
  return (h ^ (h >>> 16)) >>> 0;
}

/** Integer in [lo, hi] (both included). */
export function intBetween(rnd: Random, lo: number, hi: number): number {
  return lo + Math.floor(rnd() * (hi - lo + 1));
}

/** One element of a non-empty array. */
export function pick<T>(rnd: Random, items: readonly T[]): T {
  return items[Math.floor(rnd() * items.length)]!;
}

/**
 * Index in [0, n) with a heavy head: index = floor(n * u^power). power 1 is uniform; larger
 * powers concentrate draws on the first indices (a Zipf-like popularity).
 */
export function skewedIndex(rnd: Random, n: number, power: number): number {
  return Math.min(n - 1, Math.floor(n * Math.pow(rnd(), power)));
}

/**
 * Discrete Pareto draw: floor(min / u^(1/alpha)), capped. alpha near 1.5 gives most values
 * near `min` and a long tail of a few large ones (the out-degree of web pages looks like this).
 */
export function pareto(rnd: Random, min: number, alpha: number, cap: number): number {
  const u = 1 - rnd(); // (0, 1]
  return Math.min(cap, Math.floor(min / Math.pow(u, 1 / alpha)));
}
