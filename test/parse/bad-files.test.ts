/**
 * Bad files: each gives the right problem (or none) and the page is still produced, with what
 * could be read. The slow inputs here are the ones measured in src/parse/assess.ts.
 */
import { describe, expect, it } from 'vitest';
import { MAX_NESTING, parseSource } from '../../src/parse/index.js';
import { html, md, options, sourceFile } from './helpers.js';

describe('bad Markdown files', () => {
  it('an empty file is a page with no problems', () => {
    const f = md('', {}, 'guide/empty.md');
    expect(f).toMatchObject({ route: '/guide/empty/', title: 'empty', links: [], headings: [], spans: [], problems: [] });
    expect(f.text).toEqual({ title: 'empty', headings: '', body: '' });
  });

  it('problems the collector found are kept on the page', () => {
    const file = { ...sourceFile('a.md', 'caf\uFFFD [x](/x/)'), problems: [{ code: 'invalid-utf8' as const, message: 'Invalid UTF-8 at byte 3' }] };
    const f = parseSource(file, options());
    expect(f.problems).toEqual([{ code: 'invalid-utf8', message: 'Invalid UTF-8 at byte 3' }]);
    expect(f.links).toHaveLength(1);
  });

  it('3,000 nested block quotes: deep-nesting, links on the deep lines still found by the simple scan', () => {
    const lines = Array.from({ length: 3000 }, (_, i) => `${'>'.repeat(i + 1)} level ${i + 1} [to ${i + 1}](/p${i + 1}/)`);
    const f = md(['# Deep', '', ...lines, '', 'After [the end](/end/).'].join('\n'));
    expect(f.problems).toHaveLength(1);
    expect(f.problems[0]).toMatchObject({ code: 'deep-nesting', line: 3 + MAX_NESTING });
    expect(f.links).toHaveLength(3001);
    expect(f.links[0]).toMatchObject({ href: '/p1/', line: 3 });
    expect(f.links[2999]).toMatchObject({ href: '/p3000/', line: 3002, column: 3000 + ' level 3000 '.length + 1 });
    expect(f.links[3000]).toMatchObject({ href: '/end/', line: 3004, column: 7 });
    expect(f.title).toBe('Deep');
    // Spans only where the full parser read the text.
    expect(f.spans.every((s) => s.line <= 2 + MAX_NESTING || s.line === 3004)).toBe(true);
  });

  it('3,000 nested list items: deep-nesting, the page still counts', () => {
    const lines = Array.from({ length: 3000 }, (_, i) => `${'  '.repeat(i)}- item [${i}](/i${i}/)`);
    const f = md(lines.join('\n'));
    expect(f.problems.map((p) => p.code)).toEqual(['deep-nesting']);
    expect(f.links).toHaveLength(3000);
  });

  it('a 10 MB line of prose with links: too-complex, links found by the simple scan up to maxLinksPerPage', () => {
    const line = 'lorem ipsum [dolor](/dolor/) sit amet '.repeat(276_000);
    expect(line.length).toBeGreaterThan(10_000_000);
    const f = md(`# Long\n\n${line}\n\nTail [end](/end/).\n`);
    expect(f.problems.map((p) => [p.code, p.line])).toEqual([
      ['too-complex', 3],
      ['too-many-links', 3],
    ]);
    expect(f.links).toHaveLength(20_000);
    expect(f.links[1]).toMatchObject({ href: '/dolor/', text: 'dolor', line: 3, column: 1 + 38 + 12 });
    expect(f.text.body).toContain('Tail end.');
    expect(f.text.body).toContain('lorem ipsum dolor sit amet lorem');
    expect(f.text.body).not.toContain('](/dolor/)');
  });

  it('a 10 MB line of plain words: too-complex, the rest of the page is parsed in full', () => {
    const f = md(`See [a](/a/).\n\n${'plain words here '.repeat(620_000)}\n\nAnd [b](/b/) after.\n`);
    expect(f.problems.map((p) => p.code)).toEqual(['too-complex']);
    expect(f.links.map((l) => [l.href, l.line])).toEqual([
      ['/a/', 1],
      ['/b/', 5],
    ]);
    expect(f.spans.map((s) => s.text)).toEqual(['See', '.', 'And', 'after.'].filter((t) => /\w/.test(t)));
  });

  it('thousands of nested emphasis openers in one paragraph: too-complex', () => {
    const f = md(`${'*a **a '.repeat(3000)}b${' a** a*'.repeat(3000)}\n\nNext [x](/x/).\n`);
    expect(f.problems.map((p) => p.code)).toEqual(['too-complex']);
    expect(f.links.map((l) => l.href)).toEqual(['/x/']);
  });

  it('more links than maxLinksPerPage: the first ones are kept, with a too-many-links problem at the first dropped link', () => {
    const text = Array.from({ length: 60 }, (_, i) => `- [l${i}](/p${i}/)`).join('\n');
    const f = md(text, { maxLinksPerPage: 50 });
    expect(f.links).toHaveLength(50);
    expect(f.links[49]!.href).toBe('/p49/');
    expect(f.problems).toEqual([expect.objectContaining({ code: 'too-many-links', line: 51, column: 3 })]);
  });

  it('a fenced code block full of emphasis characters is not mistaken for a heavy paragraph', () => {
    const code = Array.from({ length: 2000 }, () => 'int **p = *q; a[i] = b[j];').join('\n');
    const f = md(`Text [x](/x/).\n\n\`\`\`c\n${code}\n\`\`\`\n`);
    expect(f.problems).toEqual([]);
    expect(f.links).toHaveLength(1);
  });
});

describe('bad HTML files', () => {
  it('malformed HTML is read as browsers read it, no problem', () => {
    const f = html('<html><body><p>Open <a href="/one/">one <b>bold</p><a href=/two/>two</a><div><p>x</span></html');
    expect(f.problems).toEqual([]);
    expect(f.links.map((l) => [l.href, l.text])).toEqual([
      ['/one/', 'one bold'],
      ['/two/', 'two'],
    ]);
  });

  it('an unclosed <a> re-opened after a paragraph end counts once', () => {
    const f = html('<p>see <a href="/x/">x</p>\n<p>more</p>');
    expect(f.links.map((l) => l.href)).toEqual(['/x/']);
  });

  it('an empty HTML file is a page', () => {
    expect(html('', {}, 'empty.html')).toMatchObject({ route: '/empty.html', title: 'empty', links: [], problems: [] });
  });

  it('100,000 nested elements: deep-nesting, links still found by the simple scan', () => {
    const f = html(`<title>Deep</title>${'<div>'.repeat(100_000)}<a href="/inside/">in</a>`);
    expect(f.problems.map((p) => p.code)).toEqual(['deep-nesting']);
    expect(f.links.map((l) => [l.href, l.text])).toEqual([['/inside/', 'in']]);
    expect(f.title).toBe('Deep');
  });

  it('a 4 MB line of HTML is parsed in full (parse5 is linear on long lines)', () => {
    const f = html(`<p>${'lorem ipsum <a href="/x/">dolor</a> sit amet '.repeat(5000)}${'word '.repeat(750_000)}</p>`);
    expect(f.problems).toEqual([]);
    expect(f.links).toHaveLength(5000);
  });
});
