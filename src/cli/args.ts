/**
 * Command-line parsing: a table of flags and a table of commands in, a checked `ParsedArgs` out.
 * Hand-written (about a hundred lines) rather than `node:util` `parseArgs`, so every mistake
 * gets one line naming the flag and the accepted values.
 */
import { EngineError } from '../errors.js';
import { FORMAT_IDS } from '../report/format.js';
import type { FormatId } from '../report/types.js';
import { PRESET_NAMES } from '../preset/names.js';

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
export const FORMAT_NAMES: readonly FormatId[] = FORMAT_IDS;

/** A format as the `--format` flag names it. */
export type FormatName = FormatId;

/** The flags shared by several commands, by name; each command lists the ones it takes. */
export const FLAGS = {
  config: { name: 'config', kind: 'string', value: 'FILE', description: 'configuration file (.json, .mjs or .js)' },
  format: {
    name: 'format',
    kind: 'string',
    value: 'FORMAT',
    choices: FORMAT_NAMES,
    description: 'output format (default: from the --output extension, else text)',
  },
  output: { name: 'output', kind: 'string', value: 'FILE', description: 'write the report to FILE (atomically); the terminal gets a short summary' },
  maxDepth: { name: 'max-depth', kind: 'string', value: 'N', minInteger: 0, description: 'deepest click depth allowed (config maxDepth)' },
  failOn: {
    name: 'fail-on',
    kind: 'string',
    value: 'LEVEL',
    choices: ['error', 'warning'],
    description: 'fail the run (exit 1) on findings at or above this level (config failOn)',
  },
  preset: {
    name: 'preset',
    kind: 'string',
    value: 'NAME',
    choices: ['auto', 'none', ...PRESET_NAMES],
    description: "read the site as this generator's (config preset; default: detected)",
  },
  quiet: { name: 'quiet', kind: 'boolean', description: 'print nothing but the report (no summary, no progress)' },
  noProgress: { name: 'no-progress', kind: 'boolean', description: 'no progress display on stderr' },
  noCache: { name: 'no-cache', kind: 'boolean', description: 'do not read or write the parse cache (config cache.enabled)' },
  help: { name: 'help', kind: 'boolean', description: 'show this help' },
  version: { name: 'version', kind: 'boolean', description: 'show the version' },
} as const satisfies Record<string, FlagSpec>;

/** Flags of `suggest` beyond those of `check`. */
export const SUGGEST_FLAGS: readonly FlagSpec[] = [
  {
    name: 'targets',
    kind: 'string',
    value: 'WHICH',
    choices: ['underlinked', 'all'],
    description: 'propose links to under-linked pages only, or to every page (config suggest.targets)',
  },
  { name: 'per-target', kind: 'string', value: 'N', minInteger: 1, description: 'most suggestions per target page (config suggest.perTarget)' },
  { name: 'per-source', kind: 'string', value: 'N', minInteger: 0, description: 'most new links per source page, 0 = no cap (config suggest.perSource)' },
];

/**
 * The flags that change which suggestions a run makes (and so their ids): `suggest` takes them,
 * and `apply` takes them too, so the apply command a report prints repeats them and finds the
 * same ids in its own suggest run.
 */
export const SELECTION_FLAG_NAMES: readonly string[] = ['max-depth', 'preset', 'targets', 'per-target', 'per-source'];

/**
 * The words to repeat in a printed apply command so it makes the same suggestions as this run:
 * `--config FILE` and every selection flag given, in that order.
 */
export function applyArgsOf(values: FlagValues): string[] {
  const args: string[] = [];
  for (const name of ['config', ...SELECTION_FLAG_NAMES]) {
    const v = values[name];
    if (typeof v === 'string' || typeof v === 'number') args.push(`--${name}`, String(v));
  }
  return args;
}

/** `help` and `version`: taken by every command. */
const ALWAYS: readonly FlagSpec[] = [FLAGS.help, FLAGS.version];

/** Short forms. */
const ALIASES: Readonly<Record<string, string>> = { '-h': 'help', '-v': 'version' };

/** A command as the parser and the help know it. */
export interface CommandInfo {
  readonly name: string;
  /** One line for the help. */
  readonly summary: string;
  /** Every flag this command takes (besides --help and --version); any other flag is refused. */
  readonly flags: readonly FlagSpec[];
  /** The command's exit codes, one sentence for its help. */
  readonly exitCodes: string;
}

/** The flags a command takes, --help and --version included. */
export function flagsOf(command: CommandInfo): readonly FlagSpec[] {
  return [...command.flags, ...ALWAYS];
}

/** Flag values by flag name: `true` for boolean flags, the checked string or number otherwise. */
export type FlagValues = Readonly<Record<string, string | number | true>>;

/** The outcome of parsing. */
export type ParsedArgs =
  | { readonly kind: 'help'; readonly command: string | null }
  | { readonly kind: 'version' }
  | { readonly kind: 'run'; readonly command: string; readonly root: string | null; readonly flags: FlagValues };

const usage = (message: string): never => {
  throw new EngineError('E_USAGE', message);
};

/**
 * Parse `argv` (without the node and script paths) against the command table.
 * @throws EngineError `E_USAGE`, one line naming the command, flag or argument and what is accepted
 */
