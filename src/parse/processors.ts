/**
 * The parsers, configured once. A frozen unified processor is immutable: `parse` keeps no state
 * between calls, so sharing these is not hidden state (they are constants, like a compiled regex).
 */
import type { Root as HastRoot } from 'hast';
import type { Root as MdastRoot } from 'mdast';
import rehypeParse from 'rehype-parse';
import remarkFrontmatter from 'remark-frontmatter';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import { unified } from 'unified';

const markdown = unified().use(remarkParse).use(remarkGfm).use(remarkFrontmatter, ['yaml']).freeze();
const htmlDocument = unified().use(rehypeParse).freeze();
const htmlFragment = unified().use(rehypeParse, { fragment: true }).freeze();

/**
 * Parse Markdown (CommonMark + GFM + YAML frontmatter) to mdast, with positions.
 * @param text Markdown source
 */
export function parseMarkdownTree(text: string): MdastRoot {
  return markdown.parse(text);
}

/**
 * Parse a whole HTML document to hast, with positions.
 * @param text HTML source
 */
export function parseHtmlDocument(text: string): HastRoot {
  return htmlDocument.parse(text);
}

/**
 * Parse an HTML fragment (raw HTML inside Markdown) to hast, with positions relative to `text`.
 * @param text HTML fragment
 */
export function parseHtmlFragment(text: string): HastRoot {
  return htmlFragment.parse(text);
}
