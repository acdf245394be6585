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
/** The JSON formatter (the report is already sorted and rounded by `buildReport`). */
export declare const jsonFormatter: Formatter;
/**
 * `JSON.stringify(report, null, 2)` plus a final newline, in pieces of about `PIECE_CHARS`,
 * made as they are asked for (so the whole text never exists at once).
 */
export declare function jsonPieces(report: Report): Generator<string, void, undefined>;
/**
 * `JSON.stringify(value, null, 2)` plus a final newline, in pieces: objects and arrays are
 * opened `levels` deep (so the items of arrays at that depth are stringified one by one).
 */
export declare function jsonTextPieces(value: unknown, levels: number): Generator<string, void, undefined>;
