/**
 * Issue 7, "one bad file never stops the run": each bad file goes through `analyze` (collect,
 * parse, graph, rank, rules, report) beside three healthy pages. Each test asserts the finding
 * the file must produce (file, line, column where there is one) and that the healthy pages are
 * still analysed (pages, ranks, resolved links). Stage-level behaviour is in test/collect and
 * test/parse; these tests check what reaches the report.
 */
import { afterEach, describe, expect, it } from 'vitest';
import { cleanupAll, expectHealthyRest, findingsOf, healthy, project, run } from './helpers.js';

afterEach(cleanupAll);

const bytes = (...parts: (string | number[])[]) =>
  Buffer.concat(parts.map((p) => (typeof p === 'string' ? Buffer.from(p, 'utf8') : Buffer.from(p))));

describe('one bad file never stops the run', () => {
  it('invalid YAML front matter: a warning at the YAML error line; the page is read without it and keeps its links', async () => {
    const { root } = project({
      ...healthy('odd.md'),
      'docs/odd.md': '---\ntitle: Odd\nslug: [unclosed\n---\n# Odd page\n\nBack [home](index.md).\n',
    });
    const report = await run(root);
    const [finding, ...more] = findingsOf(report, 'odd.md');
    expect(more).toEqual([]);
    expect(finding).toMatchObject({ rule: 'source-problem', severity: 'warning', file: 'odd.md', line: 3, target: 'frontmatter', route: '/odd/' });
    expect(finding!.message).toMatch(/^Invalid YAML frontmatter: .*; the page is read without its frontmatter$/s);
    // Without its frontmatter the slug is not applied: the route comes from the file name.
    expect(report.pages.find((p) => p.file === 'odd.md')).toMatchObject({ route: '/odd/', title: 'Odd page', depth: 1 });
    expect(report.links.filter((l) => l.file === 'odd.md')).toMatchObject([{ to: '/', line: 7, column: 6, status: 'ok' }]);
    expectHealthyRest(report);
  });

  it('malformed HTML is read as a browser reads it: no finding, links at their positions', async () => {
    const { root } = project({
      ...healthy('odd.html'),
      'docs/odd.html':
        '<html><head><title>Odd</title>\n<body><p>Open <a href="index.md">home <b>bold</p>\n<div><a href=guide.md>guide</a><p>x</span></html',
    });
    const report = await run(root);
    expect(findingsOf(report, 'odd.html')).toEqual([]);
    expect(report.links.filter((l) => l.file === 'odd.html').map((l) => [l.to, l.text, l.line, l.column, l.status])).toEqual([
      ['/', 'home bold', 2, 15, 'ok'],
      ['/guide/', 'guide', 3, 6, 'ok'],
    ]);
    expect(report.pages.find((p) => p.file === 'odd.html')).toMatchObject({ title: 'Odd', depth: 1 });
    expectHealthyRest(report);
  });

  it('invalid UTF-8: a warning at the first bad byte, the text decoded with U+FFFD, links after it still found', async () => {
    const { root } = project({
      ...healthy('odd.md'),
      'docs/odd.md': bytes('# Caf', [0xe9], ' page\n\nA \xff byte: ', [0xc3, 0x28], ' then [home](index.md).\n'),
    });
    const report = await run(root);
    expect(findingsOf(report, 'odd.md')).toMatchObject([
      { rule: 'source-problem', severity: 'warning', file: 'odd.md', line: 1, column: 6, target: 'invalid-utf8' },
    ]);
    expect(findingsOf(report, 'odd.md')[0]!.message).toContain('decoded with U+FFFD replacement characters');
    expect(report.pages.find((p) => p.file === 'odd.md')!.title).toBe('Caf\uFFFD page');
    // "A ÿ byte: " is valid UTF-8 (ÿ is two bytes), the lone 0xC3 before "(" is one U+FFFD: column of "[home]".
    expect(report.links.filter((l) => l.file === 'odd.md')).toMatchObject([{ to: '/', line: 3, column: 'A ÿ byte: \uFFFD( then '.length + 1, status: 'ok' }]);
    expectHealthyRest(report);
  });

  it('a UTF-8 BOM: no finding, columns counted from the first character after it', async () => {
    const { root } = project({
      ...healthy('odd.md'),
      'docs/odd.md': bytes([0xef, 0xbb, 0xbf], '[home](index.md) and [nowhere](missing.md)\n'),
    });
    const report = await run(root);
    expect(report.links.filter((l) => l.file === 'odd.md').map((l) => [l.to, l.line, l.column])).toEqual([
      ['/', 1, 1],
      ['missing.md', 1, 22],
    ]);
    expect(findingsOf(report, 'odd.md')).toMatchObject([{ rule: 'broken-link', file: 'odd.md', line: 1, column: 22 }]);
    expectHealthyRest(report);
  });

  it.each([
    ['CRLF', '\r\n'],
    ['CR', '\r'],
  ])('%s line endings: links and findings at the lines and columns an LF file gives', async (_name, eol) => {
    const text = ['# Odd', '', 'Go [home](index.md),', '  then [nowhere](missing.md).', ''].join(eol);
    const { root } = project({ ...healthy('odd.md'), 'docs/odd.md': text, 'docs/lf.md': text.split(eol).join('\n') });
    const report = await run(root);
    const where = (file: string) => report.links.filter((l) => l.file === file).map((l) => [l.to, l.line, l.column, l.status]);
    expect(where('odd.md')).toEqual([
      ['/', 3, 4, 'ok'],
      ['missing.md', 4, 8, 'broken'],
    ]);
    expect(where('odd.md')).toEqual(where('lf.md'));
    expect(findingsOf(report, 'odd.md')).toMatchObject([{ rule: 'broken-link', line: 4, column: 8 }]);
    expect(report.pages.find((p) => p.file === 'odd.md')!.title).toBe('Odd');
    expectHealthyRest(report);
  });

  it('an empty file is a page (title from its name) that links nowhere: a dead-end finding', async () => {
    const { root } = project({ ...healthy('odd.md'), 'docs/odd.md': '' });
    const report = await run(root);
    expect(report.pages.find((p) => p.file === 'odd.md')).toMatchObject({ route: '/odd/', title: 'odd', depth: 1, inlinks: 1, outlinks: 0 });
    expect(findingsOf(report, 'odd.md').map((f) => [f.rule, f.line])).toEqual([['dead-end', 1]]);
    expectHealthyRest(report);
  });

  it('a binary file with a source extension: a source-problem error naming it; nothing is read from it', async () => {
    const { root } = project({
      ...healthy('odd.md'),
      // A PNG signature then bytes holding a link-like text after the NUL: never parsed.
      'docs/odd.md': bytes([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d], '[secret](guide.md)'),
    });
    const report = await run(root);
    expect(findingsOf(report, 'odd.md').filter((f) => f.rule === 'source-problem')).toMatchObject([
      { severity: 'error', file: 'odd.md', line: 1, column: 1, target: 'binary' },
    ]);
    expect(report.links.filter((l) => l.file === 'odd.md')).toEqual([]);
    expect(report.gate.passed).toBe(false);
    expectHealthyRest(report);
  });

  it('3,000 nested block quotes and 3,000 nested list levels: deep-nesting at the first deep line, every link resolved', async () => {
    const quotes = Array.from({ length: 3000 }, (_, i) => `${'>'.repeat(i + 1)} level ${i + 1} [home](index.md)`);
    const list = Array.from({ length: 3000 }, (_, i) => `${'  '.repeat(i)}- item [guide](guide.md)`);
    const { root } = project({
      ...healthy('quotes.md'),
      'docs/quotes.md': ['# Quotes', '', ...quotes, '', 'After [the list](list.md).', ''].join('\n'),
      'docs/list.md': ['# List', '', ...list, ''].join('\n'),
    });
    const report = await run(root);
    // src/parse/assess.ts: MAX_NESTING = 32 levels are read by the full parser.
    expect(findingsOf(report, 'quotes.md')).toMatchObject([{ rule: 'source-problem', severity: 'warning', line: 3 + 32, target: 'deep-nesting' }]);
    expect(findingsOf(report, 'list.md').map((f) => [f.target, f.line])).toEqual([['deep-nesting', expect.any(Number)]]);
    const quoteLinks = report.links.filter((l) => l.file === 'quotes.md');
    expect(quoteLinks).toHaveLength(3001);
    expect(quoteLinks.every((l) => l.status === 'ok')).toBe(true);
    expect(quoteLinks[2999]).toMatchObject({ to: '/', line: 3002, column: 3000 + ' level 3000 '.length + 1 });
    expect(report.links.filter((l) => l.file === 'list.md' && l.to === '/guide/')).toHaveLength(3000);
    expect(report.pages.find((p) => p.file === 'list.md')).toMatchObject({ depth: 2, outlinks: 1 });
    expectHealthyRest(report);
  });

  it('a 10 MB line: too-complex at its line, its links found up to maxLinksPerPage, the text after it parsed in full', async () => {
    const line = 'lorem ipsum [dolor](guide.md) sit amet '.repeat(270_000);
    expect(line.length).toBeGreaterThan(10_000_000);
    const { root } = project({ ...healthy('odd.md'), 'docs/odd.md': `# Long\n\n${line}\n\nTail [home](index.md).\n` });
    const report = await run(root, { maxFileBytes: 20 * 1024 * 1024 });
    expect(findingsOf(report, 'odd.md').map((f) => [f.rule, f.target, f.line])).toEqual([
      ['source-problem', 'too-complex', 3],
      ['source-problem', 'too-many-links', 3],
    ]);
    const links = report.links.filter((l) => l.file === 'odd.md');
    // The default maxLinksPerPage is 20,000: the tail link is past it and dropped.
    expect(links).toHaveLength(20_000);
    expect(links[1]).toMatchObject({ to: '/guide/', line: 3, column: 1 + 39 + 12, status: 'ok' });
    expect(report.pages.find((p) => p.file === 'odd.md')).toMatchObject({ title: 'Long', depth: 1 });
    expectHealthyRest(report);
  });

  it('100,000 links on one page: too-many-links at the first dropped link, the first 20,000 kept, the run goes on', async () => {
    // An HTML page (a generated index, say), one link per line: the full parser reads them all.
    // (The same in Markdown paragraphs costs remark about 1 s of CPU per 5,000 links here.)
    const lines = Array.from({ length: 100_000 }, (_, i) => `<a href=guide.md>g${i}</a>`);
    const { root } = project({ ...healthy('odd.html'), 'docs/odd.html': `<title>Many</title>\n${lines.join('\n')}\n` });
    const report = await run(root);
    // Link i is on line i + 2; the first dropped one is link 20,000 (0-based).
    expect(findingsOf(report, 'odd.html')).toMatchObject([
      { rule: 'source-problem', severity: 'warning', target: 'too-many-links', line: 20_002, column: 1 },
    ]);
    expect(findingsOf(report, 'odd.html')[0]!.message).toContain('100000 links on one page, more than maxLinksPerPage (20000)');
    const links = report.links.filter((l) => l.file === 'odd.html');
    expect(links).toHaveLength(20_000);
    expect(links.at(-1)).toMatchObject({ text: 'g19999', to: '/guide/', line: 20_001, status: 'ok' });
    // One edge per page pair, however many links: the page has one outlink.
    expect(report.pages.find((p) => p.file === 'odd.html')).toMatchObject({ title: 'Many', outlinks: 1, depth: 1 });
    expectHealthyRest(report);
  });
});
