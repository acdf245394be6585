/** Types of the page-facts cache. */
import type { PageFacts, SourceFile } from '../types.js';
/** Why a cache file was not used. */
export type IgnoredReason = 'unreadable' | 'corrupt' | 'schema' | 'version' | 'fingerprint';
/** What one run did with the cache. Returned to the caller (and to `onCache`), never kept in module state. */
export interface CacheStats {
    /** False when `cache.enabled` is false: nothing was read or written. */
    readonly enabled: boolean;
    /** Absolute cache folder, or null when the cache is off. */
    readonly dir: string | null;
    /** Source files handed to the parse stage. */
    readonly files: number;
    /** Files whose facts came from the cache. */
    readonly hits: number;
    /** Files parsed in this run (cache misses and files that are never cached). */
    readonly parsed: number;
    /** Parsed files that are never cached (their facts depend on more than content and parse options). */
    readonly uncacheable: number;
    /** Cached entries of a current file that failed validation (wrong shape); parsed again. */
    readonly rejected: number;
    /** Cache files that were not used, with the reason (sorted by file name). */
    readonly ignored: readonly {
        readonly file: string;
        readonly reason: IgnoredReason;
    }[];
    /** Cache files written in this run (0 when nothing changed). */
    readonly written: number;
    /** One line saying why the cache could not be saved; the run itself is unaffected. */
    readonly warning: string | null;
}
/** Parses the files the cache could not answer; results in the order of `files`. */
export type ParseMisses = (files: readonly SourceFile[], onParsed: (count: number) => void) => Promise<PageFacts[]>;
/** Settings of `parseWithCache`, resolved by the caller (the working folder is not read here). */
export interface CacheSettings {
    /** Absolute cache folder, or null to run without the cache. */
    readonly dir: string | null;
    /** Tool version stored in (and required of) the cache files. */
    readonly version: string;
    /** Parses the misses (main thread or worker pool). */
    readonly parseMisses: ParseMisses;
    /** Progress: files answered so far (hits count at once), out of `total`. */
    readonly onProgress?: (done: number, total: number) => void;
}
