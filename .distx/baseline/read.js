/** Reading a baseline file back (pure: the CLI reads the bytes). */
import { z } from 'zod';
import { EngineError } from '../errors.js';
import { BASELINE_SCHEMA, toBaseline } from './format.js';
import { checkShape, parseJsonText } from './json.js';
import { findingSchema } from './schema.js';
const baselineSchema = z.object({ schema: z.literal(BASELINE_SCHEMA), findings: z.array(findingSchema) });
const reportFindings = z.object({ schema: z.literal('linkweave/report@1'), findings: z.array(findingSchema) });
/**
 * Parse a baseline file. A JSON report (`linkweave/report@1`) is accepted too: its findings
 * are the baseline.
 * @param label how messages name the file (the path as the user wrote it)
 * @throws EngineError `E_REPORT_INVALID` naming the file and the line/column (bad JSON) or the
 *   key (wrong shape, wrong schema)
 */
export function parseBaseline(text, label) {
    const value = parseJsonText(text, label);
    const schema = typeof value === 'object' && value !== null && !Array.isArray(value) ? value.schema : undefined;
    if (schema === 'linkweave/report@1') {
        return toBaseline(checkShape(reportFindings, value, label, 'a linkweave JSON report').findings.map(clean));
    }
    if (schema !== BASELINE_SCHEMA) {
        throw new EngineError('E_REPORT_INVALID', `${label}: key "schema": expected "${BASELINE_SCHEMA}" (written by --write-baseline) or "linkweave/report@1"; got ${schema === undefined ? 'none' : JSON.stringify(schema)}`);
    }
    return toBaseline(checkShape(baselineSchema, value, label, `a ${BASELINE_SCHEMA} file`).findings.map(clean));
}
/** zod's output without `target: undefined` (exactOptionalPropertyTypes). */
function clean(f) {
    const { target, ...rest } = f;
    return target === undefined ? rest : { ...rest, target };
}
