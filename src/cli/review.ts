/**
 * The pull-request review flags of `check` and `suggest`: `--baseline FILE`,
 * `--write-baseline FILE` and `--compare BASE.json`. Reads and writes the files; the matching
 * and comparing are the pure `baseline/` and `compare/` stages.
 *
 * - `--baseline FILE`: findings already in FILE do not fail the gate (its severity failures
 *   and `gate.maxWarnings` count new findings only); the gate's numeric limits on the site
 *   (`gate.maxDepth`, `gate.maxBrokenLinks`, `gate.maxOrphans`, ...) stay absolute. New and
 *   fixed findings are in the report's `baseline` field and every output.
 * - `--write-baseline FILE`: this run's findings, written atomically (`linkweave/baseline@1`).
 *   The exit code is still the gate's.
 * - `--compare BASE.json`: the report's `comparison` field; does not change the gate.
 * A file that is missing or not what it should be: exit 2, the message naming it.
 */
import fs from 'node:fs';
import { resolve } from 'node:path';
import { formatBaseline, parseBaseline } from '../baseline/index.js';
import type { Baseline } from '../baseline/index.js';
import { compareReports, parseReportFile } from '../compare/index.js';
import type { ReportFile } from '../compare/index.js';
import { EngineError } from '../errors.js';
import { writeFileAtomic } from '../util/write-file.js';
import type { Report } from '../types.js';
import type { FlagSpec, FlagValues } from './args.js';
import type { CliIo } from './io.js';
import { checkOutputPath } from './output.js';

/** Flags of `check` and `suggest` for reviews and CI. */
export const REVIEW_FLAGS: readonly FlagSpec[] = [
  {
    name: 'baseline',
    kind: 'string',
    value: 'FILE',
    description: 'findings in FILE (from --write-baseline) do not fail the gate; new ones do, fixed ones are listed',
  },
  { name: 'write-baseline', kind: 'string', value: 'FILE', description: "write this run's findings to FILE as a baseline" },
  {
    name: 'compare',
    kind: 'string',
    value: 'BASE.json',
    description: 'compare with a JSON report of the base branch: new and fixed findings, pages added and removed, rank and depth changes',
  },
];

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
export function readReviewInputs(values: FlagValues, io: Pick<CliIo, 'cwd'>, root: string): ReviewInputs {
  const baselinePath = stringValue(values, 'baseline');
  const comparePath = stringValue(values, 'compare');
  const written = stringValue(values, 'write-baseline');
  if (written !== null) checkOutputPath(resolve(io.cwd, written), root, written, 'write-baseline');
  return {
    baseline: baselinePath === null ? null : parseBaseline(readUserFile(io.cwd, baselinePath, 'baseline'), baselinePath),
    base: comparePath === null ? null : parseReportFile(readUserFile(io.cwd, comparePath, 'compare'), comparePath),
  };
}

/** The report with `comparison` added when `--compare` was given. */
export function withComparison(report: Report, inputs: ReviewInputs): Report {
  return inputs.base === null ? report : { ...report, comparison: compareReports(inputs.base, report) };
}

/** Write `--write-baseline` when given; says so on stderr unless quiet. */
export async function writeBaselineIfAsked(
  report: Report,
  values: FlagValues,
  io: Pick<CliIo, 'cwd' | 'stderr' | 'tempFiles'>,
  quiet: boolean,
): Promise<void> {
  const path = stringValue(values, 'write-baseline');
  if (path === null) return;
  await writeFileAtomic(resolve(io.cwd, path), formatBaseline(report.findings), {
    label: path,
    ...(io.tempFiles === undefined ? {} : { tracker: io.tempFiles }),
  });
  if (!quiet) io.stderr.write(`linkweave: baseline of ${report.findings.length} findings written to ${path}\n`);
}

/**
 * Read a file named by a flag, relative to the working folder.
 * @throws EngineError `E_IO`: `flag --NAME: cannot read "FILE": no such file`
 */
export function readUserFile(cwd: string, path: string, flag: string): string {
  try {
    return fs.readFileSync(resolve(cwd, path), 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' ? 'permission denied' : (code ?? (error as Error).message);
    throw new EngineError('E_IO', `flag --${flag}: cannot read "${path}": ${why}`);
  }
}

function stringValue(values: FlagValues, name: string): string | null {
  const v = values[name];
  return typeof v === 'string' ? v : null;
}
