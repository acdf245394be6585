/**
 * One backtest run (one seed): hold links out, rebuild the graph and ranking from what remains,
 * run the suggestion stage's choice with every page as a target (choose.ts), and score the three methods' ranked
 * lists against the held-out pairs (metrics.ts has the definitions).
 *
 * The pipeline's site and text stages (src/pipeline/) run again on what remains: the text stage
 * (term index, related pages, content centrality) when the held-out links' words leave the
 * pages; with `keepLinkText` the words stay, and the site's own text stage results (computed
 * once, backtest.ts) are used.
 */
import { EngineError } from '../errors.js';
import type { ResolvedOptions } from '../config/options.js';
import { graphOf, rankOf, textOf } from '../pipeline/index.js';
import type { SiteInputs, TextResults } from '../pipeline/index.js';
import { findCandidates, hasContentLink } from '../suggest/index.js';
import type { PageFacts, SiteGraph } from '../types.js';
import { chooseLikeSuggest } from './choose.js';
import { holdOut } from './holdout.js';
import type { ContentPair } from './holdout.js';
import { randomLists, randomPageLists, similarityLists, suggestionLists, titlePhraseLists } from './methods.js';
import { heldOutByTarget, LIST_LENGTH, scoreMethod } from './metrics.js';
import type { RunResult } from './types.js';

/** Everything a run needs that does not depend on the seed. */
export interface RunBase {
  /** Options of the suggestion stage for the backtest (see `backtestOptions`). */
  readonly options: ResolvedOptions;
  /** The site as it is. */
  readonly graph: SiteGraph;
  /** The facts given to `buildGraph` for `graph`. */
  readonly facts: readonly PageFacts[];
  /** What the graph is built from besides the pages. */
  readonly aux: SiteInputs;
  readonly traffic: ReadonlyMap<string, number> | null;
  /** The text stage's results for the site as it is (used with `keepLinkText`; null: computed when needed). */
  readonly text: TextResults | null;
  readonly pairs: readonly ContentPair[];
  readonly sourceText: (file: string) => string | undefined;
}

/**
 * The suggestion options of a backtest: every page a target (`suggest.targets: 'all'`), ten
 * suggestions per target (the longest list scored) and no per-source cap (`perSource: 0`), so a
 * source that suits many targets is not hidden from some of them by the cap, and no least score
 * (`minScore: 0`: the lists are ranked to their tenth place). Everything else as configured.
 */
export function backtestOptions(options: ResolvedOptions, _pages: number): ResolvedOptions {
  return {
    ...options,
    suggest: { ...options.suggest, targets: 'all', perTarget: LIST_LENGTH, perSource: 0, minScore: 0 },
  };
}

const NO_ANCHORS = { overlap: false, inPlace: false } as const;
const TITLE_ANCHORS = { overlap: true, inPlace: false } as const;

/** Run the backtest once with `seed` (`keepLinkText`: see `BacktestSettings`). */
export function runOnce(base: RunBase, share: number, seed: number, keepLinkText = false): RunResult {
  const { graph, options } = base;
  const n = graph.pages.length;
  const { facts, heldOut } = holdOut({ graph, facts: base.facts, sourceText: base.sourceText, pairs: base.pairs, keepLinkText }, share, seed);
  const reduced = graphOf(facts, base.aux, options);
  checkReduced(graph, reduced, heldOut);
  const ranking = rankOf(reduced, options);
  const ordered = reduced.pages.map((p) => facts[p.factsIndex]);
  const text = keepLinkText && base.text !== null ? base.text : textOf(ordered, options);
  const cache = text.stems;
  const choice = chooseLikeSuggest({ graph: reduced, facts: ordered, ranking, ...text, traffic: base.traffic }, options);

  const truth = heldOutByTarget(heldOut);
  const targets = [...truth.keys()];
  const candidates = findCandidates(reduced, text.related, targets, options.suggest.minSimilarity);
  const covered = heldOut.filter((p) => choice.candidatesOf(p.target).includes(p.source)).length;
  const methods =
    targets.length === 0
      ? []
      : [
          scoreMethod('linkweave', suggestionLists(choice.chosen), truth, { overlap: true, inPlace: keepLinkText }, cache),
          scoreMethod('tfidf', similarityLists(candidates), truth, NO_ANCHORS, cache),
          scoreMethod('title-phrase', titlePhraseLists(reduced, ordered, text.index, targets, cache), truth, { ...TITLE_ANCHORS, inPlace: keepLinkText }, cache),
          scoreMethod('random', randomLists(candidates, seed), truth, NO_ANCHORS, cache),
          scoreMethod('random-page', randomPageLists(reduced, targets, seed), truth, NO_ANCHORS, cache),
        ];
  return {
    seed,
    heldOutPairs: heldOut.length,
    heldOutLinks: heldOut.reduce((a, p) => a + p.links.length, 0),
    targets: targets.length,
    candidateCoverage: heldOut.length === 0 ? null : covered / heldOut.length,
    bestRecallAt1: truth.size === 0 ? null : [...truth.values()].reduce((a, sources) => a + 1 / sources.size, 0) / truth.size,
    model: {
      source: choice.modelReport.source,
      trainingPairs: choice.modelReport.trainingPairs.linked + choice.modelReport.trainingPairs.notLinked,
      auc: choice.modelReport.auc,
    },
    methods,
  };
}

/**
 * The reduced site must have the same pages in the same order (page ids are compared) and no
 * content link left between a held-out pair; anything else is a bug, not a user error.
 */
function checkReduced(graph: SiteGraph, reduced: SiteGraph, heldOut: readonly { source: number; target: number }[]): void {
  const same = reduced.pages.length === graph.pages.length && reduced.pages.every((p, i) => p.route === graph.pages[i].route);
  if (!same) throw new EngineError('E_INTERNAL', 'backtest: holding links out changed the set of pages');
  for (const p of heldOut) {
    if (hasContentLink(reduced.forward, p.source, p.target)) {
      throw new EngineError('E_INTERNAL', `backtest: the held-out link ${graph.pages[p.source].route} -> ${graph.pages[p.target].route} is still in the graph`);
    }
  }
}
