/**
 * The JSON writer: the report itself, indented, byte-identical for the same report.
 *
 * The text is made in pieces: the JSON of a 100,000-page report is over a billion characters,
 * about twice the longest string V8 can hold (2^29 - 24 characters), so `JSON.stringify` of the
 * whole report throws there. The pieces join to exactly `JSON.stringify(report, null, 2)`: each
 * array element is stringified alone and indented to its place (JSON text holds no raw line
 * breaks, so re-indenting is a plain replace).
 */
import type { Report } from '../../types.js';
import type { Formatter } from '../types.js';

/** Pieces of about this many characters are handed to the writer. */
const PIECE_CHARS = 1 << 20;

/** The JSON formatter (the report is already sorted and rounded by `buildReport`). */
export const jsonFormatter: Formatter = {
  id: 'json',
  fileExtension: '.json',
  format(report) {
    return jsonPieces(report).join('');
  },
  pieces(report) {
    return jsonPieces(report);
  },
};

/** `JSON.stringify(report, null, 2)` plus a final newline, in pieces. */
export function jsonPieces(report: Report): string[] {
  const out = new Pieces();
  writeValue(out, report, '', 2);
  out.push('\n');
  return out.done();
}

/** Collects small strings into pieces of about `PIECE_CHARS`. */
class Pieces {
  private readonly pieces: string[] = [];
  private current: string[] = [];
  private size = 0;

  push(text: string): void {
    this.current.push(text);
    this.size += text.length;
    if (this.size >= PIECE_CHARS) this.flush();
  }

  done(): string[] {
    this.flush();
    return this.pieces;
  }

  private flush(): void {
    if (this.current.length > 0) this.pieces.push(this.current.join(''));
    this.current = [];
    this.size = 0;
  }
}

/**
 * Write `value` as `JSON.stringify` with 2-space indentation would, at nesting `indent`; objects
 * and arrays are opened up `levels` deep, anything deeper is stringified whole.
 */
function writeValue(out: Pieces, value: unknown, indent: string, levels: number): void {
  if (levels === 0 || value === null || typeof value !== 'object' || typeof (value as { toJSON?: unknown }).toJSON === 'function') {
    out.push(indented(JSON.stringify(value, null, 2), indent));
    return;
  }
  const inner = `${indent}  `;
  if (Array.isArray(value)) {
    if (value.length === 0) {
      out.push('[]');
      return;
    }
    out.push('[');
    value.forEach((item: unknown, i) => {
      out.push(i === 0 ? `\n${inner}` : `,\n${inner}`);
      // Inside arrays, `undefined` and functions are written as null.
      writeValue(out, item === undefined || typeof item === 'function' || typeof item === 'symbol' ? null : item, inner, levels - 1);
    });
    out.push(`\n${indent}]`);
    return;
  }
  let first = true;
  for (const [key, item] of Object.entries(value)) {
    if (item === undefined || typeof item === 'function' || typeof item === 'symbol') continue;
    out.push(`${first ? '{' : ','}\n${inner}${JSON.stringify(key)}: `);
    first = false;
    writeValue(out, item, inner, levels - 1);
  }
  out.push(first ? '{}' : `\n${indent}}`);
}

function indented(json: string, indent: string): string {
  return indent === '' ? json : json.replaceAll('\n', `\n${indent}`);
}
