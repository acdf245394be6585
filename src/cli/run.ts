/**
 * The CLI as a function: arguments and a process description in, an exit code out. Never
 * exits the process and never reads `process` itself (bin.ts passes everything in).
 */
import { resolve } from 'node:path';
import { isEngineError } from '../errors.js';
import type { Config, ResolvedOptions } from '../config/options.js';
import { mergeConfig } from '../preset/index.js';
import { prepareConfig } from '../pipeline/index.js';
import type { OptionsOverride } from '../pipeline/index.js';
import { VERSION } from '../version.js';
import { helpText, parseArgs } from './args.js';
import type { FlagValues, FormatName } from './args.js';
import { COMMANDS } from './commands.js';
import type { CommonFlags } from './context.js';
import { loadConfig } from '../config/discover.js';
import { debugEnabled } from './io.js';
import type { CliIo } from './io.js';

/** Exit codes (DESIGN section 9). */
export const EXIT = { passed: 0, failed: 1, error: 2 } as const;

/**
 * Run the command line.
 * @param argv arguments after the script path, e.g. `['check', 'docs', '--format', 'json']`
 * @returns 0 the run passes, 1 it fails (or, for apply, some links were refused), 2 usage, configuration or I/O error
 */
export async function run(argv: readonly string[], io: CliIo): Promise<number> {
  try {
    const parsed = parseArgs(argv, COMMANDS);
    if (parsed.kind === 'help') {
      io.stdout.write(helpText(COMMANDS, parsed.command, VERSION));
      return EXIT.passed;
    }
    if (parsed.kind === 'version') {
      io.stdout.write(`${VERSION}\n`);
      return EXIT.passed;
    }
    const command = COMMANDS.find((c) => c.name === parsed.command)!;
    const root = resolve(io.cwd, parsed.root ?? '.');
    const values = parsed.flags;
    const loaded = await loadConfig({ explicit: stringFlag(values, 'config'), root, cwd: io.cwd });
    const flags = commonFlags(values);
    // The pipeline's prepare stage, once for the whole command: the file resolved as written (a
    // bad key named against the file), the flags over it, the generator preset read (its
    // summary on stderr), the checks validated.
    const onNote = (message: string): void => {
      if (!flags.quiet) io.stderr.write(`linkweave: ${message}\n`);
    };
    const settings = { root, command: command.name === 'suggest' ? ('suggest' as const) : ('check' as const), configOrigin: loaded.origin };
    const prepared = prepareConfig(loaded.config, settings, { onNote }, flagsOver(values, io.cwd));
    return await command.run({ io, root, configOrigin: loaded.origin, flags, values, run: prepared });
  } catch (error) {
    return reportError(error, io);
  }
}

/**
 * Flags override configuration keys: --max-depth (maxDepth), --fail-on (failOn), --no-cache
 * (cache.enabled), --preset (preset), --targets, --per-target and --per-source
 * (suggest.targets, .perTarget, .perSource). The parser has already refused a flag the command
 * does not take.
 */
export function withFlags(config: Config, values: FlagValues): Config {
  const merged: Config = { ...config };
  if (typeof values['max-depth'] === 'number') merged.maxDepth = values['max-depth'];
  const suggest: Record<string, unknown> = {};
  const targets = stringFlag(values, 'targets');
  if (targets === 'underlinked' || targets === 'all') suggest.targets = targets;
  if (typeof values['per-target'] === 'number') suggest.perTarget = values['per-target'];
  if (typeof values['per-source'] === 'number') suggest.perSource = values['per-source'];
  if (Object.keys(suggest).length > 0) merged.suggest = { ...config.suggest, ...suggest } as Config['suggest'];
  const failOn = stringFlag(values, 'fail-on');
  if (failOn === 'error' || failOn === 'warning') merged.failOn = failOn;
  if (values['no-cache'] === true) merged.cache = { ...config.cache, enabled: false };
  const preset = stringFlag(values, 'preset');
  if (preset !== null) merged.preset = preset as NonNullable<Config['preset']>;
  return merged;
}

/**
 * The flags over the resolved options (they win over the file and the preset), and the cache
 * folder made absolute against the working folder (`cache.dir` is relative to it).
 */
function flagsOver(values: FlagValues, cwd: string): OptionsOverride {
  const fragment = withFlags({}, values);
  return (options) => {
    const merged = mergeConfig(options as unknown as Config, fragment) as unknown as ResolvedOptions;
    return { ...merged, root: options.root, cache: { ...merged.cache, dir: resolve(cwd, merged.cache.dir) } };
  };
}

function commonFlags(values: FlagValues): CommonFlags {
  return {
    format: stringFlag(values, 'format') as FormatName | null,
    output: stringFlag(values, 'output'),
    quiet: values.quiet === true,
    progress: values['no-progress'] !== true,
  };
}

function stringFlag(values: FlagValues, name: string): string | null {
  const v = values[name];
  return typeof v === 'string' ? v : null;
}

/** One line on stderr (`linkweave: <message>`), the stack only with DEBUG=linkweave. */
function reportError(error: unknown, io: CliIo): number {
  const debug = debugEnabled(io.env);
  if (isEngineError(error)) {
    io.stderr.write(`linkweave: ${oneLine(error.message)}\n`);
  } else {
    const message = error instanceof Error ? error.message : String(error);
    io.stderr.write(`linkweave: internal error: ${oneLine(message)}${debug ? '' : ' (set DEBUG=linkweave for details)'}\n`);
  }
  if (debug && error instanceof Error && error.stack !== undefined) io.stderr.write(`${error.stack}\n`);
  return EXIT.error;
}

function oneLine(text: string): string {
  return text.replace(/\s*\n\s*/g, ' ');
}
