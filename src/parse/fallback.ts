/**
 * The simple scanner: reads text the full parsers cannot take (see assess.ts, and trees deep
 * enough to exhaust the stack) so the page still counts. One pass per line, with regular
 * expressions whose character classes exclude their own openers, so no match scans past the next
 * bracket and a 10 MB line stays linear.
 *
 * It finds inline links, autolinks, `<a href>`, ATX headings, `id`/`name` attributes and body
 * text; it skips fenced code and backtick code; it gives no spans (it cannot be sure a place is
 * prose), no reference links and no template context.
 */
import type GithubSlugger from 'github-slugger';
import type { LineIndex } from '../util/line-index.js';
import { lineContentEnd, lineStart } from '../util/line-index.js';
import { collapseSpace } from './spans.js';
import type { PageDraft } from './types.js';

const MD_LINK = /(!?)\[([^[\]\r\n]*)\]\((?:<([^<>\r\n]*)>|([^\s()<>]*))(?:\s+(?:"[^"\r\n]*"|'[^'\r\n]*'))?\s*\)/g;
const AUTOLINK = /<([A-Za-z][A-Za-z0-9+.-]{1,31}:[^\s<>]*)>/g;
const HTML_LINK = /<(?:a|area)\s[^<>]*?\bhref\s*=\s*(?:"([^"<>]*)"|'([^'<>]*)'|([^\s"'<>`=]+))/gi;
const ID_ATTR = /\s(id|name)\s*=\s*(?:"([^"<>]*)"|'([^'<>]*)'|([^\s"'<>`=]+))/gi;
const TAG = /<[^<>]*>/g;
const PREFIX = /^[ \t]*(?:(?:>|[-*+][ \t]|\d{1,9}[.)][ \t])[ \t]*)*/;
const ATX = /^(#{1,6})(?:[ \t]+|$)/;

/**
 * Scan lines `[from, to)` of Markdown.
 * @param src the source text
 * @param lines its line table
 * @param from first 0-based line
 * @param to line after the last
 * @param draft the page being collected
 * @param slugger the page's slugger (heading slugs)
 */
export function scanMarkdownLines(src: string, lines: LineIndex, from: number, to: number, draft: PageDraft, slugger: GithubSlugger): void {
  let fence: string | null = null;
  for (let l = from; l < to; l++) {
    const s = lineStart(lines, l);
    const e = lineContentEnd(lines, src, l);
    const line = src.slice(s, e);
    const prefix = PREFIX.exec(line)![0];
    const rest = line.slice(prefix.length);
    const fenceMark = /^(`{3,}|~{3,})/.exec(rest);
    if (fence !== null || fenceMark !== null) {
      if (fence === null) fence = fenceMark![1];
      else if (rest.startsWith(fence) && /^(`+|~+)[ \t]*$/.test(rest)) fence = null;
      draft.code.push(s, e);
      continue;
    }
    const atx = ATX.exec(rest);
    if (atx !== null) {
      const raw = rest.slice(atx[0].length).replace(/[ \t]+#+[ \t]*$/, '').trim();
      const text = collapseSpace(stripMarkup(raw));
      draft.headings.push({ depth: atx[1].length, text, slug: slugger.slug(text), offset: s + prefix.length });
      if (atx[1].length === 1 && draft.firstH1 === undefined && text !== '') draft.firstH1 = text;
    }
    // Odd pieces between backticks are code.
    const pieces = rest.split('`');
    let at = s + prefix.length;
    let body = '';
    for (let k = 0; k < pieces.length; k++) {
      const piece = pieces[k];
      const code = k % 2 === 1 && k < pieces.length - 1;
      if (code) draft.code.push(at, at + piece.length);
      else {
        scanPieceLinks(piece, at, draft);
        body += stripMarkup(piece);
      }
      at += piece.length + 1;
    }
    if (atx === null) draft.body.push(body, '\n');
  }
}

