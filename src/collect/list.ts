/**
 * Listing the files under the content root with tinyglobby, guarded so that no symlink leads
 * the crawl outside the root or round in a loop.
 */
import fs from 'node:fs';
import { dirname, relative, sep } from 'node:path';
import { glob } from 'tinyglobby';
import { compareText } from '../util/index.js';
import type { CollectWarning } from './types.js';

/** Always left out: dependencies, dot-folders and dot-files. */
export const ALWAYS_EXCLUDED: readonly string[] = ['**/node_modules/**', '**/.*', '**/.*/**'];

/** True when `path` (a real path) is `root` or lies inside it. */
export function isInside(root: string, path: string): boolean {
  return path === root || path.startsWith(root.endsWith(sep) ? root : root + sep);
}

/** Relative posix path of an absolute path under the root. */
export function toRelative(root: string, path: string): string {
  return relative(root, path).split(sep).join('/');
}

/** Records warnings once per (file, code) while one or more listings run. */
export class WarningLog {
  readonly #byKey = new Map<string, CollectWarning>();

  add(warning: CollectWarning): void {
    const key = `${warning.code}\0${warning.file}`;
    if (!this.#byKey.has(key)) this.#byKey.set(key, warning);
  }

  /** Warnings sorted by file, then code. */
  sorted(): CollectWarning[] {
    return [...this.#byKey.values()].sort((a, b) => compareText(a.file, b.file) || compareText(a.code, b.code));
  }
}

class SymlinkRefused extends Error {
  readonly code = 'ELINKWEAVE_REFUSED';
}

/**
 * An `fs.realpath` for the crawler that refuses symlinks leaving `realRoot` and symlinked
 * folders that contain the folder the link is in (a loop). The crawler skips refused links.
 */
function guardedRealpath(realRoot: string, warnings: WarningLog) {
  const realOf = new Map<string, Promise<string>>();
  const realpathOnce = (p: string): Promise<string> => {
    let r = realOf.get(p);
    if (r === undefined) {
      r = fs.promises.realpath(p);
      realOf.set(p, r);
    }
    return r;
  };
  const check = async (path: string): Promise<string> => {
    const file = toRelative(realRoot, path);
    let resolved: string;
    try {
      resolved = await fs.promises.realpath(path);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ELOOP') {
        warnings.add({ file, code: 'symlink-loop', message: `symlink "${file}" loops back on itself; skipped` });
      }
      throw error;
    }
    if (!isInside(realRoot, resolved)) {
      warnings.add({
        file,
        code: 'symlink-outside',
        message: `symlink "${file}" points outside the content root; skipped`,
      });
      throw new SymlinkRefused(file);
    }
    const stat = await fs.promises.stat(resolved);
    if (stat.isDirectory()) {
      // Walking into a folder that holds one of the link's own ancestors would never end.
      for (let up = dirname(path); isInside(realRoot, up); up = dirname(up)) {
        const real = await realpathOnce(up);
        if (isInside(resolved, real)) {
          warnings.add({
            file,
            code: 'symlink-loop',
            message: `symlink "${file}" leads back to "${toRelative(realRoot, resolved) || '.'}", which contains it; not followed`,
          });
          throw new SymlinkRefused(file);
        }
        if (up === realRoot) break;
      }
    }
    return resolved;
  };
  return (path: string, callback: (error: Error | null, resolved?: string) => void): void => {
    check(path).then(
      (resolved) => callback(null, resolved),
      (error: Error) => callback(error),
    );
  };
}

/**
 * List files under `realRoot` matching `patterns`, leaving out `ignore` and the always-excluded
 * paths. Symlinks are followed only while they stay inside the root and do not loop.
 * @returns relative posix paths, sorted
 */
export async function listFiles(
  realRoot: string,
  patterns: readonly string[],
  ignore: readonly string[],
  warnings: WarningLog,
): Promise<string[]> {
  const found = await glob([...patterns], {
    cwd: realRoot,
    ignore: [...ALWAYS_EXCLUDED, ...ignore],
    dot: false,
    onlyFiles: true,
    followSymbolicLinks: true,
    expandDirectories: false,
    fs: { realpath: guardedRealpath(realRoot, warnings) as unknown as typeof fs.realpath },
  });
  // Patterns cannot climb out (they are checked before), but never trust a listing blindly.
  return found.filter((p) => !p.startsWith('../') && p !== '..').sort(compareText);
}
