/** The facts of a page id, whichever of the two orders `SuggestInput.facts` comes in. */
import type { PageFacts } from '../types.js';
import type { SuggestInput } from './types.js';

/**
 * A lookup from page id to facts: `facts[i]` when the facts are in page order (as `analyze`
 * passes them), else `facts[graph.pages[i].factsIndex]`. The order is checked once.
 */
export function factsByPage(input: Pick<SuggestInput, 'graph' | 'facts'>): (page: number) => PageFacts | undefined {
  const { graph, facts } = input;
  const ordered = facts.length === graph.pages.length && facts.every((f, i) => f.file === graph.pages[i].file);
  return ordered ? (i) => facts[i] : (i) => facts[graph.pages[i].factsIndex];
}
