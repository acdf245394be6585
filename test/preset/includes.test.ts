/**
 * Links inside included files: the generator pastes the included text into the page before it
 * renders it, so a link written in an included file is a link of the including page, resolved
 * from that page (not from the included file's folder), and reported where it is written (the
 * included file, its line and column).
 *
 * - mdBook (rust-lang.github.io/mdBook/format/mdbook.html, "Including files", from memory): the
 *   `{{#include}}` path is relative to the chapter; the included text's links are the chapter's.
 * - MkDocs with pymdownx.snippets: checked by a real build where mkdocs and pymdownx are installed
 *   (the snippet's `../install.md`, pasted into guide/page.md, is written `../../install/`).
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import type { Report } from '../../src/types.js';

const temps: string[] = [];
afterAll(() => {
  for (const t of temps) fs.rmSync(t, { recursive: true, force: true });
});

function site(files: Record<string, string>): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'lw-includes-'));
  temps.push(dir);
  for (const [name, text] of Object.entries(files)) {
    fs.mkdirSync(path.dirname(path.join(dir, name)), { recursive: true });
    fs.writeFileSync(path.join(dir, name), text);
  }
  return dir;
}

async function check(root: string): Promise<Report> {
  return analyze({ root, cache: { enabled: false }, workers: 1 });
}

const linksIn = (r: Report, file: string) => r.links.filter((l) => l.file === file).map((l) => `${l.from} ${l.line}:${l.column} ${l.to} ${l.status}`);

describe('links inside included files', () => {
  it('mdBook: the included text links from the chapter that includes it', async () => {
    const root = site({
      'book.toml': '[book]\ntitle = "B"\n',
      'src/SUMMARY.md': '# Summary\n\n- [A](chapter/a.md)\n- [B](chapter/b.md)\n- [C](c.md)\n',
      'src/chapter/a.md': '# A\n\nBefore.\n\n{{#include ../shared/part.md}}\n',
      'src/chapter/b.md': '# B\n\nNothing.\n',
      'src/c.md': '# C\n\n## Deep\n\nText.\n',
      // Written as if from chapter/: b.md is chapter/b.md, not shared/b.md.
      'src/shared/part.md': 'Go on to [B](b.md),\nthen [C](../c.md#deep) and [nowhere](gone.md).\n',
    });
    const report = await check(root);
    expect(linksIn(report, 'shared/part.md')).toEqual([
      '/chapter/a.html 1:10 /chapter/b.html ok',
      '/chapter/a.html 2:6 /c.html#deep ok',
      '/chapter/a.html 2:28 chapter/gone.md broken',
    ]);
    // The included file is no page; the broken link is reported in it, at its own line.
    expect(report.pages.map((p) => p.file)).not.toContain('shared/part.md');
    expect(report.findings.filter((f) => f.rule === 'broken-link').map((f) => `${f.file}:${f.line}:${f.column}`)).toEqual(['shared/part.md:2:28']);
  });

  it('MkDocs snippets: the snippet path is read from the project folder, its links from the including page', async () => {
    const root = site({
      'mkdocs.yml': 'site_name: S\nmarkdown_extensions:\n  - pymdownx.snippets\nnav:\n  - index.md\n  - install.md\n  - guide/page.md\n',
      'docs/index.md': '# Home\n',
      'docs/install.md': '# Install\n',
      'docs/guide/page.md': '# Page\n\n--8<-- "docs/snippets/links.md"\n',
      'docs/snippets/links.md': 'See [install](../install.md) and [home](../index.md).\n',
    });
    const report = await check(root);
    // mkdocs also builds the snippet file in docs/ as a page of its own (test/preset/mkdocs-snippets.test.ts).
    expect(linksIn(report, 'snippets/links.md')).toEqual(['/guide/page/ 1:5 /install/ ok', '/guide/page/ 1:34 / ok', '/snippets/links/ 1:5 /install/ ok', '/snippets/links/ 1:34 / ok']);

    const hasBuild = spawnSync('python3', ['-c', 'import mkdocs, pymdownx']).status === 0;
    if (!hasBuild) {
      console.warn('NOTICE: mkdocs or pymdownx is not installed: the snippets build check is skipped (apt-get install mkdocs python3-pymdownx)');
      return;
    }
    const out = path.join(root, 'site');
    const r = spawnSync('mkdocs', ['build', '-q', '-f', path.join(root, 'mkdocs.yml'), '-d', out], { cwd: root, encoding: 'utf8', timeout: 120_000 });
    expect(r.status, `mkdocs failed:\n${r.stdout}\n${r.stderr}`).toBe(0);
    const html = fs.readFileSync(path.join(out, 'guide', 'page', 'index.html'), 'utf8');
    const body = html.slice(html.indexOf('See '));
    // ../../install/ and ../../ from /guide/page/: the routes linkweave gives.
    expect([...body.matchAll(/href="([^"]+)"/g)].slice(0, 2).map((m) => new URL(m[1]!, 'https://x.test/guide/page/').pathname)).toEqual(['/install/', '/']);
  });
});
