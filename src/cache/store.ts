/**
 * Reading and writing the page-facts cache folder (layout in `format.ts`). Owned by one run:
 * `openCache` loads the shard files, `lookup`/`store` answer and record files, `save` rewrites
 * the shards that changed, each atomically (temp file in the same folder, then rename).
 */
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import { join } from 'node:path';
import type { PageFacts, SourceFile } from '../types.js';
import { compareText, describeIoError } from '../util/index.js';
import { TEMP_PREFIX } from '../util/write-file.js';
import { CACHE_SCHEMA, packFacts, shardFileName, shardOfPath, SHARDS, unpackFacts } from './format.js';
import type { ShardHeader, StoredFacts } from './format.js';
import type { IgnoredReason } from './types.js';
import { asHeader, isStoredFacts } from './validate.js';

/** What a cache is valid for: shards with another key are ignored and rewritten. */
export interface CacheKey {
  readonly version: string;
  readonly fingerprint: string;
}

/** Answer of `lookup`: the facts, or why there are none. */
export type Lookup =
  | { readonly facts: PageFacts }
  | { readonly miss: 'absent' | 'changed' | 'rejected' };

/** One run's view of the cache folder. */
export interface CacheSession {
  /** Shard files that were present but not used. */
  readonly ignored: readonly { readonly file: string; readonly reason: IgnoredReason }[];
  /** Facts of `file` when an entry with its path and content hash passes validation. */
  lookup(file: SourceFile): Lookup;
  /** Record fresh facts of `file` (a miss) for saving. */
  store(file: SourceFile, facts: PageFacts): void;
  /**
   * Write every shard that changed: new or changed entries, entries of files gone from the site
   * (dropped), or a shard file that was ignored. Never throws.
   */
  save(): { readonly written: number; readonly warning: string | null };
}

interface Shard {
  /** Entries read from the file (valid header), by path. */
  readonly loaded: ReadonlyMap<string, StoredFacts>;
  /** True when the file existed and was ignored: it is rewritten. */
  readonly ignored: boolean;
  /**
   * Entries of this run: hits carried over as read, misses as their facts and source text
   * (packed only when the shard is written, one entry at a time, so a cold run of a large site
   * does not hold a packed copy of every page's facts until the end).
   */
  readonly next: Map<string, StoredFacts | Unpacked>;
  stored: number;
}

/** Fresh facts waiting to be packed for the shard file (a class, so no entry read from a file can pass for one). */
class Unpacked {
  constructor(
    readonly facts: PageFacts,
    readonly source: string,
  ) {}
}

/** Load the shard files of `dir` (a missing folder is an empty cache). */
export function openCache(dir: string, key: CacheKey): CacheSession {
  const ignored: { file: string; reason: IgnoredReason }[] = [];
  const shards: Shard[] = [];
  for (let i = 0; i < SHARDS; i++) {
    const name = shardFileName(i);
    const read = readShard(join(dir, name), i, key);
    if ('reason' in read) ignored.push({ file: name, reason: read.reason });
    shards.push({ loaded: 'entries' in read ? read.entries : new Map(), ignored: 'reason' in read, next: new Map(), stored: 0 });
  }

  return {
    ignored,
    lookup(file) {
      const shard = shards[shardOfPath(file.path)];
      const entry = shard.loaded.get(file.path);
      if (entry === undefined) return { miss: 'absent' };
      if (entry.hash !== file.hash) return { miss: 'changed' };
      if (!isStoredFacts(entry) || entry.kind !== file.kind) return { miss: 'rejected' };
      const facts = unpackFacts(entry, file.text);
      if (facts === null) return { miss: 'rejected' };
      shard.next.set(file.path, entry);
      return { facts };
    },
    store(file, facts) {
      const shard = shards[shardOfPath(file.path)];
      shard.next.set(file.path, new Unpacked(facts, file.text));
      shard.stored++;
    },
    save() {
      let written = 0;
      for (let i = 0; i < SHARDS; i++) {
        const shard = shards[i];
        const changed = shard.ignored || shard.stored > 0 || shard.next.size !== shard.loaded.size;
        if (!changed) continue;
        const problem = writeShard(dir, i, key, shard.next);
        if (problem !== null) return { written, warning: `cache not saved in "${dir}": ${problem}` };
        written++;
      }
      return { written, warning: null };
    },
  };
}

type ShardRead = { readonly entries: Map<string, StoredFacts> } | { readonly reason: IgnoredReason } | { readonly absent: true };

function readShard(path: string, index: number, key: CacheKey): ShardRead {
  let bytes: Buffer;
  try {
    bytes = fs.readFileSync(path);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    return code === 'ENOENT' || code === 'ENOTDIR' ? { absent: true } : { reason: 'unreadable' };
  }
  const newline = bytes.indexOf(10);
  if (newline < 0) return { reason: 'corrupt' };
  let header: ShardHeader | null;
  try {
    header = asHeader(JSON.parse(bytes.toString('utf8', 0, newline)));
  } catch {
    return { reason: 'corrupt' };
  }
  if (header === null || header.schema !== CACHE_SCHEMA) return { reason: 'schema' };
  if (header.version !== key.version) return { reason: 'version' };
  if (header.fingerprint !== key.fingerprint) return { reason: 'fingerprint' };
  if (header.shard !== index) return { reason: 'corrupt' };
  let body: unknown;
  try {
    body = JSON.parse(bytes.toString('utf8', newline + 1));
  } catch {
    return { reason: 'corrupt' };
  }
  if (!Array.isArray(body) || body.length !== header.count) return { reason: 'corrupt' };
  const entries = new Map<string, StoredFacts>();
  for (const entry of body as unknown[]) {
    // Only the key is read here; the full shape is checked when an entry is used (`lookup`).
    const file = typeof entry === 'object' && entry !== null ? (entry as { file?: unknown }).file : undefined;
    if (typeof file !== 'string' || entries.has(file)) return { reason: 'corrupt' };
    entries.set(file, entry as StoredFacts);
  }
  return { entries };
}

/** Serialise and write one shard atomically; the reason on failure, else null. */
function writeShard(dir: string, index: number, key: CacheKey, entries: ReadonlyMap<string, StoredFacts | Unpacked>): string | null {
  const target = join(dir, shardFileName(index));
  const temp = join(dir, `${TEMP_PREFIX}${shardFileName(index)}-${process.pid}-${randomBytes(6).toString('hex')}`);
  try {
    const data = serializeShard(index, key, entries);
    fs.mkdirSync(dir, { recursive: true });
    fs.writeFileSync(temp, data, { flag: 'wx' });
    fs.renameSync(temp, target);
    return null;
  } catch (error) {
    try {
      fs.rmSync(temp, { force: true });
    } catch {
      // Nothing more can be done about a temp file that cannot be removed.
    }
    return describeIoError(error);
  }
}

/** The text of a shard file: header line, then the entries sorted by path, one per line. */
function serializeShard(index: number, key: CacheKey, entries: ReadonlyMap<string, StoredFacts | Unpacked>): string {
  const paths = [...entries.keys()].sort(compareText);
  const header: ShardHeader = { schema: CACHE_SCHEMA, version: key.version, fingerprint: key.fingerprint, shard: index, count: paths.length };
  const parts: string[] = [JSON.stringify(header), '\n[\n'];
  for (let i = 0; i < paths.length; i++) {
    if (i > 0) parts.push(',\n');
    const entry = entries.get(paths[i])!;
    parts.push(JSON.stringify(entry instanceof Unpacked ? packFacts(entry.facts, entry.source) : entry));
  }
  parts.push('\n]\n');
  return parts.join('');
}
