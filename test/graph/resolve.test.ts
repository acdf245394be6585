import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { buildGraph } from '../../src/graph/index.js';
import type { Config } from '../../src/config/options.js';
import type { PageFacts, RawLink, ResolvedLink } from '../../src/types.js';
import { link, options, page } from './facts.js';

/** Build a graph and return the links written on the page with file `file`, in order. */
function linksOf(pages: PageFacts[], file: string, config: Config = {}, assets: string[] = []): ResolvedLink[] {
  const graph = buildGraph({ pages, assets, navigation: null, redirects: [] }, options(config));
  const id = graph.pages.findIndex((p) => p.file === file);
  expect(id).toBeGreaterThanOrEqual(0);
  return graph.links.filter((l) => l.from === id);
}

function resolveOne(href: string, pages: PageFacts[], config: Config = {}, assets: string[] = [], raw: Partial<RawLink> = {}): ResolvedLink {
  const [first, ...rest] = pages;
  const from = page(first!.file, first!.route, { ids: [...first!.ids], links: [link(href, 1, raw)], kind: first!.kind, ...(first!.baseHref === undefined ? {} : { baseHref: first!.baseHref }) });
  return linksOf([from, ...rest], first!.file, config, assets)[0]!;
}

// RFC 3986 section 5.4 (reference resolution examples), base http://a/b/c/d;p?q, with routes in
// place of the base path: the page's route is /b/c/d;p (a permalink), and each reference is a
// link on it. Expected paths are the RFC's results' paths; queries are dropped by design, so
// `?y` and `g?y` are checked on their path part.
const RFC_BASE_ROUTE = '/b/c/d;p';
const RFC_NORMAL: [string, string, string][] = [
  ['g', '/b/c/g', ''],
  ['./g', '/b/c/g', ''],
  ['g/', '/b/c/g/', ''],
  ['/g', '/g', ''],
  ['?y', '/b/c/d;p', ''], // RFC: http://a/b/c/d;p?y (query dropped)
  ['g?y', '/b/c/g', ''], // RFC: http://a/b/c/g?y (query dropped)
  ['#s', '/b/c/d;p', 's'], // RFC: http://a/b/c/d;p?q#s
  ['g#s', '/b/c/g', 's'],
  ['.', '/b/c/', ''],
  ['..', '/b/', ''],
  ['../g', '/b/g', ''],
  ['../..', '/', ''],
  ['../../g', '/g', ''],
  // The rest of section 5.4.1 (from memory, re-derived by hand from section 5.2's algorithm).
  ['g?y#s', '/b/c/g', 's'], // RFC: http://a/b/c/g?y#s (query dropped)
  [';x', '/b/c/;x', ''],
  ['g;x', '/b/c/g;x', ''],
  ['g;x?y#s', '/b/c/g;x', 's'], // RFC: http://a/b/c/g;x?y#s (query dropped)
  ['', '/b/c/d;p', ''], // RFC: http://a/b/c/d;p?q, the base itself
  ['./', '/b/c/', ''],
  ['../', '/b/', ''],
  ['../../', '/', ''],
];
const RFC_ABNORMAL: [string, string, string][] = [
  ['../../../g', '/g', ''],
  ['/./g', '/g', ''],
  ['/../g', '/g', ''],
  ['g.', '/b/c/g.', ''],
  ['./../g', '/b/g', ''],
  ['g/./h', '/b/c/g/h', ''],
  ['g/../h', '/b/c/h', ''],
  // The rest of section 5.4.2 (from memory, re-derived by hand from section 5.2's algorithm).
  ['../../../../g', '/g', ''],
  ['.g', '/b/c/.g', ''],
  ['g..', '/b/c/g..', ''],
  ['..g', '/b/c/..g', ''],
  ['./g/.', '/b/c/g/', ''],
  ['g;x=1/./y', '/b/c/g;x=1/y', ''],
  ['g;x=1/../y', '/b/c/y', ''],
  ['g?y/./x', '/b/c/g', ''], // RFC: http://a/b/c/g?y/./x (dot segments in a query stay; query dropped)
  ['g?y/../x', '/b/c/g', ''], // RFC: http://a/b/c/g?y/../x
  ['g#s/./x', '/b/c/g', 's/./x'], // RFC: http://a/b/c/g#s/./x (dot segments in a fragment stay)
  ['g#s/../x', '/b/c/g', 's/../x'],
];
const RFC_TARGET_ROUTES = [
  '/b/c/g', '/b/c/g/', '/g', '/b/c/', '/b/', '/', '/b/g', '/b/c/g.', '/b/c/g/h', '/b/c/h',
  '/b/c/;x', '/b/c/g;x', '/b/c/.g', '/b/c/g..', '/b/c/..g', '/b/c/g;x=1/y', '/b/c/y',
];

