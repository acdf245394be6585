/**
 * What the real Jekyll and Docusaurus trees (bench/corpora.sh: Jekyll's own docs, the Docusaurus
 * classic template) showed, each on a small invented site worked out by hand. The Jekyll one is
 * also built with Debian's jekyll 4.3 under TZ=UTC where it is installed (skipped, with a notice,
 * otherwise); Docusaurus is not installed here, its rules are from its documentation (from memory).
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import { tempDir, writeTree } from '../collect/tree.js';
import type { Report } from '../../src/types.js';

const temps: string[] = [];
afterAll(() => {
  for (const t of temps) fs.rmSync(t, { recursive: true, force: true });
});

function site(files: Record<string, string>): string {
  const { dir } = tempDir('lw-trees-');
  temps.push(dir);
  writeTree(path.join(dir, 'site'), files);
  return path.join(dir, 'site');
}

async function check(root: string): Promise<{ report: Report; notes: string[] }> {
  const notes: string[] = [];
  const report = await analyze({ root, cache: { enabled: false }, workers: 1 }, { onNote: (m) => notes.push(m) });
  return { report, notes };
}

const statuses = (r: Report) => r.links.map((l) => `${l.status} ${l.file}:${l.line} ${l.to}`);

const JEKYLL: Record<string, string> = {
  '_config.yml': 'title: Grove\n',
  '_layouts/default.html': '<html><body>{% include nav.html %}{{ content }}<link href="/css/site.css" rel="stylesheet"></body></html>\n',
  '_includes/nav.html': '<nav><a href="/">Home</a> <a href="/guide/start.html">Start</a> <a href="{{ site.baseurl }}/guide/tools.html">Tools</a> <a href="{{ page.url }}">here</a></nav>\n',
  'index.md': '---\nlayout: default\n---\nThe [first post](/2024/03/01/late-night.html).\n',
  'guide/start.md': '---\nlayout: default\n---\n# Start\n\n## 1.0 / 2024\n{: #v1-0}\n\nSee [the release](#v1-0).\n',
  'guide/tools.md': '---\nlayout: default\n---\n# Tools\n',
  'guide/notes.md': '# Notes\n\nNo front matter: copied as it is.\n',
  '_posts/2024-02-29-late-night.md': '---\nlayout: default\ntitle: Late night\ndate: "2024-02-29 22:30:00 -0500"\n---\nBack to [start](/guide/start.html#v1-0).\n',
};

describe('Jekyll', () => {
  it('no front matter: no page; layouts and their includes link every page; a dated post in UTC; {: #id} lines', async () => {
    const { report, notes } = await check(site(JEKYLL));
    expect(notes[0]).toBe(
      'read as a Jekyll site from _config.yml: ./, _posts/, 3 links in 2 layout files\n  1 file with no front matter copied as it is, not pages (guide/notes.md)',
    );
    // _includes/nav.html is no page (its computed link is not known); guide/notes.md is copied; the post is under 2024/03/01 (22:30 -0500 is 03:30 UTC).
    expect(report.pages.map((p) => p.route)).toEqual(['/', '/2024/03/01/late-night.html', '/guide/start.html', '/guide/tools.html']);
    expect(statuses(report)).toEqual([
      'ok _layouts:1 /',
      'ok _layouts:2 /guide/start.html',
      'ok _layouts:3 /guide/tools.html',
      'ok index.md:4 /2024/03/01/late-night.html',
      'ok _posts/2024-02-29-late-night.md:6 /guide/start.html#v1-0',
      'self guide/start.md:9 /guide/start.html#v1-0',
    ]);
    expect(report.stats).toMatchObject({ orphans: 0, unreachable: 0, brokenLinks: 0, brokenFragments: 0 });
  });

  const jekyll = spawnSync('jekyll', ['--version'], { encoding: 'utf8' }).status === 0;
  if (!jekyll) console.warn('NOTICE: jekyll is not installed: the Jekyll build check is skipped (apt-get install jekyll)');
  it.skipIf(!jekyll)('jekyll 4.3 writes the same pages and ids', () => {
    const root = site(JEKYLL);
    const out = path.join(path.dirname(root), '_site');
    const r = spawnSync('jekyll', ['build', '-q', '-s', root, '-d', out], { encoding: 'utf8', timeout: 120_000, env: { ...process.env, TZ: 'UTC' } });
    expect(r.status, `jekyll failed:\n${r.stdout}\n${r.stderr}`).toBe(0);
    const written = fs.readdirSync(out, { recursive: true, encoding: 'utf8' }).filter((f) => fs.statSync(path.join(out, f)).isFile()).map((f) => f.split(path.sep).join('/')).sort();
    expect(written).toEqual(['2024/03/01/late-night.html', 'guide/notes.md', 'guide/start.html', 'guide/tools.html', 'index.html']);
    expect([...fs.readFileSync(path.join(out, 'guide', 'start.html'), 'utf8').matchAll(/\bid="([^"]+)"/g)].map((m) => m[1])).toEqual(['start', 'v1-0']);
  });
});

describe('Docusaurus', () => {
  it('blog slugs under /blog/, a dated folder post, a JavaScript home page, navbar and footer routes', async () => {
    const root = site({
      'docusaurus.config.js':
        "export default {\n  title: 'T',\n  baseUrl: '/',\n  themeConfig: {\n    navbar: {items: [{to: '/blog', label: 'Blog'}]},\n    footer: {links: [{items: [{label: 'Tutorial', to: '/docs/intro'}]}]},\n  },\n};\n",
      'sidebars.js': "export default {tutorialSidebar: [{type: 'autogenerated', dirName: '.'}]};\n",
      'docs/intro.md': '# Intro\n\nRead the [welcome post](/blog/welcome).\n',
      'docs/guide.md': '# Guide\n',
      'blog/2021-08-01-first.md': '---\nslug: first-post\n---\nFirst.\n',
      'blog/2021-08-26-welcome/index.md': '---\ntitle: Welcome\n---\nWelcome.\n',
      'blog/2021-09-01-plain.md': 'Plain.\n',
      'src/pages/index.js': 'export default function Home() { return null; }\n',
      'src/pages/help.jsx': 'export default function Help() { return null; }\n',
      'src/pages/_util.js': 'export const x = 1;\n',
    });
    const { report, notes } = await check(root);
    expect(notes[0]).toBe(
      'read as a Docusaurus site from docusaurus.config.js: docs/, blog/, src/pages/, autogenerated sidebar (2 entries)\n  the home page is src/pages/index.js (not read): the docs pages the navbar and footer link (/docs/intro) stand for it as entry pages',
    );
    expect(report.pages.map((p) => p.route)).toEqual(['/blog/2021/08/26/welcome/', '/blog/2021/09/01/plain/', '/blog/first-post/', '/docs/guide/', '/docs/intro/']);
    // The navbar's /blog is the generated blog index; the welcome post has no slug, so it is dated.
    expect(statuses(report).filter((s) => !s.startsWith('ok sidebars.js:1 ') && !s.startsWith('ok sidebars.js:2 '))).toEqual([
      'outside sidebars.js:3 /blog',
      'ok sidebars.js:4 /docs/intro/',
      'broken docs/intro.md:3 /blog/welcome',
    ]);
    // Every post is listed by the blog index, reached from the entry; /help/ is a route the build makes.
    expect(report.stats).toMatchObject({ orphans: 0, unreachable: 0 });
    expect(report.findings.some((f) => f.rule === 'missing-entry')).toBe(false);
  });
});
