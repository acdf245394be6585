import type { FlagSpec, FlagValues } from '../cli/args.js';
import type { BacktestSettings } from './types.js';
/** Defaults of the backtest flags. */
export declare const BACKTEST_DEFAULTS: BacktestSettings;
/** Largest share that may be held out (the rest must still look like the site). */
export declare const MAX_HOLDOUT = 0.9;
/** Most runs of one backtest. */
export declare const MAX_RUNS = 50;
/** Flags of `linkweave backtest` beyond the common ones (values checked by `parseBacktestFlags`). */
export declare const BACKTEST_FLAGS: readonly FlagSpec[];
/** Output formats of the backtest. */
export type BacktestFormat = 'text' | 'json';
/**
 * The backtest settings from the flag values.
 * @throws EngineError `E_USAGE` naming the flag, the accepted values and what was given
 */
export declare function parseBacktestFlags(values: FlagValues): BacktestSettings;
/**
 * The output format: `--format` (text or json), else json when `--output` ends in `.json`, else text.
 * @throws EngineError `E_USAGE` for any other format
 */
export declare function backtestFormat(format: string | null, output: string | null): BacktestFormat;
