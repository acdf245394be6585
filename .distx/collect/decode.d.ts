import type { SourceProblem } from '../types.js';
/** Bytes inspected for a NUL byte to tell binary files from text. */
export declare const BINARY_SNIFF_BYTES = 8192;
/** Result of decoding one file's bytes. */
export interface Decoded {
    /** Decoded text, BOM removed; '' for binary files. */
    readonly text: string;
    readonly problems: readonly SourceProblem[];
}
/**
 * Decode a source file. A NUL byte in the first 8 KiB marks the file binary (text ''); invalid
 * UTF-8 is replaced with U+FFFD and reported with the line and column of the first bad byte.
 * @param bytes the file's raw bytes
 */
export declare function decodeSource(bytes: Uint8Array): Decoded;
/**
 * Offset of the first byte that does not start or continue a well-formed UTF-8 sequence
 * (Unicode Standard, Table 3-7 "Well-Formed UTF-8 Byte Sequences"), or -1 when all are valid.
 * Hand-written because no library exposes the offset; it only runs on files already known bad.
 */
export declare function firstInvalidUtf8(bytes: Uint8Array): number;
/**
 * 1-based line and column (UTF-16 code units of the decoded text, BOM not counted) of a byte.
 * Line endings are LF, CRLF and lone CR, as Markdown and HTML parsers count them.
 */
export declare function positionOfByte(bytes: Uint8Array, offset: number): {
    line: number;
    column: number;
};
