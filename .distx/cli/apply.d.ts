import type { FlagSpec } from './args.js';
import type { CommandContext } from './commands.js';
/** One line of help for `apply`. */
export declare const APPLY_SUMMARY = "write chosen suggestions into the sources as links (--ids ID,ID or --all; --dry-run prints a diff)";
/** Flags of `apply`. */
export declare const APPLY_FLAGS: readonly FlagSpec[];
/** Run `apply`; returns the exit code. */
export declare function runApplyCommand(ctx: CommandContext): Promise<number>;
