/**
 * `linkweave backtest [root] --holdout 0.1 --seed 42 [--runs 5] [--format text|json] [--output FILE]`:
 * the command behind the CLI's table entry. Flags checked, the site read by the pipeline's
 * collect and parse stages (as every command reads it, generator preset included), the backtest
 * run, the table or JSON printed or written atomically. Exit 0 on success; bad flags throw
 * `E_USAGE` (the CLI turns that into exit 2).
 */
import { relative, resolve } from 'node:path';
import { backtest } from '../backtest/index.js';
import { readSite } from '../pipeline/index.js';
import { writeFileAtomic } from '../util/write-file.js';
import { backtestFormat, parseBacktestFlags } from './backtest-flags.js';
import { formatBacktestJson, formatBacktestText } from './backtest-format.js';
import type { CommandContext } from './context.js';
import { checkOutputPath } from './output.js';
import { progressHooks } from './progress.js';

/** Summary line of the command in the help. */
export const BACKTEST_SUMMARY = 'hold out a share of the existing content links, suggest, and score how many come back (recall, precision, MRR)';

/** Run the backtest command. @returns 0 (usage errors are thrown as `E_USAGE`) */
export async function runBacktestCommand(ctx: CommandContext): Promise<number> {
  const { io, flags } = ctx;
  const settings = parseBacktestFlags(ctx.values);
  const output = flags.output === null ? null : resolve(io.cwd, flags.output);
  const format = backtestFormat(flags.format, flags.output);
  if (output !== null) checkOutputPath(output, ctx.root, flags.output!);

  const progress = !flags.quiet && flags.progress && io.stderrIsTTY === true ? progressHooks(io.stderr) : null;
  let result;
  try {
    const site = await readSite(ctx.run, progress?.hooks ?? {});
    progress?.hooks.onStage?.('suggest', 'start');
    result = backtest({ options: site.run.options, facts: site.facts, collected: site.collected }, settings, (done, total) =>
      progress?.hooks.onProgress?.('suggest', done, total),
    );
  } finally {
    progress?.done();
  }

  // People read the root as they typed it (relative to the working folder); the JSON keeps it whole.
  const shown = { ...result, root: relative(io.cwd, result.root) || '.' };
  const text = format === 'json' ? formatBacktestJson(result) : formatBacktestText(shown);
  if (output === null) {
    io.stdout.write(text);
    return 0;
  }
  await writeFileAtomic(output, text, io.tempFiles === undefined ? {} : { tracker: io.tempFiles });
  if (!flags.quiet) {
    if (format === 'json') io.stdout.write(formatBacktestText(shown));
    io.stderr.write(`linkweave: backtest written to ${flags.output}\n`);
  }
  return 0;
}
