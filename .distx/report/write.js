/**
 * Writing files atomically: the data goes to a temp file in the same folder, which is then
 * renamed over the target, so a reader never sees a half-written report or source file.
 * The only part of `report/` that touches the file system.
 */
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { EngineError } from '../errors.js';
/** Prefix of every temp file (dot-file: never collected; listed in .gitignore). */
export const TEMP_PREFIX = '.linkweave-tmp-';
/**
 * Write `data` (text, bytes, or text in pieces written one after another) to `path` atomically:
 * temp file in the same folder (created if needed), flushed,
 * then renamed over `path`. An existing file keeps its permission bits. On any error the temp
 * file is removed and the target is left as it was.
 * @throws EngineError `E_IO` naming the path and the reason
 */
export async function writeFileAtomic(path, data, options = {}) {
    const target = resolve(path);
    const dir = dirname(target);
    const temp = join(dir, `${TEMP_PREFIX}${basename(target)}-${process.pid}-${randomBytes(6).toString('hex')}`);
    const { tracker } = options;
    let created = false;
    try {
        await fs.promises.mkdir(dir, { recursive: true }).catch((error) => {
            // mkdir -p reports a file in the way as EEXIST.
            throw error.code === 'EEXIST' ? Object.assign(new Error(error.message), { code: 'ENOTDIR' }) : error;
        });
        const mode = await existingMode(target);
        tracker?.add(temp);
        const handle = await fs.promises.open(temp, 'wx', mode ?? 0o666);
        created = true;
        try {
            if (typeof data === 'string' || data instanceof Uint8Array)
                await handle.writeFile(data);
            else
                for (const piece of data)
                    await handle.writeFile(piece);
            await handle.sync();
            // open() applies the umask; restore the old file's exact bits.
            if (mode !== undefined)
                await handle.chmod(mode);
        }
        finally {
            await handle.close();
        }
        await fs.promises.rename(temp, target);
        created = false;
    }
    catch (error) {
        if (created)
            await fs.promises.rm(temp, { force: true }).catch(() => undefined);
        throw new EngineError('E_IO', `cannot write "${options.label ?? path}": ${reason(error)}`, { cause: error });
    }
    finally {
        tracker?.delete(temp);
    }
}
/**
 * Remove temp files still in flight (for a signal handler: synchronous, never throws).
 * @param paths the tracker's current contents
 */
export function removeTempFilesSync(paths) {
    for (const p of paths) {
        try {
            fs.rmSync(p, { force: true });
        }
        catch {
            // Nothing more can be done while the process is exiting.
        }
    }
}
async function existingMode(path) {
    try {
        const stat = await fs.promises.stat(path);
        return stat.isFile() ? stat.mode & 0o7777 : undefined;
    }
    catch {
        return undefined;
    }
}
function reason(error) {
    const code = error.code;
    switch (code) {
        case 'EISDIR':
            return 'it is a folder (EISDIR)';
        case 'EACCES':
        case 'EPERM':
        case 'EROFS':
            return `permission denied (${code})`;
        case 'ENOTDIR':
            return 'a parent is not a folder (ENOTDIR)';
        case 'ENOSPC':
            return 'no space left on the device (ENOSPC)';
        case undefined:
            return error.message;
        default:
            return code;
    }
}
