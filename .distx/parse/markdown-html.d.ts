/**
 * Raw HTML inside Markdown: `html` nodes are parsed with rehype-parse in fragment mode and their
 * links and ids are added with positions mapped back to the Markdown source.
 */
import type { Html } from 'mdast';
import type { LineIndex } from './lines.js';
import type { PageDraft } from './types.js';
/** What an inline opening tag does to the siblings up to its closing tag. */
export interface InlineOpen {
    readonly tag: string;
    /** The `a` has no closing tag inside this snippet: its text is in the siblings. */
    readonly link: boolean;
    /** Siblings are code: no spans, no body text, no link patterns. */
    readonly code: boolean;
    /** Siblings are a template region (nav, header, footer, aside). */
    readonly template: boolean;
}
/**
 * If an inline `html` node is an opening tag (`<a href="...">`, `<code>`), say which tag, so the
 * caller can treat the siblings up to `</tag>` accordingly.
 * @param value the html node's value
 */
export declare function inlineOpenTag(value: string): InlineOpen | null;
/**
 * True when an `html` node closes `tag` (`</a>`).
 * @param value the html node's value
 * @param tag lower-case tag name
 */
export declare function closesTag(value: string, tag: string): boolean;
/**
 * Add the links and ids of one raw HTML node.
 * @param node the mdast html node
 * @param start its start offset in the source
 * @param end its end offset in the source
 * @param src the Markdown source
 * @param lines its line table
 * @param draft the page being collected
 * @param template true when the node sits inside a template region (an inline `<nav>`)
 * @returns the number of links added (the last ones in `draft.links`)
 */
export declare function readRawHtml(node: Html, start: number, end: number, src: string, lines: LineIndex, draft: PageDraft, template: boolean): number;
