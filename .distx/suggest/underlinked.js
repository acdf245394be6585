import { percentiles } from './percentile.js';
/** PageRank percentile of every page among the pages that are not excluded (NaN for excluded pages). */
export function pagerankPercentiles(graph, ranking) {
    return percentiles(ranking.pagerank, (i) => !graph.pages[i].meta.exclude);
}
/**
 * The under-linked pages, by page id, each with its reasons.
 * @param importance from `computeImportance`
 * @param rankPercentile from `pagerankPercentiles`
 */
export function findUnderlinked(graph, ranking, importance, rankPercentile, options) {
    const entries = new Set(graph.entries);
    const { maxDepth } = options;
    const { minInlinks, rankGap } = options.suggest;
    const out = [];
    for (let i = 0; i < graph.pages.length; i++) {
        if (graph.pages[i].meta.exclude || entries.has(i))
            continue;
        const reasons = [];
        const depth = ranking.depth[i];
        if (ranking.inlinks[i] === 0)
            reasons.push('orphan');
        if (depth < 0)
            reasons.push('unreachable');
        else if (depth > maxDepth)
            reasons.push('too-deep');
        if (importance.level[i] === 'high' && ranking.contentInlinks[i] < minInlinks)
            reasons.push('few-inlinks');
        if (importance.level[i] === 'high' && importance.score[i] - rankPercentile[i] > rankGap)
            reasons.push('rank-below-importance');
        if (reasons.length > 0)
            out.push({ page: i, reasons });
    }
    return out;
}
