import type { Baseline } from './format.js';
/**
 * Parse a baseline file. A JSON report (`linkweave/report@1`) is accepted too: its findings
 * are the baseline.
 * @param label how messages name the file (the path as the user wrote it)
 * @throws EngineError `E_REPORT_INVALID` naming the file and the line/column (bad JSON) or the
 *   key (wrong shape, wrong schema)
 */
export declare function parseBaseline(text: string, label: string): Baseline;
