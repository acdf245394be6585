/** The backtest's seeded streams are the ground floor's (`src/util/prng.ts`). */
export { mulberry32, streamFor, shuffle } from '../util/prng.js';
export type { Random } from '../util/prng.js';
