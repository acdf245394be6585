/**
 * The front half of the pipeline (collect, parse, graph), run stage by stage with the built
 * modules, for the references that need the pipeline's own intermediate data: the source texts
 * (bare parse), the link graph (PageRank) and the page texts in graph order (relatedness).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { CONFIG_FILE } from './generate.js';
import type { Built } from './lib.js';
import type { Config, ResolvedOptions } from '../src/config/options.js';
import type { PageFacts, SiteGraph, SourceFile } from '../src/types.js';

/** The generated site's configuration, as the bench passes it to `analyze`. */
export function siteConfig(root: string): Config {
  return JSON.parse(readFileSync(join(root, CONFIG_FILE), 'utf8')) as Config;
}

/** What the front half of the pipeline produced. */
export interface FrontResult {
  readonly options: ResolvedOptions;
  readonly files: readonly SourceFile[];
  readonly facts: readonly PageFacts[];
  readonly graph: SiteGraph;
  /** Facts in graph order (page id order), as the text stage gets them. */
  readonly ordered: readonly PageFacts[];
}

/** Collect, parse and build the graph of the site at `root`. */
export async function runFront(lib: Pick<Built, 'api' | 'collect' | 'parse' | 'graph'>, root: string): Promise<FrontResult> {
  const options = lib.api.resolveOptions({ ...siteConfig(root), cache: { enabled: false } }, root);
  const aux = options.navigation === null ? [] : [options.navigation];
  const collected = await lib.collect.collectSources(options, aux);
  let navigation: { file: string; links: ReturnType<Built['parse']['parseNavigation']> } | null = null;
  if (options.navigation !== null) {
    const nav = await lib.collect.readAuxFile(options, 'navigation', options.navigation);
    navigation = { file: nav.file, links: lib.parse.parseNavigation(nav.file, nav.text) };
  }
  const facts = collected.files.map((f) => lib.parse.parseSource(f, options));
  const graph = lib.graph.buildGraph({ pages: facts, assets: collected.assets, navigation, redirects: [] }, options);
  const ordered = graph.pages.map((p) => facts[p.factsIndex]!);
  return { options, files: collected.files, facts, graph, ordered };
}
