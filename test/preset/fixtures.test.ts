/**
 * One small invented site per generator, each in that generator's own layout
 * (test/fixtures/preset-<name>/). Everything expected here (routes, navigation, redirects,
 * fragment resolution, links outside the content) was worked out by hand from the files.
 */
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import type { Report } from '../../src/types.js';

const FIXTURES = join(import.meta.dirname, '..', 'fixtures');

async function run(name: string, extra: Record<string, unknown> = {}): Promise<{ report: Report; notes: string[] }> {
  const notes: string[] = [];
  const report = await analyze({ root: join(FIXTURES, `preset-${name}`), cache: { enabled: false }, workers: 1, ...extra }, { onNote: (m) => notes.push(m) });
  return { report, notes };
}

const routes = (r: Report) => r.pages.map((p) => p.route);
const notOk = (r: Report) =>
  r.links.filter((l) => !['ok', 'self', 'external'].includes(l.status)).map((l) => `${l.status} ${l.file}:${l.line}:${l.column} ${l.to}`);
const rules = (r: Report) => r.findings.filter((f) => f.severity === 'error').map((f) => `${f.rule} ${f.file}:${f.line}:${f.column}`);

describe('mdBook', () => {
  it('src/ at site-url /guide/, SUMMARY.md on every page, one redirect, mdBook heading ids', async () => {
    const { report, notes } = await run('mdbook');
    expect(notes[0]).toBe('read as an mdBook site from book.toml: src/, SUMMARY.md, 1 redirect');
    expect(notes[1]).toBe('heading ids: mdbook style (chosen by the fragment links), 3 of 4 fragment links resolve');
    expect(notes[2]).toBe('install.md:11:1: included file "../shared/licence.md" is outside the sources; its ids and links are unknown');
    expect(routes(report)).toEqual(['/guide/', '/guide/install.html', '/guide/usage/advanced.html', '/guide/usage/basics.html']);
    // The sibling book (../std/) is outside; old-start.html is redirected to install.html.
    expect(notOk(report)).toEqual([
      'outside README.md:4:27 /std/',
      'broken-fragment usage/advanced.md:4:1 /guide/usage/basics.html#step-2',
      'broken usage/advanced.md:4:81 usage/nothing.md',
    ]);
    expect(report.links.find((l) => l.file === 'README.md' && l.text === 'start')).toMatchObject({ status: 'ok', to: '/guide/install.html' });
    expect(report.stats).toMatchObject({ orphans: 0, unreachable: 0, outsideLinks: 1, includesOutside: 1 });
    expect(rules(report)).toEqual(['broken-fragment usage/advanced.md:4:1', 'broken-link usage/advanced.md:4:81']);
  });
});

describe('Hugo', () => {
  it('content/en (default language), baseURL /docs/, mounted specs outside, github-ascii ids, section lists, drafts and headless left out', async () => {
    const { report, notes } = await run('hugo');
    expect(notes[0]).toBe('read as a Hugo site from hugo.toml: content/en/, 1 mounted folder from elsewhere, autoHeadingIDType github-ascii');
    expect(notes[1]).toBe('heading ids: hugo-github-ascii style (chosen by the fragment links), 1 of 2 fragment links resolve');
    // wip.md (draft) and shared.md (headless) are no pages.
    expect(routes(report)).toEqual(['/docs/', '/docs/guide/', '/docs/guide/install/', '/docs/guide/usage/']);
    expect(notOk(report)).toEqual([
      'outside _index.md:7:53 /docs/specs/v1/',
      'templated _index.md:8:1 {{< param supportURL >}}',
      'templated _index.md:8:52 {{site.Params.releases}}',
      'broken-fragment guide/usage.md:9:56 /docs/guide/install/#missing-part',
    ]);
    // The ref shortcode is a link; the section page lists its two pages (no orphans).
    expect(report.links.find((l) => l.file === 'guide/install.md')).toMatchObject({ to: '/docs/guide/usage/', status: 'ok' });
    expect(report.stats).toMatchObject({ orphans: 0, unreachable: 0, templatedLinks: 2, outsideLinks: 1 });
  });
});

