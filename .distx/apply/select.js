/** Reason given for a suggestion without an anchor phrase. */
export const NO_ANCHOR = 'no anchor phrase in the source to link (add a sentence that links to the target by hand)';
/**
 * Pick the suggestions `selection` names from `suggestions`. Duplicate ids count once.
 * @param suggestions a report's suggestions
 */
export function selectSuggestions(suggestions, selection) {
    const byId = new Map(suggestions.map((s) => [s.id, s]));
    let picked;
    const unknown = [];
    if (selection === 'all')
        picked = [...suggestions];
    else {
        const ids = [...new Set(selection.ids)];
        picked = [];
        for (const id of ids) {
            const s = byId.get(id);
            if (s === undefined)
                unknown.push(id);
            else
                picked.push(s);
        }
    }
    const skipped = picked
        .filter((s) => s.anchor === null)
        .map((s) => ({ id: s.id, file: s.file, reason: NO_ANCHOR }))
        .sort((a, b) => (a.file < b.file ? -1 : a.file > b.file ? 1 : a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
    const chosen = picked
        .filter((s) => s.anchor !== null)
        .sort((a, b) => (a.file < b.file ? -1 : a.file > b.file ? 1 : a.offset - b.offset || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0)));
    return { chosen, skipped, unknown };
}
/** `chosen` grouped by file, files in path order. */
export function groupByFile(chosen) {
    const groups = new Map();
    for (const s of chosen) {
        const g = groups.get(s.file);
        if (g === undefined)
            groups.set(s.file, [s]);
        else
            g.push(s);
    }
    return groups;
}
