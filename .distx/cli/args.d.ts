import type { FormatId } from '../report/types.js';
/** One flag of the command line. */
export interface FlagSpec {
    /** Name without dashes, e.g. `max-depth`. */
    readonly name: string;
    /** `boolean` flags take no value; `string` flags take one (`--flag value` or `--flag=value`). */
    readonly kind: 'boolean' | 'string';
    /** Placeholder shown in the help, e.g. `FILE`. */
    readonly value?: string;
    /** Accepted values, when the set is closed. */
    readonly choices?: readonly string[];
    /** The value must be a whole number at least this large. */
    readonly minInteger?: number;
    readonly description: string;
}
/** The output formats `--format` accepts: the report stage's formatter ids. */
export declare const FORMAT_NAMES: readonly FormatId[];
/** A format as the `--format` flag names it. */
export type FormatName = FormatId;
/** Flags every command accepts. */
export declare const COMMON_FLAGS: readonly FlagSpec[];
/** A command as the parser and the help know it. */
export interface CommandInfo {
    readonly name: string;
    /** One line for the help. */
    readonly summary: string;
    /** Flags this command takes beyond `COMMON_FLAGS`. */
    readonly flags?: readonly FlagSpec[];
}
/** Flag values by flag name: `true` for boolean flags, the checked string or number otherwise. */
export type FlagValues = Readonly<Record<string, string | number | true>>;
/** The outcome of parsing. */
export type ParsedArgs = {
    readonly kind: 'help';
    readonly command: string | null;
} | {
    readonly kind: 'version';
} | {
    readonly kind: 'run';
    readonly command: string;
    readonly root: string | null;
    readonly flags: FlagValues;
};
/**
 * Parse `argv` (without the node and script paths) against the command table.
 * @throws EngineError `E_USAGE`, one line naming the command, flag or argument and what is accepted
 */
export declare function parseArgs(argv: readonly string[], commands: readonly CommandInfo[]): ParsedArgs;
/**
 * The help text: usage, commands, flags and exit codes; for one command when `command` is given.
 */
export declare function helpText(commands: readonly CommandInfo[], command: string | null, version: string): string;
