import type { ShardHeader, StoredFacts } from './format.js';
/** A parsed header line, or null when it is not one. */
export declare function asHeader(v: unknown): ShardHeader | null;
/** True when `v` has the full shape of stored facts (every field of `PageFacts`, spans packed or not). */
export declare function isStoredFacts(v: unknown): v is StoredFacts;
