/**
 * The apply command a `suggest` report prints after flags that change the suggestions
 * (--targets, --per-target, --per-source, --max-depth): it repeats those flags, so it runs as
 * printed. Each printed command is run as a process exactly as printed with --dry-run added
 * (which writes nothing, not even the cache), from the repository folder as a newcomer would.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const repo = fileURLToPath(new URL('../..', import.meta.url));
const bin = fileURLToPath(new URL('../../dist/cli/bin.js', import.meta.url));

function linkweave(args: readonly string[]) {
  const r = spawnSync(process.execPath, [bin, ...args], { cwd: repo, encoding: 'utf8', env: { ...process.env, NO_COLOR: '1', FORCE_COLOR: '0' } });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

/** The printed apply command's words, `linkweave` first. */
function printedCommand(stdout: string): string[] {
  const line = stdout.split('\n').find((l) => l.startsWith('  linkweave apply '));
  expect(line).toBeDefined();
  return line!.trim().split(' ');
}

/** The number in "Would apply N links" of a dry run's summary. */
function wouldApply(stderr: string): number {
  const m = /^Would apply (\d+) links? in \d+ files?/m.exec(stderr);
  expect(m, stderr).not.toBeNull();
  return Number(m![1]);
}

describe('the printed apply command after suggestion flags', () => {
  it('names ids that only these flags produce, repeats the flags, and applies every id as printed', () => {
    const plain = linkweave(['suggest', 'examples/docs-site', '--no-cache']);
    const plainIds = new Set(printedCommand(plain.stdout).at(-1)!.split(','));

    const shaped = linkweave(['suggest', 'examples/docs-site', '--no-cache', '--max-depth', '2', '--per-target', '1']);
    const words = printedCommand(shaped.stdout);
    expect(words.join(' ')).toMatch(/^linkweave apply examples\/docs-site --max-depth 2 --per-target 1 --ids [0-9a-f]{12}(,[0-9a-f]{12})*$/);
    const ids = words.at(-1)!.split(',');
    // Some of them are not in a run without the flags: apply without them would not find these.
    const onlyShaped = ids.filter((id) => !plainIds.has(id));
    expect(onlyShaped.length).toBeGreaterThan(0);
    const without = linkweave(['apply', 'examples/docs-site', '--ids', onlyShaped.join(','), '--dry-run']);
    expect(without.code).toBe(2);
    expect(without.stderr).toContain(`no suggestion with id "${onlyShaped[0]}"`);

    const run = linkweave([...words.slice(1), '--dry-run']);
    expect(run.code, run.stderr).toBe(0);
    expect(wouldApply(run.stderr)).toBe(ids.length);
    const added = run.stdout.split('\n').filter((l) => l.startsWith('+') && !l.startsWith('+++'));
    expect(added.join('\n')).toMatch(/\]\([^)]+\)/);
  });

  it('with --targets all (past the listed-id limit, the command says --all) applies at least one link as printed', () => {
    const shaped = linkweave(['suggest', 'examples/docs-site', '--no-cache', '--targets', 'all', '--per-target', '1', '--per-source', '1']);
    const words = printedCommand(shaped.stdout);
    expect(words.join(' ')).toBe('linkweave apply examples/docs-site --targets all --per-target 1 --per-source 1 --all');
    const run = linkweave([...words.slice(1), '--dry-run']);
    expect(run.code, run.stderr).toBe(0);
    expect(wouldApply(run.stderr)).toBeGreaterThanOrEqual(1);
  });
});