function rfcSite(withTargets: boolean): PageFacts[] {
  const base = page('b/c/d.md', RFC_BASE_ROUTE, { ids: ['s'], links: [...RFC_NORMAL, ...RFC_ABNORMAL].map(([ref], i) => link(ref, i + 1)) });
  const targets = withTargets ? RFC_TARGET_ROUTES.map((r, i) => page(`t${i}.md`, r, { ids: ['s', 's/./x', 's/../x'] })) : [];
  return [base, ...targets];
}

describe('RFC 3986 section 5.4 examples on the route resolver', () => {
  const resolvedWith = linksOf(rfcSite(true), 'b/c/d.md');
  const resolvedWithout = linksOf(rfcSite(false), 'b/c/d.md');
  const rows = [...RFC_NORMAL.map((r) => ['normal', ...r] as const), ...RFC_ABNORMAL.map((r) => ['abnormal', ...r] as const)];
  rows.forEach(([group, ref, path, fragment], i) => {
    it(`RFC 3986 5.4 ${group}: "${ref}" -> path ${path}${fragment ? '#' + fragment : ''}`, () => {
      const l = resolvedWith[i]!;
      expect(l.raw.href).toBe(ref);
      expect(l.kind).toBe('internal');
      expect(l.target).toBe(path);
      expect(l.fragment).toBe(fragment);
      expect(l.status).toBe(path === RFC_BASE_ROUTE ? 'self' : 'ok');
      // The path is the same when no page is there: the link is broken, with that path as target;
      // a reference that climbs above the site's root (`../../../g`) points outside the content.
      const m = resolvedWithout[i]!;
      expect(m.target).toBe(path);
      expect(m.status).toBe(path === RFC_BASE_ROUTE ? 'self' : ref.startsWith('../../../') ? 'outside' : 'broken');
    });
  });

  it('RFC 3986 5.4 normal: "//g" -> http://g (another authority: external)', () => {
    const l = resolveOne('//g', [page('b/c/d.md', RFC_BASE_ROUTE)]);
    expect(l.kind).toBe('external');
    expect(l.status).toBe('external');
    expect(l.target).toBe('https://g/');
  });

  it('RFC 3986 5.4.1 "g:h" -> g:h and 5.4.2 "http:g" -> http:g (strict parsers): another scheme, never a page', () => {
    const other = resolveOne('g:h', [page('b/c/d.md', RFC_BASE_ROUTE)]);
    expect(other).toMatchObject({ kind: 'other', status: 'other', target: 'g:h', to: -1 });
    // The site's origin is https, so http: is another scheme too (WHATWG URL gives http://g/).
    const http = resolveOne('http:g', [page('b/c/d.md', RFC_BASE_ROUTE)]);
    expect(http).toMatchObject({ kind: 'external', status: 'external', to: -1 });
  });
});

describe('links between source files (DESIGN section 4)', () => {
  const site = [
    page('guide/install.md', '/guide/install/', { ids: ['setup'] }),
    page('guide/index.md', '/guide/'),
    page('ref/api.md', '/ref/api/', { ids: ['calls'] }),
    page('legacy/old.html', '/legacy/old.html', { ids: ['x'] }),
  ];
  const from = (href: string, config: Config = {}, raw: Partial<RawLink> = {}) => resolveOne(href, site, config, ['img/logo.png', 'guide/diagram.svg'], raw);

  it('a relative .md link resolves against the file, then maps to the route', () => {
    const l = from('../ref/api.md#calls');
    expect(l).toMatchObject({ target: '/ref/api/', fragment: 'calls', status: 'ok', kind: 'internal' });
  });
  it('an .md link to a folder index maps to the folder route', () => {
    expect(from('index.md')).toMatchObject({ target: '/guide/', status: 'ok' });
  });
  it('a site-absolute .md link is a path from the content root', () => {
    expect(from('/ref/api.md')).toMatchObject({ target: '/ref/api/', status: 'ok' });
  });
  it('a missing .md file is broken, with the resolved file path as target', () => {
    expect(from('../ref/nothere.md')).toMatchObject({ target: 'ref/nothere.md', status: 'broken', to: -1 });
  });
  it('a missing fragment on an existing file is a broken fragment', () => {
    expect(from('../ref/api.md#nope')).toMatchObject({ target: '/ref/api/', fragment: 'nope', status: 'broken-fragment' });
  });
  it('an .html link naming a source file maps to that file', () => {
    expect(from('../legacy/old.html#x')).toMatchObject({ target: '/legacy/old.html', status: 'ok' });
  });
  it('an .html link naming no source file resolves against the route URL', () => {
    // guide/install.md has route /guide/install/, so "other.html" is /guide/install/other.html.
    expect(from('other.html')).toMatchObject({ target: '/guide/install/other.html', status: 'broken', kind: 'internal' });
  });
  it('other relative links resolve against the route URL, as a browser does', () => {
    expect(from('../../ref/api/')).toMatchObject({ target: '/ref/api/', status: 'ok' });
    expect(from('../')).toMatchObject({ target: '/guide/', status: 'ok' });
  });
  it('escaping above the root stays at the root and never names an outside file', () => {
    const l = from('../../../../etc/passwd');
    // It climbs above the content root: outside the content (never broken, never read).
    expect(l).toMatchObject({ target: '/etc/passwd', status: 'outside', kind: 'internal' });
    expect(from('../../../../../etc/passwd.md')).toMatchObject({ target: 'etc/passwd.md', status: 'outside' });
  });
  it('assets: present -> asset, missing -> broken asset; Markdown may name them beside the file', () => {
    expect(from('/img/logo.png')).toMatchObject({ kind: 'asset', status: 'asset', target: '/img/logo.png' });
    expect(from('diagram.svg')).toMatchObject({ kind: 'asset', status: 'asset', target: '/guide/diagram.svg' });
    expect(from('/img/missing.png')).toMatchObject({ kind: 'asset', status: 'broken', target: '/img/missing.png' });
  });
  it('pattern links: a file route resolves like a file link (page first, then content root), others site-absolute', () => {
    expect(from('ref/api.md', {}, { origin: 'pattern', fileRelative: true })).toMatchObject({ target: '/ref/api/', status: 'ok' });
    expect(from('ref/api/', {}, { origin: 'pattern' })).toMatchObject({ target: '/ref/api/', status: 'ok' });
  });
});

