/**
 * Turning a source file's bytes into text: binary sniffing, UTF-8 decoding with replacement,
 * BOM removal and locating the first invalid byte. Pure functions of the bytes.
 */
import { isUtf8 } from 'node:buffer';
import type { SourceProblem } from '../types.js';

/** Bytes inspected for a NUL byte to tell binary files from text. */
export const BINARY_SNIFF_BYTES = 8192;

/** Result of decoding one file's bytes. */
export interface Decoded {
  /** Decoded text, BOM removed; '' for binary files. */
  readonly text: string;
  readonly problems: readonly SourceProblem[];
}

const lenient = new TextDecoder('utf-8', { fatal: false, ignoreBOM: false });

/**
 * Decode a source file. A NUL byte in the first 8 KiB marks the file binary (text ''); invalid
 * UTF-8 is replaced with U+FFFD and reported with the line and column of the first bad byte.
 * @param bytes the file's raw bytes
 */
export function decodeSource(bytes: Uint8Array): Decoded {
  const sniff = Math.min(bytes.length, BINARY_SNIFF_BYTES);
  for (let i = 0; i < sniff; i++) {
    if (bytes[i] === 0) {
      return {
        text: '',
        problems: [{ code: 'binary', message: `binary content (a NUL byte at offset ${i}); not analysed` }],
      };
    }
  }
  // TextDecoder with ignoreBOM: false drops a leading UTF-8 BOM.
  const text = lenient.decode(bytes);
  // Fast path: the native check; the byte scan below only runs on files that are not valid.
  if (isUtf8(bytes)) return { text, problems: [] };
  const bad = firstInvalidUtf8(bytes);
  if (bad < 0) return { text, problems: [] };
  const { line, column } = positionOfByte(bytes, bad);
  return {
    text,
    problems: [
      {
        code: 'invalid-utf8',
        message: `invalid UTF-8 at line ${line}, column ${column} (byte offset ${bad}); decoded with U+FFFD replacement characters`,
        line,
        column,
      },
    ],
  };
}

/**
 * Offset of the first byte that does not start or continue a well-formed UTF-8 sequence
 * (Unicode Standard, Table 3-7 "Well-Formed UTF-8 Byte Sequences"), or -1 when all are valid.
 * Hand-written because no library exposes the offset; it only runs on files already known bad.
 */
export function firstInvalidUtf8(bytes: Uint8Array): number {
  const n = bytes.length;
  let i = 0;
  while (i < n) {
    const b = bytes[i];
    if (b < 0x80) {
      i++;
      continue;
    }
    let need: number;
    let lo = 0x80;
    let hi = 0xbf;
    if (b >= 0xc2 && b <= 0xdf) need = 1;
    else if (b === 0xe0) (need = 2), (lo = 0xa0);
    else if (b >= 0xe1 && b <= 0xec) need = 2;
    else if (b === 0xed) (need = 2), (hi = 0x9f);
    else if (b >= 0xee && b <= 0xef) need = 2;
    else if (b === 0xf0) (need = 3), (lo = 0x90);
    else if (b >= 0xf1 && b <= 0xf3) need = 3;
    else if (b === 0xf4) (need = 3), (hi = 0x8f);
    else return i;
    // The second byte has the narrowed range; later ones are plain continuation bytes.
    for (let k = 1; k <= need; k++) {
      if (i + k >= n) return i;
      const c = bytes[i + k];
      const min = k === 1 ? lo : 0x80;
      const max = k === 1 ? hi : 0xbf;
      if (c < min || c > max) return i;
    }
    i += need + 1;
  }
  return -1;
}

/**
 * 1-based line and column (UTF-16 code units of the decoded text, BOM not counted) of a byte.
 * Line endings are LF, CRLF and lone CR, as Markdown and HTML parsers count them.
 */
export function positionOfByte(bytes: Uint8Array, offset: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < offset; i++) {
    const b = bytes[i];
    if (b === 0x0a || (b === 0x0d && bytes[i + 1] !== 0x0a)) {
      line++;
      lineStart = i + 1;
    }
  }
  if (lineStart === 0 && bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) lineStart = Math.min(3, offset);
  const prefix = new TextDecoder('utf-8', { ignoreBOM: true }).decode(bytes.subarray(lineStart, offset));
  return { line, column: prefix.length + 1 };
}
