/**
 * Path helpers of link resolution that need no `URL`: dot-segment removal (RFC 3986 5.2.4),
 * joining a plain relative path to a folder, and decoding paths and fragments.
 */
import { decodePathSegments } from './normalize.js';

/** A `.` or `..` segment. */
export const DOT_SEGMENT = /\/\.\.?(?:\/|$)/;

/**
 * RFC 3986 section 5.2.4 "remove_dot_segments" on an absolute path: `.` segments vanish, `..`
 * removes the segment before it (never above the root), a final `.` or `..` leaves a slash.
 */
export function removeDotSegments(path: string): string {
  if (path.indexOf('.') < 0) return path;
  const parts = path.split('/');
  const out: string[] = [];
  const last = parts.length - 1;
  for (let i = 1; i <= last; i++) {
    const s = parts[i];
    if (s === '.') {
      if (i === last) out.push('');
    } else if (s === '..') {
      out.pop();
      if (i === last) out.push('');
    } else out.push(s);
  }
  return '/' + out.join('/');
}

/**
 * `removeDotSegments(dir + rel)` for a folder `dir` (`/a/b/`) and a relative path, with the
 * usual leading `./` and `../` taken off by string slicing (no split and join).
 */
export function joinPath(dir: string, rel: string): string {
  let d = dir;
  let i = 0;
  for (;;) {
    if (rel.startsWith('./', i)) i += 2;
    else if (rel.startsWith('../', i)) {
      i += 3;
      d = d.length > 1 ? d.slice(0, d.lastIndexOf('/', d.length - 2) + 1) : d;
    } else break;
  }
  const rest = i === 0 ? rel : rel.slice(i);
  const joined = d + rest;
  return rest.indexOf('.') >= 0 && DOT_SEGMENT.test('/' + rest) ? removeDotSegments(joined) : joined;
}

/** `/a/index.html` and `/a/index.htm` stand for `/a/` (as `canonicalPath` does). */
export function stripIndexFile(path: string): string {
  if (path.endsWith('/index.html')) return path.slice(0, -10);
  if (path.endsWith('/index.htm')) return path.slice(0, -9);
  return path;
}

/** Decoded file path (relative to the content root) of a URL path; null when it does not decode. */
export function filePathOf(pathname: string): string | null {
  if (pathname.indexOf('%') < 0) return pathname.slice(1);
  const segments = decodePathSegments(pathname);
  if (segments === null) return null;
  for (const s of segments) if (s.includes('/')) return null;
  return segments.join('/');
}

/** Decoded fragment without `#`; null when it does not decode or holds a NUL. */
export function decodeFragment(hash: string): string | null {
  if (hash.length <= 1) return '';
  const raw = hash.slice(1);
  if (raw.indexOf('%') < 0) return raw;
  try {
    const d = decodeURIComponent(raw);
    return d.indexOf('\0') < 0 ? d : null;
  } catch {
    return null;
  }
}

/** The path part of an href: before the first `?` or `#`. */
export function pathPart(href: string): string {
  let end = href.length;
  const q = href.indexOf('?');
  if (q >= 0) end = q;
  const h = href.indexOf('#');
  if (h >= 0 && h < end) end = h;
  return end === href.length ? href : href.slice(0, end);
}
