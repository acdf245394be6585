/** The one list of configuration keys that change what `parseSource` extracts from a file. */
import type { ResolvedOptions } from '../config/options.js';

/**
 * Every option `src/parse/` reads (a test records the reads of `parseSource` and checks it
 * against this list):
 * - `routes.style`, `routes.basePath`, `routes.indexNames`, `routes.folders`, `routes.dated`,
 *   `routes.generator`, `routes.permalinks`: the route and title of a page;
 * - `linkPatterns`: links found by the configured patterns;
 * - `maxLinksPerPage`: links kept per page (more are dropped with a problem).
 *
 * Not here, on purpose: `routes.caseInsensitive` is applied by the graph stage (parse keeps the
 * case of routes); `maxFileBytes` is applied by `collect` (a file over the limit arrives with no
 * text and a `too-large` problem, and such files are never cached, see `isCacheable`);
 * `include`/`exclude` choose which files are parsed, not what a file yields; every later stage's
 * option (entry, template*, rules...) is applied after parsing.
 */
export const PARSE_OPTION_KEYS = [
  'routes.style',
  'routes.basePath',
  'routes.indexNames',
  'routes.folders',
  'routes.dated',
  'routes.generator',
  'routes.permalinks',
  'linkPatterns',
  'maxLinksPerPage',
] as const;

/**
 * A stable string of the values of `PARSE_OPTION_KEYS`. Cached facts are reused only under the
 * same fingerprint (and the same tool version and content hash).
 */
export function parseFingerprint(options: ResolvedOptions): string {
  const values: Record<string, unknown> = {};
  for (const key of PARSE_OPTION_KEYS) {
    let value: unknown = options;
    for (const part of key.split('.')) value = (value as Record<string, unknown>)[part];
    values[key] = value;
  }
  return JSON.stringify(values);
}
