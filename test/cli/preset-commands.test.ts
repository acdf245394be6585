/**
 * The generator preset is read by the pipeline's prepare stage for every command: on a preset
 * fixture (test/fixtures/preset-*), `backtest` and `apply` read the same content folder and the
 * same pages as `check` and `suggest`. Run as processes from the repository folder; nothing is
 * written (--no-cache, and apply --dry-run).
 */
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const repo = fileURLToPath(new URL('../..', import.meta.url));
const bin = fileURLToPath(new URL('../../dist/cli/bin.js', import.meta.url));

function linkweave(args: readonly string[]) {
  const r = spawnSync(process.execPath, [bin, ...args], { cwd: repo, encoding: 'utf8', env: { ...process.env, NO_COLOR: '1', FORCE_COLOR: '0' } });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe.each([
  ['mdbook', 'src', 'read as an mdBook site from book.toml'],
  ['vitepress', 'docs/src', 'read as a VitePress site from docs/.vitepress/config.mts'],
])('preset %s', (name, contentDir, note) => {
  const fixture = `test/fixtures/preset-${name}`;
  const contentRoot = join(repo, fixture, contentDir);

  it('backtest reads the content folder and the pages check reads', () => {
    const check = linkweave(['check', fixture, '--no-cache', '--format', 'json']);
    const report = JSON.parse(check.stdout) as { root: string; pages: { route: string }[] };
    expect(report.root).toBe(contentRoot);

    const bt = linkweave(['backtest', fixture, '--no-cache', '--format', 'json']);
    expect(bt.code, bt.stderr).toBe(0);
    expect(bt.stderr).toContain(`linkweave: ${note}`);
    const result = JSON.parse(bt.stdout) as { root: string; site: { pages: number } };
    expect(result.root).toBe(contentRoot);
    expect(result.site.pages).toBe(report.pages.length);
  });

  it("apply finds every suggestion's source file under the preset's content folder", () => {
    const suggest = linkweave(['suggest', fixture, '--no-cache', '--format', 'json']);
    const report = JSON.parse(suggest.stdout) as { suggestions: { id: string; file: string }[] };
    expect(report.suggestions.length).toBeGreaterThan(0);

    const apply = linkweave(['apply', fixture, '--all', '--dry-run']);
    expect(apply.stderr).toContain(`linkweave: ${note}`);
    // Each suggestion is accounted for under the content folder; none is refused as a missing file.
    expect(apply.stderr).not.toMatch(/does not exist|is not the path of a source file|cannot be read/);
    for (const s of report.suggestions) expect(apply.stderr).toContain(`${fixture}/${contentDir}/${s.file}  id ${s.id}`);
  });
});
