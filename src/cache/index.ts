/** The page-facts cache: facts keyed by path, content hash, tool version and code, and parse options. */
export { parseWithCache } from './parse-cached.js';
export { parseFingerprint, PARSE_OPTION_KEYS } from './fingerprint.js';
export { openCache } from './store.js';
export type { CacheKey, CacheSession, Lookup } from './store.js';
export { CACHE_SCHEMA, SHARDS, shardFileName, shardOfPath, isCacheable, packFacts, unpackFacts } from './format.js';
export type { ShardHeader, StoredFacts } from './format.js';
export { isStoredFacts } from './validate.js';
export type { CacheSettings, CacheStats, IgnoredReason, ParseMisses } from './types.js';
export { codeHash, codeVersion } from './code.js';
export { readResult, resultKey, writeResult } from './result.js';
export type { ResultInputs } from './result.js';
export { copyCachedOutput, saveCachedOutput } from './output.js';
export type { ReportCacheInfo } from './output.js';
export { linkModelStore } from './model.js';
export { relatedStore } from './related.js';
