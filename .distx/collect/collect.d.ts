import type { ResolvedOptions } from '../options.js';
import type { CollectResult } from './types.js';
/** Files read between two turns of the event loop (reads are synchronous; see read.ts). */
export declare const READ_BATCH = 64;
/**
 * Find the source files under `options.root` (include/exclude globs; node_modules, dot-folders
 * and dot-files always left out), read and decode them, and list the other files as assets.
 * Symlinks are followed only inside the root; loops are not re-entered.
 * @param extraExclude more globs or paths relative to the root to leave out (e.g. the
 *   navigation file or the report); absolute paths inside the root are made relative
 * @throws EngineError `E_NO_ROOT` when the root is not a readable folder, `E_CONFIG_INVALID`
 *   when a glob climbs out of the root
 */
export declare function collectSources(options: ResolvedOptions, extraExclude?: readonly string[]): Promise<CollectResult>;
/** Real path of the content root. @throws EngineError `E_NO_ROOT` */
export declare function realRootOf(root: string): Promise<string>;
