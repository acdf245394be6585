import type { BacktestResult, MethodId } from './types.js';
/** Schema id of the JSON output. */
export declare const BACKTEST_SCHEMA = "linkweave/backtest@1";
/** How the methods are named in the table. */
export declare const METHOD_LABELS: Readonly<Record<MethodId, string>>;
/** The suggestion score as the suggestion stage computes it, in words. */
export declare function scoreFormula(_minSimilarity: number): {
    formula: string;
};
/** The JSON output, indented, ending in a newline. */
export declare function formatBacktestJson(result: BacktestResult): string;
/** The table for people, ending in a newline. */
export declare function formatBacktestText(result: BacktestResult): string;
