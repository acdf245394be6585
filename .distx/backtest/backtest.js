import { buildGraph } from '../graph/index.js';
import { contentPairs, eligiblePairs } from './holdout.js';
import { spread } from './metrics.js';
import { backtestOptions, runOnce, textStage } from './score.js';
/** The methods in the order they are reported. */
export const METHODS = ['linkweave', 'tfidf', 'title-phrase', 'random', 'random-page'];
/**
 * Run the backtest.
 * @param onRun called after each run with (runs done, runs in all), for a progress display
 */
export function backtest(input, settings, onRun) {
    const { options, facts, collected } = input;
    const aux = { assets: collected.sources.assets, navigation: collected.navigation, redirects: collected.redirects };
    const graph = buildGraph({ ...aux, pages: facts }, options);
    const n = graph.pages.length;
    // Needed as it is only when the held-out links' words stay in the pages.
    const text = settings.keepLinkText ? textStage(graph.pages.map((p) => facts[p.factsIndex]), options) : null;
    const pairs = contentPairs(graph);
    const texts = new Map(collected.sources.files.map((f) => [f.path, f.text]));
    const runOptions = backtestOptions(options, n);
    const base = {
        options: runOptions,
        graph,
        facts,
        aux,
        traffic: collected.traffic,
        text,
        pairs,
        sourceText: (file) => texts.get(file),
    };
    const seeds = Array.from({ length: settings.runs }, (_, i) => settings.seed + i);
    const runs = [];
    for (const seed of seeds) {
        runs.push(runOnce(base, settings.holdout, seed, settings.keepLinkText));
        onRun?.(runs.length, seeds.length);
    }
    return {
        root: options.root,
        settings: { ...settings, seeds },
        suggest: {
            minSimilarity: options.suggest.minSimilarity,
            relatedK: options.suggest.relatedK,
            perTarget: { configured: options.suggest.perTarget, used: runOptions.suggest.perTarget },
            perSource: { configured: options.suggest.perSource, used: runOptions.suggest.perSource },
            targets: { configured: options.suggest.targets, used: 'all' },
        },
        site: {
            pages: n,
            contentLinks: pairs.reduce((a, p) => a + p.links.length, 0),
            contentPairs: pairs.length,
            eligiblePairs: eligiblePairs(graph, pairs).length,
        },
        runs,
        summary: summarize(runs),
    };
}
/** Mean and spread of every metric per method over the runs that scored any target. */
function summarize(runs) {
    return METHODS.map((method) => {
        const scores = runs.map((r) => r.methods.find((m) => m.method === method)).filter((m) => m !== undefined);
        const of = (f) => spread(scores.map(f));
        return {
            method,
            recall: [of((m) => m.recall[0]), of((m) => m.recall[1]), of((m) => m.recall[2])],
            precision: [of((m) => m.precision[0]), of((m) => m.precision[1]), of((m) => m.precision[2])],
            mrr: of((m) => m.mrr),
            anchorOverlap: of((m) => m.anchorOverlap),
            anchorInPlace: of((m) => m.anchorInPlace),
            lineMatch: of((m) => m.lineMatch),
        };
    });
}
