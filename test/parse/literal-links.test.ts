/**
 * GFM literal autolinks are found by our own scan of text nodes (remark-gfm's tokenizer
 * extension is left out for speed). They must be the links remark-gfm itself finds, with the
 * same addresses and places: checked on hand-picked cases and on random text made of the pieces
 * addresses are built from.
 */
import fc from 'fast-check';
import type { Link, Nodes, Root } from 'mdast';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import { unified } from 'unified';
import { describe, expect, it } from 'vitest';
import { findLiteralLinks } from '../../src/parse/literal-links.js';
import { md } from './helpers.js';

const gfm = unified().use(remarkParse).use(remarkGfm).freeze();
const plain = unified().use(remarkParse).freeze();

/** remark-gfm's literal links of a document: link nodes that are neither `[..](..)` nor `<..>`. */
function gfmLiteralLinks(source: string): string[] {
  const out: string[] = [];
  const walk = (node: Nodes): void => {
    if (node.type === 'link') {
      // Links made by remark-gfm's tree pass have no position.
      const start = node.position?.start;
      const first = start === undefined ? '' : source[start.offset!];
      if (first !== '[' && first !== '<') out.push(`${(node as Link).url} @${start === undefined ? '?' : `${start.line}:${start.column}`}`);
      return;
    }
    if ('children' in node) for (const child of node.children) walk(child as Nodes);
  };
  walk(gfm.parse(source) as Root);
  return out;
}

/** Our literal links, placed like remark-gfm's (`?` where its link has no position). */
function ourLinks(source: string, expected: readonly string[]): string[] {
  const lineStarts = [0];
  for (let i = 0; i < source.length; i++) if (source[i] === '\n') lineStarts.push(i + 1);
  const literal = md(source).links.filter((l) => !'[<'.includes(source[lineStarts[l.line - 1]! + l.column - 1]!));
  return literal.map((l, i) => `${l.href} @${expected[i]?.endsWith('@?') === true ? '?' : `${l.line}:${l.column}`}`);
}

/** A host of labels with a dot between two of them, and an e-mail domain starting with one. */
function wellFormed(href: string): boolean {
  const host = href.startsWith('mailto:') ? href.slice(href.indexOf('@') + 1) : href.replace(/^https?:\/\//, '');
  return /^[\p{L}\p{N}]/u.test(host) && /[\p{L}\p{N}]\.[\p{L}\p{N}]/u.test(host);
}

function compare(source: string): void {
  const expected = gfmLiteralLinks(source);
  expect(ourLinks(source, expected)).toEqual(expected);
}

/** True when plain CommonMark reads the text as paragraphs of text only (no emphasis, code, links...). */
function onlyText(source: string): boolean {
  const ok = (node: Nodes): boolean =>
    node.type === 'root' || node.type === 'paragraph' ? node.children.every((c) => ok(c as Nodes)) : node.type === 'text';
  return ok(plain.parse(source) as Root);
}

const CASES = [
  'Visit www.commonmark.org/help for more.',
  'Visit www.commonmark.org/a.b.',
  'www.google.com/search?q=Markup+(business)',
  'www.google.com/search?q=Markup+(business)))',
  '(www.google.com/search?q=Markup+(business))',
  '(www.google.com/search?q=Markup+(business)',
  'www.google.com/search?q=(business))+ok',
  'www.commonmark.org/he<lp',
  'http://commonmark.org',
  '(Visit https://encrypted.google.com/search?q=Markup+(business))',
  'foo@bar.baz',
  "hello@mail+xyz.example isn't valid, but hello+xyz@mail.example is.",
  'a.b-c_d@a.b',
  'a.b-c_d@a.b.',
  'a.b-c_d@a.b-',
  'a.b-c_d@a.b_',
  'mailto:foo@bar.baz',
  'mailto:a.b-c_d@a.b',
  'mailto:a.b-c_d@a.b.',
  'xmpp:foo@bar.baz',
  'xmpp:foo@bar.baz/txt',
  'xmpp:foo@bar.baz/txt@bin',
  'xmpp:foo@bar.baz/txt/bin',
  'www.a_b.c and www.a.b_c and www.a_b.c.d',
  'https://x.org, https://y.org. https://z.org! "https://q.org" https://e.org/&amp;',
  'WWW.UPPER.ORG and HTTPS://UPPER.ORG/PATH',
  'xhttps://no.org and 1www.no.org and a-www.yes.org',
  'Two lines https://one.org\nand https://two.org here',
  'Say hi@example.com or x@y',
  '> quoted https://in.quote.org and www.b.org\n> next line www.c.org',
  '- item https://list.org\n  continued www.list2.org',
  '| a | b |\n| - | - |\n| https://cell.org | www.cell2.org |',
  '# Heading www.head.org\n\nText.',
  'a [link](https://x.org) and https://y.org and [www.z.org](/z/)',
  'CRLF line https://crlf.org\r\nnext www.next.org\r\n',
];

describe('literal autolinks', () => {
  it.each(CASES)('as remark-gfm finds them: %j', (source) => {
    compare(source);
  });

  // Left out of the random pieces: `_`, parentheses, quotes, `]`, `}`, `>`, `;`, `&`, `xmpp:`, and
  // addresses mixed with e-mail addresses (`www.a.@b.c`), where remark-gfm's tokenizer and its
  // tree pass disagree with each other (so `www._` is a link after a space and not after a
  // quote); the hand-picked cases above hold the ordinary uses of these.
  const common = [',', '-', '/', '?', '!', '+', ':', '#', '=', '.', '.', ' ', ' ', '\n', 'a', 'ex', 'org', 'b2', 'W'];
  it.each([
    ['web addresses', ['www.', 'http://', 'https://', 'Www', ...common]],
    ['e-mail addresses', ['@', '@', 'mailto:', ...common]],
  ])('random text with %s (fast-check), where CommonMark reads it as plain text', (_kind, pieces) => {
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...pieces), { maxLength: 24 }), (parts) => {
        const source = parts.join('');
        fc.pre(onlyText(source));
        const expected = gfmLiteralLinks(source);
        // Links remark-gfm makes in its tree pass, after its tokenizer declined, are its
        // fallbacks, not GFM's reading; degenerate hosts without a dot between labels (`www`
        // out of `www.)`, `a@.b`) are read differently by its two parts. Such texts are skipped.
        fc.pre(expected.every((l) => !l.endsWith('@?') && wellFormed(l.replace(/ @.*$/, ''))));
        expect(ourLinks(source, expected)).toEqual(expected);
      }),
      { numRuns: 1500, seed: 7 },
    );
  });

  it('the address text is no prose: not in spans or body, the text around it is', () => {
    const f = md('Read the tidal guide at https://example.org/tides today.\n');
    expect(f.spans.map((s) => s.text)).toEqual(['Read the tidal guide at', 'today.']);
    expect(f.text.body).not.toContain('example.org');
    expect(f.text.body).toContain('today');
  });

  it('a text without a trigger costs no expression and yields nothing', () => {
    expect(findLiteralLinks('plain words only, no addresses')).toEqual([]);
  });
});
