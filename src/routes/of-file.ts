/**
 * Routes (URL paths) of source files, DESIGN section 3.
 *
 * Routes come out in the canonical form of `normalize.ts` (the one normalisation the
 * parse and graph stages share): segments decoded, with
 * only `%`, `/`, `\`, `?`, `#` and control characters percent-encoded, so `/caf%C3%A9/` and
 * `/café/` are one route, shown `/café/`, and a file `a b.md` has the route `/a b/`. Case is
 * kept (but for Hugo, which writes lower-case paths); with `routes.caseInsensitive` the graph
 * folds case in its lookup keys (`normalizeRoute` gives that key).
 */
import type { PageMeta } from '../types.js';
import { HTML_EXTENSION_END as HTML_EXT, MARKDOWN_EXTENSION_END as MARKDOWN_EXT } from './extensions.js';
import { canonicalPath, encodeRouteSegment, normalizedBasePath } from './normalize.js';
import { removeDotSegments } from './paths.js';
import type { RouteOptions } from './types.js';
import { docusaurusRest, generatorPath } from './permalinks.js';
import type { RouteMeta } from './permalinks.js';

/**
 * The route of a source file (its URL path), in canonical form.
 *
 * `a/b.md` -> `/a/b/` (style `directory`) or `/a/b.html` (style `html`); index names
 * (`routes.indexNames`, compared without regard to case) stand for their folder; `.html`/`.htm`
 * files keep their own path and `index.html` stands for its folder; frontmatter `permalink`
 * (site-absolute) wins over `slug` (site-absolute when it starts with `/`, else relative to
 * `basePath`); a slug or permalink without a trailing slash or `.html` ending gets the route
 * style's ending; everything else is prefixed with `basePath`. With `routes.generator` set, that
 * generator's rules read the frontmatter and `routes.permalinks` instead (`./permalinks.ts`).
 * @param path file path relative to the content root, `/`-separated
 * @param meta the page's frontmatter (`slug`, `permalink`, `url`, `date`, `categories`, `title`)
 * @param routes route options
 */
export function routeOfFile(path: string, meta: RouteMeta, routes: RouteOptions): string {
  const base = canonicalUrlPath(normalizedBasePath(routes));
  const { generator, permalinks } = routes;
  if (generator !== 'none') {
    // Hugo writes its paths in lower case (unless `disablePathToLower`, which the preset reads
    // into `caseInsensitive: false`); a frontmatter `url` is kept as written, and so is the base
    // path (checked with hugo 0.111: `url: /Custom/Path/`, `slug: MySlug` -> `myslug/`).
    const lower = generator === 'hugo' && routes.caseInsensitive && meta.url === undefined ? (s: string) => s.toLowerCase() : (s: string) => s;
    const own = generatorPath(path, meta, generator, permalinks);
    if (own !== null) return canonicalUrlPath(completeRoute(base + lower(own.replace(/^\/+/, '')), routes.style));
    const mapped = mapFolder(path, routes, meta);
    return mapped !== null ? mapped : base + lower(fileRoutePath(path, routes));
  }
  if (meta.permalink !== undefined) {
    const p = meta.permalink.trim();
    return canonicalUrlPath(completeRoute(p.startsWith('/') ? p : `/${p}`, routes.style));
  }
  if (meta.slug !== undefined) {
    const slug = meta.slug.trim();
    return canonicalUrlPath(completeRoute(slug.startsWith('/') ? slug : base + slug, routes.style));
  }
  const mapped = mapFolder(path, routes);
  if (mapped !== null) return mapped;
  return base + fileRoutePath(path, routes);
}

/**
 * A file under a folder of `routes.folders` gets that folder's route prefix (a generator's
 * `src/pages/` served at `/`, `docs/` at `/docs/`); a file in a folder of `routes.dated` named
 * `YYYY-MM-DD-name` gets `YYYY/MM/DD/name` (dated posts). Null when neither applies.
 */
