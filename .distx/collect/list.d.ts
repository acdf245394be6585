import type { CollectWarning } from './types.js';
/** Always left out: dependencies, dot-folders and dot-files. */
export declare const ALWAYS_EXCLUDED: readonly string[];
/** True when `path` (a real path) is `root` or lies inside it. */
export declare function isInside(root: string, path: string): boolean;
/** Relative posix path of an absolute path under the root. */
export declare function toRelative(root: string, path: string): string;
/** Records warnings once per (file, code) while one or more listings run. */
export declare class WarningLog {
    #private;
    add(warning: CollectWarning): void;
    /** Warnings sorted by file, then code. */
    sorted(): CollectWarning[];
}
/** Code-unit order (never locale order, so the output is the same on every machine). */
export declare function compare(a: string, b: string): number;
/**
 * List files under `realRoot` matching `patterns`, leaving out `ignore` and the always-excluded
 * paths. Symlinks are followed only while they stay inside the root and do not loop.
 * @returns relative posix paths, sorted
 */
export declare function listFiles(realRoot: string, patterns: readonly string[], ignore: readonly string[], warnings: WarningLog): Promise<string[]>;
