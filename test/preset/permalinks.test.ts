/**
 * Routes by a generator's own rules (`routes.generator`): Jekyll's permalinks, Hugo's `url`,
 * `slug` and `[permalinks]`, Docusaurus's `slug` and number prefixes.
 *
 * Each unit check names the page of the generator's documentation its example comes from; the
 * examples are written from memory of those pages (marked "from memory"), so the fixture sites
 * below are also built with the real generator (Debian's `hugo` 0.111 and `jekyll` 4.3) and the
 * pages the build writes are compared with the routes linkweave gives. Those two tests are
 * skipped, with a notice, where the generator is not installed.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import type { Config } from '../../src/config/options.js';
import { resolveOptions } from '../../src/config/options.js';
import { routeOfFile } from '../../src/routes/index.js';
import type { RouteMeta } from '../../src/routes/permalinks.js';
import { hugoUrlize, jekyllSlugify, stripNumberPrefix } from '../../src/routes/permalinks.js';
import type { Report } from '../../src/types.js';

const FIXTURES = path.join(import.meta.dirname, '..', 'fixtures');

function route(file: string, routes: Config['routes'], meta: RouteMeta = {}): string {
  return routeOfFile(file, meta, resolveOptions({ routes }, '.').routes);
}

describe('Jekyll permalinks (jekyllrb.com/docs/permalinks/, from memory)', () => {
  const post = '_posts/2009-04-29-slap-chop.md';
  const site = (permalink: string, extra: Config['routes'] = {}): Config['routes'] => ({
    generator: 'jekyll',
    permalinks: { '*': permalink },
    style: permalink === 'pretty' || permalink.endsWith('/') ? 'directory' : 'html',
    ...extra,
  });

  it('built-in styles on a post: date, pretty, ordinal, weekdate, none', () => {
    expect(route(post, site('date'))).toBe('/2009/04/29/slap-chop.html');
    expect(route(post, site('pretty'))).toBe('/2009/04/29/slap-chop/');
    // 29 April 2009 is day 119 of the year, a Wednesday in ISO week 18 (Ruby's strftime("%j %a %V")).
    expect(route(post, site('ordinal'))).toBe('/2009/119/slap-chop.html');
    expect(route(post, site('weekdate'))).toBe('/2009/W18/Wed/slap-chop.html');
    expect(route(post, site('none'))).toBe('/slap-chop.html');
  });

  it('patterns with placeholders; categories from the folders above _posts and from frontmatter', () => {
    expect(route(post, site('/blog/:year/:month/:day/:title/'))).toBe('/blog/2009/04/29/slap-chop/');
    expect(route(post, site('/:year/:i_month/:i_day/:short_year/:title:output_ext'))).toBe('/2009/4/29/09/slap-chop.html');
    expect(route(`kitchen/${post}`, site('date'))).toBe('/kitchen/2009/04/29/slap-chop.html');
    expect(route(post, site('date'), { categories: ['Food', 'Tools'] })).toBe('/food/tools/2009/04/29/slap-chop.html');
    expect(route(post, site('/:slugified_categories/:title/'), { categories: ['Kitchen Tools'] })).toBe('/kitchen-tools/slap-chop/');
  });

  it('frontmatter: permalink (a pattern) on a post and a page, slug for :title, date overrides the file name', () => {
    expect(route(post, site('date'), { permalink: '/fixed/:title.html' })).toBe('/fixed/slap-chop.html');
    expect(route(post, site('date'), { slug: 'Other Name' })).toBe('/2009/04/29/Other-Name.html');
    expect(route(post, site('date'), { date: '2010-01-02 10:00:00 +0000' })).toBe('/2010/01/02/slap-chop.html');
    expect(route('about.md', site('date'), { permalink: '/about-us/' })).toBe('/about-us/');
    expect(route('docs/faq.md', site('date'), { permalink: '/:path/:basename/' })).toBe('/docs/faq/');
  });

  it("pages follow the style's suffix; index pages stand for their folder; the base path is prefixed", () => {
    expect(route('guides/setup.md', site('date'))).toBe('/guides/setup.html');
    expect(route('guides/setup.md', site('pretty'))).toBe('/guides/setup/');
    expect(route('guides/setup.md', site('/:categories/:title/'))).toBe('/guides/setup/');
    expect(route('guides/index.md', site('date'))).toBe('/guides/');
    expect(route('guides/setup.md', site('pretty', { basePath: '/blog/' }))).toBe('/blog/guides/setup/');
  });

  it('collections (jekyllrb.com/docs/collections/, from memory): the default pattern and a configured one', () => {
    const withCollections: Config['routes'] = { generator: 'jekyll', style: 'html', permalinks: { '*': 'date', recipes: '/:collection/:path:output_ext', cook: '/cook/:path/' } };
    expect(route('_recipes/soups/leek.md', withCollections)).toBe('/recipes/soups/leek.html');
    expect(route('_cook/soups/leek.md', withCollections)).toBe('/cook/soups/leek/');
    expect(route('_cook/soups/leek.md', withCollections, { permalink: '/:collection/:name/' })).toBe('/cook/leek/');
  });

  it('frontmatter defaults scoped by a folder or a type (checked with the installed jekyll 4.3 on the same three files)', () => {
    const defaults: Config['routes'] = { generator: 'jekyll', style: 'html', permalinks: { '*': 'date', 'path:docs': '/manual/:basename/', 'type:posts': '/articles/:title/' } };
    expect(route('docs/alpha.md', defaults)).toBe('/manual/alpha/');
    expect(route('_posts/2020-01-02-news-item.md', defaults)).toBe('/articles/news-item/');
    expect(route('index.md', defaults)).toBe('/');
    // The page's own permalink still wins.
    expect(route('docs/alpha.md', defaults, { permalink: '/a/' })).toBe('/a/');
  });

  it('slugify modes, checked with the installed jekyll 4.3 (Jekyll::Utils.slugify)', () => {
    expect(jekyllSlugify("The _config.yml file's Title!", 'default', false)).toBe('the-config-yml-file-s-title');
    expect(jekyllSlugify("The _config.yml file's Title!", 'pretty', true)).toBe("The-_config.yml-file's-Title!");
  });
});

describe('Hugo URLs (gohugo.io/content-management/urls/, from memory)', () => {
  const hugo = (extra: Config['routes'] = {}): Config['routes'] => ({ generator: 'hugo', indexNames: ['index', '_index'], caseInsensitive: true, ...extra });

  it('url: the whole path, below the base path', () => {
    expect(route('about.md', hugo(), { url: '/company/about-us/' })).toBe('/company/about-us/');
    expect(route('about.md', hugo({ basePath: '/site/' }), { url: '/company/about-us/' })).toBe('/site/company/about-us/');
    expect(route('docs/_index.md', hugo(), { url: 'reference' })).toBe('/reference/');
  });

  it('slug: the last segment only; a leaf bundle is named by its folder', () => {
    expect(route('posts/post-1.md', hugo(), { slug: 'my-first-post' })).toBe('/posts/my-first-post/');
    expect(route('guide/bundle/index.md', hugo(), { slug: 'pack' })).toBe('/guide/pack/');
    // A section page keeps its folder's route.
    expect(route('posts/_index.md', hugo(), { slug: 'ignored' })).toBe('/posts/');
  });

  it('[permalinks] patterns per section: :year :month :day :title :slug :filename :section :sections', () => {
    const permalinks = { posts: '/:year/:month/:title/', news: '/news/:slug/', docs: '/:sections/:filename/', misc: '/:section/:yearday-:monthname-:weekdayname/' };
    const date = '2017-02-27T19:20:00-05:00';
    expect(route('posts/sample-entry.md', hugo({ permalinks }), { title: 'Sample Entry', date })).toBe('/2017/02/sample-entry/');
    expect(route('news/launch.md', hugo({ permalinks }), { title: 'Launch', slug: 'we-launched' })).toBe('/news/we-launched/');
    expect(route('news/other.md', hugo({ permalinks }), { title: 'Other News' })).toBe('/news/other-news/');
    expect(route('docs/api/call.md', hugo({ permalinks }))).toBe('/docs/api/call/');
    // Checked with the installed hugo 0.111: this page is written to misc/58-february-monday/.
    expect(route('misc/x.md', hugo({ permalinks }), { date })).toBe('/misc/58-february-monday/');
    // url wins over the pattern; other sections keep their folder routes.
    expect(route('posts/sample-entry.md', hugo({ permalinks }), { url: '/fixed/', date })).toBe('/fixed/');
    expect(route('guide/setup.md', hugo({ permalinks }))).toBe('/guide/setup/');
  });

  it(':title sanitising, checked with the installed hugo 0.111 (a page with this title under posts = "/:title/")', () => {
    expect(hugoUrlize('Hugo: A Fast & Modern Static Website Engine')).toBe('hugo-a-fast-modern-static-website-engine');
    expect(hugoUrlize(' -- Leading and trailing -- ')).toBe('leading-and-trailing');
  });
});

describe('Docusaurus docs routes (docusaurus.io/docs/create-doc and /docs/sidebar/autogenerated, from memory)', () => {
  const docusaurus: Config['routes'] = { generator: 'docusaurus', folders: { docs: '/docs/' }, indexNames: ['index', 'README'] };

  it('number prefixes are dropped from file and folder names', () => {
    expect(route('docs/01-Intro.md', docusaurus)).toBe('/docs/Intro/');
    expect(route('docs/02-Tutorial Easy/01-First Part.md', docusaurus)).toBe('/docs/Tutorial Easy/First Part/');
    expect(stripNumberPrefix('01_intro')).toBe('intro');
    expect(stripNumberPrefix('1. intro')).toBe('intro');
    expect(stripNumberPrefix('1 - intro')).toBe('intro');
    // A date or a version is no number prefix.
    expect(stripNumberPrefix('2021-01-01-release')).toBe('2021-01-01-release');
    expect(stripNumberPrefix('1.2.3-notes')).toBe('1.2.3-notes');
    expect(stripNumberPrefix('404')).toBe('404');
  });

  it('slug: relative to the doc folder, or to the docs route when it starts with /', () => {
    expect(route('docs/hello.md', docusaurus, { slug: '/bonjour' })).toBe('/docs/bonjour/');
    expect(route('docs/guide/hello.md', docusaurus, { slug: 'bonjour' })).toBe('/docs/guide/bonjour/');
    expect(route('docs/01-guide/02-hello.md', docusaurus, { slug: 'bonjour' })).toBe('/docs/guide/bonjour/');
    expect(route('docs/guide/hello.md', docusaurus, { slug: '/' })).toBe('/docs/');
  });
});

// ---------------------------------------------------------------- real builds

const installed = (bin: string): boolean => spawnSync('sh', ['-c', `command -v ${bin}`]).status === 0;
const temps: string[] = [];
afterAll(() => {
  for (const t of temps) fs.rmSync(t, { recursive: true, force: true });
});

/** Copy a fixture to a temporary folder (builds leave caches beside the sources). */
function copyFixture(name: string): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'lw-permalinks-'));
  temps.push(dir);
  fs.cpSync(path.join(FIXTURES, name), path.join(dir, 'site'), { recursive: true });
  return path.join(dir, 'site');
}

