/** Types of the backtest: held-out links, per-method scores, one run, the whole result. */
export {};
