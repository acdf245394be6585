/**
 * The command table. Adding a command is one entry here: its name, a help line, its own
 * flags and the function that runs it.
 */
import { resolve } from 'node:path';
import { analyze } from '../analyze.js';
import { readCachedOutput, saveCachedOutput } from '../cache/index.js';
import type { ReportCacheInfo } from '../cache/index.js';
import { BACKTEST_FLAGS, BACKTEST_SUMMARY, runBacktestCommand } from '../backtest/index.js';
import type { Config } from '../options.js';
import { formatReportPieces } from '../report/index.js';
import { writeFileAtomic } from '../report/write.js';
import type { CommandInfo, FlagValues, FormatName } from './args.js';
import { colorEnabled } from './io.js';
import type { CliIo } from './io.js';
import { checkOutputPath, formatFromOutput } from './output.js';
import { progressHooks } from './progress.js';
import { APPLY_FLAGS, APPLY_SUMMARY, runApplyCommand } from './apply.js';
import { readReviewInputs, withComparison, writeBaselineIfAsked, REVIEW_FLAGS } from './review.js';

/** The flags every command shares, typed. */
export interface CommonFlags {
  readonly format: FormatName | null;
  readonly output: string | null;
  readonly quiet: boolean;
  readonly progress: boolean;
}

/** Everything a command gets: the process, the content root, the configuration and the flags. */
export interface CommandContext {
  readonly io: CliIo;
  /** Absolute content root. */
  readonly root: string;
  /** The configuration file's object with the flags merged over it (validated before). */
  readonly config: Config;
  /** Where the configuration came from, for messages. */
  readonly configOrigin: string;
  readonly flags: CommonFlags;
  /** All flag values by name, including the command's own flags. */
  readonly values: FlagValues;
}

/** A command: what the parser and help know, plus how it runs. Returns the exit code. */
export interface Command extends CommandInfo {
  run(ctx: CommandContext): Promise<number>;
}

/** The commands, in help order. */
export const COMMANDS: readonly Command[] = [
  {
    name: 'check',
    summary: 'build the link graph, run the rules, print the findings, apply the gate',
    flags: REVIEW_FLAGS,
    run: (ctx) => reportCommand(ctx, 'check'),
  },
  {
    name: 'suggest',
    summary: 'check, plus proposed new links (file, line, column, anchor, target, predicted impact)',
    flags: REVIEW_FLAGS,
    run: (ctx) => reportCommand(ctx, 'suggest'),
  },
  { name: 'apply', summary: APPLY_SUMMARY, flags: APPLY_FLAGS, run: runApplyCommand },
  { name: 'backtest', summary: BACKTEST_SUMMARY, flags: BACKTEST_FLAGS, run: runBacktestCommand },
];

/** Findings and suggestions listed in the terminal summary after a report file is written. */
const SUMMARY_ITEMS = 20;

/** analyze -> format -> stdout or --output; exit 0 when the gate passed, 1 when it failed. */
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
    const hooks = { ...(progress?.hooks ?? {}), onReportCache: (info: ReportCacheInfo) => (cache.info = info) };
    report = await analyze({ ...ctx.config, root: ctx.root, command, configOrigin: ctx.configOrigin, ...baseline }, hooks);
  } finally {
    progress?.done();
  }
  const analyzed = report;
  report = withComparison(report, review);
  await writeBaselineIfAsked(report, ctx.values, io, flags.quiet);

  // The text report shows paths relative to the working folder, wrapped to the terminal.
  const terminal = { color, cwd: io.cwd, ...(io.isTTY && io.columns !== undefined ? { width: io.columns } : {}) };
  if (output === null) {
    for (const piece of formatReportPieces(report, format, terminal)) io.stdout.write(piece);
  } else {
    const writeOptions = { label: flags.output!, ...(io.tempFiles === undefined ? {} : { tracker: io.tempFiles }) };
    // A report from the whole-report cache (and not changed here by a comparison) is written as
    // the bytes written for it last time, without formatting it again.
    const reused = report === analyzed ? cache.info : null;
    const bytes = reused === null ? null : readCachedOutput(reused, format, io.cwd);
    if (bytes !== null) await writeFileAtomic(output, bytes, writeOptions);
    else {
      await writeFileAtomic(output, formatReportPieces(report, format, { color: false, cwd: io.cwd }), writeOptions);
      if (reused !== null) saveCachedOutput(reused, format, io.cwd, output);
    }
    if (!flags.quiet) {
      // After another format went to a file, the terminal gets a summary: the counts, the gate
      // and the first findings and suggestions (a large site has a hundred thousand).
      if (format !== 'text') for (const piece of formatReportPieces(report, 'text', { ...terminal, maxItems: SUMMARY_ITEMS })) io.stdout.write(piece);
      io.stderr.write(`linkweave: report written to ${flags.output}\n`);
    }
  }
  return report.gate.passed ? 0 : 1;
}
