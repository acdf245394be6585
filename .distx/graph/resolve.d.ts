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
import type { RawLink, ResolvedLink } from '../types.js';
import type { RedirectEnd } from './types.js';
import type { RouteOptions } from './normalize.js';
import type { LinkSource } from './source.js';
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
    /** True when page `page` has the fragment target `id`. */
    hasId(page: number, id: string): boolean;
}
/**
 * Resolve one link. Never throws: hrefs that hold a NUL, do not parse or do not decode give a
 * `broken` link whose target is the href as written.
 * @param fast take the `URL`-free path for plain hrefs (see `PLAIN_HREF`); false only to test
 *   that both paths agree
 */
export declare function resolveLink(raw: RawLink, src: LinkSource, ctx: ResolveContext, fast?: boolean): ResolvedLink;
