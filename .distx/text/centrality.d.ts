import type { RelatedList } from '../types.js';
/** Settings of the walk; the defaults are those of the link PageRank (`src/options.ts`). */
export interface CentralityOptions {
    readonly damping: number;
    readonly maxIterations: number;
    readonly tolerance: number;
}
/**
 * Content centrality of `n` pages from their related lists: a distribution (sums to 1) indexed
 * by page id.
 */
export declare function contentCentrality(related: readonly RelatedList[], n: number, options?: CentralityOptions): Float64Array;
