/** The text stage (DESIGN section 6): tokens, the TF-IDF index, related pages, content centrality. */
export { tokenize, tokenizeWithOffsets, createStemCache, stemToken, isStopWord, forEachWord } from './tokenize.js';
export type { StemCache, Token } from './tokenize.js';
export { buildTermIndex, cosine, topTerms, termLeaders, termFrequency, inverseDocumentFrequency, FIELD_BOOSTS } from './tfidf.js';
export { relatedPages, relatedPagesWithStats, relatingTerms, maxRelatingDf } from './related.js';
export type { RelatedResult } from './related.js';
export { relatedPagesBruteForce } from './brute.js';
export { contentCentrality } from './centrality.js';
export type { CentralityOptions } from './centrality.js';
export { relatedKey, relatedPagesMemo } from './related-memo.js';
export type { RelatedMemo } from './related-memo.js';
