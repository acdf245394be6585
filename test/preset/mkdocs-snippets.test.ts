/**
 * MkDocs and pymdownx.snippets on an invented project, worked out by hand and compared with
 * Debian's mkdocs 1.4 and pymdownx 9.5 where they are installed (skipped, with a notice,
 * otherwise): every Markdown file in docs_dir is a page, snippet files too; README.md beside
 * index.md is skipped; snippets are read from the `base_path` folders.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import { tempDir, writeTree } from '../collect/tree.js';

const temps: string[] = [];
afterAll(() => {
  for (const t of temps) fs.rmSync(t, { recursive: true, force: true });
});

const FILES: Record<string, string> = {
  'mkdocs.yml': 'site_name: S\nmarkdown_extensions:\n  - pymdownx.snippets:\n      base_path: ["docs/snippets", "parts"]\nnav:\n  - index.md\n  - guide/page.md\n',
  'docs/index.md': '# Home\n\n--8<-- "abbr.md"\n',
  'docs/README.md': '# Readme\n',
  'docs/guide/page.md': '# Page\n\n--8<-- "links.md"\n\n--8<-- "outer.md"\n',
  'docs/snippets/links.md': 'See [home](../index.md) and [a part](../index.md#no-part).\n',
  'docs/snippets/abbr.md': '*[HTML]: Hyper Text Markup Language\n',
  'docs/.drafts/later.md': '# Later\n',
  'parts/outer.md': 'Outer [x](../index.md)\n',
};

function project(): string {
  const { dir } = tempDir('lw-snippets-');
  temps.push(dir);
  writeTree(dir, FILES);
  return dir;
}

describe('MkDocs snippets', () => {
  it('snippet files in docs/ are pages, base_path folders are read, README.md beside index.md is left out', async () => {
    const root = project();
    const notes: string[] = [];
    const report = await analyze({ root, cache: { enabled: false }, workers: 1 }, { onNote: (m) => notes.push(m) });
    expect(report.pages.map((p) => `${p.route} ${p.file}`)).toEqual(['/ index.md', '/guide/page/ guide/page.md', '/snippets/abbr/ snippets/abbr.md', '/snippets/links/ snippets/links.md']);
    // links.md is found in docs/snippets (base_path): its links are the including page's too.
    expect(report.links.filter((l) => l.file === 'snippets/links.md').map((l) => `${l.from} ${l.to} ${l.status}`)).toEqual([
      '/guide/page/ / ok',
      '/guide/page/ /#no-part broken-fragment',
      '/snippets/links/ / ok',
      '/snippets/links/ /#no-part broken-fragment',
    ]);
    // outer.md is in parts/ (base_path), outside the docs: the run says so once.
    expect(notes).toContain('guide/page.md:5:1: included file "outer.md" is outside the sources; its ids and links are unknown');
    expect(report.findings.filter((f) => f.rule === 'duplicate-route').map((f) => f.file)).toEqual(['README.md']);
    // Two pages render the snippet's broken fragment; it is fixed in one place, and said once.
    expect(report.findings.filter((f) => f.rule === 'broken-fragment').map((f) => `${f.file}:${f.line}:${f.column}`)).toEqual(['snippets/links.md:1:29']);
  });

  const mkdocs = spawnSync('mkdocs', ['--version'], { encoding: 'utf8' }).status === 0;
  if (!mkdocs) console.warn('NOTICE: mkdocs is not installed: the snippets build check is skipped (apt-get install mkdocs python3-pymdownx)');
  it.skipIf(!mkdocs)('mkdocs builds the same pages', () => {
    const root = project();
    const out = path.join(root, 'site');
    const r = spawnSync('mkdocs', ['build', '-q', '-d', out], { cwd: root, encoding: 'utf8', timeout: 120_000 });
    if (r.status !== 0 && /No module named 'pymdownx'|pymdownx/.test(r.stderr)) {
      console.warn('NOTICE: pymdownx is not installed for mkdocs: the snippets build check is skipped (apt-get install python3-pymdownx)');
      return;
    }
    expect(r.status, `mkdocs failed:\n${r.stdout}\n${r.stderr}`).toBe(0);
    const pages = fs
      .readdirSync(out, { recursive: true, encoding: 'utf8' })
      .filter((f) => f.endsWith('index.html'))
      .map((f) => `/${f.split(path.sep).join('/').replace(/index\.html$/, '')}`)
      .sort();
    expect(pages).toEqual(['/', '/guide/page/', '/snippets/abbr/', '/snippets/links/']);
    // The snippets were pasted in: base_path is read as linkweave reads it.
    const page = fs.readFileSync(path.join(out, 'guide', 'page', 'index.html'), 'utf8');
    expect(page).toContain('See <a href="../../">home</a>');
    expect(page).toContain('Outer <a href="../../">x</a>');
    expect(fs.readFileSync(path.join(out, 'index.html'), 'utf8')).not.toContain('Readme');
  });
});
