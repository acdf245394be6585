import type { Config } from '../options.js';
import type { CommandInfo, FlagValues, FormatName } from './args.js';
import type { CliIo } from './io.js';
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
export declare const COMMANDS: readonly Command[];