function scanPieceLinks(piece: string, base: number, draft: PageDraft): void {
  if (piece.indexOf('](') >= 0) {
    for (const m of piece.matchAll(MD_LINK)) {
      if (m[1] === '!') continue;
      draft.links.push({ offset: base + m.index, href: m[3] ?? m[4] ?? '', text: collapseSpace(m[2]), context: 'content', nofollow: false, origin: 'markdown' });
    }
  }
  if (piece.indexOf('<') >= 0) {
    for (const m of piece.matchAll(AUTOLINK)) {
      draft.links.push({ offset: base + m.index, href: m[1], text: m[1], context: 'content', nofollow: false, origin: 'markdown' });
    }
    scanHtmlLinks(piece, base, draft);
  }
}

/**
 * Scan a whole HTML page (its tree was too deep to build): links, ids, title, headings, text.
 * @param src the source text
 * @param draft the page being collected
 */
export function scanHtml(src: string, draft: PageDraft): void {
  scanHtmlLinks(src, 0, draft);
  const title = /<title[^<>]*>([^<]*)/i.exec(src);
  if (title !== null) draft.htmlTitle = collapseSpace(decodeBasicEntities(title[1]));
  const base = /<base\s[^<>]*?\bhref\s*=\s*(?:"([^"<>]*)"|'([^'<>]*)'|([^\s"'<>`=]+))/i.exec(src);
  if (base !== null) draft.baseHref = base[1] ?? base[2] ?? base[3] ?? '';
  for (const m of src.matchAll(/<h([1-6])(?=[\s>])[^<>]*>([^<]*)/gi)) {
    const text = collapseSpace(decodeBasicEntities(m[2]));
    const depth = Number(m[1]);
    draft.headings.push({ depth, text, slug: '', offset: m.index });
    if (depth === 1 && draft.firstH1 === undefined && text !== '') draft.firstH1 = text;
  }
  draft.body.push(decodeBasicEntities(src.replace(TAG, ' ')));
}

function scanHtmlLinks(text: string, base: number, draft: PageDraft): void {
  // Next `>` and `<` are remembered, so many unclosed tags cannot make this quadratic.
  let close = -2;
  let open = -2;
  for (const m of text.matchAll(HTML_LINK)) {
    const from = m.index + m[0].length;
    if (close !== -1 && close < from) close = text.indexOf('>', from);
    const tagEnd = close < 0 ? text.length : close + 1;
    const tag = text.slice(m.index, Math.min(tagEnd, from + 2000));
    if (open !== -1 && open < tagEnd) open = text.indexOf('<', tagEnd);
    const inner = open < 0 ? '' : text.slice(tagEnd, Math.min(open, tagEnd + 2000));
    draft.links.push({
      offset: base + m.index,
      href: decodeBasicEntities(m[1] ?? m[2] ?? m[3] ?? ''),
      text: collapseSpace(decodeBasicEntities(inner)),
      context: 'content',
      nofollow: /\brel\s*=\s*["']?[^"'<>]*\bnofollow\b/i.test(tag),
      origin: 'html',
    });
  }
  for (const m of text.matchAll(ID_ATTR)) {
    const value = m[2] ?? m[3] ?? m[4] ?? '';
    if (value !== '') draft.ids.push(value);
  }
}

/** Link syntax to its text, tags and emphasis marks out: what a reader would read. */
function stripMarkup(text: string): string {
  return text
    .replace(MD_LINK, (_m, bang: string, label: string) => (bang === '!' ? '' : label))
    .replace(AUTOLINK, '')
    .replace(TAG, '')
    .replace(/[*_~]+/g, '');
}

function decodeBasicEntities(text: string): string {
  return text.replace(/&(amp|lt|gt|quot|#39|nbsp);/g, (_m, e: string) => ({ amp: '&', lt: '<', gt: '>', quot: '"', '#39': "'", nbsp: ' ' })[e] ?? '');
}
