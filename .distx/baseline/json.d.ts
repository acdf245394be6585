/**
 * Reading JSON files the user names on the command line (a baseline, a base report): the text
 * parsed, and on failure an `EngineError` naming the file and, where the parser says where, the
 * line and column. Pure: the caller reads the file.
 */
import type { z } from 'zod';
/**
 * Parse `text` as JSON (a leading BOM is allowed).
 * @param label how messages name the file (the path as the user wrote it)
 * @throws EngineError `E_REPORT_INVALID` "`label`: not valid JSON at line L, column C: ..."
 */
export declare function parseJsonText(text: string, label: string): unknown;
/**
 * Check `value` against a zod schema; the first problem becomes one line naming the key.
 * @param what what the file should be, for the message ("a linkweave baseline")
 * @throws EngineError `E_REPORT_INVALID` "`label`: key "findings.3.line": expected number, ..."
 */
export declare function checkShape<S extends z.ZodType>(schema: S, value: unknown, label: string, what: string): z.output<S>;
