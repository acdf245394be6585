import { entrySet, isChecked, isDeadEnd, isOrphan, isUnreachable } from '../rules/structure.js';
/** Counts of the report plus what the gate reads. */
export function computeStats(input) {
    const { graph, ranking, findings, importance } = input;
    const entries = entrySet(graph);
    let orphans = 0;
    let unreachable = 0;
    let deadEnds = 0;
    let maxDepth = null;
    let fewestImportantInlinks = null;
    for (const page of graph.pages) {
        if (!isChecked(graph, page.id))
            continue;
        if (isOrphan(graph, ranking, entries, page.id))
            orphans++;
        if (isDeadEnd(graph, ranking, page.id))
            deadEnds++;
        if (isUnreachable(ranking, page.id))
            unreachable++;
        else
            maxDepth = Math.max(maxDepth ?? 0, ranking.depth[page.id]);
        if (importance[page.id] === 'high') {
            const inlinks = ranking.contentInlinks[page.id];
            fewestImportantInlinks = Math.min(fewestImportantInlinks ?? inlinks, inlinks);
        }
    }
    let internalLinks = 0;
    let brokenLinks = 0;
    let brokenFragments = 0;
    for (const link of graph.links) {
        if (link.kind === 'internal')
            internalLinks++;
        if (link.from >= 0 && !isChecked(graph, link.from))
            continue;
        if (link.status === 'broken')
            brokenLinks++;
        else if (link.status === 'broken-fragment')
            brokenFragments++;
    }
    const error = findings.filter((f) => f.severity === 'error').length;
    const stats = {
        files: input.files,
        pages: graph.pages.length,
        links: graph.links.length,
        internalLinks,
        brokenLinks,
        brokenFragments,
        orphans,
        unreachable,
        deadEnds,
        maxDepth,
        iterations: ranking.iterations,
        converged: ranking.converged,
        findings: { error, warning: findings.length - error },
    };
    return { stats, gate: { maxDepth, orphans, brokenLinks, brokenFragments, unreachable, fewestImportantInlinks } };
}
