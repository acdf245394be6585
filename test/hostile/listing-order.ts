/**
 * A file system that lists directories in another order: node's `fs.readdir` (the callback form
 * the file listing uses through tinyglobby) and `fs.readdirSync`, wrapped for the length of one
 * call so that every listing comes back reordered. What the disk returned and what was handed on
 * are recorded, so a test can show the order really differed (ext4 and tmpfs list a folder in
 * the same order however its files were created).
 */
import fs from 'node:fs';
import type { Dirent } from 'node:fs';
import { syncBuiltinESMExports } from 'node:module';

/** One directory listing: names as the disk gave them, and as handed on. */
export interface Listing {
  readonly dir: string;
  readonly disk: readonly string[];
  readonly given: readonly string[];
}

/** A reordering of one listing (must return the same entries). */
export type Reorder = <T extends Dirent | string>(entries: readonly T[], dir: string) => T[];

const nameOf = (e: Dirent | string | Buffer): string => (typeof e === 'string' ? e : Buffer.isBuffer(e) ? e.toString() : e.name);

/** Run `fn` with every directory listing reordered by `reorder`; restores `fs` afterwards. */
export async function withListingOrder<T>(reorder: Reorder, fn: () => Promise<T>): Promise<{ value: T; listings: Listing[] }> {
  const listings: Listing[] = [];
  const original = { readdir: fs.readdir, readdirSync: fs.readdirSync };
  const record = (dir: unknown, entries: readonly (Dirent | string)[]): (Dirent | string)[] => {
    const given = reorder(entries, String(dir));
    listings.push({ dir: String(dir), disk: entries.map(nameOf), given: given.map(nameOf) });
    return given;
  };
  const readdir = (...args: unknown[]): void => {
    const callback = args.pop() as (error: NodeJS.ErrnoException | null, entries?: (Dirent | string)[]) => void;
    (original.readdir as (...a: unknown[]) => void)(...args, (error: NodeJS.ErrnoException | null, entries?: (Dirent | string)[]) => {
      callback(error, error === null && entries !== undefined ? record(args[0], entries) : entries);
    });
  };
  const readdirSync = (...args: unknown[]): unknown => record(args[0], (original.readdirSync as (...a: unknown[]) => (Dirent | string)[])(...args));
  (fs as { readdir: unknown }).readdir = readdir;
  (fs as { readdirSync: unknown }).readdirSync = readdirSync;
  syncBuiltinESMExports();
  try {
    return { value: await fn(), listings };
  } finally {
    (fs as { readdir: unknown }).readdir = original.readdir;
    (fs as { readdirSync: unknown }).readdirSync = original.readdirSync;
    syncBuiltinESMExports();
  }
}

/** Reverse every listing. */
export const reversed: Reorder = (entries) => [...entries].reverse();

/** A seeded shuffle of every listing (Fisher-Yates on a mulberry32 stream). */
export function shuffled(seed: number): Reorder {
  let a = seed >>> 0;
  const next = (): number => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return (entries) => {
    const out = [...entries];
    for (let i = out.length - 1; i > 0; i--) {
      const j = Math.floor(next() * (i + 1));
      [out[i], out[j]] = [out[j]!, out[i]!];
    }
    return out;
  };
}
