/**
 * Markdown pages: one remark parse (CommonMark + GFM + YAML frontmatter), one walk over the tree.
 *
 * Links: inline links, reference links (through their definitions; the first definition of a
 * label wins, as CommonMark says; an undefined reference is text, not a link), autolinks and GFM
 * literal autolinks, and raw HTML `<a href>`. Images are not links; code has no links.
 * Headings get GitHub-style slugs (github-slugger, one per page, so repeats get `-1`, `-2`), or
 * the id of a trailing `{#custom-id}` when the heading has one (the attribute syntax several site
 * generators accept).
 */
import type GithubSlugger from 'github-slugger';
import type { BlankedText } from './assess.js';
import type { LineIndex } from './lines.js';
import type { PageDraft } from './types.js';
/** The frontmatter block remark-frontmatter found. */
export interface MarkdownFrontmatter {
    readonly value: string;
    /** Offset of the YAML's first character. */
    readonly contentStart: number;
}
/**
 * Parse Markdown and add its links, headings, ids, body text, spans and code ranges to `draft`.
 * @param src the source text (spans are checked against it)
 * @param parsed the text to parse (`src`, or `src` with some lines emptied) and its offset map
 * @param lines line table of `src`
 * @param draft the page being collected
 * @param slugger the page's slugger
 * @returns the frontmatter block, if any
 */
export declare function readMarkdown(src: string, parsed: BlankedText, lines: LineIndex, draft: PageDraft, slugger: GithubSlugger): MarkdownFrontmatter | null;
