/**
 * The report's counts. Structural counts use the rules' own predicates (`rules/structure.ts`)
 * with the rules' default options, over the pages not marked `linkweave.exclude`, so a gate
 * limit reads the same thing the matching rule reports, whether that rule is on or off.
 */
import type { Finding, Ranking, Report, SiteGraph } from '../types.js';
import type { GateStats, Importance } from './types.js';
/** Counts of the report plus what the gate reads. */
export declare function computeStats(input: {
    readonly graph: SiteGraph;
    readonly ranking: Ranking;
    readonly findings: readonly Finding[];
    readonly files: number;
    readonly importance: readonly Importance[];
}): {
    stats: Report['stats'];
    gate: GateStats;
};
