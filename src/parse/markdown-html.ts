/**
 * Raw HTML inside Markdown: `html` nodes are parsed with rehype-parse in fragment mode and their
 * links and ids are added with positions mapped back to the Markdown source.
 */
import type { Html } from 'mdast';
import { walkHast } from './hast.js';
import type { LineIndex } from '../util/line-index.js';
import { buildLineIndex, lineContentEnd, lineOf, lineStart } from '../util/line-index.js';
import { parseHtmlFragment } from './processors.js';
import type { PageDraft } from './types.js';

/**
 * Only these HTML snippets can hold a link or a fragment target; the rest (`<br>`, `<div>`,
 * comments, images) are not worth a parse5 run, which costs far more than this test.
 */
const INTERESTING = /<(?:a|area)[\s>/]|[\s"'](?:id|name)\s*=/i;

/** An inline opening tag whose content up to its closing tag is special. */
const INLINE_OPEN = /^<(a|code|kbd|samp|var|pre|script|style|h[1-6]|nav|header|footer|aside|button)(?=[\s>/])[^>]*>$/i;

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
export function inlineOpenTag(value: string): InlineOpen | null {
  const m = INLINE_OPEN.exec(value);
  if (m === null || value.endsWith('/>')) return null;
  const tag = m[1].toLowerCase();
  return {
    tag,
    link: tag === 'a' && /\shref\s*=/i.test(value),
    code: tag === 'code' || tag === 'kbd' || tag === 'samp' || tag === 'var' || tag === 'pre' || tag === 'script' || tag === 'style',
    template: tag === 'nav' || tag === 'header' || tag === 'footer' || tag === 'aside',
  };
}

/**
 * True when an `html` node closes `tag` (`</a>`).
 * @param value the html node's value
 * @param tag lower-case tag name
 */
export function closesTag(value: string, tag: string): boolean {
  return value.length >= tag.length + 3 && value.startsWith('</') && value.slice(2, 2 + tag.length).toLowerCase() === tag && /^<\/[A-Za-z0-9]+\s*>$/.test(value);
}

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
export function readRawHtml(node: Html, start: number, end: number, src: string, lines: LineIndex, draft: PageDraft, template: boolean): number {
  const value = node.value;
  if (!INTERESTING.test(value)) return 0;
  const tree = parseHtmlFragment(value);
  return walkHast(tree, { src, draft, map: fragmentMapper(src, lines, value, start, end), document: false }, template).links;
}

/**
 * Offsets in an html node's value -> offsets in the source. Usually the value is the source
 * slice; inside block quotes and list items the container prefixes of continuation lines are
 * not in the value, so each value line is placed at the end of its source line (the last line
 * ends where the node ends).
 */
function fragmentMapper(src: string, lines: LineIndex, value: string, start: number, end: number): (o: number) => number {
  if (end - start === value.length && src.startsWith(value, start)) return (o) => start + o;
  const local = buildLineIndex(value);
  const firstLine = lineOf(lines, start);
  const base: number[] = [start];
  for (let k = 1; k < local.count; k++) {
    const vs = local.starts[k];
    const ve = lineContentEnd(local, value, k);
    const line = firstLine + k;
    const anchor = k === local.count - 1 ? end : lineContentEnd(lines, src, line);
    const candidate = anchor - (ve - vs);
    base.push(candidate >= 0 && src.startsWith(value.slice(vs, ve), candidate) ? candidate : lineStart(lines, line));
  }
  return (o) => {
    const k = Math.min(lineOf(local, o), base.length - 1);
    return base[k] + (o - local.starts[k]);
  };
}