/** The routes of the HTML pages a build wrote (`a/index.html` -> `/a/`), below `basePath`. */
function builtRoutes(out: string, basePath: string): string[] {
  return fs
    .readdirSync(out, { recursive: true, encoding: 'utf8' })
    .filter((f) => f.endsWith('.html'))
    .map((f) => basePath + f.split(path.sep).join('/').replace(/(^|\/)index\.html$/, '$1'))
    .sort();
}

async function check(root: string): Promise<{ report: Report; notes: string[] }> {
  const notes: string[] = [];
  const report = await analyze({ root, cache: { enabled: false }, workers: 1 }, { onNote: (m) => notes.push(m) });
  return { report, notes };
}

const notOk = (r: Report) => r.links.filter((l) => !['ok', 'self', 'external'].includes(l.status)).map((l) => `${l.status} ${l.file}:${l.line}:${l.column} ${l.to}`);

describe('fixture sites built by the real generator', () => {
  const hugo = installed('hugo');
  if (!hugo) console.warn('NOTICE: hugo is not installed: the Hugo permalinks build test is skipped (apt-get install hugo)');
  it.skipIf(!hugo)('Hugo: url, slug, [permalinks], a leaf bundle, TOML frontmatter, headless: the routes are the pages hugo writes', async () => {
    const site = copyFixture('preset-hugo-permalinks');
    const out = path.join(path.dirname(site), 'public');
    const r = spawnSync('hugo', ['--quiet', '--source', site, '--destination', out], { encoding: 'utf8', timeout: 120_000 });
    expect(r.status, `hugo failed:\n${r.stdout}\n${r.stderr}`).toBe(0);
    const { report, notes } = await check(site);
    expect(notes[0]).toBe('read as a Hugo site from hugo.toml: content/, 2 permalink patterns, 2 section lists with no source (/guide/, /news/)');
    const expected = [
      '/site/',
      '/site/2017/02/my-first-post/',
      '/site/2018/11/second-thoughts/',
      '/site/company/about-us/',
      '/site/guide/install/',
      '/site/guide/pack/',
      '/site/news/other-news/',
      '/site/news/we-launched/',
      '/site/posts/',
      '/site/reference/',
    ];
    expect(report.pages.map((p) => p.route)).toEqual(expected);
    // Hugo also writes the list pages of the top-level sections that have no _index.md.
    expect(builtRoutes(out, '/site/')).toEqual([...expected, '/site/guide/', '/site/news/'].sort());
    // The bundle's notes.md is a resource, its link part of the bundle page; docs/hidden is headless.
    expect(report.links.find((l) => l.file === 'content/guide/bundle/notes.md' || l.file === 'guide/bundle/notes.md')).toMatchObject({
      from: '/site/guide/pack/',
      to: '/site/guide/install/',
      line: 1,
      status: 'ok',
    });
    expect(notOk(report)).toEqual(['broken docs/_index.md:5:5 /site/docs/hidden/']);
  });

  const jekyll = installed('jekyll');
  if (!jekyll) console.warn('NOTICE: jekyll is not installed: the Jekyll permalinks build test is skipped (apt-get install jekyll)');
  it.skipIf(!jekyll)('Jekyll: pretty style, a post permalink, categories, an output collection, baseurl: the routes are the pages jekyll writes', async () => {
    const site = copyFixture('preset-jekyll-permalinks');
    const out = path.join(path.dirname(site), '_site');
    const r = spawnSync('jekyll', ['build', '-q', '-s', site, '-d', out], { encoding: 'utf8', timeout: 120_000 });
    expect(r.status, `jekyll failed:\n${r.stdout}\n${r.stderr}`).toBe(0);
    const { report, notes } = await check(site);
    expect(notes[0]).toBe('read as a Jekyll site from _config.yml: ./, _posts/, 1 collection, permalink pretty');
    const expected = [
      '/blog/',
      '/blog/2021/03/04/hello-world/',
      '/blog/about-us/',
      '/blog/cook/soups/leek/',
      '/blog/fixed/launch.html',
      '/blog/food/drinks/2023/05/06/menu/',
      '/blog/guides/setup/',
      '/blog/travel/2022/07/01/alps/',
    ];
    expect(report.pages.map((p) => p.route)).toEqual(expected);
    expect(builtRoutes(out, '/blog/')).toEqual(expected);
    // The include's link is the home page's, resolved from the home page, placed in _includes/.
    expect(report.links.find((l) => l.file === '_includes/note.md')).toMatchObject({ from: '/blog/', to: '/blog/guides/setup/', line: 1, column: 26, status: 'ok' });
    expect(notOk(report)).toEqual(['templated index.md:4:6 {{site.baseurl}}/2021/03/04/hello-world/']);
  });
});
