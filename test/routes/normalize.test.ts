import { describe, it, expect } from 'vitest';
import {
  canonicalPath,
  encodeRouteSegment,
  extensionOf,
  lookupRoute,
  normalizeRoute,
  normalizedBasePath,
  withBasePath,
} from '../../src/routes/index.js';
import { options } from '../graph/facts.js';

const routes = options().routes;
const folded = options({ routes: { caseInsensitive: true } }).routes;

describe('route normalisation (the rules parse and graph share)', () => {
  it('decodes percent-encoding, then encodes only % / \\ ? # and control characters', () => {
    expect(canonicalPath('/caf%C3%A9/')).toBe('/café/');
    expect(canonicalPath('/caf%c3%a9/')).toBe('/café/');
    expect(canonicalPath('/two%20words/')).toBe('/two words/');
    expect(canonicalPath('/a%2Fb/')).toBe('/a%2Fb/');
    expect(canonicalPath('/a%2fb/')).toBe('/a%2Fb/');
    expect(canonicalPath('/100%25/')).toBe('/100%25/');
    expect(canonicalPath('/q%3Fx%23y/')).toBe('/q%3Fx%23y/');
    expect(canonicalPath('/tab%09/')).toBe('/tab%09/');
    expect(canonicalPath('/semi;colon:at@/')).toBe('/semi;colon:at@/');
    expect(canonicalPath('a/b')).toBe('/a/b');
  });
  it('returns null for stray %, invalid UTF-8 and NUL', () => {
    for (const p of ['/100%/', '/%zz/', '/%C3%28/', '/%E0%A4%A/', '/%00/', '/a\u0000/']) expect(canonicalPath(p)).toBeNull();
  });
  it('index.html and index.htm stand for their folder; other index names do not (parse maps those)', () => {
    expect(canonicalPath('/a/index.html')).toBe('/a/');
    expect(canonicalPath('/index.htm')).toBe('/');
    expect(canonicalPath('/a/index.md')).toBe('/a/index.md');
    expect(canonicalPath('/a/index.html/')).toBe('/a/index.html/');
  });
  it('case folding only with caseInsensitive', () => {
    expect(normalizeRoute('/Guide/Caf%C3%89/', routes)).toBe('/Guide/CafÉ/');
    expect(normalizeRoute('/Guide/Caf%C3%89/', folded)).toBe('/guide/café/');
  });
  it('encodeRouteSegment turns a file name into a segment that decodes back to it', () => {
    for (const name of ['plain', 'with space', '100%', 'a#b', 'q?', 'back\\slash', 'café', 'x;y']) {
      const enc = encodeRouteSegment(name);
      expect(decodeURIComponent(enc)).toBe(name);
      expect(canonicalPath('/' + enc)).toBe('/' + enc);
    }
  });
  it('lookupRoute: exact, then trailing slash, then .html for route style html', () => {
    const index = new Map([['/a/b/', 1], ['/c.html', 2], ['/d', 3]]);
    expect(lookupRoute(index, '/a/b', routes)).toBe(1);
    expect(lookupRoute(index, '/a/b/', routes)).toBe(1);
    expect(lookupRoute(index, '/a/b/index.html', routes)).toBe(1);
    expect(lookupRoute(index, '/c', routes)).toBeUndefined();
    expect(lookupRoute(index, '/c', options({ routes: { style: 'html' } }).routes)).toBe(2);
    expect(lookupRoute(index, '/d', routes)).toBe(3);
    expect(lookupRoute(index, '/d/', routes)).toBeUndefined(); // a file is not served with a slash
    expect(lookupRoute(index, '/%zz', routes)).toBeUndefined();
  });
  it('base path: one trailing slash; site-absolute paths prefixed unless already under it', () => {
    expect(normalizedBasePath(options({ routes: { basePath: '/docs' } }).routes)).toBe('/docs/');
    expect(withBasePath('/a/', '/docs/')).toBe('/docs/a/');
    expect(withBasePath('/docs/a/', '/docs/')).toBe('/docs/a/');
    expect(withBasePath('/docs', '/docs/')).toBe('/docs');
    expect(withBasePath('/docsy/', '/docs/')).toBe('/docs/docsy/');
    expect(withBasePath('/a/', '/')).toBe('/a/');
  });
  it('extensionOf: lower-cased extension of the last segment', () => {
    expect(extensionOf('/a/b.MD')).toBe('.md');
    expect(extensionOf('/a.b/c')).toBe('');
    expect(extensionOf('/a/.hidden')).toBe('');
    expect(extensionOf('/a/g.')).toBe('');
    expect(extensionOf('x.tar.gz')).toBe('.gz');
  });
});
