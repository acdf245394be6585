/** Reading HTML source as text, through the HTML parser (parse5 by rehype-parse). */
import { plainText } from './hast.js';
import { parseHtmlFragment } from './processors.js';
import { collapseSpace } from './spans.js';

/**
 * What an HTML fragment reads as: its text with tags dropped and character references decoded
 * by the HTML parser, white space collapsed (as `RawLink.text` of a link around it).
 * @param html the fragment as written
 */
export function htmlFragmentText(html: string): string {
  let out = '';
  for (const child of parseHtmlFragment(html).children) {
    if (child.type === 'text') out += child.value;
    else if (child.type === 'element') out += plainText(child);
  }
  return collapseSpace(out);
}

/**
 * An anchor as a reader sees it: an HTML `<code>` element (an anchor `apply` wraps whole) as its
 * code between backticks, like a Markdown code span; any other anchor as written.
 */
export function anchorForReading(anchor: string): string {
  return /^<code[\s>]/i.test(anchor) ? `\`${htmlFragmentText(anchor)}\`` : anchor;
}
