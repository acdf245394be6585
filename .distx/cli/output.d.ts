import type { FormatName } from './args.js';
/**
 * The format a report file's name implies: a formatter's `fileExtension` (`.json`, `.md`,
 * `.sarif`, `.html`, `.txt`) or `.sarif.json`, `.markdown`, `.htm`; else text.
 */
export declare function formatFromOutput(path: string): FormatName;
/**
 * Refuse an `--output` that would overwrite a source or be read as one: inside the content root
 * (after resolving symlinks) with a source extension (.md, .markdown, .mdx, .html, .htm).
 * Other files inside the root are allowed: naming them with `--output` is asking for it.
 * @param output absolute path from the flag
 * @param shownPath the path as the user wrote it, for the message
 * @param flag the flag that named the file, for the message
 * @throws EngineError `E_USAGE`
 */
export declare function checkOutputPath(output: string, root: string, shownPath: string, flag?: string): void;
