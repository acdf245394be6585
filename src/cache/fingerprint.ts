/** The one list of configuration keys that change what `parseSource` extracts from a file. */
import type { ResolvedOptions } from '../options.js';

/**
 * A stable string of every option `parseSource` reads. Cached facts are reused only under the
 * same fingerprint (and the same tool version and content hash).
 *
 * Keep this list equal to what `src/parse/` reads from `ResolvedOptions`:
 * - `routes.style`, `routes.basePath`, `routes.indexNames`, `routes.caseInsensitive`: the route
 *   of a page (`routeOfFile`);
 * - `linkPatterns`: links found by the configured patterns;
 * - `maxLinksPerPage`: links kept per page (more are dropped with a problem).
 *
 * Not here, on purpose: `maxFileBytes` is applied by `collect` (a file over the limit arrives
 * with no text and a `too-large` problem, and such files are never cached, see `isCacheable`);
 * `include`/`exclude` choose which files are parsed, not what a file yields; every later stage's
 * option (entry, template*, rules...) is applied after parsing.
 */
export function parseFingerprint(options: ResolvedOptions): string {
  const { style, basePath, indexNames, caseInsensitive } = options.routes;
  return JSON.stringify({
    routes: { style, basePath, indexNames, caseInsensitive },
    linkPatterns: options.linkPatterns.map((p) => ({ pattern: p.pattern, route: p.route })),
    maxLinksPerPage: options.maxLinksPerPage,
  });
}
