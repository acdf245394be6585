/**
 * Reading a JSON report back (`--compare BASE.json`, `apply --from report.json`). Pure: the
 * CLI reads the bytes. Only the parts other commands use are checked and kept.
 */
import { z } from 'zod';
import { EngineError } from '../errors.js';
import { checkShape, findingSchema, parseJsonText, suggestionSchema } from '../baseline/index.js';
/** Schema id of the JSON report. */
export const REPORT_SCHEMA = 'linkweave/report@1';
const pageSchema = z.object({
    route: z.string(),
    file: z.string(),
    title: z.string(),
    rank: z.number(),
    depth: z.number().int().min(0).nullable(),
});
const reportSchema = z.object({
    schema: z.literal(REPORT_SCHEMA),
    tool: z.object({ name: z.literal('linkweave'), version: z.string() }),
    root: z.string(),
    pages: z.array(pageSchema),
    findings: z.array(findingSchema),
    suggestions: z.array(suggestionSchema),
});
/**
 * Parse a JSON report written by `--format json`.
 * @param label how messages name the file (the path as the user wrote it)
 * @throws EngineError `E_REPORT_INVALID` naming the file and the line/column (bad JSON), the
 *   key (wrong shape) or the schema it has instead
 */
export function parseReportFile(text, label) {
    const value = parseJsonText(text, label);
    const schema = typeof value === 'object' && value !== null && !Array.isArray(value) ? value.schema : undefined;
    if (schema !== REPORT_SCHEMA) {
        throw new EngineError('E_REPORT_INVALID', `${label}: key "schema": expected "${REPORT_SCHEMA}" (a report written with --format json); got ${schema === undefined ? 'none' : JSON.stringify(schema)}`);
    }
    const report = checkShape(reportSchema, value, label, `a ${REPORT_SCHEMA} JSON report`);
    return {
        root: report.root,
        version: report.tool.version,
        pages: report.pages,
        findings: report.findings.map(({ target, ...rest }) => (target === undefined ? rest : { ...rest, target })),
        suggestions: report.suggestions,
    };
}
