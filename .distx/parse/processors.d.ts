/**
 * The parsers, configured once. A frozen unified processor is immutable: `parse` keeps no state
 * between calls, so sharing these is not hidden state (they are constants, like a compiled regex).
 */
import type { Root as HastRoot } from 'hast';
import type { Root as MdastRoot } from 'mdast';
/**
 * Parse Markdown (CommonMark + GFM but literal autolinks + YAML frontmatter) to mdast, with positions.
 * @param text Markdown source
 */
export declare function parseMarkdownTree(text: string): MdastRoot;
/**
 * Parse a whole HTML document to hast, with positions.
 * @param text HTML source
 */
export declare function parseHtmlDocument(text: string): HastRoot;
/**
 * Parse an HTML fragment (raw HTML inside Markdown) to hast, with positions relative to `text`.
 * @param text HTML fragment
 */
export declare function parseHtmlFragment(text: string): HastRoot;
