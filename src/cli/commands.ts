/**
 * The command table. Adding a command is one entry here: its name, a help line, its own
 * flags and the function that runs it.
 */
import { resolve } from 'node:path';
import { copyCachedOutput, saveCachedOutput } from '../cache/index.js';
import type { ReportCacheInfo } from '../cache/index.js';
import { runPrepared } from '../pipeline/index.js';
import { formatReportPieces, summaryLines } from '../report/index.js';
import { writeFileAtomic } from '../util/write-file.js';
import { applyArgsOf, FLAGS, SUGGEST_FLAGS } from './args.js';
import type { CommandInfo, FlagSpec } from './args.js';
import { BACKTEST_FLAGS } from './backtest-flags.js';
import { BACKTEST_SUMMARY, runBacktestCommand } from './backtest.js';
import type { CommandContext } from './context.js';
import { colorEnabled } from './io.js';
import { checkOutputPath, formatFromOutput } from './output.js';
import { progressHooks } from './progress.js';
import { APPLY_FLAGS, APPLY_SUMMARY, runApplyCommand } from './apply.js';
import { readReviewInputs, withComparison, writeBaselineIfAsked, REVIEW_FLAGS } from './review.js';

/** A command: what the parser and help know, plus how it runs. Returns the exit code. */
export interface Command extends CommandInfo {
  run(ctx: CommandContext): Promise<number>;
}

/** The flags of `check`. */
const CHECK_FLAGS: readonly FlagSpec[] = [
  FLAGS.config,
  FLAGS.format,
  FLAGS.output,
  FLAGS.maxDepth,
  FLAGS.failOn,
  FLAGS.preset,
  ...REVIEW_FLAGS,
  FLAGS.quiet,
  FLAGS.noProgress,
  FLAGS.noCache,
];

/** The report commands' exit codes. */
const REPORT_EXIT =
  '0 the run passes (no finding at or above --fail-on, no limit crossed); 1 it fails; 2 usage, configuration or I/O error.';

/** The commands, in help order. */
export const COMMANDS: readonly Command[] = [
  {
    name: 'check',
    summary: 'build the link graph, run the checks, print the findings and the verdict',
    flags: CHECK_FLAGS,
    exitCodes: REPORT_EXIT,
    run: (ctx) => reportCommand(ctx, 'check'),
  },
  {
    name: 'suggest',
    summary: 'check, plus proposed new links (file, line, column, anchor, target, predicted impact)',
    flags: [...CHECK_FLAGS.slice(0, 5), ...SUGGEST_FLAGS, ...CHECK_FLAGS.slice(5)],
    exitCodes: REPORT_EXIT,
    run: (ctx) => reportCommand(ctx, 'suggest'),
  },
  {
    name: 'apply',
    summary: APPLY_SUMMARY,
    // The suggestion-shaping flags of `suggest`, so a printed apply command runs as printed.
    flags: [
      ...APPLY_FLAGS,
      FLAGS.config,
      { ...FLAGS.maxDepth, description: 'deepest click depth the depth-repair suggestions aim at, as given to suggest (config maxDepth)' },
      FLAGS.preset,
      ...SUGGEST_FLAGS,
      FLAGS.quiet,
      FLAGS.noCache,
    ],
    exitCodes:
      '0 every chosen link was written (with --dry-run: could be); 1 some were refused (the file changed, overlapping anchors, no anchor phrase); 2 usage, an unknown id, a bad --from report or a file that could not be written.',
    run: runApplyCommand,
  },
  {
    name: 'backtest',
    summary: BACKTEST_SUMMARY,
    flags: [
      ...BACKTEST_FLAGS,
      FLAGS.config,
      { ...FLAGS.format, choices: ['text', 'json'], description: 'output format (default: json when --output ends in .json, else text)' },
      FLAGS.output,
      FLAGS.quiet,
      FLAGS.noProgress,
      FLAGS.noCache,
    ],
    exitCodes: '0 the backtest ran; 2 usage, configuration or I/O error.',
    run: runBacktestCommand,
  },
];

/** analyze -> format -> stdout or --output; exit 0 when the run passes, 1 when it fails. */
async function reportCommand(ctx: CommandContext, command: 'check' | 'suggest'): Promise<number> {
  const { io, flags } = ctx;
  const output = flags.output === null ? null : resolve(io.cwd, flags.output);
  if (output !== null) checkOutputPath(output, ctx.root, flags.output!);
  const format = flags.format ?? (output === null ? 'text' : formatFromOutput(output));
  const color = colorEnabled(io);

  const review = readReviewInputs(ctx.values, io, ctx.root);
  const progress = !flags.quiet && flags.progress && io.stderrIsTTY === true ? progressHooks(io.stderr) : null;
  let report;
  const cache: { info: ReportCacheInfo | null } = { info: null };
  try {
    const baseline = review.baseline === null ? {} : { baseline: review.baseline };
    // What was read as the site's generator config goes to stderr (never into the report).
    const onNote = (message: string): void => {
      progress?.done();
      if (!flags.quiet) io.stderr.write(`linkweave: ${message}\n`);
    };
    const hooks = { ...(progress?.hooks ?? {}), onNote, onReportCache: (info: ReportCacheInfo) => (cache.info = info) };
    report = await runPrepared({ ...ctx.run, command, ...baseline }, hooks);
  } finally {
    progress?.done();
  }
  const analyzed = report;
  report = withComparison(report, review);
  await writeBaselineIfAsked(report, ctx.values, io, flags.quiet);

  // The text report shows paths relative to the working folder, wrapped to the terminal.
  // The printed apply command reads the same configuration file and repeats the flags that
  // shape the suggestions (--targets, --per-*, --max-depth, --preset), so its own suggest run
  // makes the same suggestions and finds the printed ids.
  const applyArgs = applyArgsOf(ctx.values);
  const config = applyArgs.length > 0 ? { applyArgs } : {};
  const terminal = { color, cwd: io.cwd, ...config, ...(io.isTTY && io.columns !== undefined ? { width: io.columns } : {}) };
  if (output === null) {
    for (const piece of formatReportPieces(report, format, terminal)) io.stdout.write(piece);
  } else {
    const writeOptions = { label: flags.output!, ...(io.tempFiles === undefined ? {} : { tracker: io.tempFiles }) };
    // A report from the whole-report cache (and not changed here by a comparison) is written as
    // the bytes written for it last time, without formatting it again.
    const reused = report === analyzed ? cache.info : null;
    const copied = reused !== null && (await copyCachedOutput(reused, format, io.cwd, output, io.tempFiles));
    if (!copied) {
      await writeFileAtomic(output, formatReportPieces(report, format, { color: false, cwd: io.cwd, ...config }), writeOptions);
      if (reused !== null) saveCachedOutput(reused, format, io.cwd, output);
    }
    if (!flags.quiet) {
      // The report went to a file: the terminal gets the summary alone (the site's counts, the
      // findings' count and the verdict), so a CI log does not carry the report twice.
      io.stdout.write(`${summaryLines(report, terminal).join('\n')}\n`);
      io.stderr.write(`linkweave: report written to ${flags.output}\n`);
    }
  }
  return report.gate.passed ? 0 : 1;
}
