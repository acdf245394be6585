/**
 * The built command run as a child process (`node dist/cli/bin.js`), as a user or CI runs it.
 * dist/ is built once by test/global-setup.ts.
 */
import { spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, describe, expect, it } from 'vitest';
import { tempDir, writeTree } from '../collect/tree.js';
import type { Tree } from '../collect/tree.js';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const bin = path.join(repo, 'dist', 'cli', 'bin.js');
const pkg = JSON.parse(fs.readFileSync(path.join(repo, 'package.json'), 'utf8')) as { version: string };

const cleanups: (() => void)[] = [];
afterEach(() => {
  while (cleanups.length > 0) cleanups.pop()!();
});

/** A project folder (working folder) with the site under `docs/`. */
function project(tree: Tree): { cwd: string; root: string } {
  const t = tempDir('linkweave-cli-');
  cleanups.push(t.cleanup);
  writeTree(t.dir, tree);
  return { cwd: t.dir, root: path.join(t.dir, 'docs') };
}

function cli(args: string[], cwd: string, env: Record<string, string> = {}) {
  const result = spawnSync(process.execPath, [bin, ...args], {
    cwd,
    encoding: 'utf8',
    env: { PATH: process.env.PATH ?? '', NO_COLOR: '1', ...env },
  });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** Three pages linking in a ring plus back to home: nothing to report. */
const CLEAN: Tree = {
  'docs/index.md': '# Home\n\nRead [the guide](guide.md) and [the reference](reference.md).\n',
  'docs/guide.md': '# Guide\n\nSee [the reference](reference.md) or go [home](index.md).\n',
  'docs/reference.md': '# Reference\n\nBack to [the guide](guide.md) and [home](index.md).\n',
};

/** The same site with a broken link on line 3 of guide.md. */
const BROKEN: Tree = {
  ...CLEAN,
  'docs/guide.md': '# Guide\n\nSee [the reference](reference.md), [home](index.md)\nand [the missing page](missing.md).\n',
};

const lines = (text: string) => text.split('\n').filter((l) => l !== '');

describe('linkweave (built command)', () => {
  it('--help prints the usage and exits 0', () => {
    const { cwd } = project({});
    const r = cli(['--help'], cwd);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('Usage: linkweave <command> [root] [flags]');
    expect(r.stdout).toMatch(/^ {2}check +/m);
    expect(r.stdout).toMatch(/^ {2}suggest +/m);
    expect(r.stderr).toBe('');
  });

  it('--version prints the package version and exits 0', () => {
    const { cwd } = project({});
    const r = cli(['--version'], cwd);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe(`${pkg.version}\n`);
  });

  it('exit 0 on a clean site; the JSON report says the gate passed', () => {
    const { cwd } = project(CLEAN);
    const r = cli(['check', 'docs', '--format', 'json'], cwd);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const report = JSON.parse(r.stdout);
    expect(report.schema).toBe('linkweave/report@1');
    expect(report.gate.passed).toBe(true);
    expect(report.pages.map((p: { route: string }) => p.route)).toEqual(['/', '/guide/', '/reference/']);
    expect(report.findings).toEqual([]);
  });

  it('exit 1 when a broken link fails the gate; the finding names file, line and column', () => {
    const { cwd } = project(BROKEN);
    const r = cli(['check', 'docs', '--format', 'json'], cwd);
    expect(r.code).toBe(1);
    const report = JSON.parse(r.stdout);
    expect(report.gate.passed).toBe(false);
    expect(report.findings).toMatchObject([{ rule: 'broken-link', severity: 'error', file: 'guide.md', line: 4, column: 5 }]);
  });

  it('the text report shows file:line:column and exits 1', () => {
    const { cwd } = project(BROKEN);
    const r = cli(['check', 'docs'], cwd);
    expect(r.code).toBe(1);
    // The place as one clickable token: the file from the working folder, then line and column.
    expect(r.stdout).toMatch(/(^|\s)docs\/guide\.md:4:5(\s|$)/m);
    expect(r.stdout).not.toMatch(/\x1b\[/); // NO_COLOR and no terminal: no colour codes
  });

  it('the root defaults to the working folder', () => {
    const { root } = project(CLEAN);
    const r = cli(['check', '--format', 'json'], root);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout).stats.pages).toBe(3);
  });

  it('--output writes the same JSON as stdout, prints only the short summary, and --quiet silences it', () => {
    const { cwd } = project(BROKEN);
    const toStdout = cli(['check', 'docs', '--format', 'json'], cwd);
    const r = cli(['check', 'docs', '--output', 'out/report.json'], cwd);
    expect(r.code).toBe(1);
    const written = fs.readFileSync(path.join(cwd, 'out/report.json'), 'utf8');
    // Format inferred from the extension; byte-identical to the stdout report (deterministic).
    expect(written).toBe(toStdout.stdout);
    // The summary alone: the site's counts, the findings' count and the verdict, no finding listed.
    expect(r.stdout).not.toContain('guide.md');
    expect(lines(r.stdout)).toEqual([
      expect.stringMatching(/^Site: 3 pages, /),
      expect.stringMatching(/^  /),
      'Findings: 1 error and 0 warnings from 1 check',
      'This run fails (exit 1): broken-link 1 error',
    ]);
    expect(r.stderr).toBe('linkweave: report written to out/report.json\n');
    expect(fs.readdirSync(path.join(cwd, 'out'))).toEqual(['report.json']);

    const quiet = cli(['check', 'docs', '--output', 'out/q.json', '--quiet'], cwd);
    expect(quiet.code).toBe(1);
    expect(quiet.stdout).toBe('');
    expect(quiet.stderr).toBe('');
    expect(fs.readFileSync(path.join(cwd, 'out/q.json'), 'utf8')).toBe(toStdout.stdout);
  });

  it('--max-depth and --fail-on override the configuration', () => {
    const { cwd } = project({
      'docs/index.md': '# Home\n\n[One](one.md)\n',
      'docs/one.md': '# One\n\n[Two](two.md) [home](index.md)\n',
      'docs/two.md': '# Two\n\n[Home](index.md)\n',
      'linkweave.config.json': '{"maxDepth": 5}',
    });
    expect(cli(['check', 'docs', '--fail-on', 'warning'], cwd).code).toBe(0);
    const r = cli(['check', 'docs', '--format', 'json', '--max-depth', '1', '--fail-on', 'warning'], cwd);
    expect(r.code).toBe(1);
    expect(JSON.parse(r.stdout).findings).toMatchObject([{ rule: 'click-depth', file: 'two.md' }]);
  });

  it.each([
    ['an unknown key', '{"maxDepht": 3}', /maxDepht/],
    ['a wrong type', '{"maxDepth": "three"}', /key "maxDepth"/],
    ['a wrong enum value', '{"failOn": "info"}', /key "failOn": expected one of "error", "warning"/],
  ])('a config file with %s exits 2 naming the key and the file', (_name, json, key) => {
    const { cwd } = project({ ...CLEAN, 'linkweave.config.json': json });
    const r = cli(['check', 'docs'], cwd);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(lines(r.stderr)).toHaveLength(1);
    expect(r.stderr).toMatch(/^linkweave: linkweave\.config\.json: /);
    expect(r.stderr).toMatch(key);
  });

  it('package.json#linkweave is read and named in messages', () => {
    const { cwd } = project({ ...CLEAN, 'package.json': '{"name":"x","linkweave":{"entry":[]}}' });
    const r = cli(['check', 'docs'], cwd);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^linkweave: package\.json#linkweave: key "entry"/);
  });

  it.each([
    [['check', 'docs', '--frobnicate'], /^linkweave: unknown flag --frobnicate for "check"; its flags: --config, /],
    [['backtest', 'docs', '--fail-on', 'warning'], /^linkweave: flag --fail-on is not taken by "backtest"; its flags: --holdout, /],
    [['check', 'docs', '--format', 'xml'], /^linkweave: flag --format: expected one of text, json, markdown, sarif, html; got "xml"$/],
    [['check', 'docs', '--max-depth', 'deep'], /^linkweave: flag --max-depth: expected a whole number >= 0; got "deep"$/],
    [['publish'], /^linkweave: unknown command "publish"; accepted commands: check, suggest, apply, backtest$/],
    [['check', 'nowhere'], /^linkweave: content root "\/.*nowhere" cannot be opened: no such file \(ENOENT\)$/],
  ])('%j exits 2 with one line', (args, message) => {
    const { cwd } = project(CLEAN);
    const r = cli(args, cwd);
    expect(r.code).toBe(2);
    expect(lines(r.stderr)).toHaveLength(1);
    expect(r.stderr.trimEnd()).toMatch(message);
    expect(r.stdout).toBe('');
  });

  it('refuses to write the report over a source file in the content root', () => {
    const { cwd } = project(CLEAN);
    const before = fs.readFileSync(path.join(cwd, 'docs/guide.md'), 'utf8');
    const r = cli(['check', 'docs', '--output', 'docs/guide.md'], cwd);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^linkweave: flag --output: refusing to write "docs\/guide\.md"/);
    expect(fs.readFileSync(path.join(cwd, 'docs/guide.md'), 'utf8')).toBe(before);
  });

  it('an output path that is a folder exits 2 and leaves no temp file', () => {
    const { cwd } = project({ ...CLEAN, 'out/report.json/keep.txt': 'keep' });
    const r = cli(['check', 'docs', '--output', 'out/report.json'], cwd);
    expect(r.code).toBe(2);
    expect(r.stderr).toBe('linkweave: cannot write "out/report.json": it is a folder (EISDIR)\n');
    expect(fs.readdirSync(path.join(cwd, 'out'))).toEqual(['report.json']);
  });

  it.each([
    ['SIGINT', 130],
    ['SIGTERM', 143],
  ] as const)('%s mid-run exits %i and leaves the previous report whole, with no temp file', async (signal, exitCode) => {
    // The configuration module signals that the run has started (handlers are installed before
    // it loads) and then keeps the run waiting, so the signal lands mid-run every time.
    const { cwd } = project({
      ...CLEAN,
      'slow.config.mjs': "import fs from 'node:fs';\nfs.writeFileSync('started', '');\nawait new Promise((r) => setTimeout(r, 60_000));\nexport default {};\n",
      'out/report.json': '{"previous": true}\n',
    });
    const child = spawn(process.execPath, [bin, 'check', 'docs', '--config', 'slow.config.mjs', '--output', 'out/report.json'], {
      cwd,
      env: { PATH: process.env.PATH ?? '' },
    });
    let stderr = '';
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    let exited = false;
    const closed = new Promise<number | null>((r) =>
      child.on('close', (c) => {
        exited = true;
        r(c);
      }),
    );
    while (!exited && !fs.existsSync(path.join(cwd, 'started'))) await new Promise((r) => setTimeout(r, 20));
    expect(exited).toBe(false);
    // To the first process only, as a CI system's time-out sends it: it reaches the command
    // also when that runs in a child with a larger heap (src/cli/bin.ts).
    child.kill(signal);
    expect(await closed).toBe(exitCode);
    expect(stderr).toContain(`linkweave: interrupted (${signal})`);
    expect(fs.readdirSync(path.join(cwd, 'out'))).toEqual(['report.json']);
    expect(fs.readFileSync(path.join(cwd, 'out/report.json'), 'utf8')).toBe('{"previous": true}\n');
  });
});
