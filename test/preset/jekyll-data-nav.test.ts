/**
 * A Jekyll sidebar built by Liquid from a data file (as Jekyll's own docs do: `_data/docs.yml`,
 * looped by `_includes/docs_ul.html`), read as text on an invented site worked out by hand, then
 * built with the installed jekyll (Debian's 4.3; skipped, with a notice, where it is missing) to
 * check that the links read are the links the build writes.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';

const temps: string[] = [];
afterAll(() => {
  for (const t of temps) fs.rmSync(t, { recursive: true, force: true });
});

const SIDEBAR = `{% assign items = include.items %}
<ul>
{% for item in items %}
  {% assign item_url = item | prepend:"/guides/" | append:"/" %}
  {% for p in site.guides %}
    {% if p.url == item_url %}<li><a href="{{ site.url }}{{ p.url }}">{{ p.title }}</a></li>{% endif %}
  {% endfor %}
{% endfor %}
</ul>
`;

/** The same loop writing `<option value>`: no links. */
const MENU = SIDEBAR.replace(/<li><a href="\{\{ site\.url \}\}\{\{ p\.url \}\}">\{\{ p\.title \}\}<\/a><\/li>/, '<option value="{{ p.url }}">{{ p.title }}</option>');

const FILES: Record<string, string> = {
  '_config.yml': 'collections:\n  guides:\n    output: true\n    permalink: /guides/:name/\n',
  '_data/guides.yml': '- title: Start\n  guides:\n  - intro\n  - setup\n- title: More\n  guides:\n  - deploy\n',
  '_layouts/default.html': '<html><body><a href="/guides/intro/">Guides</a>{{ content }}</body></html>\n',
  '_layouts/guide.html':
    '---\nlayout: default\n---\n<aside>{% for section in site.data.guides %}<h4>{{ section.title }}</h4>{% include guide_list.html items=section.guides %}{% endfor %}</aside>\n{{ content }}\n',
  '_includes/guide_list.html': SIDEBAR,
  'index.md': '---\nlayout: default\ntitle: Home\n---\n# Home\n',
  '_guides/intro.md': '---\nlayout: guide\ntitle: Intro\n---\n# Intro\n',
  '_guides/setup.md': '---\nlayout: guide\ntitle: Setup\n---\n# Setup\n',
  '_guides/deploy.md': '---\nlayout: guide\ntitle: Deploy\n---\n# Deploy\n',
};

function site(files: Record<string, string>): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'lw-jekyll-data-'));
  temps.push(dir);
  for (const [name, text] of Object.entries(files)) {
    fs.mkdirSync(path.dirname(path.join(dir, name)), { recursive: true });
    fs.writeFileSync(path.join(dir, name), text);
  }
  return dir;
}

async function run(root: string) {
  const notes: string[] = [];
  const report = await analyze({ root, cache: { enabled: false }, workers: 1 }, { onNote: (m) => notes.push(m) });
  return { report, notes };
}

describe('a Jekyll sidebar looped from a data file', () => {
  it('the data file is read as navigation: its 3 guides are linked from every page', async () => {
    const { report, notes } = await run(site(FILES));
    expect(notes[0]).toBe('read as a Jekyll site from _config.yml: ./, 1 collection, 1 link in 3 layout files, 3 links from _data/guides.yml (looped by _includes/guide_list.html)');
    expect(report.pages.map((p) => p.route).sort()).toEqual(['/', '/guides/deploy/', '/guides/intro/', '/guides/setup/']);
    const nav = report.links.filter((l) => l.file === '_layouts').map((l) => `${l.to} ${l.status}`);
    expect(nav).toEqual(['/guides/deploy/ ok', '/guides/intro/ ok', '/guides/setup/ ok']);
    expect(report.stats.orphans).toBe(0);
    expect(report.stats.unreachable).toBe(0);
  });

  it('a loop that writes no href (a select menu) gives no links: setup and deploy stay orphans', async () => {
    const { report, notes } = await run(site({ ...FILES, '_includes/guide_list.html': MENU }));
    expect(notes[0]).toBe('read as a Jekyll site from _config.yml: ./, 1 collection, 1 link in 3 layout files');
    expect(report.stats.orphans).toBe(2);
  });

  const jekyll = spawnSync('jekyll', ['--version'], { encoding: 'utf8' }).status === 0;
  if (!jekyll) console.warn('NOTICE: jekyll is not installed: the Jekyll data-sidebar build test is skipped (apt-get install jekyll)');
  it.skipIf(!jekyll)('the built guide pages have exactly the sidebar links read', async () => {
    const root = site(FILES);
    const out = fs.mkdtempSync(path.join(os.tmpdir(), 'lw-jekyll-data-out-'));
    temps.push(out);
    const r = spawnSync('jekyll', ['build', '-q', '-s', root, '-d', out], { encoding: 'utf8', timeout: 120_000, env: { ...process.env, TZ: 'UTC' } });
    expect(r.status, `jekyll failed:\n${r.stdout}\n${r.stderr}`).toBe(0);
    const html = fs.readFileSync(path.join(out, 'guides', 'setup', 'index.html'), 'utf8');
    const aside = html.slice(html.indexOf('<aside>'), html.indexOf('</aside>'));
    const built = [...aside.matchAll(/href="([^"]*)"/g)].map((m) => m[1]).sort();
    expect(built).toEqual(['/guides/deploy/', '/guides/intro/', '/guides/setup/']);
    const { report } = await run(root);
    expect(report.links.filter((l) => l.file === '_layouts').map((l) => l.to)).toEqual(built);
  });
});
