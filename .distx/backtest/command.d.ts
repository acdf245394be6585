import type { CommandContext } from '../cli/commands.js';
/** Summary line of the command in the help. */
export declare const BACKTEST_SUMMARY = "hold out a share of the existing content links, suggest, and score how many come back (recall, precision, MRR)";
/** Run the backtest command. @returns 0 (usage errors are thrown as `E_USAGE`) */
export declare function runBacktestCommand(ctx: CommandContext): Promise<number>;
