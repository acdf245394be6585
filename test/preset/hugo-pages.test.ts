/**
 * Which pages Hugo builds, and at which paths, on an invented site worked out by hand, then
 * built with the installed hugo (Debian's 0.111; skipped, with a notice, where it is missing):
 * - paths are lower case (`Guides/UpperCase.md` -> `/guides/uppercase/`, `slug: MySlug` ->
 *   `myslug/`), but a frontmatter `url` is kept as written (`/Custom/Path/`);
 * - a top-level folder with no `_index.md` is a section whose list page has no source: it is
 *   named in the preset line, and links to it are "outside", never broken;
 * - a top-level folder with `index.md` is a leaf bundle (a page, or nothing when headless), no
 *   section: a link to a headless bundle is broken.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import { tempDir, writeTree } from '../collect/tree.js';

const temps: string[] = [];
afterAll(() => {
  for (const t of temps) fs.rmSync(t, { recursive: true, force: true });
});

const FILES: Record<string, string> = {
  'hugo.toml': 'baseURL = "https://example.org/"\ndisableKinds = ["taxonomy", "term", "RSS", "sitemap", "404"]\n',
  'layouts/_default/single.html': '<main>{{ .Content }}</main>\n',
  'layouts/_default/list.html': '<main>{{ .Content }}{{ range .Pages }}<a href="{{ .RelPermalink }}">{{ .Title }}</a>{{ end }}</main>\n',
  'content/_index.md': '---\ntitle: Home\n---\nSee [the guides](/guides/), [the bundle](/bundle/), [the hidden bundle](/hidden/) and [the custom page](/Custom/Path/).\n',
  'content/Guides/UpperCase.md': '---\ntitle: Upper\n---\nText.\n',
  'content/Guides/Custom.md': '---\ntitle: Custom\nurl: /Custom/Path/\n---\nText.\n',
  'content/Guides/Slugged.md': '---\ntitle: Slugged\nslug: MySlug\n---\nText.\n',
  'content/bundle/index.md': '---\ntitle: Bundle\n---\nText.\n',
  'content/hidden/index.md': '---\ntitle: Hidden\nheadless: true\n---\nText.\n',
};

function site(): string {
  const { dir } = tempDir('lw-hugo-pages-');
  temps.push(dir);
  writeTree(dir, FILES);
  return dir;
}

const ROUTES = ['/', '/Custom/Path/', '/bundle/', '/guides/myslug/', '/guides/uppercase/'];

describe('the pages Hugo builds', () => {
  it('lower-case paths, url kept, a section list with no source named, a leaf bundle no section', async () => {
    const notes: string[] = [];
    const report = await analyze({ root: site(), cache: { enabled: false }, workers: 1 }, { onNote: (m) => notes.push(m) });
    expect(notes[0]).toBe('read as a Hugo site from hugo.toml: content/, 1 section list with no source (/guides/)');
    expect(report.pages.map((p) => p.route).sort()).toEqual(ROUTES);
    const status = (to: string) => report.links.find((l) => l.file === '_index.md' && l.to === to)?.status;
    expect(status('/guides/')).toBe('outside');
    expect(status('/bundle/')).toBe('ok');
    expect(status('/hidden/')).toBe('broken');
    expect(status('/Custom/Path/')).toBe('ok');
  });

  const hugo = spawnSync('hugo', ['version'], { encoding: 'utf8' }).status === 0;
  if (!hugo) console.warn('NOTICE: hugo is not installed: the Hugo pages build test is skipped (apt-get install hugo)');
  it.skipIf(!hugo)('hugo writes those pages, and the list page of guides/', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'lw-hugo-pages-out-'));
    temps.push(dir);
    const out = path.join(dir, 'public');
    const r = spawnSync('hugo', ['--quiet', '--source', site(), '--destination', out, '--cacheDir', path.join(dir, 'cache')], {
      encoding: 'utf8',
      timeout: 120_000,
      env: { ...process.env, HUGO_ENABLEGITINFO: 'false' },
    });
    expect(r.status, `hugo failed:\n${r.stdout}\n${r.stderr}`).toBe(0);
    const built: string[] = [];
    const walk = (rel: string): void => {
      for (const e of fs.readdirSync(path.join(out, rel), { withFileTypes: true })) {
        if (e.isDirectory()) walk(`${rel}${e.name}/`);
        else if (e.name === 'index.html') built.push(`/${rel}`);
      }
    };
    walk('');
    expect(built.sort()).toEqual([...ROUTES, '/guides/'].sort());
  });
});
