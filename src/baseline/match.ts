/**
 * Matching the findings of two runs (a baseline and this run, or a base report and this one).
 *
 * Two findings are the same problem when they have the same rule, route and target: not the
 * same line, column or message, so an edit above a finding, a reworded message or a new hint
 * does not make it new. Matching counts multiplicity: two broken links to the same target on
 * one page are two findings; when one is fixed, one is fixed and one is known.
 *
 * Within one key, findings at the very same file, line and column are paired first; the rest
 * are paired in report order (file, line, column), so a line inserted above keeps the pairs
 * in step.
 */
import { compareFindings } from '../util/index.js';
import type { Finding } from '../types.js';

/** The matching key of a finding: rule, route and target (message, file and position left out). */
export function findingKey(f: Pick<Finding, 'rule' | 'route' | 'target'>): string {
  return `${f.rule}\u0000${f.route}\u0000${f.target ?? ''}`;
}

/** Findings of this run against an earlier run's. */
export interface FindingMatch {
  /** This run's findings the earlier run had too, in report order. */
  readonly known: readonly Finding[];
  /** This run's findings the earlier run did not have, in report order. */
  readonly new: readonly Finding[];
  /** The earlier run's findings this run no longer has, as recorded then, in report order. */
  readonly fixed: readonly Finding[];
}

/**
 * Match `current` against `previous` by `findingKey`, with multiplicity.
 * @param current this run's findings (any order)
 * @param previous the earlier run's findings (any order)
 */
export function matchFindings(current: readonly Finding[], previous: readonly Finding[]): FindingMatch {
  const groups = new Map<string, { now: Finding[]; then: Finding[] }>();
  const group = (key: string) => {
    let g = groups.get(key);
    if (g === undefined) groups.set(key, (g = { now: [], then: [] }));
    return g;
  };
  for (const f of current) group(findingKey(f)).now.push(f);
  for (const f of previous) group(findingKey(f)).then.push(f);

  const known: Finding[] = [];
  const added: Finding[] = [];
  const fixed: Finding[] = [];
  for (const { now, then } of groups.values()) {
    now.sort(compareFindings);
    then.sort(compareFindings);
    // Pass 1: the same place in both runs.
    const thenAt = new Map<string, number[]>();
    then.forEach((f, i) => {
      const at = place(f);
      const list = thenAt.get(at);
      if (list === undefined) thenAt.set(at, [i]);
      else list.push(i);
    });
    const pairedThen = new Set<number>();
    const rest: Finding[] = [];
    for (const f of now) {
      const i = thenAt.get(place(f))?.shift();
      if (i === undefined) rest.push(f);
      else {
        pairedThen.add(i);
        known.push(f);
      }
    }
    // Pass 2: what is left, in order.
    const left = then.filter((_, i) => !pairedThen.has(i));
    const pairs = Math.min(rest.length, left.length);
    // One by one: a spread of a large site's findings would overflow the call stack.
    for (let i = 0; i < rest.length; i++) (i < pairs ? known : added).push(rest[i]);
    for (let i = pairs; i < left.length; i++) fixed.push(left[i]);
  }
  return { known: known.sort(compareFindings), new: added.sort(compareFindings), fixed: fixed.sort(compareFindings) };
}

function place(f: Finding): string {
  return `${f.file}\u0000${f.line}\u0000${f.column}`;
}
