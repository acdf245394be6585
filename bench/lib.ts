/**
 * The built package, loaded at run time from `dist/` so that the bench measures the code users
 * run. Types come from the sources (`import type` only), so the bench type-checks before a
 * build exists.
 */
import type * as Api from '../src/index.js';
import type * as Collect from '../src/collect/index.js';
import type * as Parse from '../src/parse/index.js';
import type * as Graph from '../src/graph/index.js';
import type * as Rank from '../src/rank/index.js';
import type * as Text from '../src/text/index.js';
import type * as Write from '../src/util/write-file.js';
import type * as Cache from '../src/cache/index.js';

/** The modules of the built package the bench uses. */
export interface Built {
  readonly api: typeof Api;
  readonly collect: typeof Collect;
  readonly parse: typeof Parse;
  readonly graph: typeof Graph;
  readonly rank: typeof Rank;
  readonly text: typeof Text;
  readonly write: typeof Write;
  readonly cache: typeof Cache;
}

/** URL of a file of the build (`dist/...`), from `dist-bench/bench/`. */
export function distUrl(path: string): URL {
  return new URL(`../../dist/${path}`, import.meta.url);
}

/** Import the built modules; a clear error when the build is missing. */
export async function loadBuilt(): Promise<Built> {
  const load = async <T>(path: string): Promise<T> => {
    try {
      return (await import(distUrl(path).href)) as T;
    } catch (error) {
      throw new Error(`bench: cannot load dist/${path} (run "npm run build" first): ${(error as Error).message}`);
    }
  };
  const [api, collect, parse, graph, rank, text, write, cache] = await Promise.all([
    load<typeof Api>('index.js'),
    load<typeof Collect>('collect/index.js'),
    load<typeof Parse>('parse/index.js'),
    load<typeof Graph>('graph/index.js'),
    load<typeof Rank>('rank/index.js'),
    load<typeof Text>('text/index.js'),
    load<typeof Write>('util/write-file.js'),
    load<typeof Cache>('cache/index.js'),
  ]);
  return { api, collect, parse, graph, rank, text, write, cache };
}
