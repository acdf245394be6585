/** Choosing the suggestions to apply: by id or all; those without an anchor are skipped. */
import type { Suggestion } from '../types.js';
import type { NotApplied } from './types.js';
/** Which suggestions were asked for. */
export type Selection = {
    readonly ids: readonly string[];
} | 'all';
/** The chosen suggestions, the ones skipped, and ids that name no suggestion. */
export interface Selected {
    /** With an anchor, sorted by file, then offset. */
    readonly chosen: readonly Suggestion[];
    readonly skipped: readonly NotApplied[];
    /** Ids asked for that the report does not have, in the order given. */
    readonly unknown: readonly string[];
}
/** Reason given for a suggestion without an anchor phrase. */
export declare const NO_ANCHOR = "no anchor phrase in the source to link (add a sentence that links to the target by hand)";
/**
 * Pick the suggestions `selection` names from `suggestions`. Duplicate ids count once.
 * @param suggestions a report's suggestions
 */
export declare function selectSuggestions(suggestions: readonly Suggestion[], selection: Selection): Selected;
/** `chosen` grouped by file, files in path order. */
export declare function groupByFile(chosen: readonly Suggestion[]): Map<string, Suggestion[]>;
