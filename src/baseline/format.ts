/**
 * The baseline file (`--write-baseline FILE`, read by `--baseline FILE`):
 *
 * ```json
 * {
 *   "schema": "linkweave/baseline@1",
 *   "findings": [
 *     { "rule": "broken-link", "route": "/guides/", "target": "/guides/missing/",
 *       "severity": "error", "file": "guides/index.md", "line": 12, "column": 5,
 *       "message": "Broken link: no page ..." }
 *   ]
 * }
 * ```
 *
 * Findings are sorted by their matching key (rule, route, target), then file, line, column and
 * message, so the file is byte-identical for the same findings and a diff of two baselines
 * reads by rule. Keys in each entry are in a fixed order; `target` only when the finding has
 * one. No timestamp and no tool version: the baseline changes only when the findings do.
 * Only rule, route and target are used for matching; the rest tells a reader (and the "fixed"
 * list) where the finding was.
 */
import { compareText } from '../util/index.js';
import type { Finding } from '../types.js';

/** Schema id of the baseline file. */
export const BASELINE_SCHEMA = 'linkweave/baseline@1';

/** A baseline as read: the findings it accepts. */
export interface Baseline {
  readonly schema: typeof BASELINE_SCHEMA;
  readonly findings: readonly Finding[];
}

/** Order of baseline entries: rule, route, target, then file, line, column, message. */
export function compareBaselineEntries(a: Finding, b: Finding): number {
  return (
    compareText(a.rule, b.rule) ||
    compareText(a.route, b.route) ||
    compareText(a.target ?? '', b.target ?? '') ||
    compareText(a.file, b.file) ||
    a.line - b.line ||
    a.column - b.column ||
    compareText(a.message, b.message)
  );
}

/** The baseline object of `findings` (sorted copies; keys in a fixed order). */
export function toBaseline(findings: readonly Finding[]): Baseline {
  const entries = [...findings].sort(compareBaselineEntries).map((f): Finding => {
    const head = { rule: f.rule, route: f.route };
    const tail = { severity: f.severity, file: f.file, line: f.line, column: f.column, message: f.message };
    return f.target === undefined ? { ...head, ...tail } : { ...head, target: f.target, ...tail };
  });
  return { schema: BASELINE_SCHEMA, findings: entries };
}

/** The baseline file's text for `findings`: indented JSON, one trailing newline. */
export function formatBaseline(findings: readonly Finding[]): string {
  return `${JSON.stringify(toBaseline(findings), null, 2)}\n`;
}
