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
export declare function mulberry32(seed: number): Random;
/**
 * An independent stream for (seed, purpose): the seed is mixed with the purpose number by a
 * 32-bit finaliser (murmur3's), so the sampler and the random baseline never share draws.
 * Seeds beyond 32 bits are folded in (high and low halves), so every safe integer gives its own
 * stream.
 */
export declare function streamFor(seed: number, purpose: number): Random;
/** Fisher-Yates shuffle in place; returns `items`. */
export declare function shuffle<T>(rnd: Random, items: T[]): T[];
