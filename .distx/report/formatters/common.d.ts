import type { GateFailure, Report, Suggestion } from '../../types.js';
/** `1 page`, `2 pages`. */
export declare function plural(count: number, singular: string, pluralForm?: string): string;
/** A rank (pagerank x pages) for reading: two decimals below 10, one below 100, none above. */
export declare function formatRank(rank: number): string;
/** A similarity for reading: two decimals. */
export declare function formatSimilarity(similarity: number): string;
/** A click depth for reading; `null` is unreachable. */
export declare function formatDepth(depth: number | null): string;
/** "rank 0.80 -> 1.3, depth 5 -> 2": what a suggestion is predicted to change ("rank 0.80 -> not computed" outside the impact budget). */
export declare function impactOf(s: Suggestion, rankLabel?: string): string;
/** One gate failure in three parts: what was checked, what was found, what is allowed. */
export declare function failureParts(failure: GateFailure, failOn: Report['gate']['failOn']): {
    check: string;
    found: string;
    allowed: string;
};
/** One gate failure in words: "broken-link (1 error)", "gate.maxOrphans (3, at most 1)". */
export declare function describeFailure(failure: GateFailure, failOn: Report['gate']['failOn']): string;
/** The counts of a run as phrases ("42 pages", "3 broken links", ...). */
export declare function summaryParts(report: Report): string[];
/** "5 problems (3 errors, 2 warnings)" or "No problems found". */
export declare function problemsLine(report: Report): string;
/**
 * A report path (relative to the content root) as the user should see it: relative to `cwd`
 * when one is given, with `/` separators. `''` (no file) stays `''`.
 */
export declare function displayPath(file: string, root: string, cwd: string | undefined): string;
/**
 * The depth-repair plan in one sentence, or null when the report has none or it would add
 * nothing: "3 links (ids a, b, c) bring the pages deeper than 3 clicks or unreachable from 7 to 2."
 */
export declare function repairLine(report: Report, code?: (s: string) => string): string | null;
