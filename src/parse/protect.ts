/**
 * Protected regions: the parts of a source that a site generator reads as syntax (shortcodes,
 * template tags, MDX, HTML tags and comments, front matter, link reference definitions,
 * container markers, attribute lists, code), computed once per file in the parse stage. The
 * page's prose spans are cut by them, so an anchor can never lie inside one, and `apply`
 * re-computes them on the file as it is when it writes (see `src/apply/`).
 *
 * The scan reads the source as written, left to right, outside code (which the Markdown or HTML
 * walk found): template syntax is read by the generator before Markdown, so what the Markdown
 * parser makes of it does not matter. Template tags and `{...}` groups do not cross a blank line;
 * an opener that is not closed by then protects the rest of its line.
 */
import type { FileKind, ProtectedKind, ProtectedRegion } from '../types.js';
import type { LineIndex } from '../util/line-index.js';
import { lineContentEnd, lineOf, lineStart } from '../util/line-index.js';
import {
  blockCloser,
  isAttributeList,
  matchBraces,
  matchComment,
  matchContainerMarker,
  matchHtmlTag,
  matchJsxTag,
  matchMarkdownTag,
  templateOpen,
} from './protect-syntax.js';
import { findFrontmatter } from './frontmatter.js';
import { cutSpansByRanges } from './spans.js';
import type { PageDraft } from './types.js';

/** How far a `{...}` group or a JSX tag may reach, in UTF-16 code units. */
const MAX_GROUP = 4000;

const KRAMDOWN_BLOCK = /^\{::(comment|nomarkdown)\b(?:[^}]*[^/}])?\}$/;
const A_CLOSE = /<\/a\s*>/gi;
const TOML_OPEN = /^\+\+\+[ \t]*(?:\r\n|\r|\n)/;
const TOML_CLOSE = /^\+\+\+[ \t]*$/gm;

/** What the scan of one file needs. */
export interface ProtectInput {
  /** The source text (BOM removed). */
  readonly src: string;
  readonly lines: LineIndex;
  readonly kind: FileKind;
  /** An `.mdx` file: JSX tags and `{...}` expressions. */
  readonly mdx: boolean;
}

/**
 * Find the protected regions of a file and cut the draft's spans by them.
 * @param input the source and how to read it
 * @param draft the page as the Markdown or HTML walk left it (its `code` ranges are skipped and
 *   become `code` regions; its `protected` holds what the walk found, e.g. link definitions);
 *   the bodies of template blocks shown as code are added to its `codeBodies`
 * @returns the regions, sorted by start, none holding another
 */
export function protectDraft(input: ProtectInput, draft: PageDraft): ProtectedRegion[] {
  const code = pairs(draft.code);
  const found: ProtectedRegion[] = [...frontMatter(input.src), ...draft.protected];
  scan(input, code, found, draft.codeBodies);
  for (let i = 0; i < code.length; i++) found.push([code[i][0], code[i][1], 'code']);
  const regions = normalize(input.src, found);
  const cut = cutSpansByRanges(draft.spans, regions);
  draft.spans.length = 0;
  draft.spans.push(...cut);
  return regions;
}

/** The front matter block at the top: YAML between `---` lines or TOML between `+++` lines. */
function frontMatter(src: string): ProtectedRegion[] {
  const yaml = findFrontmatter(src);
  if (yaml !== null) return [[0, yaml.end, 'front-matter']];
  const open = TOML_OPEN.exec(src);
  if (open === null) return [];
  TOML_CLOSE.lastIndex = open[0].length;
  const close = TOML_CLOSE.exec(src);
  return close === null ? [] : [[0, close.index + close[0].length, 'front-matter']];
}

