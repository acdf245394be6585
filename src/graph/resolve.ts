/**
 * Link resolution (DESIGN section 4). Pure: nothing here touches the file system; file and
 * asset "existence" is a lookup in the indexes the caller built from collect's lists.
 *
 * - WHATWG `URL` against a synthetic origin (`https://linkweave.invalid`), so dot segments,
 *   `//host`, schemes and `<base href>` behave as in a browser.
 * - A relative link whose path ends in `.md`/`.markdown`/`.mdx` (or `.html`/`.htm` naming a
 *   source file) resolves against the source file's own location and maps to that file's
 *   route. Every other relative link resolves against the page's route URL, or against the
 *   page's `<base href>` (itself resolved against the route) when the HTML page has one; with a
 *   base, every link resolves as the browser would, source extensions included.
 * - Site-absolute links (`/a/b/`) are taken against `basePath`.
 * - The query is dropped, the fragment kept and checked against the target's ids.
 */
import type { LinkKind, LinkStatus, RawLink, ResolvedLink } from '../types.js';
import type { RedirectEnd } from './types.js';
import {
  canonicalPath,
  encodeRouteSegment,
  extensionOf,
  isMarkdownExtension,
  isSourceExtension,
  lookupKey,
  routeKeyOf,
  withBasePath,
} from '../routes/index.js';
import type { RouteOptions } from '../routes/index.js';
import { decodeFragment, filePathOf, joinPath, pathPart, removeDotSegments, stripIndexFile } from '../routes/index.js';
import { isOutside, isTemplated } from './scope.js';
import type { ScopeContext } from './scope.js';
import { SITE_ORIGIN } from './link-source.js';
import type { LinkSource } from './link-source.js';


const HOSTED_SCHEMES = new Set(['http:', 'https:', 'ftp:', 'ws:', 'wss:']);
const SCHEME = /^[a-zA-Z][a-zA-Z0-9+.-]*:/;
const PROTOCOL_RELATIVE = /^[\\/]{2}/;
const SITE_ABSOLUTE = /^[\\/](?![\\/])/;
/**
 * Hrefs made only of characters that `URL` copies unchanged into a path or fragment (letters,
 * digits, `-._~/`), with no query: resolved without `URL`, which is most of the cost of
 * resolution on large sites (`npm run bench`). Both paths give the same result (tested).
 */
