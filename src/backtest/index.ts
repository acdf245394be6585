/** The backtest (issue 8): hold out existing content links, suggest, score recall/precision/MRR against two baselines. */
export { backtest, METHODS } from './backtest.js';
export type { BacktestInput } from './backtest.js';
export { holdOut, removePairs, contentPairs, eligiblePairs } from './holdout.js';
export type { ContentPair, Holdout, HoldoutInput } from './holdout.js';
export { runOnce, backtestOptions } from './run-once.js';
export type { RunBase } from './run-once.js';
export { scoreMethod, heldOutByTarget, spread, K_VALUES, LIST_LENGTH } from './metrics.js';
export type { RankedSource } from './metrics.js';
export { suggestionLists, similarityLists, randomLists } from './methods.js';
export { linkTextRange, withSpans, withoutWords, removeOnce } from './unlink.js';
export { mulberry32, streamFor, shuffle } from './prng.js';
export type { Random } from './prng.js';
export type * from './types.js';
export { chooseLikeSuggest } from './choose.js';
export { randomPageLists } from './methods.js';