function scan(input: ProtectInput, code: readonly (readonly [number, number])[], out: ProtectedRegion[], codeBodies: number[]): void {
  const { src, lines, kind, mdx } = input;
  const markdown = kind === 'markdown';
  const n = src.length;
  const blank = blankLineStarts(input);
  const closers = new Map<string, number>();
  /** indexOf with a memo per closer, so unclosed openers do not rescan the text. */
  const find = (closer: string, from: number): number => {
    const known = closers.get(closer);
    if (known !== undefined && (known === -1 || known >= from)) return known;
    const at = src.indexOf(closer, from);
    closers.set(closer, at);
    return at;
  };
  const paragraphEnd = (at: number): number => {
    let lo = 0;
    let hi = blank.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (blank[mid] <= at) lo = mid + 1;
      else hi = mid;
    }
    return lo < blank.length ? blank[lo] : n;
  };
  const lineEnd = (at: number): number => lineContentEnd(lines, src, lineOf(lines, at));
  const push = (start: number, end: number, k: ProtectedKind) => {
    if (end > start) out.push([start, end, k]);
  };

  let c = 0;
  for (let i = 0; i < n; i++) {
    const ch = src.charCodeAt(i);
    const atLineStart = markdown && (i === 0 || src.charCodeAt(i - 1) === 10 || src.charCodeAt(i - 1) === 13);
    if (ch !== 123 && ch !== 60 && !atLineStart) continue;
    while (c < code.length && code[c][1] <= i) c++;
    if (c < code.length && code[c][0] <= i) {
      i = code[c][1] - 1;
      continue;
    }
    if (atLineStart) {
      const marker = matchContainerMarker(src, i);
      if (marker !== -1) {
        const end = lineEnd(i);
        push(marker, end, 'container-marker');
        i = Math.max(i, end - 1);
        continue;
      }
      if (ch !== 123 && ch !== 60) continue;
    }
    // A backslash does not stop template syntax (Liquid and Hugo read `\{{ x }}` as a tag); it
    // escapes `<` in Markdown.
    if (ch === 123) {
      const t = templateOpen(src, i);
      if (t !== null) {
        const close = find(t.close, i + t.length);
        if (close === -1 || close >= paragraphEnd(i)) {
          const end = lineEnd(i);
          push(i, end, t.kind);
          i = end - 1;
          continue;
        }
        let end = close + t.close.length;
        if (t.close === '}}') while (end < n && src.charCodeAt(end) === 125) end++;
        push(i, end, t.kind);
        const tag = src.slice(i, end);
        const block = blockCloser(tag);
        if (block !== null) {
          block.closer.lastIndex = end;
          const m = block.closer.exec(src);
          // A code-display shortcode with no closing tag has no body (its text stays prose).
          const bodyEnd = m === null ? (block.code && t.kind === 'shortcode' ? end : n) : m.index;
          push(end, bodyEnd, 'template-block');
          if (block.code && m !== null && bodyEnd > end) codeBodies.push(end, bodyEnd);
          end = bodyEnd;
        }
        i = end - 1;
        continue;
      }
      const limit = Math.min(paragraphEnd(i), i + MAX_GROUP);
      let end = matchBraces(src, i, limit, mdx);
      if (end === -1) {
        if (mdx) {
          const stop = lineEnd(i);
          push(i, stop, 'mdx-expression');
          i = stop - 1;
        }
        continue;
      }
      const group = src.slice(i, Math.min(end, i + 200));
      push(i, end, isAttributeList(group) ? 'attribute-list' : mdx ? 'mdx-expression' : 'braces');
      // kramdown's {::comment} and {::nomarkdown} extensions: the body up to {:/name} or {:/}.
      const extension = KRAMDOWN_BLOCK.exec(group);
      if (extension !== null) {
        const close = new RegExp(String.raw`\{:\/(?:${extension[1]})?\}`, 'g');
        close.lastIndex = end;
        const m = close.exec(src);
        const bodyEnd = m === null ? n : m.index;
        push(end, bodyEnd, 'template-block');
        end = bodyEnd;
      }
      i = end - 1;
      continue;
    }
    // '<'
    if (markdown && escaped(src, i)) continue;
    let end = matchComment(src, i, markdown ? lineEnd(i) : n);
    let k: ProtectedKind = 'html-comment';
    if (end === -1 && mdx) {
      end = matchJsxTag(src, i, Math.min(paragraphEnd(i), i + MAX_GROUP));
      k = 'mdx-jsx';
    }
    if (end === -1) {
      end = markdown ? matchMarkdownTag(src, i) : matchHtmlTag(src, i, n);
      k = 'html-tag';
    }
    if (end === -1) continue;
    if (k !== 'html-comment' && /^<a[\s>]/i.test(src.slice(i, i + 3))) {
      // An existing link, its text included: a link inside it would break it.
      A_CLOSE.lastIndex = end;
      const close = A_CLOSE.exec(src);
      if (close !== null) end = close.index + close[0].length;
      k = 'link';
    }
    push(i, end, k);
    i = end - 1;
  }
}

/** True when the character at `at` is escaped by an odd number of backslashes. */
function escaped(src: string, at: number): boolean {
  let n = 0;
  for (let i = at - 1; i >= 0 && src.charCodeAt(i) === 92; i--) n++;
  return n % 2 === 1;
}

/** Offsets of the starts of blank (white space only) lines, ascending. */
function blankLineStarts(input: ProtectInput): number[] {
  const { src, lines } = input;
  const out: number[] = [];
  for (let l = 0; l < lines.count; l++) {
    const start = lineStart(lines, l);
    const end = lineContentEnd(lines, src, l);
    let blank = true;
    for (let i = start; i < end && blank; i++) {
      const c = src.charCodeAt(i);
      if (c !== 32 && c !== 9) blank = false;
    }
    if (blank) out.push(start);
  }
  return out;
}

/** True when `src` holds only spaces, tabs and line endings in `[from, to)`. */
function isBlank(src: string, from: number, to: number): boolean {
  for (let i = from; i < to; i++) {
    const c = src.charCodeAt(i);
    if (c !== 32 && c !== 9 && c !== 10 && c !== 13) return false;
  }
  return true;
}

/** `[start, end)` pairs from a flat list, sorted by start. */
function pairs(flat: readonly number[]): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i + 1 < flat.length; i += 2) if (flat[i + 1] > flat[i]) out.push([flat[i], flat[i + 1]]);
  return out.sort((a, b) => a[0] - b[0] || b[1] - a[1]);
}

/**
 * Sorted by start (longest first), regions held by an earlier one dropped (`code` loses ties),
 * and regions of one kind (but `link`) with only white space between them merged: an HTML page
 * is mostly runs of tags, and no anchor starts or ends on white space.
 */
function normalize(src: string, found: ProtectedRegion[]): ProtectedRegion[] {
  const order = (r: ProtectedRegion) => (r[2] === 'code' ? 1 : 0);
  const sorted = found.filter((r) => r[1] > r[0]).sort((a, b) => a[0] - b[0] || b[1] - a[1] || order(a) - order(b));
  const out: ProtectedRegion[] = [];
  let reach = -1;
  for (const r of sorted) {
    if (r[1] <= reach) continue;
    const last = out[out.length - 1];
    if (last !== undefined && last[2] === r[2] && r[2] !== 'link' && r[0] >= last[1] && isBlank(src, last[1], r[0])) out[out.length - 1] = [last[0], r[1], r[2]];
    else out.push(r);
    reach = r[1];
  }
  return out;
}
