/** Reading one source file: real-path check, size limit, hash, decoding. */
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import { basename, dirname, join } from 'node:path';
import type { FileKind, SourceFile } from '../types.js';
import { kindOfPath } from '../routes/index.js';
import { describeIoError } from '../util/index.js';
import { decodeSource } from './decode.js';
import { isInside } from './list.js';
import type { CollectWarning } from './types.js';

/** What reading one file needs to know. */
export interface ReadContext {
  /** Real path of the content root. */
  readonly realRoot: string;
  readonly maxFileBytes: number;
  /**
   * Real paths of the folders met so far, for a caller reading many files (`collectSources`):
   * each folder is resolved once, and each file is opened without following a symlink, so only
   * a file that is itself a symlink is resolved alone. Without it, each file's path is resolved
   * whole (one `realpath` per file: about 0.2 s of a 10,000-file site).
   */
  readonly realFolders?: Map<string, string>;
  /**
   * A read buffer kept between files by a caller reading many (`collectSources`): a file of up
   * to `SCRATCH_LIMIT` bytes is read into it, so its bytes are valid until the next read. Without
   * it, each file gets a buffer of its own.
   */
  readonly scratch?: { buffer: Buffer };
}

/** A file read, or the warning that kept it out. */
export type ReadOutcome = { readonly file: SourceFile } | { readonly warning: CollectWarning };

const HASH_CHUNK = 1 << 20;

/** O_NOFOLLOW where the platform has it (not on Windows: there every path is resolved whole). */
const NO_FOLLOW: number | undefined = fs.constants.O_NOFOLLOW;

/**
 * Read one source file. Never throws: a file that vanished or cannot be read gives a warning;
 * a file too large, binary or not valid UTF-8 gives a `SourceFile` with a problem.
 *
 * Synchronous on purpose: on a 10,000-file site (2 cores) realpath + open + fstat + read +
 * close took about 0.3 s synchronously against 0.8-1.0 s through the promise API with 32 reads
 * in flight (each async call is a thread-pool round trip). The caller yields to the event
 * loop between batches.
 * @param absPath absolute path as listed (may go through symlinks inside the root)
 * @param relPath the same path relative to the root, `/` separators
 */
export function readSource(absPath: string, relPath: string, kind: FileKind, ctx: ReadContext): ReadOutcome {
  const folders = NO_FOLLOW === undefined ? undefined : ctx.realFolders;
  let real: string;
  try {
    real = folders === undefined ? fs.realpathSync.native(absPath) : join(realFolder(dirname(absPath), folders), basename(absPath));
  } catch (error) {
    return { warning: ioWarning(relPath, error) };
  }
  const outside = (): ReadOutcome => ({
    warning: { file: relPath, code: 'symlink-outside', message: `"${relPath}" resolves outside the content root; skipped` },
  });
  if (!isInside(ctx.realRoot, real)) return outside();
  let fd: number | undefined;
  try {
    // O_NONBLOCK: opening a FIFO or device named like a page must not hang the run; the
    // fstat check below then skips it. No effect on regular files.
    const flags = fs.constants.O_RDONLY | fs.constants.O_NONBLOCK;
    if (folders === undefined) fd = fs.openSync(real, flags);
    else {
      try {
        fd = fs.openSync(real, flags | NO_FOLLOW!);
      } catch (error) {
        // ELOOP (EMLINK on FreeBSD): the file itself is a symlink; it is resolved whole, as
        // without the folder memo.
        const code = (error as NodeJS.ErrnoException).code;
        if (code !== 'ELOOP' && code !== 'EMLINK') throw error;
        real = fs.realpathSync.native(absPath);
        if (!isInside(ctx.realRoot, real)) return outside();
        fd = fs.openSync(real, flags);
      }
    }
    const stat = fs.fstatSync(fd);
    if (!stat.isFile()) {
      return { warning: { file: relPath, code: 'unreadable', message: `"${relPath}" is not a regular file; skipped` } };
    }
    if (stat.size > ctx.maxFileBytes) {
      return {
        file: {
          path: relPath,
          kind,
          bytes: stat.size,
          hash: hashFd(fd),
          text: '',
          problems: [
            {
              code: 'too-large',
              message: `file is ${stat.size} bytes, over maxFileBytes (${ctx.maxFileBytes}); not analysed`,
            },
          ],
        },
      };
    }
    const bytes = readAll(fd, stat.size, ctx.scratch);
    const decoded = decodeSource(bytes);
    return {
      file: {
        path: relPath,
        kind,
        bytes: bytes.length,
        hash: createHash('sha256').update(bytes).digest('hex'),
        text: decoded.text,
        problems: decoded.problems,
      },
    };
  } catch (error) {
    return { warning: ioWarning(relPath, error) };
  } finally {
    if (fd !== undefined) fs.closeSync(fd);
  }
}

/** Real path of `folder`, resolved once per memo. */
function realFolder(folder: string, memo: Map<string, string>): string {
  let real = memo.get(folder);
  if (real === undefined) {
    real = fs.realpathSync.native(folder);
    memo.set(folder, real);
  }
  return real;
}

/** Files up to this size are read into the caller's kept buffer (`ReadContext.scratch`). */
const SCRATCH_LIMIT = 1 << 20;

/**
 * Read a whole file of (about) `size` bytes; copes with a file that grows or shrinks meanwhile.
 * A file of up to `SCRATCH_LIMIT` bytes is read into `scratch` when given, so the returned bytes
 * are only valid until the next call (`readSource` hashes and decodes them at once): on a
 * 10,000-file site, one buffer (and a copy, once the first read filled it) per file was GC work
 * for nothing.
 */
function readAll(fd: number, size: number, scratch: { buffer: Buffer } | undefined): Buffer {
  const kept = scratch !== undefined && size < SCRATCH_LIMIT;
  // One byte of room beyond `size`: the read that returns 0 then needs no larger buffer.
  if (kept && scratch.buffer.length <= size) scratch.buffer = Buffer.allocUnsafe(Math.min(SCRATCH_LIMIT, Math.max(size + 1, scratch.buffer.length * 2)));
  let buffer = kept ? scratch.buffer : Buffer.allocUnsafe(size + 1);
  let length = 0;
  for (;;) {
    if (length === buffer.length) {
      const bigger = Buffer.allocUnsafe(buffer.length * 2);
      buffer.copy(bigger, 0, 0, length);
      buffer = bigger;
    }
    const n = fs.readSync(fd, buffer, length, buffer.length - length, length);
    if (n === 0) break;
    length += n;
  }
  return buffer.subarray(0, length);
}

/** sha256 of a file read in chunks, so a huge file never sits in memory whole. */
function hashFd(fd: number): string {
  const hash = createHash('sha256');
  const buffer = Buffer.allocUnsafe(HASH_CHUNK);
  let position = 0;
  for (;;) {
    const n = fs.readSync(fd, buffer, 0, HASH_CHUNK, position);
    if (n === 0) break;
    hash.update(buffer.subarray(0, n));
    position += n;
  }
  return hash.digest('hex');
}

function ioWarning(file: string, error: unknown): CollectWarning {
  const code = (error as NodeJS.ErrnoException).code;
  if (code === 'ENOENT' || code === 'ENOTDIR') {
    return { file, code: 'vanished', message: `"${file}" disappeared while the site was being read; skipped` };
  }
  return {
    file,
    code: 'unreadable',
    message: `cannot read "${file}": ${describeIoError(error)}; skipped`,
  };
}