export function parseArgs(argv: readonly string[], commands: readonly CommandInfo[]): ParsedArgs {
  const positionals: string[] = [];
  const seen: { flag: string; value: string | null }[] = [];
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (arg === '--') {
      positionals.push(...argv.slice(i + 1));
      break;
    }
    if (arg in ALIASES) {
      seen.push({ flag: ALIASES[arg], value: null });
    } else if (arg.startsWith('--')) {
      const eq = arg.indexOf('=');
      seen.push(eq < 0 ? { flag: arg.slice(2), value: null } : { flag: arg.slice(2, eq), value: arg.slice(eq + 1) });
    } else if (arg.startsWith('-') && arg.length > 1) {
      usage(`unknown flag "${arg}"; flags are written --name (see --help)`);
    } else {
      positionals.push(arg);
      continue;
    }
    // A string flag takes the next argument as its value unless it is written --flag=value.
    const last = seen[seen.length - 1];
    const spec = findFlag(last.flag, commands);
    if (spec?.kind === 'string' && last.value === null && i + 1 < argv.length && !argv[i + 1].startsWith('--')) {
      last.value = argv[++i];
    }
  }

  const commandName = positionals[0] ?? null;
  const command = commandName === null ? null : (commands.find((c) => c.name === commandName) ?? null);
  if (seen.some((s) => s.flag === 'help')) return { kind: 'help', command: command?.name ?? null };
  if (seen.some((s) => s.flag === 'version')) return { kind: 'version' };
  const names = commands.map((c) => c.name).join(', ');
  if (commandName === null) return usage(`missing command; accepted commands: ${names} (see --help)`);
  if (command === null) return usage(`unknown command "${commandName}"; accepted commands: ${names}`);
  const accepted = flagsOf(command);
  const flags: Record<string, string | number | true> = {};
  for (const { flag, value } of seen) {
    const spec = accepted.find((f) => f.name === flag);
    if (spec === undefined) {
      const known = findFlag(flag, commands) !== undefined;
      const list = accepted.map((f) => `--${f.name}`).join(', ');
      usage(`${known ? `flag --${flag} is not taken by` : `unknown flag --${flag} for`} "${command.name}"; its flags: ${list}`);
    }
    flags[flag] = checkValue(spec!, value);
  }
  if (positionals.length > 2) {
    usage(`unexpected argument "${positionals[2]}": "${command.name}" takes one content root at most`);
  }
  return { kind: 'run', command: command.name, root: positionals[1] ?? null, flags };
}

function findFlag(name: string, commands: readonly CommandInfo[]): FlagSpec | undefined {
  return ALWAYS.find((f) => f.name === name) ?? commands.flatMap((c) => c.flags).find((f) => f.name === name);
}

function checkValue(spec: FlagSpec, value: string | null): string | number | true {
  if (spec.kind === 'boolean') {
    if (value !== null) usage(`flag --${spec.name} takes no value; got "${value}"`);
    return true;
  }
  const accepts = spec.choices !== undefined ? `one of ${spec.choices.join(', ')}` : spec.minInteger !== undefined ? `a whole number >= ${spec.minInteger}` : spec.value ?? 'a value';
  if (value === null || value === '') return usage(`flag --${spec.name} needs a value: ${accepts}`);
  if (spec.choices !== undefined && !spec.choices.includes(value)) {
    usage(`flag --${spec.name}: expected one of ${spec.choices.join(', ')}; got "${value}"`);
  }
  if (spec.minInteger !== undefined) {
    const n = /^-?\d+$/.test(value) ? Number(value) : Number.NaN;
    if (!Number.isSafeInteger(n) || n < spec.minInteger) usage(`flag --${spec.name}: expected ${accepts}; got "${value}"`);
    return n;
  }
  return value;
}

/**
 * The help text: for one command its usage, its own flags only and its exit codes; without a
 * command, the list of commands.
 */
export function helpText(commands: readonly CommandInfo[], command: string | null, version: string): string {
  const cmd = command === null ? null : commands.find((c) => c.name === command);
  const lines = [`linkweave ${version}: internal links, PageRank, click depth and link suggestions for documentation sources`, ''];
  if (!cmd) {
    const width = Math.max(...commands.map((c) => c.name.length)) + 2;
    lines.push(
      'Usage: linkweave <command> [root] [flags]',
      '',
      'Commands:',
      ...commands.map((c) => `  ${c.name.padEnd(width)}${c.summary}`),
      '',
      'root: the content root (default: the working folder).',
      'linkweave <command> --help lists the flags and exit codes of a command; --version shows the version.',
    );
    return `${lines.join('\n')}\n`;
  }
  const flags = flagsOf(cmd);
  const flagLabel = (f: FlagSpec) => `--${f.name}${f.value === undefined ? '' : ` ${f.value}`}`;
  const width = Math.max(...flags.map((f) => flagLabel(f).length)) + 2;
  lines.push(
    `Usage: linkweave ${cmd.name} [root] [flags]`,
    '',
    `  ${cmd.summary}`,
    '',
    'root: the content root (default: the working folder).',
    '',
    'Flags:',
    ...flags.map((f) => `  ${flagLabel(f).padEnd(width)}${f.description}${f.choices ? ` [${f.choices.join(', ')}]` : ''}`),
    '',
    'Configuration: --config FILE, else linkweave.config.json or linkweave.config.mjs in the content',
    'root, then in the working folder, else the "linkweave" key of package.json (root, then working',
    'folder). Paths in it (navigation, redirects, traffic) are relative to the content root. Flags',
    'override the configuration.',
    '',
    `Exit codes: ${cmd.exitCodes}`,
  );
  return `${lines.join('\n')}\n`;
}
