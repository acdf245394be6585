import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import { readPreset, staticValue } from '../../src/preset/index.js';

const dirs: string[] = [];
afterEach(() => {
  for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
});

/** A tree written from an object literal to a temp folder (with .git, so the walk stops there). */
function tree(files: Record<string, string>): string {
  const root = mkdtempSync(join(tmpdir(), 'lw-preset-'));
  dirs.push(root);
  mkdirSync(join(root, '.git'));
  for (const [path, text] of Object.entries(files)) {
    mkdirSync(dirname(join(root, path)), { recursive: true });
    writeFileSync(join(root, path), text);
  }
  return root;
}

describe('detection', () => {
  it('each generator is found by its own config file', () => {
    const cases: [string, Record<string, string>][] = [
      ['mdbook', { 'book.toml': '[book]\n' }],
      ['mkdocs', { 'mkdocs.yml': 'site_name: x\n' }],
      ['docusaurus', { 'docusaurus.config.ts': 'export default { baseUrl: "/" }\n' }],
      ['vitepress', { '.vitepress/config.ts': 'export default {}\n' }],
      ['hugo', { 'hugo.yaml': 'title: x\n' }],
      ['hugo', { 'config/_default/hugo.toml': 'title = "x"\n' }],
      ['hugo', { 'config.toml': 'title = "x"\n', 'content/a.md': '# A\n' }],
      ['jekyll', { '_config.yml': 'title: x\n' }],
    ];
    for (const [name, files] of cases) expect(readPreset(tree(files), 'auto')?.site.name, JSON.stringify(files)).toBe(name);
  });

  it('config.toml without a Hugo layout is not taken for a Hugo site', () => {
    expect(readPreset(tree({ 'config.toml': 'x = 1\n' }), 'auto')).toBeNull();
  });

  it('two generator configs: the nearer one wins and the summary says which it passed over', () => {
    const root = tree({ 'mkdocs.yml': 'site_name: outer\n', 'book/book.toml': '[book]\nsrc = "pages"\n', 'book/pages/a.md': '# A\n' });
    const found = readPreset(join(root, 'book'), 'auto')!;
    expect(found.site.name).toBe('mdbook');
    expect(found.summary).toBe('read as an mdBook site from book.toml: pages/; the nearer config wins over ../mkdocs.yml');
    expect(found.contentRoot).toBe(join(root, 'book', 'pages'));
  });

  it('one folder with two configs: the more specific file wins, and it is said', () => {
    const found = readPreset(tree({ '_config.yml': 'title: x\n', 'mkdocs.yml': 'site_name: x\n' }), 'auto')!;
    expect(found.site.name).toBe('mkdocs');
    expect(found.summary).toContain('the nearer config wins over _config.yml');
  });

  it('the walk stops at the repository root (a folder holding .git)', () => {
    const root = tree({ 'repo/.git/HEAD': 'ref\n', 'book.toml': '[book]\n', 'repo/docs/a.md': '# A\n' });
    expect(readPreset(join(root, 'repo', 'docs'), 'auto')).toBeNull();
  });

  it('--preset NAME reads that generator even where another config is nearer; none reads nothing', () => {
    const root = tree({ 'mkdocs.yml': 'site_name: x\ndocs_dir: pages\n', '_config.yml': 'title: x\n' });
    expect(readPreset(root, 'jekyll')?.site.name).toBe('jekyll');
    expect(readPreset(root, 'none')).toBeNull();
  });
});

describe('never running the site code', () => {
  it('a JavaScript config value that is not a literal falls back to the default, and the summary says so', () => {
    const root = tree({
      'docusaurus.config.js': "const base = process.env.BASE;\nmodule.exports = { baseUrl: base, title: 'x' };\nrequire('fs').writeFileSync('ran', 'yes');\n",
      'docs/a.md': '# A\n',
    });
    const found = readPreset(root, 'auto')!;
    expect(found.site.notes).toEqual(['baseUrl is not a literal in docusaurus.config.js (base, title: \'x\' };); "/" used']);
    expect(found.summary).toContain('\n  baseUrl is not a literal');
    expect(found.site.config.routes?.basePath).toBe('/');
  });
  it('literal values are read: strings, booleans, arrays and objects of literals; comments skipped', () => {
    const src = "// base: '/no/'\nexport default defineConfig({ base: '/kit/', /* srcDir: 'x' */ srcDir: `src`, cleanUrls: true, nav: [{ text: 'A', link: '/a' },] })";
    expect(staticValue(src, 'base')).toEqual({ kind: 'literal', value: '/kit/' });
    expect(staticValue(src, 'srcDir')).toEqual({ kind: 'literal', value: 'src' });
    expect(staticValue(src, 'cleanUrls')).toEqual({ kind: 'literal', value: true });
    expect(staticValue(src, 'nav')).toEqual({ kind: 'literal', value: [{ text: 'A', link: '/a' }] });
    expect(staticValue('x = { base: `/${v}/` }', 'base')?.kind).toBe('dynamic');
  });
});

describe('link scope (analyze on a site written here)', () => {
  it('outside-the-content and templated links are never broken-link findings and are listed with positions', async () => {
    const root = tree({
      'a.md': '# A\n\n[b](b.md) [up](../../other/x.html) [site](/elsewhere/page/)\n[mounted](/docs/api/x/) [tpl]({{site.url}}/x) <a href="<%= url %>">erb</a>\n[missing](nope.md)\n',
      'b.md': '# B\n\n[a](a.md)\n',
    });
    const report = await analyze({ root, preset: 'none', routes: { basePath: '/docs/' }, outside: ['/docs/api/'], cache: { enabled: false }, workers: 1 });
    const listed = report.links.map((l) => `${l.status} ${l.line}:${l.column} ${l.to}`);
    expect(listed).toEqual([
      'ok 3:1 /docs/b/',
      'outside 3:11 /other/x.html',
      'outside 3:36 /docs/elsewhere/page/',
      'outside 4:1 /docs/api/x/',
      'templated 4:25 {{site.url}}/x',
      'templated 4:47 <%= url %>',
      'broken 5:1 nope.md',
      'ok 3:1 /docs/a/',
    ]);
    expect(report.findings.filter((f) => f.rule === 'broken-link').map((f) => `${f.line}:${f.column}`)).toEqual(['5:1']);
    expect(report.stats).toMatchObject({ outsideLinks: 3, templatedLinks: 2, brokenLinks: 1 });
  });
});
