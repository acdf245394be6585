import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hrefFor, linkMarkup, relativeFilePath, relativeRoute } from '../../src/apply/index.js';

describe('relative paths', () => {
  it.each([
    ['guides/calibration.md', 'hardware/tide-gauge.md', '../hardware/tide-gauge.md'],
    ['guides/calibration.md', 'guides/index.md', 'index.md'],
    ['index.md', 'guides/calibration.md', 'guides/calibration.md'],
    ['a/b/c.md', 'a/d.md', '../d.md'],
    ['a/b/c.md', 'a/b/c/d.md', 'c/d.md'],
    ['a/100%.md', 'b/what?#.md', '../b/what%3F%23.md'],
  ])('file %s -> %s is %s', (from, to, rel) => {
    expect(relativeFilePath(from, to)).toBe(rel);
  });

  it.each([
    ['/guides/calibration/', '/guides/multi-station/', '../multi-station/'],
    ['/guides/', '/guides/calibration/', 'calibration/'],
    ['/guides/calibration/', '/', '../../'],
    ['/legacy/faq.html', '/legacy/serial-console.html', 'serial-console.html'],
    ['/legacy/faq.html', '/legacy/', './'],
    ['/', '/guides/', 'guides/'],
  ])('route %s -> %s is %s', (from, to, rel) => {
    expect(relativeRoute(from, to)).toBe(rel);
  });

  it('a relative route resolves back to the target as a browser resolves it (WHATWG URL)', () => {
    const segment = fc.constantFrom('a', 'b', 'guides', 'faq.html', 'x-y', 'ü');
    const route = fc
      .tuple(fc.array(segment, { maxLength: 4 }), fc.boolean())
      .map(([segs, dir]) => (segs.length === 0 ? '/' : `/${segs.join('/')}${dir ? '/' : ''}`));
    fc.assert(
      fc.property(route, route, (from, to) => {
        const origin = 'https://site.invalid';
        const resolved = new URL(relativeRoute(from, to), origin + encodeURI(from)).pathname;
        expect(decodeURI(resolved)).toBe(to);
      }),
    );
  });
});

describe('hrefFor', () => {
  const md = { file: 'guides/calibration.md', kind: 'markdown' as const, route: '/guides/calibration/' };
  const html = { file: 'legacy/faq.html', kind: 'html' as const, route: '/legacy/faq.html' };
  const tide = { route: '/hardware/tide-gauge/', file: 'hardware/tide-gauge.md' };
  const serial = { route: '/legacy/serial-console.html', file: 'legacy/serial-console.html' };

  it('Markdown: the source file relative, the route, or the route relative to the page', () => {
    expect(hrefFor(md, tide, 'relative')).toBe('../hardware/tide-gauge.md');
    expect(hrefFor(md, tide, 'absolute')).toBe('/hardware/tide-gauge/');
    expect(hrefFor(md, tide, 'route-relative')).toBe('../../hardware/tide-gauge/');
    // A relative route ending in .html would be read as a file link: the route instead.
    expect(hrefFor(md, serial, 'route-relative')).toBe('/legacy/serial-console.html');
  });

  it('HTML: a relative URL or the route; always the route under <base href>', () => {
    expect(hrefFor(html, tide, 'relative')).toBe('../hardware/tide-gauge/');
    expect(hrefFor(html, serial, 'route-relative')).toBe('serial-console.html');
    expect(hrefFor(html, tide, 'absolute')).toBe('/hardware/tide-gauge/');
    expect(hrefFor({ ...html, baseHref: '/' }, tide, 'relative')).toBe('/hardware/tide-gauge/');
  });

  it('encodes what would end a link destination or attribute, keeps non-ASCII', () => {
    expect(hrefFor(md, { route: '/notes/a b (draft)/', file: 'notes/a b (draft).md' }, 'relative')).toBe('../notes/a%20b%20%28draft%29.md');
    expect(hrefFor(md, { route: '/notes/grüße/', file: 'notes/grüße.md' }, 'absolute')).toBe('/notes/grüße/');
  });

  it('markup: [ and ](href) in Markdown, <a href> in HTML with the attribute escaped', () => {
    expect(linkMarkup('markdown', '../a.md')).toEqual({ open: '[', close: '](../a.md)' });
    expect(linkMarkup('html', '/a/?x=1&y="2"')).toEqual({ open: '<a href="/a/?x=1&amp;y=&quot;2&quot;">', close: '</a>' });
  });
});
