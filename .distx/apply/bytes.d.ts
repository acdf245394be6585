/**
 * Turning an edited text back into the file's bytes. The collect stage decodes UTF-8 and drops
 * a leading byte order mark; for a file that decoded without problems, encoding the text again
 * gives the original bytes exactly, so the BOM is the only thing to put back. Pure.
 */
import type { SourceFile } from '../types.js';
/**
 * True when the file started with a UTF-8 BOM: its size is the decoded text's UTF-8 length
 * plus the three bytes of the BOM (only meaningful for files that decoded without problems).
 */
export declare function hadBom(file: Pick<SourceFile, 'bytes' | 'text'>): boolean;
/** The bytes of `text` for `file`: UTF-8, with the BOM when the file had one. */
export declare function encodeText(text: string, bom: boolean): Uint8Array;
