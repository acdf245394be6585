import type { Finding } from '../types.js';
/** The matching key of a finding: rule, route and target (message, file and position left out). */
export declare function findingKey(f: Pick<Finding, 'rule' | 'route' | 'target'>): string;
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
export declare function matchFindings(current: readonly Finding[], previous: readonly Finding[]): FindingMatch;
