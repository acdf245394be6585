import type { RouteOptions } from '../graph/normalize.js';
import type { PageMeta } from '../types.js';
export { normalizeRoute } from '../graph/normalize.js';
/**
 * The route of a source file (its URL path), in canonical form.
 *
 * `a/b.md` -> `/a/b/` (style `directory`) or `/a/b.html` (style `html`); index names
 * (`routes.indexNames`, compared without regard to case) stand for their folder; `.html`/`.htm`
 * files keep their own path and `index.html` stands for its folder; frontmatter `permalink`
 * (site-absolute) wins over `slug` (site-absolute when it starts with `/`, else relative to
 * `basePath`); a slug or permalink without a trailing slash or `.html` ending gets the route
 * style's ending; everything else is prefixed with `basePath`.
 * @param path file path relative to the content root, `/`-separated
 * @param meta the page's frontmatter (only `slug` and `permalink` are read)
 * @param routes route options
 */
export declare function routeOfFile(path: string, meta: Pick<PageMeta, 'slug' | 'permalink'>, routes: RouteOptions): string;
/**
 * True when a path names a source file by its extension (`.md`, `.markdown`, `.mdx`, `.html`,
 * `.htm`), ignoring any query or fragment.
 * @param href a link destination or route
 */
export declare function hasSourceExtension(href: string): boolean;
