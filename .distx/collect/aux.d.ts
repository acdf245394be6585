import type { ResolvedOptions } from '../options.js';
/** The configuration keys that name an auxiliary file. */
export type AuxKey = 'navigation' | 'redirects' | 'traffic';
/**
 * Read one auxiliary file. `relPath` is relative to the content root (or absolute); its real
 * path must lie inside the content root or inside the working folder (where the configuration
 * usually is), so a configuration cannot make linkweave read arbitrary files.
 * @returns `file`: the path relative to the content root with `/` separators (it starts with
 *   `../` when the file is in the working folder outside the root); `text`: UTF-8, BOM removed
 * @throws EngineError `E_IO` naming the key and the path when the file is missing, unreadable,
 *   larger than `maxFileBytes` or outside both folders
 */
export declare function readAuxFile(options: ResolvedOptions, key: AuxKey, relPath: string): Promise<{
    file: string;
    text: string;
}>;
