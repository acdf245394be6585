/** The ranking stage: PageRank, click depth, inlinks and outlinks. */
export { pagerank } from './pagerank.js';
export type { PagerankOptions, PagerankResult, ExtraEdge } from './pagerank.js';
export { clickDepth } from './depth.js';
export type { ExtraLink } from './depth.js';
export { rankGraph, teleportVector, depthMask } from './rank.js';
