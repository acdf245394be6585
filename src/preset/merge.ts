/** A preset's config fragment under the user's config: the user's keys win, key by key. */
import type { Config } from '../config/config.js';

/**
 * Merge `over` onto `under`: plain objects merge key by key (recursively), every other value
 * (lists included) of `over` replaces `under`'s. Keys `over` leaves undefined keep `under`'s.
 */
export function mergeConfig(under: Config, over: Config): Config {
  return mergeValue(under, over) as Config;
}

function mergeValue(under: unknown, over: unknown): unknown {
  if (over === undefined) return under;
  if (!isPlain(under) || !isPlain(over)) return over;
  const out: Record<string, unknown> = { ...under };
  for (const [k, v] of Object.entries(over)) out[k] = mergeValue(under[k], v);
  return out;
}

function isPlain(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}
