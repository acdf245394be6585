/**
 * `backtest`: how well would the suggestion stage re-discover links the authors actually wrote?
 * Pure: parsed facts and the collected inputs in, measurements out (the files are never read or
 * written here; `load.ts` and the command do that).
 *
 * The site is built once as it is (graph, term index, related pages, content centrality); then
 * each run (seed, seed + 1, ...) holds a share of the content-link pairs out, rebuilds graph and
 * ranking, runs the suggestion stage and scores it and the baselines (run-once.ts).
 */
import type { ResolvedOptions } from '../config/options.js';
import { graphOf, textOf } from '../pipeline/index.js';
import type { CollectedInputs } from '../pipeline/index.js';
import type { PageFacts } from '../types.js';
import { contentPairs, eligiblePairs } from './holdout.js';
import { spread } from './metrics.js';
import { backtestOptions, runOnce } from './run-once.js';
import type { BacktestResult, BacktestSettings, MethodId, MethodScores, MethodSummary, RunResult, Spread } from './types.js';

/** What the backtest works from: what `analyze` would have collected and parsed. */
export interface BacktestInput {
  readonly options: ResolvedOptions;
  /** Facts of every collected source file (any order). */
  readonly facts: readonly PageFacts[];
  readonly collected: Pick<CollectedInputs, 'navigation' | 'redirects' | 'traffic'> & {
    readonly sources: Pick<CollectedInputs['sources'], 'files' | 'assets'>;
  };
}

/** The methods in the order they are reported. */
export const METHODS: readonly MethodId[] = ['linkweave', 'tfidf', 'title-phrase', 'random', 'random-page'];

/**
 * Run the backtest.
 * @param onRun called after each run with (runs done, runs in all), for a progress display
 */
export function backtest(input: BacktestInput, settings: BacktestSettings, onRun?: (done: number, total: number) => void): BacktestResult {
  const { options, facts, collected } = input;
  const aux = { assets: collected.sources.assets, navigation: collected.navigation, redirects: collected.redirects };
  const graph = graphOf(facts, aux, options);
  const n = graph.pages.length;
  // Needed as it is only when the held-out links' words stay in the pages.
  const text = settings.keepLinkText ? textOf(graph.pages.map((p) => facts[p.factsIndex]), options) : null;
  const pairs = contentPairs(graph);
  const texts = new Map(collected.sources.files.map((f) => [f.path, f.text] as const));
  const runOptions = backtestOptions(options, n);
  const base = {
    options: runOptions,
    graph,
    facts,
    aux,
    traffic: collected.traffic,
    text,
    pairs,
    sourceText: (file: string) => texts.get(file),
  };

  const seeds = Array.from({ length: settings.runs }, (_, i) => settings.seed + i);
  const runs: RunResult[] = [];
  for (const seed of seeds) {
    runs.push(runOnce(base, settings.holdout, seed, settings.keepLinkText));
    onRun?.(runs.length, seeds.length);
  }
  return {
    root: options.root,
    settings: { ...settings, seeds },
    suggest: {
      minSimilarity: options.suggest.minSimilarity,
      relatedK: options.suggest.relatedK,
      perTarget: { configured: options.suggest.perTarget, used: runOptions.suggest.perTarget },
      perSource: { configured: options.suggest.perSource, used: runOptions.suggest.perSource },
      targets: { configured: options.suggest.targets, used: 'all' },
    },
    site: {
      pages: n,
      contentLinks: pairs.reduce((a, p) => a + p.links.length, 0),
      contentPairs: pairs.length,
      eligiblePairs: eligiblePairs(graph, pairs).length,
    },
    runs,
    summary: summarize(runs),
  };
}

/** Mean and spread of every metric per method over the runs that scored any target. */
function summarize(runs: readonly RunResult[]): MethodSummary[] {
  return METHODS.map((method): MethodSummary => {
    const scores = runs.map((r) => r.methods.find((m) => m.method === method)).filter((m): m is MethodScores => m !== undefined);
    const of = (f: (m: MethodScores) => number | null): Spread => spread(scores.map(f));
    return {
      method,
      recall: [of((m) => m.recall[0]), of((m) => m.recall[1]), of((m) => m.recall[2])],
      precision: [of((m) => m.precision[0]), of((m) => m.precision[1]), of((m) => m.precision[2])],
      mrr: of((m) => m.mrr),
      anchorOverlap: of((m) => m.anchorOverlap),
      anchorInPlace: of((m) => m.anchorInPlace),
      lineMatch: of((m) => m.lineMatch),
    };
  });
}
