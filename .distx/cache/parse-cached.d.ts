/** The parse stage with the cache in front: lookups, then the misses parsed, then the cache saved. */
import type { ResolvedOptions } from '../options.js';
import type { PageFacts, SourceFile } from '../types.js';
import type { CacheSettings, CacheStats } from './types.js';
/**
 * Facts of every file, in the order of `files`: taken from the cache when an entry has the same
 * path, content hash, tool version and code (`codeVersion`) and parse fingerprint
 * (`parseFingerprint`), parsed otherwise
 * (through `settings.parseMisses`), and stored back. The result equals parsing every file.
 * Cache problems never fail the run: a damaged or foreign cache file is ignored (and rewritten),
 * a folder that cannot be written gives `stats.warning`.
 */
export declare function parseWithCache(files: readonly SourceFile[], options: ResolvedOptions, settings: CacheSettings): Promise<{
    facts: PageFacts[];
    stats: CacheStats;
}>;
