/**
 * GFM literal autolinks (bare `https://…`, `www.…` and e-mail addresses, GFM spec section
 * "Autolinks (extension)"), found in the text nodes of the tree.
 *
 * Written by hand because the library is measurably slower on the hot path: with
 * `micromark-extension-gfm-autolink-literal` in the tokenizer, remark-gfm parsing took about
 * 1.75x as long as plain remark-parse on the generated bench pages (3.2 s against 1.8 s for
 * 1,000 pages), and its tree pass alone (a find-and-replace over every text node with four
 * expressions) about 1.25x. Here a text node is looked at only when it holds `://`, `www.` or
 * `@`, and it is read with the rules remark-gfm applies (its tree pass, with the tokenizer's
 * reading of `<` and of e-mail addresses), so the links found are the same; a test compares
 * them with remark-gfm on a corpus of cases and on random text.
 *
 * What differs: without the tokenizer extension, Markdown inside an address is read as
 * Markdown, so `https://x.org/_a_/b` is the link `https://x.org/` followed by emphasis, and a
 * bare address inside raw `<a>…</a>` is not a second link. These are external links, which the
 * report counts but never checks.
 */

/** A literal link in a text: `value.slice(index, index + text.length) === text`. */
export interface LiteralLink {
  readonly index: number;
  readonly text: string;
  readonly href: string;
}

// `<` ends an address (GFM spec: "< immediately ends an autolink").
// The domain: letters and digits of any script, `-`, `_` and `.` (the tokenizer's reading).
const URL = /((?<![a-z])https?:\/\/|(?<![\da-z])www(?=\.))([\p{L}\p{N}\p{M}\-_.]*)([^\t\n\r <]*)/giu;
// An address is not preceded by a character it could hold, nor by `/`; after `mailto:` or
// `xmpp:` only the address itself is the link (as remark-gfm's tokenizer reads it).
const EMAIL = /(?<![\w+\-./])([\w+\-.]+)@([\w-]+(?:\.[\w-]+)+)/g;
const PUNCTUATION = /[\p{P}\p{S}]/u;
const SPACE = /\s/;
const LABEL_BAD_END = /[\d\-_]$/;
const MAY_HOLD = /@|:\/\/|www\./i;

/** Quick test: can `value` hold a literal link at all? (No expression runs on most text.) */
export function mayHoldLiteralLink(value: string): boolean {
  return MAY_HOLD.test(value);
}

/**
 * The literal links of one text node's value, in order.
 * @param value the text node's value
 */
export function findLiteralLinks(value: string): LiteralLink[] {
  // Read left to right, as the tokenizer does: where an address and an e-mail address overlap,
  // the one starting first wins.
  const candidates = [...urlsIn(value), ...emailsIn(value)].sort((a, b) => a.index - b.index);
  const found: LiteralLink[] = [];
  let end = 0;
  for (const c of candidates) {
    if (c.index < end) continue;
    found.push(c);
    end = c.index + c.text.length;
  }
  return found;
}

function urlsIn(text: string): LiteralLink[] {
  const out: LiteralLink[] = [];
  const re = new RegExp(URL);
  let m: RegExpExecArray | null;
  while ((m = re.exec(text)) !== null) {
    const link = urlAt(text, m);
    // A match that is no address is looked into again from its next character.
    re.lastIndex = link === null ? m.index + 1 : m.index + link.text.length;
    if (link !== null) out.push(link);
  }
  return out;
}

function urlAt(text: string, m: RegExpExecArray): LiteralLink | null {
  const index = m.index;
  const www = m[1][0] === 'w' || m[1][0] === 'W';
  const before = index === 0 ? ' ' : text[index - 1];
  // remark-gfm's tokenizer reads an address after a space or `(*_[]~` (`www.`) or after
  // anything but a letter (`http://`); failing that, its tree pass reads it after a space or
  // punctuation, and wants a letter or digit in the last two labels.
  const tokenizer = www ? /[\s(*_[\]~]/.test(before) : !/[A-Za-z]/.test(before);
  if (!tokenizer && !SPACE.test(before) && !PUNCTUATION.test(before)) return null;
  const protocol = www ? '' : m[1];
  const domain = www ? m[1] + m[2] : m[2];
  if (PUNCTUATION.test(domain[0] ?? '') || !isDomain(domain, !tokenizer)) return null;
  let kept = withoutTrail(domain + m[3]);
  // A domain ends before trailing dots and underscores.
  if (kept.length <= domain.length) kept = kept.replace(/[._]+$/, '');
  return { index, text: protocol + kept, href: (www ? 'http://' : '') + protocol + kept };
}

function emailsIn(text: string): LiteralLink[] {
  const out: LiteralLink[] = [];
  for (const m of text.matchAll(EMAIL)) {
    if (LABEL_BAD_END.test(m[2])) continue;
    out.push({ index: m.index, text: m[0], href: `mailto:${m[0]}` });
  }
  return out;
}

/**
 * Something besides dots and underscores, no `_` in the last two labels, and when `alnum`, a
 * letter or digit in each of them.
 */
function isDomain(domain: string, alnum: boolean): boolean {
  const parts = domain.split('.');
  if (!/[^._]/.test(domain)) return false;
  for (const label of [parts[parts.length - 1] ?? '', parts[parts.length - 2] ?? '']) {
    if (label.includes('_') || (alnum && label !== '' && !/[\p{L}\p{N}]/u.test(label))) return false;
  }
  return true;
}

/**
 * The address without its trailing punctuation (`.`, `,`, `?`, quotes, brackets…), keeping
 * closing parentheses that balance opening ones inside the address.
 */
function withoutTrail(url: string): string {
  let end = url.length;
  while (end > 0 && TRAILING.has(url.charCodeAt(end - 1))) end--;
  if (end === url.length) return url;
  let kept = url.slice(0, end);
  let trail = url.slice(end);
  const opening = count(kept, '(');
  let closing = count(kept, ')');
  let paren = trail.indexOf(')');
  while (paren !== -1 && opening > closing) {
    kept += trail.slice(0, paren + 1);
    trail = trail.slice(paren + 1);
    paren = trail.indexOf(')');
    closing++;
  }
  return kept;
}

/** `! " & ' ) , . : ; < > ? ] }` */
const TRAILING = new Set([33, 34, 38, 39, 41, 44, 46, 58, 59, 60, 62, 63, 93, 125]);

function count(text: string, char: string): number {
  let n = 0;
  for (let i = text.indexOf(char); i !== -1; i = text.indexOf(char, i + 1)) n++;
  return n;
}
