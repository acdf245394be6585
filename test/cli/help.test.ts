/**
 * Every command's help lists the flags that command takes and no other, and every flag a
 * command does not take is refused with exit 2 and one line (run in-process through `run()`,
 * the same function bin.js calls).
 */
import { describe, expect, it } from 'vitest';
import { flagsOf } from '../../src/cli/args.js';
import { COMMANDS } from '../../src/cli/commands.js';
import { run } from '../../src/cli/run.js';

async function runCli(argv: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await run(argv, {
    stdout: { write: (s: string) => (stdout += s) },
    stderr: { write: (s: string) => (stderr += s) },
    cwd: '/nonexistent-linkweave-help',
    env: {},
    isTTY: false,
  });
  return { code, stdout, stderr };
}

const everyFlag = [...new Set(COMMANDS.flatMap((c) => flagsOf(c).map((f) => f.name)))].sort();

describe.each(COMMANDS.map((c) => [c.name, c] as const))('%s', (name, command) => {
  const own = flagsOf(command).map((f) => f.name);

  it('--help lists exactly the flags the command takes, and its exit codes', async () => {
    const r = await runCli([name, '--help']);
    expect(r.code).toBe(0);
    const listed = [...r.stdout.matchAll(/^ {2}--([a-z-]+)/gm)].map((m) => m[1]);
    expect(listed).toEqual(own);
    expect(r.stdout).toMatch(/^Exit codes: 0 /m);
  });

  const refused = everyFlag.filter((f) => !own.includes(f));
  it.each(refused.length > 0 ? refused : ['(none)'])('refuses --%s with exit 2 and one line', async (flag) => {
    if (flag === '(none)') return;
    const spec = COMMANDS.flatMap((c) => c.flags).find((f) => f.name === flag)!;
    const value = spec.kind === 'boolean' ? [] : [spec.choices?.[0] ?? (spec.minInteger !== undefined ? '1' : 'x')];
    const r = await runCli([name, `--${flag}`, ...value]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toBe(`linkweave: flag --${flag} is not taken by "${name}"; its flags: ${own.map((f) => `--${f}`).join(', ')}\n`);
  });
});

describe('the flags of the commands', () => {
  it('backtest offers only the formats it writes; apply has no report flags but the suggestion-shaping ones', () => {
    const backtest = COMMANDS.find((c) => c.name === 'backtest')!;
    expect(backtest.flags.find((f) => f.name === 'format')?.choices).toEqual(['text', 'json']);
    const apply = flagsOf(COMMANDS.find((c) => c.name === 'apply')!).map((f) => f.name);
    for (const flag of ['fail-on', 'format', 'output', 'baseline']) expect(apply).not.toContain(flag);
    // A printed apply command repeats these, so apply takes what suggest took.
    expect(apply).toEqual(expect.arrayContaining(['max-depth', 'preset', 'targets', 'per-target', 'per-source']));
  });

  it('suggest takes --targets, --per-target and --per-source; check does not', () => {
    const names = (n: string) => flagsOf(COMMANDS.find((c) => c.name === n)!).map((f) => f.name);
    expect(names('suggest')).toEqual(expect.arrayContaining(['targets', 'per-target', 'per-source']));
    expect(names('check')).not.toContain('targets');
  });
});

describe('withFlags: the suggest flags map to their configuration keys', () => {
  it('--targets, --per-target and --per-source (0 = no cap) set suggest.targets, .perTarget and .perSource over the file', async () => {
    const { withFlags } = await import('../../src/cli/run.js');
    const merged = withFlags({ suggest: { minSimilarity: 0.2, perTarget: 9 } }, { targets: 'all', 'per-target': 2, 'per-source': 0 });
    expect(merged.suggest).toEqual({ minSimilarity: 0.2, perTarget: 2, targets: 'all', perSource: 0 });
    expect(withFlags({ suggest: { perTarget: 9 } }, {}).suggest).toEqual({ perTarget: 9 });
  });
});
