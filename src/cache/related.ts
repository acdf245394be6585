/**
 * Related pages beside the other caches: one file, `related.bin`, holding the lists of the last
 * run and their key (`relatedKey` in `src/text/related-memo.ts`), under the tool version and
 * code hash (`codeVersion`).
 *
 * Layout: a JSON head line `{"schema","code","key","pages","entries"}`, then three little-endian
 * arrays: list offsets (Int32, pages + 1), related page ids (Int32, entries) and similarities
 * (Float64, entries), so every similarity comes back to the bit and a 100,000-page site's lists
 * (a million entries) load in one read. A file whose head, sizes or values do not check out is
 * ignored (and replaced by the next run), never trusted. Written atomically; never throws.
 */
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import { join } from 'node:path';
import type { RelatedList, RelatedMemo } from '../types.js';
import { codeVersion } from './code.js';

const RELATED_SCHEMA = 'linkweave/related-cache@1';
const RELATED_FILE = 'related.bin';

interface Head {
  readonly schema: string;
  readonly code: string;
  readonly key: string;
  readonly pages: number;
  readonly entries: number;
}

/** The related-pages memo of the cache folder `dir`, for the tool version `version`. */
export function relatedStore(dir: string, version: string): RelatedMemo {
  const file = join(dir, RELATED_FILE);
  return {
    get(key: string, pages: number): RelatedList[] | null {
      try {
        return decode(fs.readFileSync(file), codeVersion(version), key, pages);
      } catch {
        return null;
      }
    },
    set(key: string, lists: readonly RelatedList[]): void {
      const temp = join(dir, `.${RELATED_FILE}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
      try {
        const bytes = encode(lists, codeVersion(version), key);
        if (bytes === null) return;
        fs.mkdirSync(dir, { recursive: true });
        fs.writeFileSync(temp, bytes);
        fs.renameSync(temp, file);
      } catch {
        try {
          fs.rmSync(temp, { force: true });
        } catch {
          // The folder itself is unusable; there is nothing to clean.
        }
      }
    },
  };
}

/** The file's bytes, or null when a list is not in page order or holds a non-finite similarity. */
function encode(lists: readonly RelatedList[], code: string, key: string): Buffer | null {
  const n = lists.length;
  let entries = 0;
  for (let i = 0; i < n; i++) {
    if (lists[i].page !== i) return null;
    entries += lists[i].related.length;
  }
  const offsets = new Int32Array(n + 1);
  const ids = new Int32Array(entries);
  const sims = new Float64Array(entries);
  let at = 0;
  for (let i = 0; i < n; i++) {
    for (const r of lists[i].related) {
      if (!Number.isFinite(r.similarity)) return null;
      ids[at] = r.page;
      sims[at] = r.similarity;
      at += 1;
    }
    offsets[i + 1] = at;
  }
  const head: Head = { schema: RELATED_SCHEMA, code, key, pages: n, entries };
  return Buffer.concat([Buffer.from(`${JSON.stringify(head)}\n`), bytesOf(offsets), bytesOf(ids), bytesOf(sims)]);
}

function bytesOf(array: Int32Array | Float64Array): Buffer {
  return Buffer.from(array.buffer, array.byteOffset, array.byteLength);
}

/** The lists in `bytes`, or null unless head, sizes and every value check out. */
function decode(bytes: Buffer, code: string, key: string, pages: number): RelatedList[] | null {
  const newline = bytes.indexOf(10);
  if (newline < 0) return null;
  const head = JSON.parse(bytes.toString('utf8', 0, newline)) as Partial<Head> | null;
  if (typeof head !== 'object' || head === null) return null;
  if (head.schema !== RELATED_SCHEMA || head.code !== code || head.key !== key || head.pages !== pages) return null;
  const entries = head.entries;
  if (!Number.isInteger(entries) || entries! < 0) return null;
  const start = newline + 1;
  if (bytes.length !== start + 4 * (pages + 1) + 4 * entries! + 8 * entries!) return null;
  // Copies: typed arrays need aligned offsets, and the head's length is arbitrary.
  const offsets = new Int32Array(bytes.buffer.slice(bytes.byteOffset + start, bytes.byteOffset + start + 4 * (pages + 1)));
  const idsAt = start + 4 * (pages + 1);
  const ids = new Int32Array(bytes.buffer.slice(bytes.byteOffset + idsAt, bytes.byteOffset + idsAt + 4 * entries!));
  const simsAt = idsAt + 4 * entries!;
  const sims = new Float64Array(bytes.buffer.slice(bytes.byteOffset + simsAt, bytes.byteOffset + simsAt + 8 * entries!));
  if (offsets[0] !== 0 || offsets[pages] !== entries) return null;
  const lists: RelatedList[] = new Array(pages);
  for (let i = 0; i < pages; i++) {
    const from = offsets[i];
    const to = offsets[i + 1];
    if (to < from || to > entries!) return null;
    const related: { page: number; similarity: number }[] = [];
    for (let e = from; e < to; e++) {
      const page = ids[e];
      const similarity = sims[e];
      if (page < 0 || page >= pages || page === i || !Number.isFinite(similarity)) return null;
      related.push({ page, similarity });
    }
    lists[i] = { page: i, related };
  }
  return lists;
}
