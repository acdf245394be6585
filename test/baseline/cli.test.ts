/** `--baseline`, `--write-baseline` and `--compare` through `run()`: files, messages, exit codes. */
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, describe, expect, it } from 'vitest';
import type { CliIo } from '../../src/cli/io.js';
import { run } from '../../src/cli/run.js';
import type { Report } from '../../src/types.js';
import { tempDir } from '../collect/tree.js';

const fixtures = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', 'fixtures');
const cleanups: (() => void)[] = [];
afterEach(() => {
  while (cleanups.length > 0) cleanups.pop()!();
});

/** A working folder with both fixture versions copied in (`base/`, `head/`). */
function project(): string {
  const t = tempDir('linkweave-review-');
  cleanups.push(t.cleanup);
  fs.cpSync(path.join(fixtures, 'pr-base'), path.join(t.dir, 'base'), { recursive: true });
  fs.cpSync(path.join(fixtures, 'pr-head'), path.join(t.dir, 'head'), { recursive: true });
  return t.dir;
}

async function cli(cwd: string, ...argv: string[]) {
  let stdout = '';
  let stderr = '';
  const io: CliIo = { stdout: { write: (s: string) => (stdout += s) }, stderr: { write: (s: string) => (stderr += s) }, cwd, env: {}, isTTY: false };
  const code = await run([...argv, '--no-cache'], io);
  return { code, stdout, stderr };
}

describe('review flags', () => {
  it('--write-baseline writes the findings (the same bytes every run); --baseline passes on known findings, fails on new ones', async () => {
    const cwd = project();
    const first = await cli(cwd, 'check', 'base', '--write-baseline', 'ci/baseline.json');
    expect(first.code).toBe(1);
    expect(first.stderr).toContain('linkweave: baseline of 4 findings written to ci/baseline.json');
    const text = fs.readFileSync(path.join(cwd, 'ci/baseline.json'), 'utf8');
    expect(JSON.parse(text)).toMatchObject({ schema: 'linkweave/baseline@1' });
    await cli(cwd, 'check', 'base', '--write-baseline', 'ci/again.json', '--quiet');
    expect(fs.readFileSync(path.join(cwd, 'ci/again.json'), 'utf8')).toBe(text);
    expect(fs.readdirSync(path.join(cwd, 'ci')).sort()).toEqual(['again.json', 'baseline.json']);

    const same = await cli(cwd, 'check', 'base', '--baseline', 'ci/baseline.json');
    expect(same.code).toBe(0);
    expect(same.stdout).toContain('This run passes (exit 0)');

    const head = await cli(cwd, 'check', 'head', '--baseline', 'ci/baseline.json', '--format', 'json');
    expect(head.code).toBe(1);
    const report = JSON.parse(head.stdout) as Report;
    expect(report.gate.failures).toEqual([{ rule: 'broken-link', limit: 0, actual: 1 }]);
    expect(report.baseline!.new.map((f) => f.file)).toEqual(['guide/faq.md']);
    expect(report.baseline!.fixed.map((f) => f.route)).toEqual(['/notes/legacy/']);
  });

  it('the text output lists new and fixed findings against the baseline', async () => {
    const cwd = project();
    await cli(cwd, 'check', 'base', '--write-baseline', 'b.json', '--quiet');
    const r = await cli(cwd, 'check', 'head', '--baseline', 'b.json');
    expect(r.stdout).toContain('Against the baseline: 3 known, 1 new, 1 fixed');
    expect(r.stdout).toMatch(/New \(1\):\n {2}head\/guide\/faq\.md:3:34 {2}broken-link/);
    expect(r.stdout).toMatch(/Fixed \(1\):\n {2}head\/notes\/legacy\.md:1:1 {2}orphan-page/);
  });

  it('--compare adds the comparison to the report and the outputs; the gate stays as it is', async () => {
    const cwd = project();
    await cli(cwd, 'suggest', 'base', '--format', 'json', '--output', 'base.json', '--quiet');
    const json = await cli(cwd, 'suggest', 'head', '--compare', 'base.json', '--format', 'json');
    expect(json.code).toBe(1);
    const report = JSON.parse(json.stdout) as Report;
    expect(report.comparison!.pagesAdded).toEqual([{ route: '/guide/faq/', file: 'guide/faq.md' }]);
    expect(report.gate.failures.map((f) => f.rule)).toEqual(['broken-fragment', 'broken-link', 'orphan-page']);
    const text = await cli(cwd, 'suggest', 'head', '--compare', 'base.json');
    expect(text.stdout).toContain('Compared with the base report: 1 new finding, 1 fixed, 1 page added, 1 removed');
    expect(text.stdout).toMatch(/\/reference\/codes\/ {2}rank 0\.93 -> 1\.26, depth 2 -> 1/);
  });

  it('exit 2 naming the file for a missing or malformed baseline or base report, or a baseline written over a source', async () => {
    const cwd = project();
    fs.writeFileSync(path.join(cwd, 'broken.json'), '{\n  "schema": "linkweave/baseline@1",\n  "findings": [\n    { "rule": "x" ]\n}\n');
    fs.writeFileSync(path.join(cwd, 'shape.json'), JSON.stringify({ schema: 'linkweave/baseline@1', findings: [{ rule: 'x' }] }));
    fs.writeFileSync(path.join(cwd, 'baseline-not-report.json'), JSON.stringify({ schema: 'linkweave/baseline@1', findings: [] }));
    const cases: [string[], RegExp][] = [
      [['check', 'head', '--baseline', 'nope.json'], /^linkweave: flag --baseline: cannot read "nope\.json": no such file\n$/],
      [['check', 'head', '--baseline', 'broken.json'], /^linkweave: broken\.json: not valid JSON at line 4, column 19: /],
      [['check', 'head', '--baseline', 'shape.json'], /^linkweave: shape\.json: key "findings\.0\.severity": /],
      [['check', 'head', '--compare', 'nope.json'], /^linkweave: flag --compare: cannot read "nope\.json": no such file/],
      [['suggest', 'head', '--compare', 'baseline-not-report.json'], /key "schema": expected "linkweave\/report@1"/],
      [['check', 'head', '--write-baseline', 'head/baseline.md'], /flag --write-baseline: refusing to write "head\/baseline\.md": it is inside the content root/],
    ];
    for (const [argv, message] of cases) {
      const r = await cli(cwd, ...argv);
      expect(r.code, argv.join(' ')).toBe(2);
      expect(r.stderr).toMatch(message);
      expect(r.stdout).toBe('');
    }
    expect(fs.existsSync(path.join(cwd, 'head/baseline.md'))).toBe(false);
  });
});
