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
import type { Heading, Html, Nodes, Parents, RootContent, Text } from 'mdast';
import type { BlankedText } from './assess.js';
import type { LineIndex } from '../util/line-index.js';
import { lineOf, lineStart } from '../util/line-index.js';
import { closesTag, inlineOpenTag, readRawHtml } from './markdown-html.js';
import { parseMarkdownTree } from './processors.js';
import { findLiteralLinks, mayHoldLiteralLink } from './literal-links.js';
import type { LiteralLink } from './literal-links.js';
import { addMarkdownTextSpans, collapseSpace, cutSpans, looksLikeUrl } from './spans.js';
import type { LinkDraft, PageDraft } from './types.js';

const IN_LINK = 1;
const NO_SPAN = 2;
const NO_BODY = 4;
const TEMPLATE = 8;

const PHRASING_PARENTS = new Set(['paragraph', 'heading', 'emphasis', 'strong', 'delete', 'link', 'linkReference', 'tableCell']);
const BLOCK_TEMPLATE_OPEN = /^<(nav|header|footer|aside)(?=[\s>])/i;
const CUSTOM_ID = /\s*\{#([A-Za-z0-9_][\w\-:.]*)\}$/;

interface Walk {
  readonly src: string;
  /** Offset in the parsed text -> offset in `src`. */
  readonly map: (offset: number) => number;
  readonly lines: LineIndex;
  readonly draft: PageDraft;
  readonly slugger: GithubSlugger;
  readonly definitions: Map<string, string>;
  readonly references: { link: LinkDraft; id: string }[];
}

/** The frontmatter block remark-frontmatter found. */
export interface MarkdownFrontmatter {
  readonly value: string;
  /** Offset of the YAML's first character. */
  readonly contentStart: number;
  /** `toml` for a `+++` block. */
  readonly format?: 'toml';
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
export function readMarkdown(
  src: string,
  parsed: BlankedText,
  lines: LineIndex,
  draft: PageDraft,
  slugger: GithubSlugger,
): MarkdownFrontmatter | null {
  const tree = parseMarkdownTree(parsed.text);
  const w: Walk = { src, map: parsed.toSource, lines, draft, slugger, definitions: new Map(), references: [] };
  let frontmatter: MarkdownFrontmatter | null = null;
  const first = tree.children[0];
  // remark-frontmatter's `toml` node (a `+++` block) is not in mdast's node types; it has no children.
  const fm = first as { type: string; value?: unknown } | undefined;
  if (first !== undefined && fm !== undefined && (fm.type === 'yaml' || fm.type === 'toml') && typeof fm.value === 'string') {
    const start = startOf(w, first);
    const contentStart = lineStart(lines, lineOf(lines, start) + 1);
    frontmatter = fm.type === 'toml' ? { value: fm.value, contentStart, format: 'toml' } : { value: fm.value, contentStart };
    draft.code.push(start, endOf(w, first));
  }
  walkChildren(w, tree, 0);
  for (const { link, id } of w.references) {
    const url = w.definitions.get(id);
    if (url === undefined) continue;
    link.href = url;
    draft.links.push(link);
  }
  return frontmatter;
}

function walkChildren(w: Walk, parent: Parents, flags: number): void {
  const children = parent.children as RootContent[];
  const phrasing = PHRASING_PARENTS.has(parent.type);
  for (let i = 0; i < children.length; i++) {
    const child = children[i];
    if (child.type === 'html') i = html(w, children, i, flags, phrasing);
    else visit(w, child, flags);
  }
}

function visit(w: Walk, node: Nodes, flags: number): void {
  const draft = w.draft;
  switch (node.type) {
    case 'text': {
      const literal = (flags & IN_LINK) === 0 && mayHoldLiteralLink(node.value) ? findLiteralLinks(node.value) : [];
      if (literal.length > 0) {
        textWithLiteralLinks(w, node, flags, literal);
        return;
      }
      if ((flags & NO_BODY) === 0) draft.body.push(node.value);
      if ((flags & NO_SPAN) === 0) addMarkdownTextSpans(draft, w.src, w.lines, node.value, startOf(w, node), endOf(w, node));
      return;
    }
    case 'heading':
      heading(w, node, flags);
      return;
    case 'paragraph':
    case 'tableCell':
      walkChildren(w, node, flags);
      if ((flags & NO_BODY) === 0) draft.body.push('\n');
      return;
    case 'link':
    case 'linkReference': {
      const text = collapseSpace(plainText(node, true));
      const link: LinkDraft = {
        offset: startOf(w, node),
        href: node.type === 'link' ? node.url : '',
        text,
        context: (flags & TEMPLATE) !== 0 ? 'template' : 'content',
        nofollow: false,
        origin: 'markdown',
      };
      if (node.children.length === 1 && node.children[0].type === 'inlineCode') link.code = true;
      if (node.type === 'link') draft.links.push(link);
      else w.references.push({ link, id: node.identifier });
      draft.protected.push([link.offset, endOf(w, node), 'link']);
      let f = flags | IN_LINK | NO_SPAN;
      if (node.type === 'link' && looksLikeUrl(text, node.url)) f |= NO_BODY;
      walkChildren(w, node, f);
      return;
    }
    case 'definition':
      if (!w.definitions.has(node.identifier)) w.definitions.set(node.identifier, node.url);
      draft.protected.push([startOf(w, node), endOf(w, node), 'link-definition']);
      return;
    case 'code':
      draft.code.push(startOf(w, node), endOf(w, node));
      return;
    case 'inlineCode': {
      const start = startOf(w, node);
      const end = endOf(w, node);
      draft.code.push(start, end);
      if ((flags & NO_SPAN) === 0 && /\S/.test(node.value) && !/[\r\n]/.test(w.src.slice(start, end))) draft.codeSpans.push({ text: w.src.slice(start, end), code: collapseSpace(node.value), offset: start, end });
      return;
    }
    case 'html':
      readRawHtml(node, startOf(w, node), endOf(w, node), w.src, w.lines, draft, (flags & TEMPLATE) !== 0);
      return;
    case 'table':
      node.children.forEach((row, i) => walkChildren(w, row, i === 0 ? flags | NO_SPAN : flags));
      return;
    case 'delete':
      walkChildren(w, node, flags | NO_SPAN);
      return;
    case 'break':
      if ((flags & NO_BODY) === 0) draft.body.push('\n');
      return;
    case 'image':
    case 'imageReference':
    case 'footnoteReference':
    case 'yaml':
    case 'thematicBreak':
      return;
    default:
      if ('children' in node) walkChildren(w, node, flags);
  }
}

/**
 * A text node holding literal autolinks: each is a link (its text, an address, is no prose), and
 * the text around them is body text and spans as usual.
 */
function textWithLiteralLinks(w: Walk, node: Text, flags: number, literal: readonly LiteralLink[]): void {
  const { draft, src } = w;
  const start = startOf(w, node);
  const end = endOf(w, node);
  const exact = end - start === node.value.length && src.startsWith(node.value, start);
  const cuts: number[] = [];
  let searchFrom = start;
  let at = 0;
  for (const l of literal) {
    // Where the value is not the source slice (inside containers), find the address in the source.
    let offset = exact ? start + l.index : src.indexOf(l.text, searchFrom);
    if (offset === -1 || offset + l.text.length > end) offset = -1;
    draft.links.push({
      offset: offset === -1 ? start : offset,
      href: l.href,
      text: l.text,
      context: (flags & TEMPLATE) !== 0 ? 'template' : 'content',
      nofollow: false,
      origin: 'markdown',
    });
    if (offset !== -1) {
      cuts.push(offset, offset + l.text.length);
      draft.protected.push([offset, offset + l.text.length, 'link']);
      searchFrom = offset + l.text.length;
    }
    if ((flags & NO_BODY) === 0) draft.body.push(node.value.slice(at, l.index));
    at = l.index + l.text.length;
  }
  if ((flags & NO_BODY) === 0) draft.body.push(node.value.slice(at));
  if ((flags & NO_SPAN) !== 0) return;
  const first = draft.spans.length;
  addMarkdownTextSpans(draft, src, w.lines, node.value, start, end);
  cutSpans(draft, first, cuts);
}

function heading(w: Walk, node: Heading, flags: number): void {
  const raw = plainText(node, false).trim();
  const custom = CUSTOM_ID.exec(raw);
  const slugText = custom === null ? raw : raw.slice(0, custom.index);
  const text = collapseSpace(slugText);
  const slug = custom === null ? w.slugger.slug(slugText) : custom[1];
  const offset = startOf(w, node);
  if (custom !== null) w.draft.headings.push({ depth: node.depth, text, slug, offset, explicit: true });
  else if (slugText !== text) w.draft.headings.push({ depth: node.depth, text, slug, offset, raw: slugText });
  else w.draft.headings.push({ depth: node.depth, text, slug, offset });
  if (node.depth === 1 && w.draft.firstH1 === undefined && text !== '') w.draft.firstH1 = text;
  walkChildren(w, node, flags | NO_SPAN | NO_BODY);
}

/**
 * An html node among its siblings. Inline opening tags (`<a href>`, `<code>`, `<nav>`) change
 * how the siblings up to the closing tag are read; block `<nav>`-like openers without their
 * closing tag make the following blocks a template region up to it.
 * @returns the index of the last sibling consumed
 */
function html(w: Walk, children: RootContent[], i: number, flags: number, phrasing: boolean): number {
  const node = children[i] as Html;
  const added = readRawHtml(node, startOf(w, node), endOf(w, node), w.src, w.lines, w.draft, (flags & TEMPLATE) !== 0);
  const open = phrasing ? inlineOpenTag(node.value) : blockTemplateOpen(node.value);
  if (open === null) return i;
  let j = i + 1;
  while (j < children.length && !isClosing(children[j], open.tag, phrasing)) j++;
  let f = flags;
  if (open.link) f |= IN_LINK | NO_SPAN;
  if (open.code) f |= NO_SPAN | NO_BODY;
  if (open.template) f |= TEMPLATE | NO_SPAN | NO_BODY;
  if (/^h[1-6]$/.test(open.tag)) f |= NO_SPAN;
  if (open.code && j > i + 1) w.draft.code.push(endOf(w, node), endOf(w, children[j - 1]));
  if (open.link && added > 0) {
    let text = '';
    for (let k = i + 1; k < j; k++) text += plainText(children[k], true);
    const link = w.draft.links[w.draft.links.length - 1];
    if (link.text === '') link.text = collapseSpace(text);
    if (looksLikeUrl(link.text, link.href)) f |= NO_BODY;
  }
  for (let k = i + 1; k < j; k++) {
    const child = children[k];
    if (child.type === 'html') readRawHtml(child, startOf(w, child), endOf(w, child), w.src, w.lines, w.draft, (f & TEMPLATE) !== 0);
    else visit(w, child, f);
  }
  return Math.min(j, children.length - 1);
}

function blockTemplateOpen(value: string): { tag: string; link: false; code: false; template: true } | null {
  const m = BLOCK_TEMPLATE_OPEN.exec(value);
  if (m === null) return null;
  const tag = m[1].toLowerCase();
  if (new RegExp(`</${tag}\\s*>`, 'i').test(value)) return null;
  return { tag, link: false, code: false, template: true };
}

function isClosing(node: RootContent, tag: string, phrasing: boolean): boolean {
  if (node.type !== 'html') return false;
  return phrasing ? closesTag(node.value, tag) : new RegExp(`</${tag}\\s*>`, 'i').test(node.value);
}

/**
 * Plain text of an mdast node: text and inline code, with image alt text when `alt` is true
 * (link text) and without it for headings (GitHub slugs ignore images). Raw HTML is left out.
 */
function plainText(node: Nodes, alt: boolean): string {
  switch (node.type) {
    case 'text':
    case 'inlineCode':
      return node.value;
    case 'image':
    case 'imageReference':
      return alt ? (node.alt ?? '') : '';
    case 'break':
      return ' ';
    case 'html':
      return '';
    default: {
      if (!('children' in node)) return '';
      let out = '';
      for (const child of node.children) out += plainText(child as Nodes, alt);
      return out;
    }
  }
}

function startOf(w: Walk, node: Nodes): number {
  return w.map(node.position?.start.offset ?? 0);
}

function endOf(w: Walk, node: Nodes): number {
  const end = node.position?.end.offset;
  return end === undefined ? startOf(w, node) : w.map(end);
}