describe('MkDocs', () => {
  it('docs/ at /manual/, nav on every page, redirect map, Python-Markdown ids, snippets part of the page', async () => {
    const { report, notes } = await run('mkdocs');
    expect(notes[0]).toBe('read as an MkDocs site from mkdocs.yml: docs/, nav, 1 redirect');
    expect(notes[1]).toBe('heading ids: python-markdown style (chosen by the fragment links), 2 of 2 fragment links resolve');
    // includes/glossary.md is pulled into index.md (its <a id> is index's) and, as every file in
    // docs_dir, built as a page of its own (mkdocs 1.4 does; test/preset/mkdocs-snippets.test.ts).
    expect(routes(report)).toEqual(['/manual/', '/manual/includes/glossary/', '/manual/reference/api/', '/manual/setup/']);
    expect(notOk(report)).toEqual(['broken setup.md:3:54 missing.md']);
    // setup.md's link to ../old/ is redirected back to setup itself.
    expect(report.links.find((l) => l.text === 'old page')).toMatchObject({ status: 'self', to: '/manual/setup/' });
    expect(report.links.filter((l) => l.file === 'mkdocs.yml').map((l) => `${l.line} ${l.to}`)).toEqual([
      '4 /manual/',
      '5 /manual/setup/',
      '7 /manual/reference/api/',
    ]);
  });
});

describe('Docusaurus', () => {
  it('docs/, blog/ (dated, prev/next, listed), src/pages/ at /, static sidebars.js, GitHub ids', async () => {
    const { report, notes } = await run('docusaurus');
    expect(notes[0]).toBe('read as a Docusaurus site from docusaurus.config.js: docs/, blog/, src/pages/, sidebars.js (3 entries)');
    expect(routes(report)).toEqual([
      '/',
      '/blog/2024/01/10/hello/',
      '/blog/2024/02/01/spring/',
      '/docs/guides/first-flight/',
      '/docs/guides/repairs/',
      '/docs/intro/',
    ]);
    expect(notOk(report)).toEqual([
      'outside src/pages/index.md:3:33 /blog',
      'outside blog/2024-02-01-spring.md:5:58 /blog',
      'broken-fragment docs/guides/repairs.md:3:26 /docs/guides/first-flight/#wind-speed',
    ]);
    expect(report.stats).toMatchObject({ orphans: 0, unreachable: 0 });
  });
});

describe('Jekyll', () => {
  it('baseurl /orchard, .html pages, dated _posts, _includes pulled in, exclude honoured, kramdown ids', async () => {
    const { report, notes } = await run('jekyll');
    expect(notes[0]).toBe('read as a Jekyll site from _config.yml: ./, _posts/');
    expect(notes[1]).toBe('heading ids: kramdown style (chosen by the fragment links), 2 of 2 fragment links resolve');
    expect(routes(report)).toEqual(['/orchard/', '/orchard/2023/05/01/first-blossom.html', '/orchard/2023/06/01/second-harvest.html', '/orchard/about.html']);
    expect(notOk(report)).toEqual(['broken _posts/2023-06-01-second-harvest.md:5:22 /orchard/plums.html']);
    expect(report.stats).toMatchObject({ orphans: 0, unreachable: 0 });
  });
});

describe('VitePress', () => {
  it('found in docs/.vitepress from the repository root: srcDir src/, base /kit/, VitePress ids', async () => {
    const { report, notes } = await run('vitepress');
    expect(notes[0]).toBe('read as a VitePress site from docs/.vitepress/config.mts: src/, clean URLs');
    expect(notes[1]).toBe('heading ids: vitepress style (chosen by the fragment links), 3 of 3 fragment links resolve');
    expect(routes(report)).toEqual(['/kit/', '/kit/guide/config.html', '/kit/guide/start.html']);
    // Site-absolute links are written below base: /changelog is /kit/changelog, which is missing.
    expect(notOk(report)).toEqual(['broken guide/start.md:3:95 /kit/changelog']);
  });
});

describe('overrides', () => {
  it('--preset none reads no generator config: the same folder gives other routes and false errors', async () => {
    const { report, notes } = await run('mdbook', { preset: 'none' });
    expect(notes.some((n) => n.startsWith('read as'))).toBe(false);
    expect(routes(report)).toContain('/src/usage/basics/');
  });
  it('an explicit config wins key by key over the preset', async () => {
    const { report } = await run('mdbook', { routes: { headingIds: 'github' } });
    // Forced GitHub ids: #Über-uns no longer resolves; the preset's other keys (style html, src/) stay.
    expect(report.stats.headingIds).toEqual({ style: 'github', how: 'set', fragmentLinks: 4, resolved: 2 });
    expect(routes(report)[1]).toBe('/guide/install.html');
  });
});
