/** What every command gets from the CLI (run.ts builds it; commands.ts and the command files read it). */
import type { PreparedRun } from '../pipeline/index.js';
import type { FlagValues, FormatName } from './args.js';
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
  /** Absolute content root, as given on the command line (a generator preset may move it: see `prepare`). */
  readonly root: string;
  /** Where the configuration came from, for messages. */
  readonly configOrigin: string;
  readonly flags: CommonFlags;
  /** All flag values by name, including the command's own flags. */
  readonly values: FlagValues;
  /**
   * The pipeline's prepare stage for this configuration and root (options resolved, generator
   * preset read, checks validated), run once per command run before the command starts.
   */
  readonly run: PreparedRun;
}
