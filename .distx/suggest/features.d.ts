/**
 * The features of a candidate link source -> target, each as if the pair's own content links
 * were absent (the link model trains on the site's existing links; see `model.ts`):
 *
 * | feature              | what it measures                                                                 |
 * | -------------------- | -------------------------------------------------------------------------------- |
 * | similarity           | TF-IDF cosine similarity of the two pages                                        |
 * | title-mention        | the source's prose mentions the target's title (1/0)                             |
 * | anchor-text-mention  | ... a phrase other pages already link the target with (1/0)                      |
 * | label-mention        | ... the label of a navigation or template link to the target (1/0)               |
 * | alias-mention        | ... the words of the target's route or an alias (1/0)                            |
 * | mentions             | ln(1 + mentions of any of those names)                                           |
 * | name-words           | words of the longest name mentioned                                              |
 * | link-probability     | of the names mentioned, the highest share of a name's occurrences that are links |
 * | commonness           | ... the highest share of a name's links that point to this target                |
 * | adamic-adar          | ln(1 + Adamic-Adar over content links either way)                                |
 * | two-step-paths       | ln(1 + pages x with source -> x -> target)                                       |
 * | shared-folders       | leading route folders the two pages share                                        |
 * | target-inlinks       | ln(1 + distinct pages with a content link to the target)                         |
 * | source-outlinks      | ln(1 + distinct pages the source links to in its content)                        |
 * | source-rank          | PageRank percentile of the source                                                |
 * | target-depth         | the target's click depth without this pair, capped at 10 (unreachable: 10)       |
 *
 * "As if absent": a linked pair's own link texts count as prose mentions (the author's words
 * stay, the link goes), anchor texts only count when another page uses them, a phrase's link
 * counts leave out the pair's own links, and the link counts and depth leave out the pair.
 */
import type { Ranking, SiteGraph, TermIndex } from '../types.js';
import type { MentionIndex } from './mentions.js';
import type { Neighbours } from './proximity.js';
/** Feature names, in the order of a feature vector. */
export declare const FEATURES: readonly ['similarity', 'title-mention', 'anchor-text-mention', 'label-mention', 'alias-mention', 'mentions', 'name-words', 'link-probability', 'commonness', 'adamic-adar', 'two-step-paths', 'shared-folders', 'target-inlinks', 'source-outlinks', 'source-rank', 'target-depth'];
/** A feature's name. */
export type FeatureName = (typeof FEATURES)[number];
/** Index of each feature in a vector. */
export declare const F: Readonly<Record<FeatureName, number>>;
/** The name evidence features (zeroed to score a pair as if its source did not mention the target). */
export declare const NAME_FEATURES: readonly number[];
/** Depth given to an unreachable target, and the cap of every depth. */
export declare const DEPTH_CAP = 10;
/** Everything the features are computed from. */
export interface FeatureContext {
    readonly graph: SiteGraph;
    readonly ranking: Ranking;
    readonly index: TermIndex;
    readonly mentions: MentionIndex;
    readonly neighbours: Neighbours;
    /** PageRank percentile per page id. */
    readonly rankPct: ArrayLike<number>;
    /** 1 for entry pages. */
    readonly isEntry: Uint8Array;
    /** Distinct pages each page links to in its content (`contentOutlinks`). */
    readonly outlinks: Int32Array;
    /** Each page's route folders (`routeFolders`). */
    readonly folders: readonly (readonly string[])[];
}
/** The feature vector of the pair. */
export declare function pairFeatures(ctx: FeatureContext, s: number, t: number): number[];
/** Per page: the distinct pages it links to with at least one content link. */
export declare function contentOutlinks(graph: SiteGraph): Int32Array;
/** The vector with the name evidence zeroed: the pair as if the source did not mention the target. */
export declare function withoutNames(x: readonly number[]): number[];
