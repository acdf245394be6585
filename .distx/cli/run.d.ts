import type { Config } from '../options.js';
import type { FlagValues } from './args.js';
import type { CliIo } from './io.js';
/** Exit codes (DESIGN section 9). */
export declare const EXIT: {
    readonly passed: 0;
    readonly failed: 1;
    readonly error: 2;
};
/**
 * Run the command line.
 * @param argv arguments after the script path, e.g. `['check', 'docs', '--format', 'json']`
 * @returns 0 the gate passed, 1 the gate failed, 2 usage, configuration or I/O error
 */
export declare function run(argv: readonly string[], io: CliIo): Promise<number>;
/** Flags override configuration keys: --max-depth, --fail-on, --no-cache. */
export declare function withFlags(config: Config, values: FlagValues): Config;