describe('routes, base path and <base href>', () => {
  it('site-absolute links are taken against basePath (prefixed unless already there)', () => {
    const site = [page('a.md', '/docs/a/'), page('b.md', '/docs/b/')];
    expect(resolveOne('/b/', site, { routes: { basePath: '/docs/' } })).toMatchObject({ target: '/docs/b/', status: 'ok' });
    expect(resolveOne('/docs/b/', site, { routes: { basePath: '/docs' } })).toMatchObject({ target: '/docs/b/', status: 'ok' });
    expect(resolveOne('../b/', site, { routes: { basePath: '/docs/' } })).toMatchObject({ target: '/docs/b/', status: 'ok' });
  });
  it('WHATWG HTML <base href>: relative links resolve against the base, itself resolved against the route', () => {
    const site = [page('x/p.html', '/x/p.html', { baseHref: '../lib/', ids: ['here'] }), page('lib/q.html', '/lib/q.html'), page('x/q.html', '/x/q.html')];
    expect(resolveOne('q.html', site)).toMatchObject({ target: '/lib/q.html', status: 'ok' });
    // With a base, even a fragment-only link goes to the base URL (the standard's behaviour).
    expect(resolveOne('#here', site)).toMatchObject({ target: '/lib/', status: 'broken' });
    const external = [page('x/p.html', '/x/p.html', { baseHref: 'https://cdn.example.test/docs/' })];
    expect(resolveOne('q.html', external)).toMatchObject({ kind: 'external', target: 'https://cdn.example.test/docs/q.html' });
  });
  it('percent-encoding is normalised: decoded, then re-encoded only where the path needs it', () => {
    const site = [page('x.md', '/x/'), page('a.md', '/a/'), page('café.md', '/café/'), page('100%.md', '/100%25/'), page('sp.md', '/two words/')];
    expect(resolveOne('/caf%C3%A9/', site)).toMatchObject({ target: '/café/', status: 'ok' });
    expect(resolveOne('/café/', site)).toMatchObject({ target: '/café/', status: 'ok' });
    expect(resolveOne('/100%25/', site)).toMatchObject({ target: '/100%25/', status: 'ok' });
    expect(resolveOne('/two%20words/', site)).toMatchObject({ target: '/two words/', status: 'ok' });
    expect(resolveOne('/%61/', site)).toMatchObject({ target: '/a/', status: 'ok' });
  });
  it('index.html and index.htm stand for their folder', () => {
    const site = [page('a.md', '/a/'), page('g/index.md', '/g/')];
    expect(resolveOne('/g/index.html', site)).toMatchObject({ target: '/g/', status: 'ok' });
    expect(resolveOne('/g/index.htm#top', site)).toMatchObject({ target: '/g/', status: 'ok' });
  });
  it('trailing slash: /a/b finds the page /a/b/ (and /a/b.html with route style html)', () => {
    const site = [page('x.md', '/x/'), page('a/b.md', '/a/b/'), page('c.md', '/c.html')];
    expect(resolveOne('/a/b', site)).toMatchObject({ target: '/a/b/', status: 'ok' });
    expect(resolveOne('/c', site, { routes: { style: 'html' } })).toMatchObject({ target: '/c.html', status: 'ok' });
    expect(resolveOne('/c', site)).toMatchObject({ status: 'broken' });
  });
  it('case folding only when routes.caseInsensitive', () => {
    const site = [page('x.md', '/x/'), page('Guide.md', '/Guide/')];
    expect(resolveOne('/guide/', site)).toMatchObject({ status: 'broken', target: '/guide/' });
    expect(resolveOne('/guide/', site, { routes: { caseInsensitive: true } })).toMatchObject({ status: 'ok', target: '/Guide/' });
    expect(resolveOne('guide.MD', site, { routes: { caseInsensitive: true } })).toMatchObject({ status: 'ok', target: '/Guide/' });
  });
});

