import { encodeRouteSegment } from './normalize.js';
import { DOT_SEGMENT } from './paths.js';
/** The synthetic origin routes are resolved against. `.invalid` is reserved (RFC 2606). */
export const SITE_ORIGIN = 'https://linkweave.invalid';
/** The URL of a file path under the synthetic origin (`a/b c.md` -> `https://linkweave.invalid/a/b%20c.md`). */
export function fileUrlOf(file) {
    return SITE_ORIGIN + '/' + file.split('/').map(encodeRouteSegment).join('/');
}
/**
 * The resolution source of a page: its file location, its route URL and its `<base href>`
 * (first base with an href, resolved against the route URL; ignored when it does not parse,
 * as the HTML standard says).
 */
export function pageSource(page, kind, file, route, baseHref) {
    const path = route.startsWith('/') ? route : '/' + route;
    const routeUrl = SITE_ORIGIN + path;
    const fileUrl = fileUrlOf(file);
    const fileDir = file.slice(0, file.lastIndexOf('/') + 1);
    if (baseHref !== undefined && !baseHref.includes('\0')) {
        try {
            return { page, kind, fileUrl, baseUrl: new URL(baseHref, routeUrl).href, hasBase: true, fileDir, routeDir: null };
        }
        catch {
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
export function navigationSource(file, basePath, kind = 'markdown') {
    const encoded = file.split('/').map(encodeRouteSegment).join('/');
    const routePath = basePath + encoded;
    const routeDir = DOT_SEGMENT.test(routePath) ? null : routePath.slice(0, routePath.lastIndexOf('/') + 1);
    const fileDir = file.slice(0, file.lastIndexOf('/') + 1);
    return { page: -1, kind, fileUrl: fileUrlOf(file), baseUrl: SITE_ORIGIN + routePath, hasBase: false, fileDir, routeDir };
}
