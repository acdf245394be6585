/**
 * The ranked lists of proposed sources per target, for the three methods compared:
 *
 * - linkweave: the suggestion stage's choice (`chooseLikeSuggest`, the same as `suggestLinks`
 *   without the impact prediction), a target's suggestions ordered by their score, best first
 *   (the order in which the stage's greedy choice took them), ties by source route;
 * - TF-IDF only: the same candidate sources the stage starts from (related pages with
 *   similarity >= `minSimilarity` that do not link to the target yet), ordered by cosine
 *   similarity alone, ties by source route: no PageRank, no click depth, no anchor search;
 * - title phrase: the pages whose prose holds the target's whole title (on stems, as one run of
 *   words in one text span, stop words allowed between), most occurrences first, then by cosine
 *   similarity, then by source; the anchor is the first occurrence. No model, no graph.
 * - random related page: the same candidates in a seeded random order (a stream of its own,
 *   separate from the sampler's): what the ordering adds over the candidate set;
 * - random page: ten pages drawn at random (seeded) from every page that could link to the
 *   target (not the target, not excluded, no content link to it yet): chance, what the
 *   candidate set itself adds.
 */
import type { CandidatePair, Chosen } from '../suggest/index.js';
import type { StemCache } from '../text/index.js';
import type { PageFacts, SiteGraph, TermIndex } from '../types.js';
import type { RankedSource } from './metrics.js';
/** Our ranked lists: the chosen suggestions grouped by target, best score first. */
export declare function suggestionLists(chosen: readonly Chosen[]): Map<number, RankedSource[]>;
/** TF-IDF only: candidates by similarity, best first, ties by source. */
export declare function similarityLists(candidates: readonly CandidatePair[]): Map<number, RankedSource[]>;
/** Random: candidates in a seeded random order, targets taken in ascending order. */
export declare function randomLists(candidates: readonly CandidatePair[], seed: number): Map<number, RankedSource[]>;
/**
 * Random page: for each target (ascending), up to ten distinct pages drawn uniformly from the
 * pages that could link to it. Draws are by rejection (a page id at random, kept when it may
 * link and was not drawn yet); when that keeps failing (few possible sources) the possible
 * sources are listed and shuffled instead. Either way each possible source is equally likely.
 */
export declare function randomPageLists(graph: SiteGraph, targets: readonly number[], seed: number): Map<number, RankedSource[]>;
/**
 * Title phrase only: for each target, the sources whose prose holds its whole title, most
 * occurrences first, then by cosine similarity, ties by source; anchored on the first one.
 * @param facts facts in page order
 */
export declare function titlePhraseLists(graph: SiteGraph, facts: readonly PageFacts[], index: TermIndex, targets: readonly number[], cache: StemCache): Map<number, RankedSource[]>;
