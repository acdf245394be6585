/**
 * A lookup from page id to facts: `facts[i]` when the facts are in page order (as `analyze`
 * passes them), else `facts[graph.pages[i].factsIndex]`. The order is checked once.
 */
export function factsByPage(input) {
    const { graph, facts } = input;
    const ordered = facts.length === graph.pages.length && facts.every((f, i) => f.file === graph.pages[i].file);
    return ordered ? (i) => facts[i] : (i) => facts[graph.pages[i].factsIndex];
}
