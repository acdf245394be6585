/**
 * Route normalisation shared by every route lookup of the graph (DESIGN sections 3 and 4).
 *
 * A route is a URL path. Its canonical form ("canonical path") is what the graph stores and
 * shows; its key (canonical path, case-folded when `routes.caseInsensitive`) is what the graph
 * looks up. The rules, in order:
 *
 * 1. Percent-encoding: every `/`-separated segment is percent-decoded (UTF-8), then only the
 *    characters that would change the path's meaning are encoded again: `%` `/` `\` `?` `#`,
 *    the C0 controls and DEL. Everything else (spaces, non-ASCII letters, `;`, `:`...) stays
 *    decoded, so `/caf%C3%A9/` and `/café/` are the same route, shown as `/café/`.
 *    A segment that does not decode (bad `%` escape, invalid UTF-8) or holds a NUL makes the
 *    whole path unusable: the functions return `null` and the caller reports a broken link.
 * 2. A last segment `index.html` or `index.htm` is dropped: `/a/index.html` is `/a/`.
 * 3. Case folding (`toLowerCase`) of the key when `routes.caseInsensitive` is true.
 * 4. Trailing slash: not part of the key; `lookupRoute` tries `/a/b` and then `/a/b/`
 *    (and `/a/b.html` for route style `html`), so a link to `/a/b` finds the page `/a/b/`.
 *
 * Dot segments are not handled here: WHATWG `URL` removes them before a path gets here.
 * This module is part of the ground floor, so that parse and graph use the same functions.
 */
import { extensionOf } from './extensions.js';
import type { RouteOptions } from './types.js';

/** A `%` to decode, or a character `encodeRouteSegment` encodes. */
const NEEDS_CODING = /[%\\?#\u0000-\u001f\u007f]/;

/**
 * Encode one decoded path segment into its canonical form: only `%`, `/`, `\`, `?`, `#`, C0
 * controls and DEL are percent-encoded. Use it to turn a file or folder name into a route
 * segment (`100%.md` -> `100%25`).
 */
export function encodeRouteSegment(segment: string): string {
  let out = '';
  let start = 0;
  for (let i = 0; i < segment.length; i++) {
    const c = segment.charCodeAt(i);
    if (c < 0x20 || c === 0x7f || c === 0x25 || c === 0x2f || c === 0x5c || c === 0x3f || c === 0x23) {
      out += segment.slice(start, i) + '%' + (c < 16 ? '0' : '') + c.toString(16).toUpperCase();
      start = i + 1;
    }
  }
  return start === 0 ? segment : out + segment.slice(start);
}

/**
 * Percent-decode one path segment. Returns null when it does not decode (a stray `%`, invalid
 * UTF-8) or holds a NUL.
 */
export function decodeRouteSegment(segment: string): string | null {
  if (segment.indexOf('%') < 0) return segment.indexOf('\0') < 0 ? segment : null;
  let decoded: string;
  try {
    decoded = decodeURIComponent(segment);
  } catch {
    return null;
  }
  return decoded.indexOf('\0') < 0 ? decoded : null;
}

/**
 * Split a URL path into decoded segments (the leading `/` gives no segment; a trailing `/`
 * gives a last empty segment). Null when a segment does not decode.
 */
export function decodePathSegments(path: string): string[] | null {
  const parts = path.split('/');
  if (parts[0] === '') parts.shift();
  for (let i = 0; i < parts.length; i++) {
    const d = decodeRouteSegment(parts[i]);
    if (d === null) return null;
    parts[i] = d;
  }
  return parts;
}

/**
 * Canonical form of a URL path (rules 1 and 2 above; no case folding). A path without a
 * leading `/` gets one. Null when the path does not decode.
 */
export function canonicalPath(path: string): string | null {
  if (!NEEDS_CODING.test(path)) {
    // Nothing to decode or encode (the common case): only the leading slash and index files.
    const p = path.charCodeAt(0) === 0x2f ? path : '/' + path;
    if (p.endsWith('/index.html')) return p.slice(0, -10);
    if (p.endsWith('/index.htm')) return p.slice(0, -9);
    return p;
  }
  const segments = decodePathSegments(path);
  if (segments === null) return null;
  const last = segments.length - 1;
  if (last >= 0 && (segments[last] === 'index.html' || segments[last] === 'index.htm')) segments[last] = '';
  return '/' + segments.map(encodeRouteSegment).join('/');
}

/** The lookup key of a canonical path: case-folded when routes are case-insensitive. */
export function routeKeyOf(canonical: string, routes: RouteOptions): string {
  return routes.caseInsensitive ? canonical.toLowerCase() : canonical;
}

/**
 * The lookup key of any URL path (rules 1 to 3). Null when the path does not decode.
 * Parse and graph agree on routes when both pass them through this function.
 */
export function normalizeRoute(path: string, routes: RouteOptions): string | null {
  const canonical = canonicalPath(path);
  return canonical === null ? null : routeKeyOf(canonical, routes);
}

/** `routes.basePath` with exactly one trailing slash (`/docs` -> `/docs/`). */
export function normalizedBasePath(routes: RouteOptions): string {
  const base = routes.basePath.startsWith('/') ? routes.basePath : '/' + routes.basePath;
  return base.endsWith('/') ? base : base + '/';
}

/**
 * A site-absolute path taken against `basePath`: returned as is when it already starts with
 * the base path (or is the base path without its slash), else prefixed with it.
 */
export function withBasePath(path: string, basePath: string): string {
  if (basePath === '/' || path.startsWith(basePath) || path === basePath.slice(0, -1)) return path;
  return basePath + path.slice(1);
}

/**
 * Look a URL path up in a route index (keys made by `normalizeRoute`). Tries the exact key,
 * then the key with a trailing slash added (a static server answers `/a/b` with the folder
 * `/a/b/`: common practice, no source), then for route style `html` the key with `.html`
 * added to an extension-less last segment (hosts serve `/a/b` from `a/b.html`: common
 * practice, no source).
 * @returns the indexed value, or undefined (also when the path does not decode)
 */
export function lookupRoute<T>(index: ReadonlyMap<string, T>, path: string, routes: RouteOptions): T | undefined {
  const key = normalizeRoute(path, routes);
  return key === null ? undefined : lookupKey(index, key, routes);
}

/** `lookupRoute` for a key that is already normalised. */
export function lookupKey<T>(index: ReadonlyMap<string, T>, key: string, routes: RouteOptions): T | undefined {
  const exact = index.get(key);
  if (exact !== undefined || key.endsWith('/')) return exact;
  const folder = index.get(key + '/');
  if (folder !== undefined) return folder;
  if (routes.style === 'html' && extensionOf(key) === '') return index.get(key + '.html');
  return undefined;
}
