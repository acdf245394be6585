/**
 * The depth-repair plan (DESIGN section 7): a small set of the suggestions that together bring
 * as many pages as they can within `maxDepth`, chosen greedily, as for set cover: each round
 * takes the suggestion that fixes the most remaining depth findings (pages deeper than
 * `maxDepth` or unreachable, not excluded) given the links already taken, until none fixes
 * any. Gains are evaluated lazily (a stored gain is recomputed when it reaches the top, at once
 * for suggestions whose source page got closer to the entry pages, and for all before stopping);
 * ties go to the higher score, then the smaller id.
 */
import type { ResolvedOptions } from '../options.js';
import type { Ranking, SiteGraph } from '../types.js';
import type { RepairPlan } from './types.js';
/** What the plan needs of a suggestion. */
export interface PlanCandidate {
    readonly id: string;
    readonly source: number;
    readonly target: number;
    readonly score: number;
}
/** Greedy depth-repair plan over the given suggestions. */
export declare function repairPlan(graph: SiteGraph, ranking: Ranking, options: ResolvedOptions, candidates: readonly PlanCandidate[]): RepairPlan;
