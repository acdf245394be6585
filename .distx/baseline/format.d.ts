import type { Finding } from '../types.js';
/** Schema id of the baseline file. */
export declare const BASELINE_SCHEMA = "linkweave/baseline@1";
/** A baseline as read: the findings it accepts. */
export interface Baseline {
    readonly schema: typeof BASELINE_SCHEMA;
    readonly findings: readonly Finding[];
}
/** Order of baseline entries: rule, route, target, then file, line, column, message. */
export declare function compareBaselineEntries(a: Finding, b: Finding): number;
/** The baseline object of `findings` (sorted copies; keys in a fixed order). */
export declare function toBaseline(findings: readonly Finding[]): Baseline;
/** The baseline file's text for `findings`: indented JSON, one trailing newline. */
export declare function formatBaseline(findings: readonly Finding[]): string;
