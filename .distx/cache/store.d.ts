import type { PageFacts, SourceFile } from '../types.js';
import type { IgnoredReason } from './types.js';
/** What a cache is valid for: shards with another key are ignored and rewritten. */
export interface CacheKey {
    readonly version: string;
    readonly fingerprint: string;
}
/** Answer of `lookup`: the facts, or why there are none. */
export type Lookup = {
    readonly facts: PageFacts;
} | {
    readonly miss: 'absent' | 'changed' | 'rejected';
};
/** One run's view of the cache folder. */
export interface CacheSession {
    /** Shard files that were present but not used. */
    readonly ignored: readonly {
        readonly file: string;
        readonly reason: IgnoredReason;
    }[];
    /** Facts of `file` when an entry with its path and content hash passes validation. */
    lookup(file: SourceFile): Lookup;
    /** Record fresh facts of `file` (a miss) for saving. */
    store(file: SourceFile, facts: PageFacts): void;
    /**
     * Write every shard that changed: new or changed entries, entries of files gone from the site
     * (dropped), or a shard file that was ignored. Never throws.
     */
    save(): {
        readonly written: number;
        readonly warning: string | null;
    };
}
/** Load the shard files of `dir` (a missing folder is an empty cache). */
export declare function openCache(dir: string, key: CacheKey): CacheSession;
