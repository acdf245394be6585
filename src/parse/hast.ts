/**
 * One walk over an HTML tree (hast from rehype-parse) for both HTML pages and raw HTML inside
 * Markdown: links (`<a href>`, `<area href>`), fragment targets, and for whole pages also the
 * title, headings, body text and spans.
 *
 * - Links inside `nav`, `header`, `footer`, `aside` are template links (DESIGN section 4).
 * - `rel` containing `nofollow` marks a link nofollow (WHATWG HTML, link types).
 * - Fragment targets: `id` of any element, and `name` of an `a` element (WHATWG HTML, "the
 *   indicated part of the document").
 * - The first `<base>` with an `href` is recorded (WHATWG HTML: only the first such element counts).
 */
import type { Element, Root, RootContent } from 'hast';
import { addHtmlTextSpans, collapseSpace, looksLikeUrl } from './spans.js';
import type { LinkDraft, PageDraft } from './types.js';

const TEMPLATE = 1;
const IN_LINK = 2;
const NO_BODY = 4;
const SPAN_OK = 8;
const NO_SPAN = 16;
const IN_SVG = 32;

const TEMPLATE_TAGS = new Set(['nav', 'header', 'footer', 'aside']);
const SPAN_TAGS = new Set(['p', 'li', 'td', 'dd']);
const CODE_TAGS = new Set(['code', 'pre', 'kbd', 'samp', 'var']);
const SKIP_TAGS = new Set(['script', 'style', 'template', 'noscript', 'textarea', 'iframe', 'object']);
const NO_SPAN_TAGS = new Set(['button', 'select', 'option', 'label', 'sup', 'sub', 'abbr']);
const BLOCK_TAGS = new Set([
  'p', 'li', 'td', 'th', 'dd', 'dt', 'div', 'section', 'article', 'main', 'blockquote', 'br', 'tr',
  'figcaption', 'caption', 'ul', 'ol', 'dl', 'table', 'hr', 'h1', 'h2', 'h3', 'h4', 'h5', 'h6',
]);
const HEADING = /^h([1-6])$/;

/** How to walk one tree. */
export interface HastContext {
  /** The page's source text (spans are checked against it). */
  readonly src: string;
  readonly draft: PageDraft;
  /** Map an offset in the parsed HTML to an offset in `src` (identity for whole pages). */
  readonly map: (offset: number) => number;
  /** Whole page: also title, headings, body text and spans. Fragment: links and ids only. */
  readonly document: boolean;
}

/** What a walk found about its links (raw HTML in Markdown needs the count). */
export interface HastWalkResult {
  /** Links added, in document order. */
  readonly links: number;
}

/**
 * Walk a hast tree and add what it holds to the draft.
 * @param root the tree
 * @param ctx the page and the offset mapping
 * @param template true when the tree sits inside a template region already
 */
export function walkHast(root: Root, ctx: HastContext, template = false): HastWalkResult {
  const before = ctx.draft.links.length;
  const flags = template ? TEMPLATE | NO_BODY | NO_SPAN : 0;
  const walk: Walk = { ...ctx, seen: new Set() };
  for (const child of root.children) visit(child, walk, flags);
  return { links: ctx.draft.links.length - before };
}

interface Walk extends HastContext {
  /**
   * Start offsets of the links added. The HTML parser re-opens an `<a>` left open across a
   * block end (WHATWG HTML, "reconstruct the active formatting elements"): the copy has the
   * same start position and is the same link, so it is counted once. Copies made by the
   * adoption agency algorithm (an `<a>` opened while another is still open) have no position
   * at all: they are not links the author wrote and are not counted.
   */
  readonly seen: Set<number>;
}

