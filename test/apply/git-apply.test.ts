/**
 * The `apply --dry-run` diff checked by git, not by the library that writes it: the README says
 * `git apply` takes it. On the pr-base site with LF line ends and with CRLF line ends, the
 * printed diff passes `git apply --check` in a real git repository, and `git apply` of it gives
 * the same files as a real `apply`.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, describe, expect, it } from 'vitest';
import type { CliIo } from '../../src/cli/io.js';
import { run } from '../../src/cli/run.js';
import type { Report } from '../../src/types.js';
import { tempDir } from '../collect/tree.js';

const fixture = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', 'fixtures', 'pr-base');
const cleanups: (() => void)[] = [];
afterEach(() => {
  while (cleanups.length > 0) cleanups.pop()!();
});

async function cli(cwd: string, argv: string[]) {
  let stdout = '';
  let stderr = '';
  const io: CliIo = { stdout: { write: (s: string) => (stdout += s) }, stderr: { write: (s: string) => (stderr += s) }, cwd, env: {}, isTTY: false };
  const code = await run(argv, io);
  return { code, stdout, stderr };
}

function git(cwd: string, args: string[], input?: string) {
  const r = spawnSync('git', ['-c', 'core.autocrlf=false', '-c', 'user.name=t', '-c', 'user.email=t@t', ...args], { cwd, encoding: 'utf8', ...(input === undefined ? {} : { input }) });
  return { status: r.status, out: `${r.stdout}${r.stderr}` };
}

/** Two copies of the pr-base site under `docs/`, each a git repository; Markdown line ends as given. */
function copies(eol: '\n' | '\r\n'): { dry: string; real: string } {
  const made = ['dry', 'real'].map((name) => {
    const t = tempDir(`linkweave-git-${name}-`);
    cleanups.push(t.cleanup);
    const root = path.join(t.dir, 'docs');
    fs.cpSync(fixture, root, { recursive: true });
    for (const entry of fs.readdirSync(root, { recursive: true, withFileTypes: true })) {
      if (!entry.isFile() || !entry.name.endsWith('.md')) continue;
      const file = path.join(entry.parentPath, entry.name);
      fs.writeFileSync(file, fs.readFileSync(file, 'utf8').replace(/\r?\n/g, eol));
    }
    expect(git(t.dir, ['init', '-q']).status).toBe(0);
    expect(git(t.dir, ['add', '.']).status).toBe(0);
    expect(git(t.dir, ['commit', '-qm', 'site']).status).toBe(0);
    return t.dir;
  });
  return { dry: made[0]!, real: made[1]! };
}

/** Every Markdown file under `dir` with its bytes. */
function markdown(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const entry of fs.readdirSync(dir, { recursive: true, withFileTypes: true })) {
    if (entry.isFile() && entry.name.endsWith('.md')) out[path.relative(dir, path.join(entry.parentPath, entry.name))] = fs.readFileSync(path.join(entry.parentPath, entry.name), 'latin1');
  }
  return out;
}

describe('the --dry-run diff through git apply', () => {
  for (const [name, eol] of [['LF', '\n'], ['CRLF', '\r\n']] as const) {
    it(`${name} sources: git apply --check takes the diff, and git apply gives what apply writes`, async () => {
      const { dry, real } = copies(eol);
      const suggest = await cli(dry, ['suggest', 'docs', '--format', 'json', '--output', 'report.json', '--quiet', '--no-cache']);
      expect(suggest.code).toBe(1);
      const report = JSON.parse(fs.readFileSync(path.join(dry, 'report.json'), 'utf8')) as Report;
      fs.rmSync(path.join(dry, 'report.json'));
      const ids = report.suggestions.filter((s) => s.anchor !== null).map((s) => s.id);
      expect(ids.length).toBeGreaterThan(0);

      const diff = await cli(dry, ['apply', 'docs', '--ids', ids.join(','), '--dry-run']);
      expect(diff.code).toBe(0);
      expect(diff.stdout).toMatch(/^--- a\/docs\//);
      if (eol === '\r\n') expect(diff.stdout).toContain('\r\n');
      const check = git(dry, ['apply', '--check', '-'], diff.stdout);
      expect(check.out).toBe('');
      expect(check.status).toBe(0);
      expect(git(dry, ['apply', '-'], diff.stdout).status).toBe(0);

      const applied = await cli(real, ['apply', 'docs', '--ids', ids.join(',')]);
      expect(applied.code).toBe(0);
      const got = markdown(dry);
      expect(got).toEqual(markdown(real));
      // The change is real, and the line ends of the edited files are kept.
      expect(git(dry, ['diff', '--quiet']).status).toBe(1);
      for (const text of Object.values(got)) expect(text.replace(/\r\n/g, '').includes('\n')).toBe(eol === '\n');
    });
  }
});
