/**
 * The gate: whether the run passes, and every limit it crossed.
 *
 * Two kinds of failure:
 * - severity: a rule has findings at or above `failOn` -> `{ rule: <rule id>, limit: 0,
 *   actual: <that rule's findings at or above failOn> }`;
 * - a `gate` limit is crossed -> `{ rule: 'gate.<key>', limit, actual }`: `maxDepth` (deepest
 *   reachable page), `maxOrphans`, `maxBrokenLinks`, `maxBrokenFragments`, `maxUnreachable`,
 *   `maxWarnings` (findings of severity warning) fail when the count is above the limit;
 *   `minInlinksForImportant` fails when a page of high importance has fewer content inlinks
 *   (`actual` is the fewest).
 *
 * Failures are sorted by `rule`.
 */
import type { ResolvedOptions } from '../options.js';
import type { Finding, GateFailure, Report } from '../types.js';
import { compareText } from '../rules/structure.js';
import type { GateStats } from './types.js';

/** Decide the gate. `findings` are the ones that count (a baseline may have removed known ones). */
export function evaluateGate(
  findings: readonly Finding[],
  stats: GateStats,
  options: Pick<ResolvedOptions, 'failOn' | 'gate'>,
): Report['gate'] {
  const failures: GateFailure[] = [];
  const counts = new Map<string, number>();
  for (const f of findings) {
    if (f.severity === 'error' || options.failOn === 'warning') counts.set(f.rule, (counts.get(f.rule) ?? 0) + 1);
  }
  for (const [rule, actual] of counts) failures.push({ rule, limit: 0, actual });

  const { gate } = options;
  const above = (key: keyof typeof gate, actual: number | null): void => {
    const limit = gate[key];
    if (limit !== null && actual !== null && actual > limit) failures.push({ rule: `gate.${key}`, limit, actual });
  };
  above('maxDepth', stats.maxDepth);
  above('maxOrphans', stats.orphans);
  above('maxBrokenLinks', stats.brokenLinks);
  above('maxBrokenFragments', stats.brokenFragments);
  above('maxUnreachable', stats.unreachable);
  above('maxWarnings', findings.filter((f) => f.severity === 'warning').length);
  const min = gate.minInlinksForImportant;
  if (min !== null && stats.fewestImportantInlinks !== null && stats.fewestImportantInlinks < min) {
    failures.push({ rule: 'gate.minInlinksForImportant', limit: min, actual: stats.fewestImportantInlinks });
  }
  failures.sort((a, b) => compareText(a.rule, b.rule));
  return { passed: failures.length === 0, failOn: options.failOn, failures };
}