function visit(node: RootContent, ctx: Walk, flags: number): void {
  if (node.type === 'text') {
    if (!ctx.document) return;
    if ((flags & NO_BODY) === 0) ctx.draft.body.push(node.value);
    if ((flags & SPAN_OK) !== 0 && (flags & (NO_SPAN | IN_LINK | TEMPLATE)) === 0 && node.position) {
      const start = node.position.start.offset;
      const end = node.position.end.offset;
      if (start !== undefined && end !== undefined) addHtmlTextSpans(ctx.draft, ctx.src, node.value, ctx.map(start), ctx.map(end));
    }
    return;
  }
  if (node.type !== 'element') return;
  const tag = node.tagName;
  const props = node.properties;
  const start = ctx.map(node.position?.start.offset ?? 0);
  const draft = ctx.draft;
  if (typeof props.id === 'string' && props.id !== '') draft.ids.push(props.id);
  if (tag === 'a' && typeof props.name === 'string' && props.name !== '') draft.ids.push(props.name);
  if (SKIP_TAGS.has(tag)) {
    // Raw text (scripts, styles): no links, no prose, no link patterns.
    const end = node.position?.end.offset;
    if (end !== undefined) draft.code.push(start, ctx.map(end));
    return;
  }

  let f = flags;
  if ((tag === 'a' || tag === 'area') && props.href !== undefined && props.href !== null && node.position !== undefined && !ctx.seen.has(start)) {
    ctx.seen.add(start);
    const href = String(props.href);
    // An area has no content: its alt text is what it says.
    const text = collapseSpace(tag === 'area' ? (typeof props.alt === 'string' ? props.alt : '') : plainText(node));
    const rel = props.rel;
    const nofollow = Array.isArray(rel) ? rel.some((r) => String(r).toLowerCase() === 'nofollow') : typeof rel === 'string' && /(?:^|\s)nofollow(?:\s|$)/i.test(rel);
    const link: LinkDraft = { offset: start, href, text, context: (flags & TEMPLATE) !== 0 ? 'template' : 'content', nofollow, origin: 'html' };
    if (tag === 'a' && isOneCode(node)) link.code = true;
    draft.links.push(link);
    f |= IN_LINK;
    if (looksLikeUrl(text, href)) f |= NO_BODY;
  }
  if (TEMPLATE_TAGS.has(tag)) f |= TEMPLATE | NO_BODY | NO_SPAN;
  if (CODE_TAGS.has(tag)) {
    f |= NO_BODY | NO_SPAN;
    const end = node.position?.end.offset;
    if (end !== undefined) {
      const stop = ctx.map(end);
      draft.code.push(start, stop);
      // A <code> element in prose may be an anchor, wrapped whole, as a Markdown code span is.
      if (tag === 'code' && (flags & SPAN_OK) !== 0 && (flags & (NO_SPAN | IN_LINK | TEMPLATE)) === 0) {
        const text = ctx.src.slice(start, stop);
        const code = collapseSpace(plainText(node));
        if (code !== '' && !/[\r\n]/.test(text)) draft.codeSpans.push({ text, code, offset: start, end: stop });
      }
    }
  }
  if (NO_SPAN_TAGS.has(tag)) f |= NO_SPAN;
  if (SPAN_TAGS.has(tag)) f |= SPAN_OK;
  if (tag === 'svg') f |= IN_SVG | NO_BODY | NO_SPAN;

  if (ctx.document) {
    if (tag === 'base') {
      if (draft.baseHref === undefined && typeof props.href === 'string') draft.baseHref = props.href;
      return;
    }
    if (tag === 'title' && (flags & IN_SVG) === 0) {
      if (draft.htmlTitle === undefined) draft.htmlTitle = collapseSpace(plainText(node));
      return;
    }
    const h = HEADING.exec(tag);
    // A heading in a template region (the site name in a header) is not the page's.
    if (h !== null && (flags & TEMPLATE) === 0) {
      const text = collapseSpace(plainText(node));
      const depth = Number(h[1]);
      draft.headings.push({ depth, text, slug: typeof props.id === 'string' ? props.id : '', offset: start });
      if (depth === 1 && draft.firstH1 === undefined && text !== '') draft.firstH1 = text;
      f |= NO_BODY | NO_SPAN;
    }
  }
  for (const child of node.children) visit(child, ctx, f);
  if (ctx.document && (f & NO_BODY) === 0 && BLOCK_TAGS.has(tag)) draft.body.push('\n');
}

/**
 * Plain text of an element: its text nodes, and `alt` of images, in document order (script and
 * style content left out).
 * @param node a hast element
 */
export function plainText(node: Element): string {
  let out = '';
  for (const child of node.children) {
    if (child.type === 'text') out += child.value;
    else if (child.type === 'element' && !SKIP_TAGS.has(child.tagName)) {
      if (child.tagName === 'img' && typeof child.properties.alt === 'string') out += child.properties.alt;
      else out += plainText(child);
    }
  }
  return out;
}

/** An element whose only content (white space aside) is one `<code>` element. */
function isOneCode(node: Element): boolean {
  let code = 0;
  for (const c of node.children) {
    if (c.type === 'text' && c.value.trim() === '') continue;
    if (c.type === 'element' && c.tagName === 'code') code++;
    else return false;
  }
  return code === 1;
}
