/**
 * The verdict of a run: whether it passes (exit 0) or fails (exit 1), and every reason.
 *
 * Two kinds of failure:
 * - level: a check has findings at or above `failOn` -> `{ rule: <check id>, limit: 0,
 *   actual: <that check's findings at or above failOn> }`;
 * - a site limit (`limits`) is crossed -> `{ rule: 'limits.<key>', limit, actual }`:
 *   `orphans`, `brokenLinks`, `brokenFragments`, `unreachable`, `warnings` (findings of level
 *   warning) fail when the count is over the limit; `importantPageInlinks` fails when a page of
 *   high importance has fewer content inlinks (`actual` is the fewest).
 *
 * Failures are sorted by `rule`. The report keeps the result under its `gate` key (the report
 * contract, DESIGN section 8).
 */
import type { ResolvedOptions } from '../config/options.js';
import type { Finding, GateFailure, Report } from '../types.js';
import { compareText } from '../util/index.js';
import type { GateStats } from './types.js';

/** Decide the verdict. `findings` are the ones that count (a baseline may have removed known ones). */
export function evaluateGate(
  findings: readonly Finding[],
  stats: GateStats,
  options: Pick<ResolvedOptions, 'failOn' | 'limits'>,
): Report['gate'] {
  const failures: GateFailure[] = [];
  const counts = new Map<string, number>();
  for (const f of findings) {
    if (f.severity === 'error' || options.failOn === 'warning') counts.set(f.rule, (counts.get(f.rule) ?? 0) + 1);
  }
  for (const [rule, actual] of counts) failures.push({ rule, limit: 0, actual });

  const { limits } = options;
  const above = (key: Exclude<keyof typeof limits, 'importantPageInlinks'>, actual: number | null): void => {
    const limit = limits[key];
    if (limit !== null && actual !== null && actual > limit) failures.push({ rule: `limits.${key}`, limit, actual });
  };
  above('orphans', stats.orphans);
  above('brokenLinks', stats.brokenLinks);
  above('brokenFragments', stats.brokenFragments);
  above('unreachable', stats.unreachable);
  above('warnings', findings.filter((f) => f.severity === 'warning').length);
  const min = limits.importantPageInlinks;
  if (min !== null && stats.fewestImportantInlinks !== null && stats.fewestImportantInlinks < min) {
    failures.push({ rule: 'limits.importantPageInlinks', limit: min, actual: stats.fewestImportantInlinks });
  }
  failures.sort((a, b) => compareText(a.rule, b.rule));
  return { passed: failures.length === 0, failOn: options.failOn, failures };
}
