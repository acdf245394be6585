/** The `collect` stage: find and read the sources under the content root. */
export { collectSources, READ_BATCH } from './collect.js';
export { readAuxFile } from './aux.js';
export type { AuxKey } from './aux.js';
export { readSource } from './read.js';
export { kindOfPath } from '../routes/index.js';
export type { ReadContext, ReadOutcome } from './read.js';
export { decodeSource, firstInvalidUtf8, positionOfByte, BINARY_SNIFF_BYTES } from './decode.js';
export type { Decoded } from './decode.js';
export { ALWAYS_EXCLUDED } from './list.js';
export type { CollectResult, CollectWarning } from './types.js';
