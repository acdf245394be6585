/**
 * The backtest command's own flags: their table (for the CLI's parser and help), their
 * defaults, and the checks that turn the raw values into `BacktestSettings`. These are
 * parameters of one command run, not configuration keys, so their defaults live here.
 */
import { EngineError } from '../errors.js';
import type { BacktestSettings } from '../backtest/index.js';
import type { FlagSpec, FlagValues } from './args.js';

/** Defaults of the backtest flags. */
export const BACKTEST_DEFAULTS: BacktestSettings = { holdout: 0.1, seed: 42, runs: 1, keepLinkText: false };

/** Largest share that may be held out (the rest must still look like the site). */
export const MAX_HOLDOUT = 0.9;
/** Most runs of one backtest. */
export const MAX_RUNS = 50;

/** Flags of `linkweave backtest` beyond the common ones (values checked by `parseBacktestFlags`). */
export const BACKTEST_FLAGS: readonly FlagSpec[] = [
  {
    name: 'holdout',
    kind: 'string',
    value: 'SHARE',
    description: `share of the content links to hold out, > 0 and <= ${MAX_HOLDOUT} (default ${BACKTEST_DEFAULTS.holdout})`,
  },
  { name: 'seed', kind: 'string', value: 'N', description: `seed of the first run, a whole number (default ${BACKTEST_DEFAULTS.seed})` },
  { name: 'runs', kind: 'string', value: 'N', description: `runs with seeds N, N+1, ..., 1 to ${MAX_RUNS} (default ${BACKTEST_DEFAULTS.runs})` },
  {
    name: 'keep-link-text',
    kind: 'boolean',
    description: 'keep the text of a held-out link as plain prose where an anchor may be proposed (default: it may not)',
  },
];

/** Output formats of the backtest. */
export type BacktestFormat = 'text' | 'json';

const usage = (message: string): never => {
  throw new EngineError('E_USAGE', message);
};

/**
 * The backtest settings from the flag values.
 * @throws EngineError `E_USAGE` naming the flag, the accepted values and what was given
 */
export function parseBacktestFlags(values: FlagValues): BacktestSettings {
  const holdout = numberFlag(values, 'holdout', BACKTEST_DEFAULTS.holdout, /^\d*\.?\d+(e-?\d+)?$/i);
  if (!(holdout > 0 && holdout <= MAX_HOLDOUT)) {
    usage(`flag --holdout: expected a number greater than 0 and at most ${MAX_HOLDOUT} (the share of content links to hold out); got "${String(values.holdout)}"`);
  }
  const runs = numberFlag(values, 'runs', BACKTEST_DEFAULTS.runs, /^\d+$/);
  if (!Number.isInteger(runs) || runs < 1 || runs > MAX_RUNS) usage(`flag --runs: expected a whole number from 1 to ${MAX_RUNS}; got "${String(values.runs)}"`);
  const seed = numberFlag(values, 'seed', BACKTEST_DEFAULTS.seed, /^-?\d+$/);
  if (!Number.isSafeInteger(seed) || !Number.isSafeInteger(seed + runs - 1)) {
    usage(`flag --seed: expected a whole number, e.g. 42 (at most ${Number.MAX_SAFE_INTEGER - runs + 1} with --runs ${runs}); got "${String(values.seed)}"`);
  }
  return { holdout, seed, runs, keepLinkText: values['keep-link-text'] === true };
}

/**
 * The output format: `--format` (text or json), else json when `--output` ends in `.json`, else text.
 * @throws EngineError `E_USAGE` for any other format
 */
export function backtestFormat(format: string | null, output: string | null): BacktestFormat {
  if (format === null) return output !== null && output.toLowerCase().endsWith('.json') ? 'json' : 'text';
  if (format === 'text' || format === 'json') return format;
  return usage(`flag --format: the backtest writes text or json; got "${format}"`);
}

/** A flag's number, or the default when the flag is absent; NaN when it does not match `shape`. */
function numberFlag(values: FlagValues, name: string, fallback: number, shape: RegExp): number {
  const v = values[name];
  if (v === undefined) return fallback;
  if (typeof v === 'number') return v;
  if (typeof v !== 'string' || !shape.test(v.trim())) return Number.NaN;
  return Number(v.trim());
}
