/**
 * Routes of files (DESIGN section 3) for each route option, and frontmatter slug/permalink.
 * The conventions (directory routes, index files standing for their folder, basePath prefix)
 * are common practice of static-site generators, no source.
 */
import { describe, expect, it } from 'vitest';
import type { Config } from '../../src/config/options.js';
import { normalizeRoute, routeOfFile } from '../../src/routes/index.js';
import type { PageMeta } from '../../src/types.js';
import { md, options } from '../parse/helpers.js';

const NO_META: Pick<PageMeta, 'slug' | 'permalink'> = {};

function route(path: string, routes: Config['routes'] = {}, meta: Pick<PageMeta, 'slug' | 'permalink'> = NO_META): string {
  return routeOfFile(path, meta, options({ routes }).routes);
}

describe('routeOfFile', () => {
  const table: [string, Config['routes'], string][] = [
    ['a/b.md', {}, '/a/b/'],
    ['a/b.markdown', {}, '/a/b/'],
    ['a/b.mdx', {}, '/a/b/'],
    ['a/b.md', { style: 'html' }, '/a/b.html'],
    ['b.md', { style: 'html' }, '/b.html'],
    ['index.md', {}, '/'],
    ['index.md', { style: 'html' }, '/'],
    ['guide/index.md', {}, '/guide/'],
    ['guide/index.md', { style: 'html' }, '/guide/'],
    ['guide/README.md', {}, '/guide/'],
    ['guide/readme.md', {}, '/guide/'],
    ['guide/_index.md', {}, '/guide/'],
    ['guide/home.md', { indexNames: ['home'] }, '/guide/'],
    ['guide/index.md', { indexNames: ['home'] }, '/guide/index/'],
    ['a/b.html', {}, '/a/b.html'],
    ['a/b.htm', {}, '/a/b.htm'],
    ['a/b.html', { style: 'html' }, '/a/b.html'],
    ['a/index.html', {}, '/a/'],
    ['index.html', {}, '/'],
    ['a/README.html', {}, '/a/README.html'],
    ['a/b.md', { basePath: '/docs/' }, '/docs/a/b/'],
    ['a/b.md', { basePath: '/docs' }, '/docs/a/b/'],
    ['index.md', { basePath: '/docs/' }, '/docs/'],
    ['a/b.html', { basePath: '/docs/' }, '/docs/a/b.html'],
    ['a/b.md', { basePath: '/docs/', style: 'html' }, '/docs/a/b.html'],
    ['My Guide/Über uns.md', {}, '/My Guide/Über uns/'],
    ['100%.md', {}, '/100%25/'],
    ['a/What?.md', {}, '/a/What%3F/'],
    ['Guide/Intro.md', { caseInsensitive: true }, '/Guide/Intro/'],
  ];
  for (const [path, routes, expected] of table) {
    it(`${path} with ${JSON.stringify(routes)} -> ${expected}`, () => {
      expect(route(path, routes)).toBe(expected);
    });
  }
});

describe('frontmatter slug and permalink', () => {
  const table: [Pick<PageMeta, 'slug' | 'permalink'>, Config['routes'], string][] = [
    [{ slug: 'intro' }, {}, '/intro/'],
    [{ slug: 'intro' }, { basePath: '/docs/' }, '/docs/intro/'],
    [{ slug: 'intro' }, { style: 'html' }, '/intro.html'],
    [{ slug: 'guide/intro/' }, { basePath: '/docs/' }, '/docs/guide/intro/'],
    [{ slug: '/intro' }, { basePath: '/docs/' }, '/intro/'],
    [{ slug: 'intro.html' }, {}, '/intro.html'],
    [{ permalink: '/blog/2024/post/' }, { basePath: '/docs/' }, '/blog/2024/post/'],
    [{ permalink: 'blog/post' }, {}, '/blog/post/'],
    [{ permalink: '/p/index.html' }, {}, '/p/'],
    [{ permalink: '/p/', slug: 'ignored' }, {}, '/p/'],
    [{ slug: 'caf%C3%A9' }, {}, '/café/'],
  ];
  for (const [meta, routes, expected] of table) {
    it(`${JSON.stringify(meta)} with ${JSON.stringify(routes)} -> ${expected}`, () => {
      expect(route('x/y.md', routes, meta)).toBe(expected);
    });
  }

  it('the page route honours frontmatter read from the page', () => {
    expect(md('---\nslug: welcome\n---\n# Hi\n', { routes: { basePath: '/docs/' } }, 'a/b.md').route).toBe('/docs/welcome/');
    expect(md('---\npermalink: /about/\n---\n', {}, 'a/b.md').route).toBe('/about/');
  });
});

describe('normalizeRoute (shared with the graph stage)', () => {
  const routes = options().routes;
  const folded = options({ routes: { caseInsensitive: true } }).routes;
  it('makes percent-encoding canonical, so encoded and plain forms meet', () => {
    expect(normalizeRoute('/caf%C3%A9/', routes)).toBe(normalizeRoute('/café/', routes));
    expect(normalizeRoute('/a%20b/', routes)).toBe(normalizeRoute('/a b/', routes));
    expect(normalizeRoute(route('My Guide/Über uns.md'), routes)).toBe(normalizeRoute('/My%20Guide/%C3%9Cber%20uns/', routes));
  });
  it('keeps an escaped slash inside its segment', () => {
    expect(normalizeRoute('/a%2Fb/', routes)).toBe('/a%2Fb/');
  });
  it('folds case only when routes are case-insensitive', () => {
    expect(normalizeRoute('/Guide/Intro/', routes)).toBe('/Guide/Intro/');
    expect(normalizeRoute('/Guide/Intro/', folded)).toBe(normalizeRoute('/guide/intro/', folded));
  });
  it('every route of a file is its own normal form', () => {
    for (const p of ['a/b.md', 'My Guide/Über uns.md', '100%.md', 'a/What?.md', 'index.html']) {
      const r = route(p);
      expect(normalizeRoute(r, routes)).toBe(r);
    }
  });
});
