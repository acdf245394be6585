/** A fresh, empty draft. */
export function newDraft() {
    return { links: [], headings: [], ids: [], spans: [], body: [], code: [], problems: [] };
}
