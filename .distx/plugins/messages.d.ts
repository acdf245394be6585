import type { Transformer } from 'unified';
import type { Report } from '../types.js';
/** The vfile type unified passes to transformers. */
export type VFile = Parameters<Transformer>[1];
/** A message on a vfile. */
export type VFileMessage = ReturnType<VFile['message']>;
/** The `source` of every message linkweave adds. */
export declare const MESSAGE_SOURCE = "linkweave";
/** Absolute path of a vfile (its `path` against its `cwd`), or null when it has none. */
export declare function absolutePathOf(file: VFile): string | null;
/**
 * Add the report's findings (and suggestions) for one file to it as messages.
 * @param rel the file's path relative to the content root, as the report names it
 * @returns the messages added, in report order
 */
export declare function attachReport(file: VFile, rel: string, report: Report): VFileMessage[];
