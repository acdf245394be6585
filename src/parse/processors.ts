/**
 * The parsers, configured once. A frozen unified processor is immutable: `parse` keeps no state
 * between calls, so sharing these is not hidden state (they are constants, like a compiled regex).
 */
import type { Root as HastRoot } from 'hast';
import type { Root as MdastRoot } from 'mdast';
import { gfmFootnoteFromMarkdown } from 'mdast-util-gfm-footnote';
import { gfmStrikethroughFromMarkdown } from 'mdast-util-gfm-strikethrough';
import { gfmTableFromMarkdown } from 'mdast-util-gfm-table';
import { gfmTaskListItemFromMarkdown } from 'mdast-util-gfm-task-list-item';
import { gfmFootnote } from 'micromark-extension-gfm-footnote';
import { gfmStrikethrough } from 'micromark-extension-gfm-strikethrough';
import { gfmTable } from 'micromark-extension-gfm-table';
import { gfmTaskListItem } from 'micromark-extension-gfm-task-list-item';
import rehypeParse from 'rehype-parse';
import remarkFrontmatter from 'remark-frontmatter';
import remarkParse from 'remark-parse';
import type { Processor } from 'unified';
import { unified } from 'unified';

/**
 * GFM as remark-gfm sets it up (tables, footnotes, strikethrough, task list items), but without
 * literal autolinks: those are found in the text nodes by `literal-links.ts`, which costs a
 * small part of what the tokenizer extension and its tree pass cost (see there).
 */
function gfmWithoutLiteralLinks(this: Processor): void {
  const data = this.data();
  (data.micromarkExtensions ??= []).push(gfmFootnote(), gfmStrikethrough(), gfmTable(), gfmTaskListItem());
  (data.fromMarkdownExtensions ??= []).push([gfmFootnoteFromMarkdown(), gfmStrikethroughFromMarkdown(), gfmTableFromMarkdown(), gfmTaskListItemFromMarkdown()]);
}

const markdown = unified().use(remarkParse).use(gfmWithoutLiteralLinks).use(remarkFrontmatter, ['yaml', 'toml']).freeze();
const htmlDocument = unified().use(rehypeParse).freeze();
const htmlFragment = unified().use(rehypeParse, { fragment: true }).freeze();

/**
 * Parse Markdown (CommonMark + GFM but literal autolinks + YAML frontmatter) to mdast, with positions.
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
