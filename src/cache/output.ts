/**
 * The formatted report beside the whole-report cache. When a run's report comes from the cache
 * (nothing it depends on changed), formatting it again would give the same bytes as last time,
 * and on a large site formatting and writing are most of such a run: so the bytes the last run
 * wrote are kept in the cache folder and copied instead.
 *
 * One file per command and format, named by a hash of the report's cache key, the format and
 * the working folder (the formatters' only other input): a file whose name does not match is
 * never read. Written by copying the report file the run wrote (temp file + rename); older files
 * of the same command and format are removed. Never throws: a cache that cannot be used is
 * skipped.
 */
import { createHash, randomBytes } from 'node:crypto';
import fs from 'node:fs';
import { join } from 'node:path';
import { writeFileAtomic } from '../util/write-file.js';
import type { TempFileTracker } from '../util/write-file.js';

/** Where `analyze` found (or put) the report of this run in the whole-report cache. */
export interface ReportCacheInfo {
  /** Absolute cache folder. */
  readonly dir: string;
  readonly command: string;
  /** The whole-report cache key of this run's inputs. */
  readonly key: string;
  /** True when the report was read from the cache (nothing changed since it was written). */
  readonly hit: boolean;
}

function prefix(command: string, format: string): string {
  return `output-${command}-${format}-`;
}

function outputFile(info: ReportCacheInfo, format: string, cwd: string): string {
  const hash = createHash('sha256').update(`${info.key}\n${format}\n${cwd}`).digest('hex').slice(0, 32);
  return join(info.dir, `${prefix(info.command, format)}${hash}`);
}

/**
 * Write the cached bytes of this report in `format` to `target` (only when the report itself
 * came from the cache and the same format was written from the same working folder), copied by
 * the file system instead of read into memory and written again, atomically
 * (`writeFileAtomic`). Never throws: false when there are no cached bytes or the copy failed
 * (`target` as it was), and the caller formats the report instead.
 */
export async function copyCachedOutput(info: ReportCacheInfo, format: string, cwd: string, target: string, tracker?: TempFileTracker): Promise<boolean> {
  if (!info.hit) return false;
  try {
    await writeFileAtomic(target, { copyOf: outputFile(info, format, cwd) }, tracker === undefined ? {} : { tracker });
    return true;
  } catch {
    return false;
  }
}

/**
 * Keep a copy of the report file this run wrote (`written`, in `format`) for the next run with
 * the same inputs.
 */
export function saveCachedOutput(info: ReportCacheInfo, format: string, cwd: string, written: string): void {
  const target = outputFile(info, format, cwd);
  const temp = join(info.dir, `.output-${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
  try {
    if (info.hit && fs.existsSync(target)) return;
    fs.mkdirSync(info.dir, { recursive: true });
    fs.copyFileSync(written, temp);
    fs.renameSync(temp, target);
    const mine = target.slice(info.dir.length + 1);
    for (const name of fs.readdirSync(info.dir)) {
      if (name.startsWith(prefix(info.command, format)) && name !== mine) fs.rmSync(join(info.dir, name), { force: true });
    }
  } catch {
    try {
      fs.rmSync(temp, { force: true });
    } catch {
      // The folder itself is unusable; there is nothing to clean.
    }
  }
}
