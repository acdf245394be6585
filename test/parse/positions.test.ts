/**
 * Line/column positions of links, headings and spans: 1-based, columns in UTF-16 code units (as
 * editors count them), right after a BOM, with CRLF and lone CR line endings, and with
 * non-ASCII text. Offsets always index `SourceFile.text`.
 */
import { describe, expect, it } from 'vitest';
import { parseSource } from '../../src/parse/index.js';
import type { PageFacts } from '../../src/types.js';
import { html, md, options, sourceFile } from './helpers.js';

/** 1-based line/column of an offset, computed independently of the parser. */
function lineColumn(text: string, offset: number): { line: number; column: number } {
  const before = text.slice(0, offset);
  const breaks = before.match(/\r\n|\r|\n/g) ?? [];
  const lastBreak = Math.max(before.lastIndexOf('\n'), before.lastIndexOf('\r'));
  return { line: breaks.length + 1, column: offset - (lastBreak + 1) + 1 };
}

/** Offset of a 1-based line/column. */
function offsetOf(text: string, line: number, column: number): number {
  let offset = 0;
  for (let l = 1; l < line; l++) {
    const m = /\r\n|\r|\n/.exec(text.slice(offset))!;
    offset += m.index + m[0].length;
  }
  return offset + column - 1;
}

function checkSpans(text: string, facts: PageFacts): void {
  for (const s of facts.spans) {
    expect(text.slice(s.offset, s.offset + s.text.length)).toBe(s.text);
    expect({ line: s.line, column: s.column }).toEqual(lineColumn(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text, s.offset - (text.charCodeAt(0) === 0xfeff ? 1 : 0)));
  }
}

const PAGE = ['# Getting started', '', 'Read the [install guide](install.md) first.', '', '## Next steps', '', 'Then see <https://example.org/x> and [more][m].', '', '[m]: /more/'];

describe('Markdown positions', () => {
  it('LF: links, headings and spans at their source line and column', () => {
    const text = PAGE.join('\n');
    const f = md(text);
    expect(f.links.map((l) => [l.href, l.line, l.column])).toEqual([
      ['install.md', 3, 10],
      ['https://example.org/x', 7, 10],
      ['/more/', 7, 38],
    ]);
    expect(f.headings.map((h) => [h.slug, h.line, h.column])).toEqual([
      ['getting-started', 1, 1],
      ['next-steps', 5, 1],
    ]);
    for (const l of f.links) expect(text.slice(offsetOf(text, l.line, l.column))).toMatch(/^[[<]/);
    checkSpans(text, f);
    expect(f.spans.map((s) => s.text)).toEqual(['Read the', 'first.', 'Then see', 'and']);
  });

  it('CRLF and lone CR give the same lines and columns as LF', () => {
    const lf = md(PAGE.join('\n'));
    for (const eol of ['\r\n', '\r']) {
      const text = PAGE.join(eol);
      const f = md(text);
      expect(f.links.map((l) => [l.line, l.column])).toEqual(lf.links.map((l) => [l.line, l.column]));
      expect(f.headings.map((h) => [h.line, h.column])).toEqual(lf.headings.map((h) => [h.line, h.column]));
      expect(f.spans.map((s) => [s.text, s.line, s.column])).toEqual(lf.spans.map((s) => [s.text, s.line, s.column]));
      checkSpans(text, f);
    }
  });

  it('a BOM the collector removed leaves columns right; a BOM still present is skipped and offsets still index the text', () => {
    const stripped = PAGE.join('\n');
    const withBom = '\uFEFF' + stripped;
    const a = md(stripped);
    const b = parseSource(sourceFile('page.md', withBom), options());
    expect(b.links.map((l) => [l.line, l.column])).toEqual(a.links.map((l) => [l.line, l.column]));
    expect(b.headings[0]).toEqual(a.headings[0]);
    expect(b.spans.map((s) => s.offset)).toEqual(a.spans.map((s) => s.offset + 1));
    expect(b.spans.map((s) => [s.line, s.column])).toEqual(a.spans.map((s) => [s.line, s.column]));
    checkSpans(withBom, b);
  });

  it('non-ASCII text: columns count UTF-16 code units (an emoji is two)', () => {
    const text = 'Ünïcödé 😀 text [ziel](/zïel/) — weiter\n\n## Überblick 😀\n';
    const f = md(text);
    expect(f.links[0]).toMatchObject({ href: '/zïel/', text: 'ziel', line: 1, column: 17 });
    expect(text.slice(16, 17)).toBe('[');
    expect(f.headings[0]).toMatchObject({ text: 'Überblick 😀', slug: 'überblick-', line: 3, column: 1 });
    checkSpans(text, f);
    expect(f.spans.map((s) => s.text)).toEqual(['Ünïcödé 😀 text', '— weiter']);
  });

  it('raw HTML inside a block quote: a link on a continuation line is placed after the `> ` prefix', () => {
    const text = '> <div class="note">\r\n> See <a href="/inner/">inner</a>.\r\n> </div>\r\n';
    const f = md(text);
    expect(f.links).toHaveLength(1);
    expect(f.links[0]).toMatchObject({ href: '/inner/', text: 'inner', line: 2, column: 7, origin: 'html' });
  });

  it('paragraph continuation lines inside block quotes and lists give spans at their own lines', () => {
    const text = '> first line of the quote\n> second line here\n\n- item one\n  continues here\n';
    const f = md(text);
    expect(f.spans.map((s) => [s.text, s.line, s.column])).toEqual([
      ['first line of the quote', 1, 3],
      ['second line here', 2, 3],
      ['item one', 4, 3],
      ['continues here', 5, 3],
    ]);
    checkSpans(text, f);
  });
});

describe('HTML positions', () => {
  it('links, headings and spans with CRLF line endings', () => {
    const text = '<html>\r\n<body>\r\n<h1 id="top">Top</h1>\r\n<p>See the\r\n<a href="/guide/">guide</a> now.</p>\r\n</body>\r\n</html>\r\n';
    const f = html(text);
    expect(f.links[0]).toMatchObject({ href: '/guide/', line: 5, column: 1 });
    expect(f.headings[0]).toMatchObject({ text: 'Top', slug: 'top', line: 3, column: 1 });
    expect(f.spans.map((s) => [s.text, s.line, s.column])).toEqual([
      ['See the', 4, 4],
      ['now.', 5, 29],
    ]);
    checkSpans(text, f);
  });

  it('a text with a character reference is no span (the source differs from the text)', () => {
    const f = html('<p>Tom &amp; Jerry</p><p>Plain words</p>');
    expect(f.spans.map((s) => s.text)).toEqual(['Plain words']);
  });
});
