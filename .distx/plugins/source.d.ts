import type { ResolvedOptions } from '../options.js';
import type { FileKind, SourceFile } from '../types.js';
/**
 * Build the `SourceFile` for `path` from its contents.
 * @param path path relative to the content root, `/` separators
 * @param value the file's text (encoded as UTF-8, as it is on disk) or raw bytes
 * @param fallbackKind the kind when the extension names none (a remark pipeline reads Markdown)
 */
export declare function sourceFileFrom(path: string, value: string | Uint8Array, options: Pick<ResolvedOptions, 'maxFileBytes'>, fallbackKind?: FileKind): SourceFile;
