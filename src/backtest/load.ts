/**
 * Reading a site for the backtest the way `analyze` reads it: sources and the auxiliary files
 * (navigation, redirects, traffic) through `collect`, facts through the cache and the parallel
 * parser. The reading itself is done by those stages; this file only wires them.
 *
 * This mirrors `collectInputs` and `parseAll` of `analyze.ts`, which are not exported; when they
 * are, `loadSite` should call them instead of repeating them.
 */
import { resolve } from 'node:path';
import type { AnalyzeHooks, CollectedInputs } from '../analyze.js';
import { parseWithCache } from '../cache/index.js';
import { collectSources, readAuxFile } from '../collect/index.js';
import type { ResolvedOptions } from '../options.js';
import { parseFiles } from '../parallel/index.js';
import { parseNavigation, parseRedirects } from '../parse/index.js';
import type { Redirect } from '../parse/index.js';
import type { AuxProblem } from '../rules/index.js';
import { parseTraffic } from '../suggest/index.js';
import type { PageFacts } from '../types.js';
import { VERSION } from '../version.js';

/** The collected inputs and the facts of every source file. */
export interface LoadedSite {
  readonly collected: CollectedInputs;
  readonly facts: PageFacts[];
}

/**
 * Collect and parse the site under `options.root`.
 * @param cores available cores (the caller reads them), for the choice of parse threads
 * @throws EngineError `E_IO` for an unreadable root or a missing auxiliary file
 */
export async function loadSite(options: ResolvedOptions, cores: number, hooks: AnalyzeHooks = {}): Promise<LoadedSite> {
  hooks.onStage?.('collect', 'start');
  const aux = [options.navigation, options.redirects, options.traffic].filter((p): p is string => p !== null);
  const [sources, navText, redirectsText, trafficText] = await Promise.all([
    collectSources(options, aux),
    options.navigation === null ? null : readAuxFile(options, 'navigation', options.navigation),
    options.redirects === null ? null : readAuxFile(options, 'redirects', options.redirects),
    options.traffic === null ? null : readAuxFile(options, 'traffic', options.traffic),
  ]);
  const auxProblems: AuxProblem[] = [];
  const navigation = navText === null ? null : { file: navText.file, links: parseNavigation(navText.file, navText.text) };
  let redirects: Redirect[] = [];
  if (redirectsText !== null) {
    const parsed = parseRedirects(redirectsText.file, redirectsText.text);
    redirects = parsed.redirects;
    for (const p of parsed.problems) auxProblems.push({ file: redirectsText.file, line: p.line, message: p.message });
  }
  let traffic: Map<string, number> | null = null;
  if (trafficText !== null) {
    const parsed = parseTraffic(trafficText.file, trafficText.text);
    traffic = parsed.views;
    for (const p of parsed.problems) auxProblems.push({ file: trafficText.file, line: p.line, message: p.message });
  }
  hooks.onStage?.('collect', 'end');

  hooks.onStage?.('parse', 'start');
  const { facts } = await parseWithCache(sources.files, options, {
    // `cache.dir` is relative to the working folder of this run, as for `analyze`.
    dir: options.cache.enabled ? resolve(options.cache.dir) : null,
    version: VERSION,
    parseMisses: async (files, onParsed) => (await parseFiles(files, options, { cores, onParsed })).facts,
    onProgress: (done, total) => hooks.onProgress?.('parse', done, total),
  });
  hooks.onStage?.('parse', 'end');
  return { collected: { sources, navigation, redirects, traffic, auxProblems }, facts };
}
