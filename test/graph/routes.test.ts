import { describe, it, expect } from 'vitest';
import { buildRouteIndex, resolveRouteValue } from '../../src/graph/index.js';
import { options } from './facts.js';

const routes = options().routes;

describe('route index: aliases and redirects', () => {
  it('resolveRouteValue: site-absolute against basePath, relative against the page, outside origins external', () => {
    expect(resolveRouteValue('/old/', '/docs/')).toEqual({ kind: 'path', path: '/docs/old/' });
    expect(resolveRouteValue('old', '/docs/', '/docs/a/b/')).toEqual({ kind: 'path', path: '/docs/a/b/old' });
    expect(resolveRouteValue('../old/?q=1#f', '/', '/a/b/')).toEqual({ kind: 'path', path: '/a/old/' });
    expect(resolveRouteValue('https://elsewhere.example.test/x', '/')).toEqual({ kind: 'external', url: 'https://elsewhere.example.test/x' });
    expect(resolveRouteValue('', '/')).toBeNull();
    expect(resolveRouteValue('/%zz/', '/')).toBeNull();
  });

  it('redirect chains are followed; loops and long chains end as dead routes', () => {
    const pages = [{ route: '/end/', aliases: [] }];
    const chain = Array.from({ length: 70 }, (_, i) => ({ from: `/r${i}/`, to: `/r${i + 1}/`, line: i + 1 }));
    chain.push({ from: '/r70/', to: '/end/', line: 71 });
    const { routeIndex, redirectEnds } = buildRouteIndex(pages, [...chain, { from: '/x/', to: '/y/', line: 80 }, { from: '/y/', to: '/x/', line: 81 }], routes, '/');
    expect(routeIndex.get('/r70/')).toBe(0);
    expect(routeIndex.get('/r10/')).toBe(0); // 61 hops
    expect(redirectEnds.get('/r0/')).toMatchObject({ kind: 'dead' }); // 71 hops: over the limit of 64
    expect(redirectEnds.get('/x/')).toEqual({ kind: 'dead', route: '/x/' });
  });

  it('the first line wins between redirects, the first page in route order between aliases; pages win over both', () => {
    const pages = [{ route: '/a/', aliases: ['/same/', '/b'] }, { route: '/b/', aliases: ['/same/'] }];
    const { routeIndex } = buildRouteIndex(pages, [{ from: '/r/', to: '/a/', line: 1 }, { from: '/r/', to: '/b/', line: 2 }, { from: '/a', to: '/b/', line: 3 }], routes, '/');
    expect(routeIndex.get('/same/')).toBe(0);
    expect(routeIndex.get('/b')).toBeUndefined(); // '/b' already reaches the page /b/
    expect(routeIndex.get('/r/')).toBe(0);
    expect(routeIndex.get('/a')).toBeUndefined(); // shadowed by the page /a/
  });

  it('case-insensitive keys', () => {
    const folded = options({ routes: { caseInsensitive: true } }).routes;
    const { routeIndex } = buildRouteIndex([{ route: '/Guide/', aliases: ['/Old-Guide/'] }], [{ from: '/Start/', to: '/GUIDE/', line: 1 }], folded, '/');
    expect([...routeIndex.keys()].sort()).toEqual(['/guide/', '/old-guide', '/old-guide/', '/start', '/start/']);
  });
});
