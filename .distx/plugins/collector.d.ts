import type { AnalyzeInput } from '../analyze.js';
import type { ResolvedOptions } from '../options.js';
import type { Report } from '../types.js';
import type { VFile, VFileMessage } from './messages.js';
/** Collects page facts file by file and turns them into a report. */
export interface Collector {
    /** The resolved options (the same `resolveOptions` as every entry point). */
    readonly options: ResolvedOptions;
    /**
     * Add a file's page facts, replacing any earlier version of the same file.
     * @param path absolute, or relative to the content root
     * @param value the file's text or raw bytes
     * @returns the path relative to the root, or null when the file lies outside the root (not added)
     */
    add(path: string, value: string | Uint8Array): string | null;
    /** The path relative to the root of an absolute path or one relative to the root; null when outside the root. */
    relativePath(path: string): string | null;
    /** Paths (relative to the root) of the files added so far, sorted. */
    files(): string[];
    /**
     * The report over the files added so far: the same stages as `analyze`, fed with these
     * files' facts. Computed once per set of files (adding a file computes it again).
     * @throws EngineError `E_NO_ROOT` or `E_IO` as `analyze` does
     */
    report(): Promise<Report>;
    /** The last report computed, or null before the first `report()`. */
    lastReport(): Report | null;
    /**
     * Add a vfile (its `path` resolved against its `cwd`, its `value`). A file without a path or
     * value, or outside the root, is not added and gets a warning message saying so.
     * @returns true when the file was added
     */
    collect(file: VFile): boolean;
    /**
     * Add the last report's findings (and suggestions) for this file to it as messages
     * (`ruleId`, `source: 'linkweave'`, line and column; errors `fatal`). Call once per file.
     * @throws EngineError `E_USAGE` before the first `report()`
     */
    attach(file: VFile): VFileMessage[];
}
/**
 * Create a collector.
 * @param input the same object `analyze` takes: configuration keys, `root`, `command`
 * @throws EngineError `E_CONFIG_INVALID` for a bad configuration, naming the key
 */
export declare function createCollector(input: AnalyzeInput): Collector;
