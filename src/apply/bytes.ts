/**
 * Turning an edited text back into the file's bytes. The collect stage decodes UTF-8 and drops
 * a leading byte order mark; for a file that decoded without problems, encoding the text again
 * gives the original bytes exactly, so the BOM is the only thing to put back. Pure.
 */
import type { SourceFile } from '../types.js';

const encoder = new TextEncoder();
const BOM = Uint8Array.of(0xef, 0xbb, 0xbf);

/**
 * True when the file started with a UTF-8 BOM: its size is the decoded text's UTF-8 length
 * plus the three bytes of the BOM (only meaningful for files that decoded without problems).
 */
export function hadBom(file: Pick<SourceFile, 'bytes' | 'text'>): boolean {
  return file.bytes === encoder.encode(file.text).length + BOM.length;
}

/** The bytes of `text` for `file`: UTF-8, with the BOM when the file had one. */
export function encodeText(text: string, bom: boolean): Uint8Array {
  const body = encoder.encode(text);
  if (!bom) return body;
  const out = new Uint8Array(body.length + BOM.length);
  out.set(BOM, 0);
  out.set(body, BOM.length);
  return out;
}
