import { chooseForTargets, pagerankPercentiles } from '../suggest/index.js';
/**
 * The suggestions `suggestLinks` would choose with `suggest.targets: 'all'`, in the order it
 * chooses them, before impact. (`centrality` and `traffic` of the input only serve importance,
 * which does not matter when every page is a target.)
 */
export function chooseLikeSuggest(input, options) {
    const { graph, ranking } = input;
    const targets = graph.pages.filter((p) => !p.meta.exclude).map((p) => p.id);
    return chooseForTargets(input, options, targets, pagerankPercentiles(graph, ranking));
}
