/**
 * Seeded pseudo-random numbers (no `Math.random`): the same seed gives the same held-out links,
 * the same random baselines and the same training sample of the link model on every machine.
 */

/** A stream of numbers in [0, 1). */
export type Random = () => number;

/**
 * mulberry32, a small 32-bit generator (Tommy Ettinger's public-domain design; common practice,
 * no source beyond the original post). Statistical quality is ample for sampling a few
 * thousand links.
 * @param seed any integer; it is reduced to 32 bits
 */
export function mulberry32(seed: number): Random {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * An independent stream for (seed, purpose): the seed is mixed with the purpose number by a
 * 32-bit finaliser (murmur3's), so the sampler and the random baseline never share draws.
 * Seeds beyond 32 bits are folded in (high and low halves), so every safe integer gives its own
 * stream.
 */
export function streamFor(seed: number, purpose: number): Random {
  const low = seed % 4294967296;
  const high = Math.floor(seed / 4294967296);
  let h = (low ^ Math.imul(high + 0x632be5ab, 0x85ebca6b) ^ Math.imul(purpose + 1, 0x9e3779b1)) >>> 0;
  h = Math.imul(h ^ (h >>> 16), 0x85ebca6b) >>> 0;
  h = Math.imul(h ^ (h >>> 13), 0xc2b2ae35) >>> 0;
  return mulberry32((h ^ (h >>> 16)) >>> 0);
}

/** Fisher-Yates shuffle in place; returns `items`. */
export function shuffle<T>(rnd: Random, items: T[]): T[] {
  for (let i = items.length - 1; i > 0; i--) {
    const j = Math.floor(rnd() * (i + 1));
    const t = items[i];
    items[i] = items[j];
    items[j] = t;
  }
  return items;
}
