/**
 * `suggestLinks`: the suggest stage (DESIGN section 7) from under-linked pages to positioned,
 * impact-annotated link suggestions and a depth-repair plan.
 *
 * Steps: importance -> under-linked pages -> targets (under-linked, or all pages with
 * `suggest.targets: 'all'`) -> candidate sources -> anchors (each source tokenised once) ->
 * scores -> greedy choice under the per-source and per-target caps -> predicted PageRank and
 * depth per suggestion -> repair plan. Output sorted by file, line, column, target.
 */
import type { ResolvedOptions } from '../options.js';
import type { Suggestion } from '../types.js';
import type { SuggestInput, SuggestResult } from './types.js';
/** Propose links for the site. Pure: same input, same output. */
export declare function suggestLinks(input: SuggestInput, options: ResolvedOptions): SuggestResult;
/** Output order: file, line, column, then target route (code-unit order). */
export declare function compareSuggestions(a: Suggestion, b: Suggestion): number;
