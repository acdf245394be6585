/**
 * Where links are written: the locations a page's (or the navigation file's) links resolve
 * against, computed once per page.
 */
import type { FileKind } from '../types.js';
import { DOT_SEGMENT, encodeRouteSegment } from '../routes/index.js';

/** The synthetic origin routes are resolved against. `.invalid` is reserved (RFC 2606). */
export const SITE_ORIGIN = 'https://linkweave.invalid';

/** Where a link is written: a page, or the navigation file (`page` -1). */
export interface LinkSource {
  readonly page: number;
  readonly kind: FileKind;
  /** URL of the source file's own location (`SITE_ORIGIN` + `/` + file path). */
  readonly fileUrl: string;
  /** URL relative links resolve against: the `<base href>` when there is one, else the route URL. */
  readonly baseUrl: string;
  /** True when `baseUrl` comes from a `<base href>`. */
  readonly hasBase: boolean;
  /** Decoded folder of the source file (`guide/` for `guide/a.md`, '' at the root). */
  readonly fileDir: string;
  /**
   * Canonical folder of the route URL (`/guide/a/` for `/guide/a/`, `/b/c/` for `/b/c/d;p`),
   * or null when plain hrefs cannot be joined to it without `URL` (a `<base href>`, dot segments).
   */
  readonly routeDir: string | null;
}

/** The URL of a file path under the synthetic origin (`a/b c.md` -> `https://linkweave.invalid/a/b%20c.md`). */
export function fileUrlOf(file: string): string {
  return SITE_ORIGIN + '/' + file.split('/').map(encodeRouteSegment).join('/');
}

/**
 * The resolution source of a page: its file location, its route URL and its `<base href>`
 * (first base with an href, resolved against the route URL; ignored when it does not parse,
 * as the HTML standard says).
 */
export function pageSource(page: number, kind: FileKind, file: string, route: string, baseHref?: string): LinkSource {
  const path = route.startsWith('/') ? route : '/' + route;
  const routeUrl = SITE_ORIGIN + path;
  const fileUrl = fileUrlOf(file);
  const fileDir = file.slice(0, file.lastIndexOf('/') + 1);
  if (baseHref !== undefined && !baseHref.includes('\0')) {
    try {
      return { page, kind, fileUrl, baseUrl: new URL(baseHref, routeUrl).href, hasBase: true, fileDir, routeDir: null };
    } catch {
      // An unparsable base URL is ignored (HTML standard: fall back to the document URL).
    }
  }
  const routeDir = DOT_SEGMENT.test(path) ? null : path.slice(0, path.lastIndexOf('/') + 1);
  return { page, kind, fileUrl, baseUrl: routeUrl, hasBase: false, fileDir, routeDir };
}

/**
 * The resolution source of the navigation file: links resolve against the file's own
 * location, under `basePath` for route-style links.
 */
export function navigationSource(file: string, basePath: string, kind: FileKind = 'markdown'): LinkSource {
  const encoded = file.split('/').map(encodeRouteSegment).join('/');
  const routePath = basePath + encoded;
  const routeDir = DOT_SEGMENT.test(routePath) ? null : routePath.slice(0, routePath.lastIndexOf('/') + 1);
  const fileDir = file.slice(0, file.lastIndexOf('/') + 1);
  return { page: -1, kind, fileUrl: fileUrlOf(file), baseUrl: SITE_ORIGIN + routePath, hasBase: false, fileDir, routeDir };
}
