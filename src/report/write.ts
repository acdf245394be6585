/**
 * Writing files atomically: the data goes to a temp file in the same folder, which is then
 * renamed over the target, so a reader never sees a half-written report or source file.
 * The only part of `report/` that touches the file system.
 */
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { EngineError } from '../errors.js';
import { describeIoError } from '../util/index.js';

/** Prefix of every temp file (dot-file: never collected; listed in .gitignore). */
export const TEMP_PREFIX = '.linkweave-tmp-';

/**
 * Where in-flight temp files are recorded, so a signal handler can remove them before the
 * process exits. A `Set<string>` is one. Owned by the caller (the CLI), never module state.
 */
export interface TempFileTracker {
  add(path: string): unknown;
  delete(path: string): unknown;
}

/** Options of `writeFileAtomic`. */
export interface WriteOptions {
  /** Records the temp file while it exists. @default none */
  readonly tracker?: TempFileTracker;
  /** How error messages name the file (e.g. the path as the user wrote it). @default the `path` argument */
  readonly label?: string;
}

/**
 * Write `data` (text, bytes, or text in pieces written one after another) to `path` atomically:
 * temp file in the same folder (created if needed), flushed,
 * then renamed over `path`. An existing file keeps its permission bits. On any error the temp
 * file is removed and the target is left as it was.
 * @throws EngineError `E_IO` naming the path and the reason
 */
export async function writeFileAtomic(path: string, data: string | Uint8Array | Iterable<string>, options: WriteOptions = {}): Promise<void> {
  const target = resolve(path);
  const dir = dirname(target);
  const temp = join(dir, `${TEMP_PREFIX}${basename(target)}-${process.pid}-${randomBytes(6).toString('hex')}`);
  const { tracker } = options;
  let created = false;
  try {
    await fs.promises.mkdir(dir, { recursive: true }).catch((error: NodeJS.ErrnoException) => {
      // mkdir -p reports a file in the way as EEXIST.
      throw error.code === 'EEXIST' ? Object.assign(new Error(error.message), { code: 'ENOTDIR' }) : error;
    });
    const mode = await existingMode(target);
    tracker?.add(temp);
    const handle = await fs.promises.open(temp, 'wx', mode ?? 0o666);
    created = true;
    try {
      if (typeof data === 'string' || data instanceof Uint8Array) await handle.writeFile(data);
      else for (const piece of data) await handle.writeFile(piece);
      await handle.sync();
      // open() applies the umask; restore the old file's exact bits.
      if (mode !== undefined) await handle.chmod(mode);
    } finally {
      await handle.close();
    }
    await fs.promises.rename(temp, target);
    created = false;
  } catch (error) {
    if (created) await fs.promises.rm(temp, { force: true }).catch(() => undefined);
    throw new EngineError('E_IO', `cannot write "${options.label ?? path}": ${describeIoError(error)}`, { cause: error });
  } finally {
    tracker?.delete(temp);
  }
}

/**
 * Remove temp files still in flight (for a signal handler: synchronous, never throws).
 * @param paths the tracker's current contents
 */
export function removeTempFilesSync(paths: Iterable<string>): void {
  for (const p of paths) {
    try {
      fs.rmSync(p, { force: true });
    } catch {
      // Nothing more can be done while the process is exiting.
    }
  }
}

async function existingMode(path: string): Promise<number | undefined> {
  try {
    const stat = await fs.promises.stat(path);
    return stat.isFile() ? stat.mode & 0o7777 : undefined;
  } catch {
    return undefined;
  }
}