describe('fragments, kinds and hostile hrefs', () => {
  const site = [page('a.md', '/a/', { ids: ['intro', 'café'] }), page('b.md', '/b/')];
  const one = (href: string) => resolveOne(href, site);
  it('fragment-only links target the page itself', () => {
    expect(one('#intro')).toMatchObject({ to: 0, from: 0, status: 'self', fragment: 'intro' });
    expect(one('#caf%C3%A9')).toMatchObject({ status: 'self', fragment: 'café' });
    expect(one('#missing')).toMatchObject({ to: 0, status: 'broken-fragment', fragment: 'missing' });
    expect(one('')).toMatchObject({ to: 0, status: 'self' });
  });
  it('"#" and "#top" always exist (browsers scroll to the top; common practice, no source)', () => {
    expect(one('#')).toMatchObject({ status: 'self' });
    expect(one('#top')).toMatchObject({ status: 'self' });
    expect(one('/b/#top')).toMatchObject({ status: 'ok', to: 1 });
  });
  it('the query is dropped, the fragment kept', () => {
    expect(one('/b/?tab=2#intro')).toMatchObject({ target: '/b/', fragment: 'intro', status: 'broken-fragment' });
  });
  it('mailto, tel, javascript, data and file: are recorded, never resolved', () => {
    expect(one('mailto:team@example.test')).toMatchObject({ kind: 'mailto', status: 'other', target: 'mailto:team@example.test' });
    for (const href of ['tel:+100', 'javascript:void(0)', 'data:text/plain,hi', 'file:///etc/passwd', 'C:\\Windows\\x.md']) {
      expect(one(href)).toMatchObject({ kind: 'other', status: 'other', to: -1 });
    }
  });
  it('other origins are external', () => {
    expect(one('https://example.test/x?y=1#z')).toMatchObject({ kind: 'external', target: 'https://example.test/x?y=1', fragment: 'z' });
    expect(one('\\\\host\\share')).toMatchObject({ kind: 'external' });
  });
  it('NUL bytes and undecodable percent-encoding are broken, target as written', () => {
    for (const href of ['/a\u0000b/', '/%00/', '/%E0%A4%A/', '/bad%ZZ/', 'x%C3%28.md', '#%C3%28', 'http://[bad']) {
      expect(one(href)).toMatchObject({ status: 'broken', target: href, to: -1 });
    }
  });
  it('encoded slashes stay inside their segment (no traversal)', () => {
    expect(one('/..%2f..%2fetc/passwd')).toMatchObject({ status: 'broken', kind: 'internal', target: '/..%2F..%2Fetc/passwd' });
    expect(one('%2e%2e/%2e%2e/b/')).toMatchObject({ status: 'ok', target: '/b/' }); // WHATWG: %2e%2e is a dot segment
  });
  it('property (fast-check): any href resolves without throwing, to a consistent result', () => {
    const pages = [page('d/a.md', '/d/a/', { ids: ['x'] }), page('d/b.md', '/d/b/'), page('c.html', '/c.html')];
    const graphOf = (hrefs: string[]) =>
      buildGraph({ pages: [page('d/a.md', '/d/a/', { ids: ['x'], links: hrefs.map((h, i) => link(h, i + 1)) }), ...pages.slice(1)], assets: ['f.pdf'], navigation: null, redirects: [] }, options());
    const piece = fc.constantFrom('/', '.', '..', '%', '%2f', '%00', '#', '?', 'a', 'b', '.md', '.html', '\\', ':', 'é', ' ', '\u0000', 'x.md', 'mailto:', '//');
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.string(), fc.array(piece, { maxLength: 8 }).map((p) => p.join(''))), { maxLength: 20 }), (hrefs) => {
        const g = graphOf(hrefs);
        expect(g.links).toHaveLength(hrefs.length);
        for (const l of g.links) {
          const toPage = l.status === 'ok' || l.status === 'self' || l.status === 'broken-fragment';
          expect(l.to >= 0).toBe(toPage);
          if (toPage) expect(l.target).toBe(g.pages[l.to]!.route);
          if (l.status === 'self') expect(l.to).toBe(l.from);
        }
      }),
      { numRuns: 300, seed: 7 },
    );
  });
});
