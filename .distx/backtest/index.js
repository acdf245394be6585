/** The backtest (issue 8): hold out existing content links, suggest, score recall/precision/MRR against two baselines. */
export { backtest, METHODS } from './backtest.js';
export { holdOut, removePairs, contentPairs, eligiblePairs } from './holdout.js';
export { runOnce, backtestOptions, textStage } from './score.js';
export { scoreMethod, heldOutByTarget, spread, K_VALUES, LIST_LENGTH } from './metrics.js';
export { suggestionLists, similarityLists, randomLists } from './methods.js';
export { formatBacktestJson, formatBacktestText, scoreFormula, BACKTEST_SCHEMA, METHOD_LABELS } from './format.js';
export { parseBacktestFlags, backtestFormat, BACKTEST_FLAGS, BACKTEST_DEFAULTS, MAX_HOLDOUT, MAX_RUNS } from './settings.js';
export { loadSite } from './load.js';
export { runBacktestCommand, BACKTEST_SUMMARY } from './command.js';
export { lineStarts, positionOf, linkTextRange, withSpans, withoutWords, removeOnce } from './unlink.js';
export { mulberry32, streamFor, shuffle } from './prng.js';
export { chooseLikeSuggest } from './choose.js';
export { randomPageLists } from './methods.js';
