import type { GraphInput } from '../graph/index.js';
import type { ResolvedOptions } from '../options.js';
import type { PageFacts, RelatedList, SiteGraph, TermIndex } from '../types.js';
import type { ContentPair } from './holdout.js';
import type { RunResult } from './types.js';
/** What the text stage gives the suggestion stage. */
export interface TextResults {
    readonly index: TermIndex;
    readonly related: readonly RelatedList[];
    readonly centrality: Float64Array;
}
/** Everything a run needs that does not depend on the seed. */
export interface RunBase {
    /** Options of the suggestion stage for the backtest (see `backtestOptions`). */
    readonly options: ResolvedOptions;
    /** The site as it is. */
    readonly graph: SiteGraph;
    /** The facts given to `buildGraph` for `graph`. */
    readonly facts: readonly PageFacts[];
    readonly aux: Omit<GraphInput, 'pages'>;
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
export declare function backtestOptions(options: ResolvedOptions, _pages: number): ResolvedOptions;
/** The text stage as `analyze` runs it, over the facts in page order. */
export declare function textStage(ordered: readonly PageFacts[], options: ResolvedOptions): TextResults;
/** Run the backtest once with `seed` (`keepLinkText`: see `BacktestSettings`). */
export declare function runOnce(base: RunBase, share: number, seed: number, keepLinkText?: boolean): RunResult;
