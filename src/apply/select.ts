/** Choosing the suggestions to apply: by id or all; those without an anchor are skipped. */
import type { Suggestion } from '../types.js';
import type { NotApplied } from './types.js';

/** Which suggestions were asked for. */
export type Selection = { readonly ids: readonly string[] } | 'all';

/** The chosen suggestions, the ones skipped, and ids that name no suggestion. */
export interface Selected {
  /** With an anchor, sorted by file, then offset. */
  readonly chosen: readonly Suggestion[];
  readonly skipped: readonly NotApplied[];
  /** Ids asked for that the report does not have, in the order given. */
  readonly unknown: readonly string[];
}

/** Reason given for a suggestion without an anchor phrase. */
export const NO_ANCHOR = 'no anchor phrase: needs a sentence written by hand';

/**
 * Pick the suggestions `selection` names from `suggestions`. Duplicate ids count once.
 * @param suggestions a report's suggestions
 */
export function selectSuggestions(suggestions: readonly Suggestion[], selection: Selection): Selected {
  const byId = new Map(suggestions.map((s) => [s.id, s]));
  let picked: Suggestion[];
  const unknown: string[] = [];
  if (selection === 'all') picked = [...suggestions];
  else {
    const ids = [...new Set(selection.ids)];
    picked = [];
    for (const id of ids) {
      const s = byId.get(id);
      if (s === undefined) unknown.push(id);
      else picked.push(s);
    }
  }
  const skipped = picked
    .filter((s) => s.anchor === null)
    .map((s): NotApplied => ({ id: s.id, file: s.file, code: 'no-anchor', reason: NO_ANCHOR }))
    .sort((a, b) => (a.file < b.file ? -1 : a.file > b.file ? 1 : a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  const chosen = picked
    .filter((s) => s.anchor !== null)
    .sort((a, b) => (a.file < b.file ? -1 : a.file > b.file ? 1 : a.offset - b.offset || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0)));
  return { chosen, skipped, unknown };
}

/** `chosen` grouped by file, files in path order. */
export function groupByFile(chosen: readonly Suggestion[]): Map<string, Suggestion[]> {
  const groups = new Map<string, Suggestion[]>();
  for (const s of chosen) {
    const g = groups.get(s.file);
    if (g === undefined) groups.set(s.file, [s]);
    else g.push(s);
  }
  return groups;
}
