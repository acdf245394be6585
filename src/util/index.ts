/**
 * The ground floor of helpers: any stage may import it; it imports no stage (only the types of
 * `src/types.ts`).
 */
export { compareText } from './compare.js';
export { compareFindings, compareSuggestions } from './order.js';
export { describeIoError } from './io-error.js';
export { mulberry32, streamFor, shuffle } from './prng.js';
export type { Random } from './prng.js';
export { navigationFile } from './navigation-file.js';
export { buildLineIndex, positionOf, lineOf, lineStart, lineContentEnd } from './line-index.js';
export type { LineIndex } from './line-index.js';
// The atomic file write (write-file.ts) is not exported here: only the stages that touch the
// file system import it (the `file-writes` rule of .dependency-cruiser.cjs).
