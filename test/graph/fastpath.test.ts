/**
 * Plain hrefs are resolved without `URL` (a speed-up for large sites); these checks hold that
 * path to the `URL` path, which is the WHATWG URL Standard's parser as Node ships it.
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { buildGraph, pageSource, navigationSource, resolveLink } from '../../src/graph/index.js';
import type { ResolveContext } from '../../src/graph/index.js';
import { joinPath, removeDotSegments } from '../../src/routes/index.js';
import type { Config } from '../../src/config/options.js';
import { link, options, page } from './facts.js';

function contextFor(config: Config) {
  const opts = options(config);
  const facts = [
    page('index.md', '/', { ids: ['a'] }),
    page('a/b.md', '/a/b/', { ids: ['x', 'y'] }),
    page('a/index.md', '/a/'),
    page('a/c.html', '/a/c.html'),
    page('d/e.md', '/d/e.html'),
    page('b/c/d.md', '/b/c/d;p'),
    page('x.md', '/docs/x/'),
  ];
  const graph = buildGraph({ pages: facts, assets: ['a/img.png', 'z.pdf'], navigation: null, redirects: [{ from: '/old/', to: '/a/b/', line: 1 }] }, opts);
  const byId = graph.pages.map((p) => facts[p.factsIndex]!);
  const ctx: ResolveContext = {
    routes: opts.routes,
    basePath: opts.routes.basePath.endsWith('/') ? opts.routes.basePath : opts.routes.basePath + '/',
    routeIndex: graph.routeIndex,
    redirectEnds: new Map(),
    fileIndex: new Map(graph.pages.map((p) => [p.file, p.id])),
    assets: new Set(['a/img.png', 'z.pdf']),
    pageRoutes: graph.pages.map((p) => p.route),
    hasId: (p, id) => byId[p]!.ids.includes(id),
  };
  const sources = [...graph.pages.map((p) => pageSource(p.id, byId[p.id]!.kind, p.file, p.route)), navigationSource('nav/toc.md', ctx.basePath)];
  return { ctx, sources };
}

describe('the URL-free path for plain hrefs', () => {
  it('removeDotSegments on RFC 3986 5.2.4 cases', () => {
    expect(removeDotSegments('/a/b/c/./../../g')).toBe('/a/g'); // RFC 3986 5.2.4 example
    expect(removeDotSegments('/b/c/..')).toBe('/b/');
    expect(removeDotSegments('/b/c/.')).toBe('/b/c/');
    expect(removeDotSegments('/../../g')).toBe('/g');
    expect(removeDotSegments('/a/.b/..c/')).toBe('/a/.b/..c/');
    expect(joinPath('/b/c/', '../../../g')).toBe('/g');
    expect(joinPath('/b/c/', './g/../h')).toBe('/b/c/h');
    expect(joinPath('/', '..')).toBe('/');
  });

  for (const config of [{}, { routes: { style: 'html' as const } }, { routes: { basePath: '/docs/' } }, { routes: { caseInsensitive: true } }]) {
    it(`gives what the URL path gives, for any plain href (fast-check), config ${JSON.stringify(config)}`, () => {
      const { ctx, sources } = contextFor(config);
      const segment = fc.constantFrom('a', 'b', 'c', 'd', 'A', '.', '..', '', 'b.md', 'c.html', 'index.html', 'index.htm', 'e.md', 'd.md', 'img.png', 'z.pdf', 'x', 'g.', '-_~', 'index.md');
      const href = fc
        .tuple(fc.boolean(), fc.array(segment, { minLength: 1, maxLength: 6 }), fc.option(fc.constantFrom('', 'x', 'y', 'a', 'top', 'X')))
        .map(([abs, segs, frag]) => (abs ? '/' : '') + segs.join('/') + (frag === null ? '' : '#' + frag))
        .filter((h) => h.length > 0 && !h.startsWith('//') && !h.startsWith('#'));
      fc.assert(
        fc.property(href, fc.nat(sources.length - 1), fc.constantFrom('markdown' as const, 'pattern' as const), fc.boolean(), (h, s, origin, fileRelative) => {
          const raw = link(h, 1, { origin, ...(origin === 'pattern' && fileRelative ? { fileRelative: true } : {}) });
          const src = sources[s]!;
          expect(resolveLink(raw, src, ctx, true)).toEqual(resolveLink(raw, src, ctx, false));
        }),
        { numRuns: 1500, seed: 17 },
      );
    });
  }
});
