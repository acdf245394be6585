/**
 * Layout of the page-facts cache on disk. Pure functions; `store.ts` does the reading and writing.
 *
 * The cache is a folder of `SHARDS` files, `facts-0.json` .. `facts-f.json`. A file's shard is a
 * hash of its path, so one changed page rewrites one shard (1/16 of the cache), not all of it.
 * Each shard file is two parts:
 *
 * ```
 * {"schema":"linkweave/facts-cache@3","version":"0.1.0","fingerprint":"...","shard":3,"count":2}\n
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

/** Schema id of a shard file; bump when the entry layout changes (2: heading fields and `protected` regions). */
export const CACHE_SCHEMA = 'linkweave/facts-cache@3';

/** Number of shard files. */
export const SHARDS = 16;

/** First line of a shard file. */
export interface ShardHeader {
  readonly schema: string;
  readonly version: string;
  readonly fingerprint: string;
  readonly shard: number;
  readonly count: number;
}

/** Facts as stored: `spans` packed (numbers) or, when packing was not exact, as written. */
export type StoredFacts = Omit<PageFacts, 'spans'> & { readonly spans: readonly number[] | readonly TextSpan[] };

/** File name of shard `i`. */
export function shardFileName(i: number): string {
  return `facts-${i.toString(16)}.json`;
}

/** Shard of a source path: FNV-1a (32 bit) of its UTF-16 code units, modulo `SHARDS`. */
export function shardOfPath(path: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < path.length; i++) {
    h ^= path.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return (h >>> 0) % SHARDS;
}

/**
 * True when a file's facts depend only on its bytes, its path and the parse options, so they may
 * be cached. A `too-large` file depends on `maxFileBytes` (collect gave it no text), and any
 * other read problem (unreadable, or one added later) may not recur: such files are parsed every
 * run, which costs nothing since they carry no text. `binary` and `invalid-utf8` follow from the
 * bytes alone and are cached.
 */
export function isCacheable(file: SourceFile): boolean {
  for (const p of file.problems) if (p.code !== 'binary' && p.code !== 'invalid-utf8') return false;
  return true;
}

/** The key order of a span as `parseSource` builds it; spans in another form are stored as written. */
const SPAN_KEYS = ['text', 'offset', 'line', 'column'] as const;

/** Facts in their stored form. Key order is kept, so restoring gives the same JSON. */
export function packFacts(facts: PageFacts, source: string): StoredFacts {
  const packed = packSpans(facts.spans, source);
  return packed === null ? facts : { ...facts, spans: packed };
}

/**
 * Facts back from their stored form, with span texts sliced from `source`; null when a packed
 * span does not fit the source (a damaged entry).
 */
export function unpackFacts(stored: StoredFacts, source: string): PageFacts | null {
  const spans = stored.spans;
  if (spans.length === 0 || typeof spans[0] !== 'number') return stored as PageFacts;
  const numbers = spans as readonly number[];
  const out: TextSpan[] = new Array(numbers.length / 4);
  for (let i = 0, j = 0; i < numbers.length; i += 4, j++) {
    const offset = numbers[i];
    const length = numbers[i + 1];
    if (offset < 0 || length < 0 || offset + length > source.length) return null;
    out[j] = { text: source.slice(offset, offset + length), offset, line: numbers[i + 2], column: numbers[i + 3] };
  }
  return { ...stored, spans: out };
}

function packSpans(spans: readonly TextSpan[], source: string): number[] | null {
  const out: number[] = new Array(spans.length * 4);
  for (let i = 0; i < spans.length; i++) {
    const s = spans[i];
    if (!hasSpanKeys(s)) return null;
    if (!Number.isInteger(s.offset) || source.slice(s.offset, s.offset + s.text.length) !== s.text) return null;
    out[i * 4] = s.offset;
    out[i * 4 + 1] = s.text.length;
    out[i * 4 + 2] = s.line;
    out[i * 4 + 3] = s.column;
  }
  return out;
}

function hasSpanKeys(span: TextSpan): boolean {
  let n = 0;
  for (const key in span) {
    if (key !== SPAN_KEYS[n]) return false;
    n++;
  }
  return n === SPAN_KEYS.length;
}
