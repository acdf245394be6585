import { describe, expect, it } from 'vitest';
import { FLAGS, helpText, parseArgs } from '../../src/cli/args.js';
import type { CommandInfo } from '../../src/cli/args.js';

const shared = [FLAGS.config, FLAGS.format, FLAGS.output, FLAGS.maxDepth, FLAGS.failOn, FLAGS.quiet, FLAGS.noProgress, FLAGS.noCache];
const commands: CommandInfo[] = [
  { name: 'check', summary: 'check the site', flags: shared, exitCodes: '0 passes; 1 fails; 2 usage.' },
  { name: 'suggest', summary: 'suggest links', flags: shared, exitCodes: '0 passes; 1 fails; 2 usage.' },
  { name: 'apply', summary: 'apply links', flags: [{ name: 'dry-run', kind: 'boolean', description: 'show a diff' }, FLAGS.config], exitCodes: '0 applied; 2 usage.' },
];

const usageError = (argv: string[]) => {
  try {
    parseArgs(argv, commands);
  } catch (error) {
    expect(error).toMatchObject({ name: 'EngineError', code: 'E_USAGE' });
    return (error as Error).message;
  }
  throw new Error(`expected a usage error for ${argv.join(' ')}`);
};

describe('parseArgs', () => {
  it('reads the command, the root and typed flag values in either flag form', () => {
    expect(parseArgs(['check', 'docs', '--format', 'json', '--output=out/r.json', '--max-depth', '4', '--quiet'], commands)).toEqual({
      kind: 'run',
      command: 'check',
      root: 'docs',
      flags: { format: 'json', output: 'out/r.json', 'max-depth': 4, quiet: true },
    });
  });

  it('accepts flags before the command and a root after --', () => {
    expect(parseArgs(['--fail-on', 'warning', 'suggest', '--', '--odd-root'], commands)).toEqual({
      kind: 'run',
      command: 'suggest',
      root: '--odd-root',
      flags: { 'fail-on': 'warning' },
    });
  });

  it('the root is optional', () => {
    expect(parseArgs(['check', '--no-cache', '--no-progress'], commands)).toMatchObject({ root: null, flags: { 'no-cache': true, 'no-progress': true } });
  });

  it('a command-specific flag works only for its command', () => {
    expect(parseArgs(['apply', '--dry-run'], commands)).toMatchObject({ command: 'apply', flags: { 'dry-run': true } });
    expect(usageError(['check', '--dry-run'])).toMatch(/^flag --dry-run is not taken by "check"; its flags: --config, --format/);
    expect(usageError(['apply', '--format', 'json'])).toBe('flag --format is not taken by "apply"; its flags: --dry-run, --config, --help, --version');
  });

  it('--help and --version win over everything else', () => {
    expect(parseArgs(['check', '--bogus', '--help'], commands)).toEqual({ kind: 'help', command: 'check' });
    expect(parseArgs(['-h'], commands)).toEqual({ kind: 'help', command: null });
    expect(parseArgs(['--version'], commands)).toEqual({ kind: 'version' });
    expect(parseArgs(['check', '-v'], commands)).toEqual({ kind: 'version' });
  });

  it.each([
    [['check', '--frobnicate'], /^unknown flag --frobnicate for "check"; its flags: .*--max-depth.*--version$/],
    [['check', '-x'], /^unknown flag "-x"/],
    [['check', '--format', 'xml'], /^flag --format: expected one of text, json, markdown, sarif, html; got "xml"$/],
    [['check', '--format'], /^flag --format needs a value: one of text, json, markdown, sarif, html$/],
    [['check', '--format', '--quiet'], /^flag --format needs a value/],
    [['check', '--format='], /^flag --format needs a value/],
    [['check', '--max-depth', 'three'], /^flag --max-depth: expected a whole number >= 0; got "three"$/],
    [['check', '--max-depth', '-1'], /^flag --max-depth: expected a whole number >= 0; got "-1"$/],
    [['check', '--max-depth', '2.5'], /^flag --max-depth: expected a whole number >= 0; got "2.5"$/],
    [['check', '--fail-on', 'info'], /^flag --fail-on: expected one of error, warning; got "info"$/],
    [['check', '--quiet=yes'], /^flag --quiet takes no value; got "yes"$/],
    [['check', '--output'], /^flag --output needs a value: FILE$/],
    [[], /^missing command; accepted commands: check, suggest, apply/],
    [['--quiet'], /^missing command/],
    [['chek'], /^unknown command "chek"; accepted commands: check, suggest, apply$/],
    [['check', 'a', 'b'], /^unexpected argument "b": "check" takes one content root at most$/],
  ])('%j -> one line naming the problem', (argv, pattern) => {
    const message = usageError(argv);
    expect(message).toMatch(pattern);
    expect(message).not.toContain('\n');
  });
});

describe('helpText', () => {
  it('without a command: every command and how to get its flags', () => {
    const text = helpText(commands, null, '9.9.9');
    expect(text).toContain('linkweave 9.9.9');
    for (const c of commands) expect(text).toMatch(new RegExp(`^  ${c.name} +${c.summary}$`, 'm'));
    expect(text).toContain('linkweave <command> --help lists the flags and exit codes of a command');
    expect(text).not.toContain('--dry-run');
  });

  it('a command help shows its own flags only, and its exit codes', () => {
    const text = helpText(commands, 'apply', '1.0.0');
    expect(text).toContain('Usage: linkweave apply [root] [flags]');
    const flags = [...text.matchAll(/^  (--[a-z-]+)/gm)].map((m) => m[1]);
    expect(flags).toEqual(['--dry-run', '--config', '--help', '--version']);
    expect(text).toContain('Exit codes: 0 applied; 2 usage.');
  });
});
