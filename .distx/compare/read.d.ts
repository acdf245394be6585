/**
 * Reading a JSON report back (`--compare BASE.json`, `apply --from report.json`). Pure: the
 * CLI reads the bytes. Only the parts other commands use are checked and kept.
 */
import { z } from 'zod';
import type { Finding, Suggestion } from '../types.js';
/** Schema id of the JSON report. */
export declare const REPORT_SCHEMA = "linkweave/report@1";
declare const pageSchema: z.ZodObject<{
    route: z.ZodString;
    file: z.ZodString;
    title: z.ZodString;
    rank: z.ZodNumber;
    depth: z.ZodNullable<z.ZodNumber>;
}, z.core.$strip>;
/** The parts of a JSON report that comparing and applying read. */
export interface ReportFile {
    readonly root: string;
    readonly version: string;
    readonly pages: readonly z.output<typeof pageSchema>[];
    readonly findings: readonly Finding[];
    readonly suggestions: readonly Suggestion[];
}
/**
 * Parse a JSON report written by `--format json`.
 * @param label how messages name the file (the path as the user wrote it)
 * @throws EngineError `E_REPORT_INVALID` naming the file and the line/column (bad JSON), the
 *   key (wrong shape) or the schema it has instead
 */
export declare function parseReportFile(text: string, label: string): ReportFile;
export {};
