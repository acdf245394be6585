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
 * This module is dependency-free so that the parse stage can use the same functions.
 */
import type { ResolvedOptions } from '../options.js';
/** The route options the normalisation reads. */
export type RouteOptions = ResolvedOptions['routes'];
/**
 * Encode one decoded path segment into its canonical form: only `%`, `/`, `\`, `?`, `#`, C0
 * controls and DEL are percent-encoded. Use it to turn a file or folder name into a route
 * segment (`100%.md` -> `100%25`).
 */
export declare function encodeRouteSegment(segment: string): string;
/**
 * Percent-decode one path segment. Returns null when it does not decode (a stray `%`, invalid
 * UTF-8) or holds a NUL.
 */
export declare function decodeRouteSegment(segment: string): string | null;
/**
 * Split a URL path into decoded segments (the leading `/` gives no segment; a trailing `/`
 * gives a last empty segment). Null when a segment does not decode.
 */
export declare function decodePathSegments(path: string): string[] | null;
/**
 * Canonical form of a URL path (rules 1 and 2 above; no case folding). A path without a
 * leading `/` gets one. Null when the path does not decode.
 */
export declare function canonicalPath(path: string): string | null;
/** The lookup key of a canonical path: case-folded when routes are case-insensitive. */
export declare function routeKeyOf(canonical: string, routes: RouteOptions): string;
/**
 * The lookup key of any URL path (rules 1 to 3). Null when the path does not decode.
 * Parse and graph agree on routes when both pass them through this function.
 */
export declare function normalizeRoute(path: string, routes: RouteOptions): string | null;
/** `routes.basePath` with exactly one trailing slash (`/docs` -> `/docs/`). */
export declare function normalizedBasePath(routes: RouteOptions): string;
/**
 * A site-absolute path taken against `basePath`: returned as is when it already starts with
 * the base path (or is the base path without its slash), else prefixed with it.
 */
export declare function withBasePath(path: string, basePath: string): string;
/**
 * Look a URL path up in a route index (keys made by `normalizeRoute`). Tries the exact key,
 * then the key with a trailing slash added (a static server answers `/a/b` with the folder
 * `/a/b/`: common practice, no source), then for route style `html` the key with `.html`
 * added to an extension-less last segment (hosts serve `/a/b` from `a/b.html`: common
 * practice, no source).
 * @returns the indexed value, or undefined (also when the path does not decode)
 */
export declare function lookupRoute<T>(index: ReadonlyMap<string, T>, path: string, routes: RouteOptions): T | undefined;
/** `lookupRoute` for a key that is already normalised. */
export declare function lookupKey<T>(index: ReadonlyMap<string, T>, key: string, routes: RouteOptions): T | undefined;
/**
 * Extension of the last segment of a path, lower-cased, with its dot (`/a/b.PNG` -> `.png`);
 * '' when the last segment has none (or ends in a dot, or starts with its only dot).
 */
export declare function extensionOf(path: string): string;
/** True for `.md`, `.markdown`, `.mdx`, `.html`, `.htm` (any case). */
export declare function isSourceExtension(ext: string): boolean;
/** True for `.md`, `.markdown`, `.mdx` (any case). */
export declare function isMarkdownExtension(ext: string): boolean;
