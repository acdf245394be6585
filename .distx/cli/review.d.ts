import type { Baseline } from '../baseline/index.js';
import type { ReportFile } from '../compare/index.js';
import type { Report } from '../types.js';
import type { FlagSpec, FlagValues } from './args.js';
import type { CliIo } from './io.js';
/** Flags of `check` and `suggest` for reviews and CI. */
export declare const REVIEW_FLAGS: readonly FlagSpec[];
/** What the review flags read before the analysis. */
export interface ReviewInputs {
    readonly baseline: Baseline | null;
    readonly base: ReportFile | null;
}
/**
 * Read `--baseline` and `--compare` files (before the analysis, so a bad file fails fast).
 * @throws EngineError `E_IO` (missing or unreadable, naming the flag and file) or
 *   `E_REPORT_INVALID` (bad JSON or shape, naming the file and line or key)
 */
export declare function readReviewInputs(values: FlagValues, io: Pick<CliIo, 'cwd'>, root: string): ReviewInputs;
/** The report with `comparison` added when `--compare` was given. */
export declare function withComparison(report: Report, inputs: ReviewInputs): Report;
/** Write `--write-baseline` when given; says so on stderr unless quiet. */
export declare function writeBaselineIfAsked(report: Report, values: FlagValues, io: Pick<CliIo, 'cwd' | 'stderr' | 'tempFiles'>, quiet: boolean): Promise<void>;
/**
 * Read a file named by a flag, relative to the working folder.
 * @throws EngineError `E_IO`: `flag --NAME: cannot read "FILE": no such file`
 */
export declare function readUserFile(cwd: string, path: string, flag: string): string;