const PLAIN_HREF = /^[A-Za-z0-9\-._~/]+(?:#[A-Za-z0-9\-._~]*)?$/;
/** Characters WHATWG `URL` strips from both ends of an href. */
const URL_TRIM = /^[\u0000-\u0020]+|[\u0000-\u0020]+$/g;

/** The indexes resolution looks things up in. Built once per graph by `buildGraph`. */
export interface ResolveContext {
  readonly routes: RouteOptions;
  /** `routes.basePath` with a trailing slash. */
  readonly basePath: string;
  /** Route key -> page id (pages, aliases, redirects that reach a page). */
  readonly routeIndex: ReadonlyMap<string, number>;
  /** Route key -> end of a redirect chain that reaches no page. */
  readonly redirectEnds: ReadonlyMap<string, RedirectEnd>;
  /** File path (case-folded when routes are case-insensitive) -> page id. */
  readonly fileIndex: ReadonlyMap<string, number>;
  /** Asset paths (case-folded when routes are case-insensitive). */
  readonly assets: ReadonlySet<string>;
  /** Route of each page id. */
  readonly pageRoutes: readonly string[];
  /** True when page `page` has the fragment target `id` (always true when its ids are unknown). */
  hasId(page: number, id: string): boolean;
  /** Link scope (outside prefixes, generated routes); absent: nothing is outside. */
  readonly scope?: ScopeContext;
  /**
   * Lower-cased file name (`front-matter.md`) -> its page id, -1 when several pages have that
   * name: Hugo's `ref`/`relref` find a name with no `/` anywhere in the content when it names
   * no file from the page or the content root. Absent: no such lookup.
   */
  readonly fileNames?: ReadonlyMap<string, number>;
}

/**
 * Resolve one link. Never throws: hrefs that hold a NUL, do not parse or do not decode give a
 * `broken` link whose target is the href as written.
 * @param fast take the `URL`-free path for plain hrefs (see `PLAIN_HREF`); false only to test
 *   that both paths agree
 */
export function resolveLink(raw: RawLink, src: LinkSource, ctx: ResolveContext, fast = true): ResolvedLink {
  if (isTemplated(raw.href)) return make(raw, src, -1, raw.href.replace(URL_TRIM, ''), '', 'internal', 'templated');
  const link = resolveInSources(raw, src, ctx, fast);
  if (link.status !== 'broken' || ctx.scope === undefined) return link;
  // Only a link that resolved to a usable path can be placed outside; the rest stay broken.
  if (raw.href.includes('\0') || link.target.split('/').includes('..')) return link;
  const href = raw.href.replace(URL_TRIM, '');
  const fileLink = raw.fileRelative === true || (!src.hasBase && isMarkdownExtension(extensionOf(pathPart(href))));
  if (!isOutside(href, link.target, src.routeDir, src.fileDir, fileLink, ctx.scope)) return link;
  return { ...link, status: 'outside' };
}

/** Resolve a link among the sources: a page, an asset, a redirect, or broken. */
function resolveInSources(raw: RawLink, src: LinkSource, ctx: ResolveContext, fast: boolean): ResolvedLink {
  if (raw.href.includes('\0')) return broken(raw, src, raw.href, 'internal');
  let href = raw.href.replace(URL_TRIM, '');
  const hasScheme = SCHEME.test(href);
  const protocolRelative = !hasScheme && PROTOCOL_RELATIVE.test(href);
  if (raw.origin === 'pattern' && raw.fileRelative !== true && !hasScheme && !protocolRelative && !SITE_ABSOLUTE.test(href)) {
    // A pattern route that is no file link is site-absolute (DESIGN section 9, linkPatterns).
    href = '/' + href;
  }
  const siteAbsolute = !hasScheme && !protocolRelative && SITE_ABSOLUTE.test(href);
  const plain = fast && src.routeDir !== null && !protocolRelative && PLAIN_HREF.test(href);
  if (!hasScheme && !protocolRelative) {
    const ext = extensionOf(pathPart(href));
    if (raw.fileRelative === true || (!src.hasBase && isSourceExtension(ext))) {
      const markdownLink = raw.fileRelative === true || isMarkdownExtension(ext);
      const viaFile = plain ? resolvePlainFileLink(raw, href, src, ctx, markdownLink) : resolveFileLink(raw, href, src, ctx, markdownLink);
      if (viaFile !== null) return viaFile;
    }
  }
  let canonical: string | null;
  let hash: string;
  if (plain) {
    // A plain href has no characters `URL` would encode, no query and no `%`, so joining it to
    // the route's folder and removing dot segments (RFC 3986 5.2.4) gives the path `URL` gives.
    const h = href.indexOf('#');
    const path = h < 0 ? href : href.slice(0, h);
    hash = h < 0 ? '' : href.slice(h);
    canonical = stripIndexFile(siteAbsolute ? withBasePath(removeDotSegments(path), ctx.basePath) : joinPath(src.routeDir!, path));
  } else {
    let url: URL;
    try {
      url = new URL(href, src.baseUrl);
    } catch {
      return broken(raw, src, raw.href, 'internal');
    }
    if (url.origin !== SITE_ORIGIN || url.protocol !== 'https:') return classifyForeign(raw, src, url);
    hash = url.hash;
    canonical = canonicalPath(siteAbsolute ? withBasePath(url.pathname, ctx.basePath) : url.pathname);
  }
  const fragment = decodeFragment(hash);
  if (fragment === null || canonical === null) return broken(raw, src, raw.href, 'internal');
  const key = routeKeyOf(canonical, ctx.routes);
  const page = lookupKey(ctx.routeIndex, key, ctx.routes);
  if (page !== undefined) return toPage(raw, src, ctx, page, fragment, hash);
  if (ctx.redirectEnds.size > 0) {
    const end = lookupKey(ctx.redirectEnds, key, ctx.routes);
    if (end !== undefined) {
      if (end.kind === 'external') return make(raw, src, -1, end.url, fragment, 'external', 'external');
      return broken(raw, src, end.route, 'internal', fragment);
    }
  }
  return resolveAsset(raw, src, ctx, href, canonical, fragment);
}

/** A link that resolved to a page: check its fragment. */
function toPage(raw: RawLink, src: LinkSource, ctx: ResolveContext, page: number, fragment: string, rawHash: string): ResolvedLink {
  const target = ctx.pageRoutes[page];
  const status: LinkStatus = fragmentExists(ctx, page, fragment, rawHash) ? (page === src.page ? 'self' : 'ok') : 'broken-fragment';
  return make(raw, src, page, target, fragment, 'internal', status);
}

/**
 * The empty fragment and `top` always exist: browsers scroll to the top of the document for
 * them (the HTML standard's "indicated part of the document"; common practice, no source for
 * linking to them). Otherwise the decoded fragment, or the fragment as written, must be an id.
 */
function fragmentExists(ctx: ResolveContext, page: number, fragment: string, rawHash: string): boolean {
  if (fragment === '' || fragment.toLowerCase() === 'top') return true;
  return ctx.hasId(page, fragment) || (rawHash.length > 1 && ctx.hasId(page, rawHash.slice(1)));
}

/**
 * A link to a source file, resolved against the file's own location (site-absolute: against
 * the content root). Null when an `.html`/`.htm` link names no source file: the caller then
 * resolves it as a route.
 */
function resolveFileLink(raw: RawLink, href: string, src: LinkSource, ctx: ResolveContext, markdownLink: boolean): ResolvedLink | null {
  const candidates: URL[] = [];
  try {
    if (SITE_ABSOLUTE.test(href)) {
      const url = new URL(href, SITE_ORIGIN + '/');
      candidates.push(url);
      if (ctx.basePath !== '/' && url.pathname.startsWith(ctx.basePath)) {
        candidates.push(new URL(url.pathname.slice(ctx.basePath.length - 1) + url.hash, SITE_ORIGIN));
      }
    } else {
      candidates.push(new URL(href, src.fileUrl));
      // Link patterns (`{{ref "a/b.md"}}`) name files relative to the page or, failing that,
      // to the content root, as site generators' ref shortcodes do (common practice, no source).
      if (raw.origin === 'pattern' && !href.startsWith('.')) candidates.push(new URL(href, SITE_ORIGIN + '/'));
    }
  } catch {
    return broken(raw, src, raw.href, 'internal');
  }
  const files: string[] = [];
  for (const url of candidates) {
    const file = filePathOf(url.pathname);
    if (file === null) return broken(raw, src, raw.href, 'internal');
    files.push(file);
  }
  return fileCandidates(raw, src, ctx, files, candidates[0].hash, markdownLink);
}

/** `resolveFileLink` for a plain href (see `PLAIN_HREF`): the same candidates without `URL`. */
function resolvePlainFileLink(raw: RawLink, href: string, src: LinkSource, ctx: ResolveContext, markdownLink: boolean): ResolvedLink | null {
  const h = href.indexOf('#');
  const path = h < 0 ? href : href.slice(0, h);
  const hash = h < 0 ? '' : href.slice(h);
  const files: string[] = [];
  if (SITE_ABSOLUTE.test(path)) {
    const p = removeDotSegments(path);
    files.push(p.slice(1));
    if (ctx.basePath !== '/' && p.startsWith(ctx.basePath)) files.push(p.slice(ctx.basePath.length));
  } else {
    files.push(joinPath('/' + src.fileDir, path).slice(1));
    if (raw.origin === 'pattern' && !path.startsWith('.')) files.push(removeDotSegments('/' + path).slice(1));
  }
  return fileCandidates(raw, src, ctx, files, hash, markdownLink);
}

/** Look decoded file paths up in order: a source file (its page), else an asset. */
function fileCandidates(raw: RawLink, src: LinkSource, ctx: ResolveContext, files: readonly string[], hash: string, markdownLink: boolean): ResolvedLink | null {
  const fragment = decodeFragment(hash);
  if (fragment === null) return broken(raw, src, raw.href, 'internal');
  for (const file of files) {
    const lookup = ctx.routes.caseInsensitive ? file.toLowerCase() : file;
    const page = ctx.fileIndex.get(lookup);
    if (page !== undefined) return toPage(raw, src, ctx, page, fragment, hash);
    if (ctx.assets.has(lookup)) return make(raw, src, -1, assetTarget(file, ctx), fragment, 'asset', 'asset');
  }
  if (raw.origin === 'pattern' && ctx.fileNames !== undefined) {
    const written = raw.href.split('#')[0];
    const page = written.includes('/') ? undefined : ctx.fileNames.get(written.toLowerCase());
    if (page !== undefined && page >= 0) return toPage(raw, src, ctx, page, fragment, hash);
  }
  if (!markdownLink) return null;
  return broken(raw, src, files[0] ?? raw.href, 'internal', fragment);
}

/** An internal path that is no page: an asset, or a broken link. */
function resolveAsset(raw: RawLink, src: LinkSource, ctx: ResolveContext, href: string, canonical: string, fragment: string): ResolvedLink {
  const ext = extensionOf(canonical);
  const kind: LinkKind = ext !== '' && !isSourceExtension(ext) ? 'asset' : 'internal';
  const paths: string[] = [];
  if (canonical.startsWith(ctx.basePath)) paths.push(canonical.slice(ctx.basePath.length - 1));
  // Markdown authors write asset links relative to the file (the way repository viewers and
  // most generators read them), so a Markdown page's asset link may also name a file beside it.
  if (src.kind === 'markdown' && !SITE_ABSOLUTE.test(href) && !src.hasBase) {
    try {
      paths.push(new URL(href, src.fileUrl).pathname);
    } catch {
      // Already parsed once against the route URL; a failure here only skips this candidate.
    }
  }
  for (const p of paths) {
    const file = filePathOf(p);
    if (file === null) continue;
    const lookup = ctx.routes.caseInsensitive ? file.toLowerCase() : file;
    if (ctx.assets.has(lookup)) return make(raw, src, -1, assetTarget(file, ctx), fragment, 'asset', 'asset');
  }
  return broken(raw, src, canonical, kind, fragment);
}

/** A link to another origin or scheme. */
function classifyForeign(raw: RawLink, src: LinkSource, url: URL): ResolvedLink {
  if (url.protocol === 'mailto:') return make(raw, src, -1, raw.href.replace(URL_TRIM, ''), '', 'mailto', 'other');
  if (HOSTED_SCHEMES.has(url.protocol)) {
    const hash = url.hash;
    const target = hash === '' ? url.href : url.href.slice(0, -hash.length);
    return make(raw, src, -1, target, decodeFragment(hash) ?? hash.slice(1), 'external', 'external');
  }
  // tel:, javascript:, data:, file: and the rest: recorded, never read, never resolved to disk.
  return make(raw, src, -1, raw.href.replace(URL_TRIM, ''), '', 'other', 'other');
}

function assetTarget(file: string, ctx: ResolveContext): string {
  return ctx.basePath + file.split('/').map(encodeRouteSegment).join('/');
}

function broken(raw: RawLink, src: LinkSource, target: string, kind: LinkKind, fragment = ''): ResolvedLink {
  return make(raw, src, -1, target, fragment, kind, 'broken');
}

function make(raw: RawLink, src: LinkSource, to: number, target: string, fragment: string, kind: LinkKind, status: LinkStatus): ResolvedLink {
  return { from: src.page, to, target, fragment, kind, status, context: raw.context, raw };
}
