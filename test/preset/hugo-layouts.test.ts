/**
 * What a Hugo site's layouts and shortcodes do to its links, on an invented site
 * (test/fixtures/preset-hugo-layouts) worked out by hand from its files and then built with
 * Debian's hugo 0.111 (the build part is skipped, with a notice, where hugo is not installed):
 * - the ids page templates write: a literal id of the theme's `single.html` (`page-tools`) and
 *   its `baseof.html` (`main-content`) is on every single page; the `reference` type's own
 *   content view computes ids from frontmatter, so fragments of its pages are unknown, never
 *   broken; the menu partial's computed ids are said, not silencing other pages' fragments;
 * - `{{< code >}}` and `{{< highlight >}}` bodies show their text: no links, no headings;
 * - `{{< ref "fmt.md" >}}` finds the page by its file name alone, as hugo does;
 * - `guide/2021/` has no `_index.md`: its page is listed by the guide section (no orphan).
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import type { Report } from '../../src/types.js';

const FIXTURE = path.join(import.meta.dirname, '..', 'fixtures', 'preset-hugo-layouts');
const temps: string[] = [];
afterAll(() => {
  for (const t of temps) fs.rmSync(t, { recursive: true, force: true });
});

async function check(root: string): Promise<{ report: Report; notes: string[] }> {
  const notes: string[] = [];
  const report = await analyze({ root, cache: { enabled: false }, workers: 1 }, { onNote: (m) => notes.push(m) });
  return { report, notes };
}

const statuses = (r: Report) => r.links.map((l) => `${l.status} ${l.file}:${l.line}:${l.column} ${l.to}`);

describe('Hugo layouts and shortcodes, read from the site as text', () => {
  it('layout ids, code shortcode bodies, ref by file name, a folder that is no section', async () => {
    const { report, notes } = await check(FIXTURE);
    expect(notes[0]).toBe(
      [
        'read as a Hugo site from hugo.toml: content/, 1 section list with no source (/reference/)',
        '  layouts/reference/body.html computes the ids it writes: fragment links to pages of type reference are unknown, never broken',
        '  1 id computed by shared templates (_default/, partials) not known',
      ].join('\n'),
    );
    expect(report.pages.map((p) => p.route)).toEqual(['/', '/guide/', '/guide/2021/old/', '/guide/other/', '/guide/start/', '/reference/fmt/']);
    expect(statuses(report)).toEqual([
      'ok _index.md:4:16 /guide/',
      'ok guide/other.md:4:13 /guide/start/',
      'ok guide/start.md:4:6 /reference/fmt/#format.print',
      'ok guide/start.md:4:50 /reference/fmt/#page-tools',
      'ok guide/start.md:5:5 /guide/other/#page-tools',
      'broken-fragment guide/start.md:5:56 /guide/other/#no-such-part',
      'ok guide/start.md:7:18 /guide/other/',
      'ok guide/start.md:7:62 /reference/fmt/',
      'external guide/start.md:19:49 https://example.org/photo/',
    ]);
    expect(report.findings.filter((f) => f.severity === 'error').map((f) => `${f.rule} ${f.file}:${f.line}`)).toEqual(['broken-fragment guide/start.md:5']);
    expect(report.stats).toMatchObject({ orphans: 0, unreachable: 0, templatedLinks: 0 });
  });

  it('a ref whose file name two pages share is broken (hugo stops with "ambiguous"); a path finds it', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'lw-hugo-ref-'));
    temps.push(dir);
    const write = (file: string, text: string) => {
      fs.mkdirSync(path.dirname(path.join(dir, file)), { recursive: true });
      fs.writeFileSync(path.join(dir, file), text);
    };
    write('hugo.toml', 'baseURL = "https://example.org/"\n');
    write('content/_index.md', '[a]({{< ref "notes.md" >}}) [b]({{< ref "b/notes.md" >}}) [c]({{< ref "NOTES-C.md" >}})\n');
    write('content/a/notes.md', 'A.\n');
    write('content/b/notes.md', 'B.\n');
    write('content/c/notes-c.md', 'C.\n');
    const { report } = await check(dir);
    expect(statuses(report)).toEqual(['broken _index.md:1:5 notes.md', 'ok _index.md:1:33 /b/notes/', 'ok _index.md:1:63 /c/notes-c/']);
  });

  const hugo = spawnSync('hugo', ['version'], { encoding: 'utf8' }).status === 0;
  if (!hugo) console.warn('NOTICE: hugo is not installed: the Hugo layouts build test is skipped (apt-get install hugo)');
  it.skipIf(!hugo)('the built pages have the ids and links linkweave reads', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'lw-hugo-layouts-'));
    temps.push(dir);
    const site = path.join(dir, 'site');
    fs.cpSync(FIXTURE, site, { recursive: true });
    const out = path.join(dir, 'public');
    const r = spawnSync('hugo', ['--quiet', '--source', site, '--destination', out, '--cacheDir', path.join(dir, 'cache')], { encoding: 'utf8', timeout: 120_000 });
    expect(r.status, `hugo failed:\n${r.stdout}\n${r.stderr}`).toBe(0);
    const page = (route: string) => fs.readFileSync(path.join(out, route, 'index.html'), 'utf8');
    const ids = (route: string) => [...page(route).matchAll(/\bid="([^"]+)"/g)].map((m) => m[1]).sort();
    // Literal layout ids on every single page; the reference page's ids come from its frontmatter.
    expect(ids('guide/other')).toEqual(['guide', 'main-content', 'page-tools', 'references']);
    expect(ids('reference/fmt')).toEqual(['format.print', 'format.sprint', 'guide', 'main-content', 'page-tools', 'references']);
    // The code bodies are text, not links or headings; the ref is the reference page.
    const start = page('guide/start');
    expect(start).not.toContain('href="/nowhere/"');
    expect(start).not.toContain('href="/missing/"');
    expect(start).not.toMatch(/<h1[^>]*>A heading in the example/);
    expect(start).toContain('href="https://example.org/reference/fmt/"');
    // guide/2021/ is no section: the guide's list page links its page.
    expect(page('guide')).toContain('href="/guide/2021/old/"');
  });
});
