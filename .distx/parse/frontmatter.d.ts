import type { PageMeta } from '../types.js';
import type { PageDraft, ProblemDraft, Read } from './types.js';
/** Frontmatter of a page that has none. */
export declare const EMPTY_META: PageMeta;
/** What the frontmatter says. */
export interface FrontmatterResult {
    readonly meta: PageMeta;
    readonly title?: string;
    readonly problems: ProblemDraft[];
}
/** A frontmatter block found at the start of a text. */
export interface FrontmatterBlock {
    /** The YAML between the fences. */
    readonly value: string;
    /** Offset of the YAML's first character. */
    readonly contentStart: number;
    /** Offset just past the closing fence line (its line ending excluded). */
    readonly end: number;
}
/**
 * Find a `---` fenced YAML block at the very start of a text (the rule remark-frontmatter applies
 * to Markdown; used here for HTML files, which some generators also give frontmatter, and for the
 * simple fallback reader).
 * @param text the source text (BOM removed)
 */
export declare function findFrontmatter(text: string): FrontmatterBlock | null;
/**
 * Read frontmatter YAML into page metadata.
 * @param value the YAML text between the fences
 * @param contentStart offset of the YAML's first character in the source (problem positions)
 */
export declare function readFrontmatter(value: string, contentStart: number): FrontmatterResult;
/**
 * Read a page's frontmatter block (if any) and put its problems on the draft.
 * @param draft the page being collected
 * @param block the YAML and the offset of its first character, or null
 */
export declare function applyFrontmatter(draft: PageDraft, block: {
    readonly value: string;
    readonly contentStart: number;
} | null): Read;
