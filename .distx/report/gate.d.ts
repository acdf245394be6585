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
import type { Finding, Report } from '../types.js';
import type { GateStats } from './types.js';
/** Decide the gate. `findings` are the ones that count (a baseline may have removed known ones). */
export declare function evaluateGate(findings: readonly Finding[], stats: GateStats, options: Pick<ResolvedOptions, 'failOn' | 'gate'>): Report['gate'];
