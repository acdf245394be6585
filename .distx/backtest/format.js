/**
 * The backtest's outputs: a table for people and JSON for machines (`linkweave/backtest@1`).
 * Both print the settings the numbers depend on (share held out, seeds, minSimilarity, the
 * score formula and its factors, k, what the backtest changed), so runs with different
 * settings can be compared. Pure; numbers in the JSON are rounded to 6 decimals so the same
 * input gives byte-identical output.
 */
import { roundTo } from '../report/round.js';
import { VERSION } from '../version.js';
import { K_VALUES, LIST_LENGTH } from './metrics.js';
/** Schema id of the JSON output. */
export const BACKTEST_SCHEMA = 'linkweave/backtest@1';
const DECIMALS = 6;
/** How the methods are named in the table. */
export const METHOD_LABELS = {
    linkweave: 'linkweave',
    tfidf: 'TF-IDF only',
    'title-phrase': 'title phrase',
    random: 'random related',
    'random-page': 'random page',
};
/** The suggestion score as the suggestion stage computes it, in words. */
export function scoreFormula(_minSimilarity) {
    return {
        formula: "the link model's probability, refitted on each run's remaining links",
    };
}
const r = (x) => (x === null ? null : roundTo(x, DECIMALS));
const rs = (s) => ({ mean: r(s.mean), sd: r(s.sd) });
function methodJson(m) {
    return {
        method: m.method,
        ...Object.fromEntries(K_VALUES.map((k, i) => [`recallAt${k}`, r(m.recall[i])])),
        ...Object.fromEntries(K_VALUES.map((k, i) => [`precisionAt${k}`, r(m.precision[i])])),
        mrr: r(m.mrr),
        recovered: m.recovered,
        anchorOverlap: r(m.anchorOverlap),
        anchorInPlace: r(m.anchorInPlace),
        lineMatch: r(m.lineMatch),
    };
}
/** The JSON output, indented, ending in a newline. */
export function formatBacktestJson(result) {
    const { settings, suggest } = result;
    const doc = {
        schema: BACKTEST_SCHEMA,
        tool: { name: 'linkweave', version: VERSION },
        root: result.root,
        settings: {
            holdout: settings.holdout,
            seeds: settings.seeds,
            runs: settings.runs,
            keepLinkText: settings.keepLinkText,
            k: [...K_VALUES],
            listLength: LIST_LENGTH,
            minSimilarity: suggest.minSimilarity,
            relatedK: suggest.relatedK,
            targets: suggest.targets,
            perTarget: suggest.perTarget,
            perSource: suggest.perSource,
            score: scoreFormula(suggest.minSimilarity),
        },
        site: result.site,
        runs: result.runs.map((run) => ({ ...run, candidateCoverage: r(run.candidateCoverage), methods: run.methods.map(methodJson) })),
        summary: result.summary.map((s) => ({
            method: s.method,
            ...Object.fromEntries(K_VALUES.map((k, i) => [`recallAt${k}`, rs(s.recall[i])])),
            ...Object.fromEntries(K_VALUES.map((k, i) => [`precisionAt${k}`, rs(s.precision[i])])),
            mrr: rs(s.mrr),
            anchorOverlap: rs(s.anchorOverlap),
            anchorInPlace: rs(s.anchorInPlace),
            lineMatch: rs(s.lineMatch),
        })),
    };
    return `${JSON.stringify(doc, null, 2)}\n`;
}
const f3 = (x) => x.toFixed(3);
function cell(s, runs) {
    if (s.mean === null)
        return '-';
    return runs > 1 && s.sd !== null ? `${f3(s.mean)}±${f3(s.sd)}` : f3(s.mean);
}
const mean = (xs) => (xs.length === 0 ? 0 : xs.reduce((a, b) => a + b, 0) / xs.length);
const count = (x) => (Number.isInteger(x) ? String(x) : x.toFixed(1));
function coverage(runs) {
    const xs = runs.map((x) => x.candidateCoverage).filter((x) => x !== null);
    return xs.length === 0 ? '-' : `${(100 * mean(xs)).toFixed(1)}%`;
}
function modelLine(runs) {
    const fitted = runs.filter((x) => x.model.source === 'fitted').length;
    const aucs = runs.map((x) => x.model.auc).filter((x) => x !== null);
    const pairs = count(mean(runs.map((x) => x.model.trainingPairs)));
    const auc = aucs.length === 0 ? '' : `, AUC ${f3(mean(aucs))} on pairs kept out of the fit`;
    return `fitted on ${pairs} pairs per run (${fitted} of ${runs.length} runs fitted, the rest fixed weights)${auc}`;
}
/** The table for people, ending in a newline. */
export function formatBacktestText(result) {
    const { settings, suggest, site, runs } = result;
    const score = scoreFormula(suggest.minSimilarity);
    const seeds = settings.runs === 1 ? `seed ${settings.seed}` : `seeds ${settings.seeds[0]}..${settings.seeds[settings.seeds.length - 1]} (${settings.runs} runs)`;
    const changes = [
        suggest.targets.configured === 'all' ? null : `suggest.targets ${suggest.targets.configured} -> all`,
        suggest.perTarget.configured === suggest.perTarget.used ? null : `perTarget ${suggest.perTarget.configured} -> ${suggest.perTarget.used}`,
        `perSource ${suggest.perSource.configured} -> no cap`,
    ].filter((c) => c !== null);
    const field = (label, value) => `  ${label.padEnd(16)}${value}`;
    const perRun = (f) => count(mean(runs.map(f)));
    const lines = [
        `linkweave backtest: ${result.root}`,
        '',
        field('site', `${site.pages} pages; ${site.contentLinks} content links between ${site.contentPairs} page pairs, ${site.eligiblePairs} of which may be held out`),
        field('held out', `${roundTo(settings.holdout * 100, 2)}% of those pairs per run, ${seeds}; every page keeps a content inlink`),
        field('link words', settings.keepLinkText ? 'kept in the page as prose, where an anchor may go (--keep-link-text)' : 'removed with the link (--keep-link-text keeps them as prose)'),
        field(settings.runs > 1 ? 'per run (mean)' : 'this run', `${perRun((x) => x.heldOutPairs)} pairs (${perRun((x) => x.heldOutLinks)} links) into ${perRun((x) => x.targets)} target pages`),
        field('candidates', `${coverage(runs)} of the held-out sources are candidates of their target (names mentioned, TF-IDF neighbours, graph neighbourhood)`),
        field('model', modelLine(runs)),
        field('minSimilarity', `${suggest.minSimilarity} (relatedK ${suggest.relatedK})`),
        field('score', score.formula),
        field('k', `${K_VALUES.join(', ')} (ranked lists of ${LIST_LENGTH} sources per target)`),
        field('backtest sets', changes.join(', ')),
        '',
    ];
    if (result.summary.every((s) => s.mrr.mean === null)) {
        lines.push('  Nothing was held out: no page has content inlinks from two or more other pages, so any held-out', '  link would leave a page without inlinks.');
        return `${lines.join('\n')}\n`;
    }
    const header = ['method', ...K_VALUES.map((k) => `R@${k}`), ...K_VALUES.map((k) => `P@${k}`), 'MRR', 'anchor', 'line'];
    const rows = result.summary.map((s) => [
        METHOD_LABELS[s.method],
        ...s.recall.map((x) => cell(x, settings.runs)),
        ...s.precision.map((x) => cell(x, settings.runs)),
        cell(s.mrr, settings.runs),
        cell(s.anchorOverlap, settings.runs),
        cell(s.lineMatch, settings.runs),
    ]);
    const widths = header.map((h, i) => Math.max(h.length, ...rows.map((row) => row[i].length)));
    const line = (row) => `  ${row.map((c, i) => (i === 0 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join('  ')}`.trimEnd();
    lines.push(line(header), ...rows.map(line), '');
    const ours = result.summary.find((s) => s.method === 'linkweave');
    const place = settings.keepLinkText && ours !== undefined ? ` On the original link's own place: ${cell(ours.anchorInPlace, settings.runs)}.` : '';
    lines.push(`  ${settings.runs > 1 ? 'Cells: mean±sample standard deviation over the runs. ' : ''}Means over the target pages with held-out inlinks.`, '  R@k: share of a target\'s held-out sources among its first k proposed sources. P@k: held-out', '  sources among the first k, divided by k. MRR: 1 / rank of the first held-out source in the', `  top ${LIST_LENGTH} (0 if none). anchor: share of the recovered links whose anchor shares a word stem`, `  with the original link text. line: share of the recovered links whose anchor is on the line of`, `  the original link.${place}`);
    return `${lines.join('\n')}\n`;
}
