/**
 * Layout of the page-facts cache on disk. Pure functions; `store.ts` does the reading and writing.
 *
 * The cache is a folder of `SHARDS` files, `facts-0.json` .. `facts-f.json`. A file's shard is a
 * hash of its path, so one changed page rewrites one shard (1/16 of the cache), not all of it.
 * Each shard file is two parts:
 *
 * ```
 * {"schema":"linkweave/facts-cache@1","version":"0.1.0","fingerprint":"...","shard":3,"count":2}\n
 * [\n<entry>,\n<entry>\n]\n
 * ```
 *
 * The header line is parsed first, so a cache of another schema, version or fingerprint is
 * dropped without parsing its entries. An entry is the file's `PageFacts` as JSON (keyed by its
 * own `file` and `hash`), except that `spans` is packed as flat numbers
 * `[offset, length, line, column, ...]`: a span's text is a slice of the source text, which the
 * collect stage reads anyway, so storing it again would double the cache for nothing. Facts whose
 * spans do not have that exact form keep their spans as written.
 *
 * Why JSON and not a binary format: `JSON.parse` is V8's fastest way to build many small objects
 * (several hundred MB/s), against well under 1 MB/s for parsing Markdown, so loading costs a
 * small fraction of parsing; sharding keeps every string far below V8's string-length limit.
 */
import type { PageFacts, SourceFile, TextSpan } from '../types.js';
/** Schema id of a shard file; bump when the entry layout changes. */
export declare const CACHE_SCHEMA = "linkweave/facts-cache@1";
/** Number of shard files. */
export declare const SHARDS = 16;
/** First line of a shard file. */
export interface ShardHeader {
    readonly schema: string;
    readonly version: string;
    readonly fingerprint: string;
    readonly shard: number;
    readonly count: number;
}
/** Facts as stored: `spans` packed (numbers) or, when packing was not exact, as written. */
export type StoredFacts = Omit<PageFacts, 'spans'> & {
    readonly spans: readonly number[] | readonly TextSpan[];
};
/** File name of shard `i`. */
export declare function shardFileName(i: number): string;
/** Shard of a source path: FNV-1a (32 bit) of its UTF-16 code units, modulo `SHARDS`. */
export declare function shardOfPath(path: string): number;
/**
 * True when a file's facts depend only on its bytes, its path and the parse options, so they may
 * be cached. A `too-large` file depends on `maxFileBytes` (collect gave it no text), and any
 * other read problem (unreadable, or one added later) may not recur: such files are parsed every
 * run, which costs nothing since they carry no text. `binary` and `invalid-utf8` follow from the
 * bytes alone and are cached.
 */
export declare function isCacheable(file: SourceFile): boolean;
/** Facts in their stored form. Key order is kept, so restoring gives the same JSON. */
export declare function packFacts(facts: PageFacts, source: string): StoredFacts;
/**
 * Facts back from their stored form, with span texts sliced from `source`; null when a packed
 * span does not fit the source (a damaged entry).
 */
export declare function unpackFacts(stored: StoredFacts, source: string): PageFacts | null;
