/**
 * `backtest`: how well would the suggestion stage re-discover links the authors actually wrote?
 * Pure: parsed facts and the collected inputs in, measurements out (the files are never read or
 * written here; `load.ts` and the command do that).
 *
 * The site is built once as it is (graph, term index, related pages, content centrality); then
 * each run (seed, seed + 1, ...) holds a share of the content-link pairs out, rebuilds graph and
 * ranking, runs the suggestion stage and scores it and the two baselines (score.ts).
 */
import type { CollectedInputs } from '../analyze.js';
import type { ResolvedOptions } from '../options.js';
import type { PageFacts } from '../types.js';
import type { BacktestResult, BacktestSettings, MethodId } from './types.js';
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
export declare const METHODS: readonly MethodId[];
/**
 * Run the backtest.
 * @param onRun called after each run with (runs done, runs in all), for a progress display
 */
export declare function backtest(input: BacktestInput, settings: BacktestSettings, onRun?: (done: number, total: number) => void): BacktestResult;