function mapFolder(path: string, routes: RouteOptions, meta: RouteMeta = {}): string | null {
  const folders = routes.folders;
  const dated = routes.dated;
  if (Object.keys(folders).length === 0 && dated.length === 0) return null;
  let rest = path.replace(/^(?:\.?\/)+/, '');
  let prefix: string | null = null;
  let longest = -1;
  for (const [folder, route] of Object.entries(folders)) {
    const f = folder.endsWith('/') ? folder : `${folder}/`;
    if (rest.startsWith(f) && f.length > longest) {
      longest = f.length;
      prefix = route;
    }
  }
  const folderOf = rest.slice(0, rest.lastIndexOf('/') + 1);
  const isDated = dated.some((d) => folderOf.startsWith(d.endsWith('/') ? d : `${d}/`));
  if (prefix === null && !isDated) return null;
  if (prefix !== null) rest = rest.slice(longest);
  else prefix = normalizedBasePath(routes);
  // Docusaurus: a blog post's `slug` is its path below the blog's route (relative or not).
  if (isDated && routes.generator === 'docusaurus' && meta.slug !== undefined && meta.slug.trim() !== '') {
    return canonicalUrlPath(completeRoute(folderStart(prefix, routes) + meta.slug.trim().replace(/^\/+/, ''), routes.style));
  }
  // A dated post is a file `YYYY-MM-DD-name.md`, or a folder `YYYY-MM-DD-name/` holding `index.md`.
  if (isDated) rest = rest.replace(/(^|\/)(\d{4})-(\d{2})-(\d{2})-([^/]+?)(?:\/(?:index|README)(\.[A-Za-z]+))?$/i, (_m, lead: string, y: string, mo: string, d: string, name: string, ext?: string) => `${lead}${y}/${mo}/${d}/${name}${ext ?? ''}`);
  const start = folderStart(prefix, routes);
  if (routes.generator === 'docusaurus' && !isDated) {
    const doc = docusaurusRest(rest, meta);
    if (doc.slug !== null) return canonicalUrlPath(completeRoute(start + doc.slug, routes.style));
    rest = doc.rest;
  }
  return canonicalUrlPath(start + fileRoutePath(rest, routes));
}

/** A folder's route prefix with the base path in front and a trailing slash. */
function folderStart(prefix: string, routes: RouteOptions): string {
  let start = prefix.startsWith('/') ? prefix : `/${prefix}`;
  const base = normalizedBasePath(routes);
  if (base !== '/' && !start.startsWith(base)) start = base + start.slice(1);
  return start.endsWith('/') ? start : `${start}/`;
}

/** The route of a file below `basePath`, without a leading slash (`a/b/`, `a/b.html`, ``), encoded. */
function fileRoutePath(path: string, routes: RouteOptions): string {
  const segments = path.replace(/^(?:\.?\/)+/, '').split('/');
  const name = segments.pop()!;
  const folder = segments.map((s) => `${encodeRouteSegment(s)}/`).join('');
  if (HTML_EXT.test(name)) {
    return name.replace(HTML_EXT, '').toLowerCase() === 'index' ? folder : folder + encodeRouteSegment(name);
  }
  const stem = name.replace(MARKDOWN_EXT, '');
  const lower = stem.toLowerCase();
  if (routes.indexNames.some((n) => n.toLowerCase() === lower)) return folder;
  return folder + encodeRouteSegment(stem) + (routes.style === 'html' ? '.html' : '/');
}

/** A slug or permalink without an `.html`/`.htm` ending or a trailing slash gets the style's ending. */
function completeRoute(route: string, style: RouteOptions['style']): string {
  if (route.endsWith('/') || HTML_EXT.test(route)) return route;
  return style === 'html' ? `${route}.html` : `${route}/`;
}

/**
 * Canonical form of a URL path as written (frontmatter, options); a path that does not decode
 * (a stray `%`) is taken literally, its segments encoded. Dot segments (`.`, `..`, also written
 * `%2e`) are removed as a browser removes them (RFC 3986 section 5.2.4), so a slug such as
 * `../../x` gives `/x/`, never a route with `..` in it.
 */
function canonicalUrlPath(path: string): string {
  return removeDotSegments(canonicalPath(path) ?? canonicalPath(path.split('/').map(encodeRouteSegment).join('/')) ?? path);
}
