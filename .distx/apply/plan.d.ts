/**
 * Planning the edits of one source file: which of its chosen suggestions can be written, and
 * the text after writing them. Pure.
 *
 * A suggestion is refused (the others in the file still apply) when:
 * - the file's content hash is not the `sourceHash` the suggestion was made for (the file
 *   changed since the report; its offsets may point anywhere now);
 * - the file could not be decoded exactly (binary, too large, invalid UTF-8: writing it back
 *   would change bytes other than the link);
 * - the anchor phrase is not at its offsets;
 * - its anchor overlaps one of an earlier suggestion in the file (by offset);
 * - re-parsing the edited text (`parseSource`) does not show a link with that href starting at
 *   the anchor's place, e.g. when the anchor sits where link syntax is not read.
 * Edits are made from the end of the file backwards, so every offset still refers to the
 * original text; nothing but the link markup is inserted.
 */
import type { ResolvedOptions } from '../options.js';
import type { SourceFile, Suggestion } from '../types.js';
import type { FilePlan, LinkStyle } from './types.js';
/** What planning one file needs. */
export interface PlanInput {
    /** The file as read now. */
    readonly file: SourceFile;
    /** The chosen suggestions in this file, each with an anchor. */
    readonly suggestions: readonly Suggestion[];
    /** The href of each suggestion's link, by id (from `hrefFor`). */
    readonly hrefs: ReadonlyMap<string, string>;
    readonly style: LinkStyle;
    /** For re-parsing the edited text as the analysis would. */
    readonly options: ResolvedOptions;
}
/** Plan one file's edits. */
export declare function planFile(input: PlanInput): FilePlan;
