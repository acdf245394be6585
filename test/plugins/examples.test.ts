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

function run(args: string[], cwd = repo) {
  const result = spawnSync(process.execPath, args, { cwd, encoding: 'utf8', env: { ...process.env, NO_COLOR: '1', FORCE_COLOR: '0' } });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

describe('examples/api', () => {
  it('the command: linkweave check on the example site fails with exit code 1', () => {
    const { status, stdout } = run(['dist/cli/bin.js', 'check', 'examples/docs-site']);
    expect(status).toBe(1);
    expect(stdout).toMatch(/^This run fails \(exit 1\): broken-fragment 3 errors, /m);
  });

  it('report.mjs: analyze() and formatReport() through the package name print the report summary', async () => {
    const { status, stdout, stderr } = run(['examples/api/report.mjs']);
    expect(stderr).toBe('');
    const report = await analyze({ ...docsConfig, root: docsSite, command: 'suggest', cache: { enabled: false } });
    const { stats } = report;
    const top = [...report.pages].sort((a, b) => b.pagerank - a.pagerank).slice(0, 3);
    expect(stdout.split('\n').slice(0, 3)).toEqual([
      `${stats.pages} pages, ${stats.links} links, ${stats.brokenLinks} broken links, ${stats.orphans} orphans, deepest page ${stats.maxDepth} clicks`,
      `Top pages by PageRank: ${top.map((p) => p.route).join(', ')}`,
      `${report.findings.length} findings, ${report.suggestions.length} suggested links; the run fails`,
    ]);
    // The example site is built to fail its gate (examples/README.md): the example exits 1 as the CLI does.
    expect(report.gate.passed).toBe(false);
    expect(status).toBe(1);
  });

  it('unified.mjs: a remark pipeline prints the Markdown findings through vfile-reporter', async () => {
    const { status, stdout, stderr } = run(['examples/api/unified.mjs']);
    expect(stderr).toBe('');
    expect(status).toBe(0);
    const report = await analyze({ ...docsConfig, root: docsSite, cache: { enabled: false } });
    const markdown = report.findings.filter((f) => f.file.endsWith('.md'));
    expect(markdown.length).toBeGreaterThan(0);
    for (const f of markdown) {
      const block = stdout.split('\n\n').find((b) => b.startsWith(`${f.file}\n`));
      expect(block, f.file).toBeDefined();
      expect(block).toMatch(new RegExp(`\\n${f.line}:${f.column}\\s+${f.severity}\\s[^\\n]*${f.rule}\\s+linkweave`));
    }
    const errors = markdown.filter((f) => f.severity === 'error').length;
    const warnings = markdown.length - errors;
    expect(stdout).toContain(`${markdown.length} messages (✖ ${errors} errors, ⚠ ${warnings} warning${warnings === 1 ? '' : 's'})`);
    expect(stdout.trim().split('\n').at(-1)).toBe(`${report.stats.pages} pages; the run fails`);
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
