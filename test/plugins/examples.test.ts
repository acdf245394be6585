/**
 * The README's "three ways to run linkweave" (command, Node API, plugins) as the files under
 * examples/api/ and the command line, run as a user runs them: child processes on the built
 * package (`dist/`, built by the global setup), importing it by its name. The Vite example runs
 * in a temp project that has linkweave and vite in its node_modules, like an installed package.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import type { Report } from '../../src/types.js';

const repo = path.resolve(import.meta.dirname, '../..');
const docsSite = path.join(repo, 'examples/docs-site');
const docsConfig = JSON.parse(fs.readFileSync(path.join(docsSite, 'linkweave.config.json'), 'utf8')) as Record<string, unknown>;
const temp = fs.mkdtempSync(path.join(os.tmpdir(), 'linkweave-examples-'));
afterAll(() => fs.rmSync(temp, { recursive: true, force: true }));

/** Run from a temp working folder, so the examples' cache (`node_modules/.cache/linkweave` of the working folder) is a fresh one. */
const work = fs.mkdtempSync(path.join(os.tmpdir(), 'linkweave-examples-cwd-'));
afterAll(() => fs.rmSync(work, { recursive: true, force: true }));

function run(args: string[], cwd = work) {
  const result = spawnSync(process.execPath, args, { cwd, encoding: 'utf8', env: { ...process.env, NO_COLOR: '1', FORCE_COLOR: '0' } });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** The sidebar of the example site (nav.yml): home and the six section indexes. */
const NAV_ROUTES = ['/', '/getting-started/', '/guides/', '/hardware/', '/concepts/', '/reference/', '/troubleshooting/'];
/** examples/README.md, "Planted problems", the rows in Markdown files: file, line:column, rule. */
const PLANTED_MARKDOWN: readonly [string, string, string][] = [
  ['guides/index.md', '23:3', 'broken-link'],
  ['troubleshooting/index.md', '13:40', 'broken-link'],
  ['hardware/anemometer.md', '29:1', 'broken-link'],
  ['hardware/wiring.md', '10:1', 'broken-link'],
  ['getting-started/quick-start.md', '52:1', 'broken-fragment'],
  ['guides/calibration.md', '25:1', 'broken-fragment'],
  ['hardware/tide-gauge.md', '35:16', 'broken-fragment'],
  ['getting-started/first-week-checklist.md', '1:1', 'orphan-page'],
  ['guides/tide-prediction.md', '1:1', 'orphan-page'],
  ['hardware/solar-panel-sizing.md', '1:1', 'orphan-page'],
  ['troubleshooting/sd-card-recovery.md', '1:1', 'click-depth'],
  ['troubleshooting/log-repair.md', '1:1', 'click-depth'],
  ['concepts/glossary.md', '1:1', 'dead-end'],
];

describe('examples/api', () => {
  it('the command: linkweave check on the example site fails with exit code 1', () => {
    const { status, stdout } = run([path.join(repo, 'dist/cli/bin.js'), 'check', docsSite]);
    expect(status).toBe(1);
    expect(stdout).toMatch(/^This run fails \(exit 1\): broken-fragment 3 errors, /m);
  });

  it('report.mjs: analyze() and formatReport() through the package name print the report summary', () => {
    const { status, stdout, stderr } = run([path.join(repo, 'examples/api/report.mjs')]);
    expect(stderr).toBe('');
    const lines = stdout.split('\n');
    // examples/README.md: 52 files, one a draft (51 pages); planted problems 1-6 are the broken
    // links, 10-13 the orphans; the troubleshooting chain is 5 clicks deep.
    expect(lines[0]).toMatch(/^51 pages, \d+ links, 6 broken links, 4 orphans, deepest page 5 clicks$/);
    // Template links from nav.yml (home and the six section indexes) reach every page: the top three are among them.
    const top = /^Top pages by PageRank: (.*)$/.exec(lines[1]!)![1]!.split(', ');
    expect(top).toHaveLength(3);
    for (const route of top) expect(NAV_ROUTES).toContain(route);
    // 17 planted findings (orphans are not also reported as unreachable, DEVELOPERS.md); the gate fails.
    expect(lines[2]).toMatch(/^17 findings, \d+ suggested links; the run fails$/);
    // The five planted under-linked targets (three orphans, two too deep) each get a suggestion.
    // The five planted under-linked targets (three orphans, two too deep) each get a suggestion.
    expect(Number(/(\d+) suggested/.exec(lines[2]!)![1])).toBeGreaterThanOrEqual(5);
    // The example site is built to fail its gate (examples/README.md): the example exits 1 as the CLI does.
    expect(status).toBe(1);
  });

  it('unified.mjs: a remark pipeline prints the Markdown findings through vfile-reporter', () => {
    const { status, stdout, stderr } = run([path.join(repo, 'examples/api/unified.mjs')]);
    expect(stderr).toBe('');
    expect(status).toBe(0);
    // The planted problems of examples/README.md in Markdown files, at their line and column
    // (page-level ones on the first line).
    for (const [file, place, rule] of PLANTED_MARKDOWN) {
      const block = stdout.split('\n\n').find((b) => b.startsWith(`${file}\n`));
      expect(block, file).toBeDefined();
      expect(block).toMatch(new RegExp(`\\n${place}\\s+(error|warning)\\s[^\\n]*${rule}\\s+linkweave`));
    }
    const errors = PLANTED_MARKDOWN.filter(([, , rule]) => rule !== 'dead-end').length;
    expect(stdout).toContain(`${PLANTED_MARKDOWN.length} messages (✖ ${errors} errors, ⚠ ${PLANTED_MARKDOWN.length - errors} warning${PLANTED_MARKDOWN.length - errors === 1 ? '' : 's'})`);
    expect(stdout.trim().split('\n').at(-1)).toBe('51 pages; the run fails');
  });

  it('vite.config.mjs: `vite build` in a project with linkweave installed checks the built pages', async () => {
    const project = path.join(temp, 'project');
    fs.cpSync(path.join(repo, 'examples/api/site'), path.join(project, 'site'), { recursive: true });
    fs.copyFileSync(path.join(repo, 'examples/api/vite.config.mjs'), path.join(project, 'vite.config.mjs'));
    fs.mkdirSync(path.join(project, 'node_modules'));
    fs.symlinkSync(repo, path.join(project, 'node_modules/linkweave'), 'dir');
    fs.symlinkSync(path.join(repo, 'node_modules/vite'), path.join(project, 'node_modules/vite'), 'dir');

    const { status, stdout, stderr } = run(['node_modules/vite/bin/vite.js', 'build', '--config', 'vite.config.mjs'], project);
    expect(status).toBe(0);
    const outDir = path.join(project, 'site/dist');
    expect(stdout).toContain('linkweave: 3 pages, 8 links, 0 broken links');
    expect(stdout).toContain('The build passes: no errors, no limit crossed.');
    const written = JSON.parse(fs.readFileSync(path.join(outDir, 'linkweave-report.json'), 'utf8')) as Report;
    const direct = await analyze({
      include: ['**/*.html'],
      exclude: ['linkweave-report.json'],
      maxDepth: 2,
      limits: { orphans: 0 },
      cache: { enabled: false },
      root: outDir,
    });
    expect(written).toEqual(JSON.parse(JSON.stringify(direct)));
    expect(written.pages.map((p) => p.route)).toEqual(['/', '/guide/', '/guide/notes.html']);
    // Findings go to Vite's logger.warn (stderr), at their place relative to Vite's root.
    expect(written.findings.length).toBeGreaterThan(0);
    for (const f of written.findings) {
      expect(stderr).toContain(`  dist/${f.file}:${f.line}:${f.column}  ${f.severity}  ${f.message}  (${f.rule})`);
    }
  });
});
