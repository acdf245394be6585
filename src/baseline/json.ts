/**
 * Reading JSON files the user names on the command line (a baseline, a base report): the text
 * parsed, and on failure an `EngineError` naming the file and, where the parser says where, the
 * line and column. Pure: the caller reads the file.
 */
import type { z } from 'zod';
import { EngineError } from '../errors.js';

/**
 * Parse `text` as JSON (a leading BOM is allowed).
 * @param label how messages name the file (the path as the user wrote it)
 * @throws EngineError `E_REPORT_INVALID` "`label`: not valid JSON at line L, column C: ..."
 */
export function parseJsonText(text: string, label: string): unknown {
  const body = text.replace(/^\uFEFF/, '');
  try {
    return JSON.parse(body);
  } catch (error) {
    const message = (error as Error).message;
    const at = errorOffset(message, body);
    const where = at === null ? '' : ` at line ${at.line}, column ${at.column}`;
    throw new EngineError('E_REPORT_INVALID', `${label}: not valid JSON${where}: ${message.split('\n', 1)[0]}`);
  }
}

/** Where JSON.parse stopped: from "at position N", "(line L column C)" or "end of JSON input". */
function errorOffset(message: string, text: string): { line: number; column: number } | null {
  const lc = /\(line (\d+) column (\d+)\)/.exec(message);
  if (lc !== null) return { line: Number(lc[1]), column: Number(lc[2]) };
  const pos = /at position (\d+)/.exec(message);
  const offset = pos !== null ? Number(pos[1]) : /end of JSON input/.test(message) ? text.length : null;
  if (offset === null) return null;
  const before = text.slice(0, offset);
  const lines = before.split(/\r\n|\r|\n/);
  return { line: lines.length, column: lines[lines.length - 1].length + 1 };
}

/**
 * Check `value` against a zod schema; the first problem becomes one line naming the key.
 * @param what what the file should be, for the message ("a linkweave baseline")
 * @throws EngineError `E_REPORT_INVALID` "`label`: key "findings.3.line": expected number, ..."
 */
export function checkShape<S extends z.ZodType>(schema: S, value: unknown, label: string, what: string): z.output<S> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const issue = result.error.issues[0];
  const key = issue.path.length > 0 ? `key "${issue.path.join('.')}"` : 'top level';
  throw new EngineError('E_REPORT_INVALID', `${label}: ${key}: ${issue.message}; expected ${what}`);
}
