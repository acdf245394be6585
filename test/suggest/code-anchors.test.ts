/**
 * Inline code as an anchor, as API references link their code names (`` [`fs.stat()`](fs.md) ``):
 * the parse stage keeps the inline code spans of prose, the mention index reads a whole span as a
 * mention of a page named by those words, the suggestion's anchor is the span with its backticks,
 * `apply` wraps the span whole (checked by re-parsing), and the backtest holds out a code link as
 * a code span again. Real files, the real parse, suggest and apply stages.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { analyze, applySuggestions, resolveOptions } from '../../src/index.js';
import type { Report, Suggestion } from '../../src/index.js';
import { codeSpanText, parseSource } from '../../src/parse/index.js';
import { planFile } from '../../src/apply/index.js';
import { linkTextRange } from '../../src/backtest/unlink.js';
import { buildLineIndex } from '../../src/util/line-index.js';
import { tempDir, writeTree } from '../collect/tree.js';
import { md } from '../parse/helpers.js';
import { headingNames, placementRate } from '../../src/suggest/mentions.js';
import { markdownPage, mentionsOf, testOptions } from './helpers.js';

const cleanups: (() => void)[] = [];
afterEach(() => {
  while (cleanups.length > 0) cleanups.pop()!();
});

describe('codeSpanText (CommonMark 0.31, section 6.1; examples 328-335 written from memory, re-derived by hand)', () => {
  it.each([
    ['`foo`', 'foo'],
    ['`` foo ` bar ``', 'foo ` bar'],
    ['` `` `', '``'],
    ['`  ``  `', ' `` '.trim()],
    ['` a`', 'a'],
    ['`fs.readFile()`', 'fs.readFile()'],
  ])('%s reads as %s', (span, text) => {
    expect(codeSpanText(span)).toBe(text);
  });
});

describe('inline code spans in the parse stage', () => {
  it('keeps prose code spans with their source range, line and column, backticks included', () => {
    const src = '# Page\n\nCall `fs.readFile()` and then ``a `b` c``.\n';
    const facts = md(src);
    expect(facts.codeSpans).toEqual([
      { text: '`fs.readFile()`', code: 'fs.readFile()', offset: 13, endOffset: 28, line: 3, column: 6 },
      { text: '``a `b` c``', code: 'a `b` c', offset: 38, endOffset: 49, line: 3, column: 31 },
    ]);
    for (const c of facts.codeSpans!) expect(src.slice(c.offset, c.endOffset)).toBe(c.text);
  });

  it('leaves out code in links, headings, tables heads, fenced code, blank spans and spans over two lines', () => {
    const facts = md('# The `title()` call\n\n[`linked()`](x.md) and ` ` and `two\nlines`.\n\n```\n`fenced()`\n```\n\nKept: `kept()`.\n');
    expect(facts.codeSpans?.map((c) => c.text)).toEqual(['`kept()`']);
  });

  it('counts offsets after a BOM and inside list items and block quotes', () => {
    const src = '\uFEFF# P\n\n- item with `one()`\n\n> quoted `two()` here\n';
    const facts = md(src);
    const text = src.slice(1);
    expect(facts.codeSpans?.map((c) => [c.text, c.line, c.column])).toEqual([
      ['`one()`', 3, 13],
      ['`two()`', 5, 10],
    ]);
    // Offsets are into the decoded text as collect hands it over (the BOM is not part of it).
    for (const c of facts.codeSpans!) expect(text.slice(c.offset - 1, c.endOffset - 1)).toBe(c.text);
  });

  it('marks links whose whole text is one code span, in Markdown and HTML', () => {
    expect(md('# P\n\n[`x()`](y.md), [`x()` and more](z.md), [plain](w.md)\n').links.map((l) => l.code)).toEqual([true, undefined, undefined]);
    const html = parseSource({ path: 'p.html', kind: 'html', bytes: 0, hash: 'h', text: '<p><a href="y.html"> <code>x()</code> </a> <a href="z.html"><code>x</code>()</a></p>', problems: [] }, testOptions());
    expect(html.links.map((l) => l.code)).toEqual([true, undefined]);
  });

  it('keeps <code> elements in the prose of HTML pages, tags included, with the code as it reads', () => {
    const text = '<h2><code>title()</code></h2>\n<p>Call <code class="x"><span class="pre">a&lt;b</span> <span>()</span></code> or <a href="y.html"><code>linked()</code></a>.</p>\n<pre><code>block()</code></pre>\n';
    const facts = parseSource({ path: 'p.html', kind: 'html', bytes: 0, hash: 'h', text, problems: [] }, testOptions());
    expect(facts.codeSpans).toEqual([
      { text: '<code class="x"><span class="pre">a&lt;b</span> <span>()</span></code>', code: 'a<b ()', offset: 38, endOffset: 108, line: 2, column: 9 },
    ]);
  });
});

/** A small API reference: each widget call has a page, guides link some calls as code and mention others as code. */
function apiSite(): Record<string, string> {
  const calls = ['open', 'close', 'read', 'write', 'flush', 'seek'];
  const tree: Record<string, string> = {
    'index.md': `# Widget guide\n\n${calls.map((c) => `- [widget.${c}()](api/${c}.md)`).join('\n')}\n- [Starting](guides/start.md)\n- [Saving](guides/save.md)\n- [Tuning](guides/tune.md)\n`,
  };
  for (const c of calls) {
    tree[`api/${c}.md`] = `# widget.${c}()\n\nThe \`widget.${c}()\` call is how a widget does ${c} work on its buffer. See the [guide](../index.md).\n`;
  }
  tree['guides/start.md'] =
    '# Starting\n\nFirst call [`widget.open()`](../api/open.md), then [`widget.read()`](../api/read.md) until the buffer is empty.\nWhen done, call `widget.close()` so the buffer is freed.\n';
  tree['guides/save.md'] =
    '# Saving\n\nCall [`widget.write()`](../api/write.md) and then [`widget.flush()`](../api/flush.md).\nA widget that was never opened with [`widget.open()`](../api/open.md) cannot save; use `widget.seek()` to move first.\n';
  tree['guides/tune.md'] =
    '# Tuning\n\nBig buffers make [`widget.read()`](../api/read.md) and [`widget.write()`](../api/write.md) faster.\nCall [`widget.close()`](../api/close.md) when the work is done, and `widget.flush()` before it.\n';
  return tree;
}

async function suggestOn(root: string): Promise<Report> {
  return analyze({ root, command: 'suggest', cache: { enabled: false }, suggest: { targets: 'all', perSource: 0 } });
}

describe('code spans as anchors, from suggest to apply', () => {
  it('suggests the code span that names the target, and apply links the whole span', async () => {
    const t = tempDir('linkweave-code-');
    cleanups.push(t.cleanup);
    writeTree(t.dir, apiSite());
    const report = await suggestOn(t.dir);
    const closeFromStart = report.suggestions.find((s) => s.file === 'guides/start.md' && s.target === '/api/close/');
    expect(closeFromStart).toBeDefined();
    expect(closeFromStart!.anchor).toBe('`widget.close()`');
    expect([closeFromStart!.line, closeFromStart!.column]).toEqual([4, 17]);

    const result = await applySuggestions({ options: resolveOptions({}, t.dir), report, selection: { ids: [closeFromStart!.id] } });
    expect(result.notApplied).toEqual([]);
    const after = fs.readFileSync(path.join(t.dir, 'guides/start.md'), 'utf8');
    expect(after.split('\n')[3]).toBe('When done, call [`widget.close()`](../api/close.md) so the buffer is freed.');
    const reread = markdownPage('guides/start.md', after);
    const link = reread.links.find((l) => l.href === '../api/close.md');
    expect(link?.text).toBe('widget.close()');
    expect([link?.line, link?.column]).toEqual([4, 17]);
  });

  it('refuses an anchor that covers part of a code span or more than one', () => {
    const text = '# P\n\nUse `widget.close()` and `widget.open()` here.\n';
    const file = { path: 'p.md', kind: 'markdown' as const, bytes: text.length, hash: 'h', text, problems: [] };
    const options = testOptions();
    const facts = parseSource(file, options);
    const base: Omit<Suggestion, 'id' | 'offset' | 'endOffset' | 'anchor'> = {
      source: '/p/', target: '/t/', file: 'p.md', line: 3, column: 5, similarity: 0.5, score: 0.5,
      targetRankBefore: 1, targetRankAfter: 1, depthBefore: 2, depthAfter: 2, reason: '', sourceHash: 'h',
    };
    const at = (id: string, s: number, e: number): Suggestion => ({ ...base, id, offset: s, endOffset: e, anchor: text.slice(s, e) });
    const whole = facts.codeSpans![0]!;
    const plan = planFile({
      file,
      suggestions: [at('part', whole.offset + 1, whole.endOffset - 1), at('both', whole.offset, facts.codeSpans![1]!.endOffset)],
      hrefs: new Map([['part', 't.md'], ['both', 't.md']]),
      style: 'relative',
      options,
      regions: facts.protected,
      links: facts.links,
      codeSpans: facts.codeSpans ?? [],
    });
    expect(plan.applied).toEqual([]);
    expect(plan.refused.map((n) => [n.id, n.code, n.kind])).toEqual([
      ['both', 'protected', 'code'],
      ['part', 'protected', 'code'],
    ]);
  });
});

describe('an HTML <code> element as the anchor', () => {
  it('is wrapped whole by apply, and the re-parsed link reads as the code', () => {
    const text = '<html><body>\n<p>Call <code class="xref"><span class="pre">widget.close()</span></code> when done.</p>\n</body></html>\n';
    const file = { path: 'p.html', kind: 'html' as const, bytes: text.length, hash: 'h', text, problems: [] };
    const options = testOptions();
    const facts = parseSource(file, options);
    const span = facts.codeSpans![0]!;
    const suggestion: Suggestion = {
      id: 'c', source: '/p.html', target: '/t.html', file: 'p.html', line: span.line, column: span.column, offset: span.offset, endOffset: span.endOffset,
      anchor: span.text, similarity: 0.5, score: 0.5, targetRankBefore: 1, targetRankAfter: 1, depthBefore: 2, depthAfter: 2, reason: '', sourceHash: 'h',
    };
    const plan = planFile({ file, suggestions: [suggestion], hrefs: new Map([['c', 't.html']]), style: 'relative', options, regions: facts.protected, links: facts.links, codeSpans: facts.codeSpans ?? [] });
    expect(plan.refused).toEqual([]);
    expect(plan.after.split('\n')[1]).toBe('<p>Call <a href="t.html"><code class="xref"><span class="pre">widget.close()</span></code></a> when done.</p>');
    const link = parseSource({ ...file, text: plan.after }, options).links[0]!;
    expect([link.text, link.code]).toEqual(['widget.close()', true]);
  });
});

describe('holding out a code link in the backtest', () => {
  it('finds the code span inside the brackets, backticks included', () => {
    const src = '# P\n\nSee [`fs.stat()`](fs.md) and [the **bold** one](x.md) and [plain](y.md).\n';
    const facts = md(src);
    const starts = buildLineIndex(src);
    const [code, bold, plain] = facts.links;
    expect(linkTextRange(src, starts, code!, 'markdown')).toEqual({ start: 10, end: 21, code: 'fs.stat()' });
    expect(src.slice(10, 21)).toBe('`fs.stat()`');
    expect(linkTextRange(src, starts, bold!, 'markdown')).toBeNull();
    const p = linkTextRange(src, starts, plain!, 'markdown');
    expect(p && src.slice(p.start, p.end)).toBe('plain');
  });
});

describe("the site's placement habit orders the anchor options", () => {
  /**
   * Two sites with the same mentions of the `npm widget` command on page `guide`: once in code in
   * running text (line 3), once alone in a list at the end (line 7). One site links its command
   * names in lists and leaves them unlinked in code; the other links them in code in running text.
   */
  function site(linksInLists: boolean) {
    const options = testOptions();
    const other = ['alpha', 'beta', 'gamma', 'delta'];
    const pages = [
      markdownPage('index.md', `# Home\n\n${['widget', ...other].map((c) => `- [npm ${c}](${c}.md)`).join('\n')}\n- [Guide](guide.md)\n`),
      markdownPage('widget.md', '# npm widget\n\nMakes widgets.\n'),
      ...other.map((c) => markdownPage(`${c}.md`, `# npm ${c}\n\nDoes ${c} things.\n`)),
      markdownPage('guide.md', '# Guide\n\nFirst run `npm widget` in the folder.\n\nThen you are done.\n\n## See also\n\n- npm widget\n'),
      // The habit: how other pages write their links to the commands.
      ...other.map((c, i) =>
        markdownPage(
          `use-${c}.md`,
          linksInLists
            ? `# Using ${c}\n\nRun \`npm ${other[(i + 1) % 4]}\` first, then \`npm ${c}\`.\n\n## See also\n\n- [npm ${c}](${c}.md)\n`
            : `# Using ${c}\n\nRun [\`npm ${c}\`](${c}.md) first.\n\n## See also\n\n- npm ${other[(i + 1) % 4]}\n`,
        ),
      ),
    ];
    const { index, id } = mentionsOf(pages, options);
    return { index, hit: index.bySource[id('/guide/')]!.get(id('/widget/'))! };
  }

  it('a site that links commands in lists gets the list entry first', () => {
    const { index, hit } = site(true);
    expect(index.placement.linked[2]).toBeGreaterThan(0);
    expect(hit.anchors.map((a) => [a.text, a.line])).toEqual([
      ['npm widget', 9],
      ['`npm widget`', 3],
    ]);
  });

  it('a site that links commands in code in running text gets the code span first', () => {
    const { index, hit } = site(false);
    expect(index.placement.linked[1]).toBeGreaterThan(0);
    expect(hit.anchors.map((a) => [a.text, a.line])).toEqual([
      ['`npm widget`', 3],
      ['npm widget', 9],
    ]);
  });

  it('rates a placement by its share of links, one link and one mention added', () => {
    const habit = { linked: [3, 0, 8, 1] as [number, number, number, number], mentioned: [97, 0, 2, 9] as [number, number, number, number] };
    expect([0, 1, 2, 3].map((p) => placementRate(habit, p))).toEqual([4 / 102, 1 / 2, 9 / 12, 2 / 12]);
  });
});

describe('section headings name their page', () => {
  it.each([
    ['Installing the widget', []],
    ['Why (and when) to cache', []],
    ['Event: close', []],
    ['fs.readFile(path[, options], callback)', ['fs.readFile(path[, options], callback)', 'fs.readFile']],
    ['Class: fs.Dir', ['Class: fs.Dir', 'fs.Dir']],
    ['Static method: Buffer.from(array)', ['Static method: Buffer.from(array)', 'Buffer.from(array)', 'Buffer.from']],
    ['ERR_WIDGET_CLOSED', ['ERR_WIDGET_CLOSED']],
    ['readFileSync', ['readFileSync']],
    ['PyObject_New()', ['PyObject_New()', 'PyObject_New']],
    ['--pending-deprecation', ['--pending-deprecation']],
    ['--require module', ['--require module']],
    ['--max-old-space-size=SIZE', ['--max-old-space-size=SIZE']],
    ['-- the rest', []],
    ['- a list marker', []],
  ])('%s gives %j', (heading, names) => {
    expect(headingNames(heading)).toEqual(names);
  });

  it('a code span naming a section of another page is a mention of that page', () => {
    const options = testOptions();
    const pages = [
      markdownPage('index.md', '# Home\n\n- [Errors](errors.md)\n- [Guide](guide.md)\n'),
      markdownPage('errors.md', '# Errors\n\n## `ERR_WIDGET_CLOSED`\n\nThe widget was closed.\n\n## `ERR_WIDGET_FULL`\n\nThe buffer is full.\n'),
      markdownPage('guide.md', '# Guide\n\nWriting to a closed widget throws `ERR_WIDGET_CLOSED`.\n'),
    ];
    const { index, id } = mentionsOf(pages, options);
    const hit = index.bySource[id('/guide/')]!.get(id('/errors/'));
    expect(hit?.anchors.map((a) => [a.text, a.line, a.kind])).toEqual([['`ERR_WIDGET_CLOSED`', 3, 'code']]);
  });

  it('a code name from a heading is no mention in prose words with the same stems ("the server is closed"), and still one in code', () => {
    const options = testOptions();
    const pages = [
      markdownPage('index.md', '# Home\n\n- [Networking](net.md)\n- [Guide](guide.md)\n- [Notes](notes.md)\n'),
      markdownPage('net.md', '# Networking\n\n## `server.close([callback])`\n\nStops the server from accepting new connections.\n'),
      markdownPage('guide.md', '# Guide\n\nAfter the server is closed, no new connection is accepted.\nOnce the server closes, it is gone.\n'),
      markdownPage('notes.md', '# Notes\n\nAfter the server is closed, it is gone.\nCall `server.close()` to stop it.\n'),
    ];
    const { index, id } = mentionsOf(pages, options);
    expect(index.bySource[id('/guide/')]!.get(id('/net/'))).toBeUndefined();
    const hit = index.bySource[id('/notes/')]!.get(id('/net/'));
    expect(hit?.count).toBe(1);
    expect(hit?.anchors.map((a) => [a.text, a.line, a.kind])).toEqual([['`server.close()`', 4, 'code']]);
  });
});

describe("a page's own members", () => {
  it('code written as the last part of a dotted name of its headings is the page speaking of its own member', () => {
    const { index, id } = mentionsOf([
      markdownPage('index.md', '# Home\n\n- [Errors](errors.md)\n- [Assert](assert.md)\n- [Guide](guide.md)\n'),
      markdownPage('errors.md', '# Errors\n\n## Class: `AssertionError`\n\nA failed check.\n'),
      markdownPage('assert.md', '# Assert\n\n## Class: `assert.AssertionError`\n\nThrown by `assert`. An `AssertionError` has a `code`.\n'),
      markdownPage('guide.md', '# Guide\n\nA failed `assert` throws an `AssertionError`.\n'),
    ]);
    expect(index.bySource[id('/assert/')]!.get(id('/errors/'))).toBeUndefined();
    expect(index.bySource[id('/guide/')]!.get(id('/errors/'))?.anchors.map((a) => [a.text, a.line])).toEqual([['`AssertionError`', 3]]);
  });
});

describe('code a page links to one page', () => {
  it('means that page wherever the page writes it, and is no mention of another page named so; quoted strings aside', () => {
    const options = testOptions();
    const pages = [
      markdownPage('index.md', '# Home\n\n- [Errors](errors.md)\n- [Expressions](expressions.md)\n- [Objects](objects.md)\n- [Sockets](sockets.md)\n- [Files](files.md)\n- [Types](types.md)\n'),
      markdownPage('errors.md', '# Errors\n\nEvery error class.\n'),
      markdownPage('expressions.md', '# Expressions\n\nOperators.\n'),
      markdownPage('sockets.md', '# Sockets\n\nSockets close.\n'),
      markdownPage('files.md', '# Files\n\nFiles close.\n'),
      // The site's index links `TypeError` to the expressions page and `'close'` to the files page.
      markdownPage('glossary.md', '# Glossary\n\n- [`TypeError`](expressions.md)\n- [`\'close\'`](files.md)\n'),
      markdownPage('objects.md', "# Objects\n\nRaises [`TypeError`](errors.md) on a bad key.\n\nA wrong type raises `TypeError` too.\n\nListen for [`'close'`](sockets.md), then for `'close'` again.\n"),
      markdownPage('types.md', '# Types\n\nA wrong type raises `TypeError`.\n'),
    ];
    const { index, id } = mentionsOf(pages, options);
    expect(index.bySource[id('/objects/')]!.get(id('/expressions/'))).toBeUndefined();
    expect(index.bySource[id('/objects/')]!.get(id('/files/'))?.anchors.map((a) => [a.text, a.line])).toEqual([["`'close'`", 7]]);
    // A page that links no `TypeError` still mentions the expressions page by it.
    expect(index.bySource[id('/types/')]!.get(id('/expressions/'))?.anchors.map((a) => [a.text, a.line])).toEqual([['`TypeError`', 3]]);
  });
});

describe('command-line option headings name their page', () => {
  it('a code span written as an option of a command-line page is a mention of that page, and it is the option put first', () => {
    const options = testOptions();
    const pages = [
      markdownPage('index.md', '# Home\n\n- [Command line](cli.md)\n- [Deprecations](deprecations.md)\n'),
      markdownPage('cli.md', '# Command line\n\n## Options\n\n### `--pending-deprecation`\n\nWarn about pending deprecations.\n\n### `-r, --require module`\n\nLoad a module at startup.\n'),
      markdownPage('deprecations.md', '# Deprecations\n\nSome deprecations are pending deprecation notices.\nThey warn when the `--pending-deprecation` flag is set.\n'),
    ];
    const { index, id } = mentionsOf(pages, options);
    const hit = index.bySource[id('/deprecations/')]!.get(id('/cli/'));
    expect(hit?.anchors.map((a) => [a.text, a.line, a.kind])).toEqual([
      ['`--pending-deprecation`', 4, 'code'],
      ['pending deprecation', 3, 'name'],
    ]);
  });
});

describe('holding out an HTML code link in the backtest', () => {
  it('finds the <code> element that fills an HTML link, tags included', () => {
    const src = '<p>See <a href="fs.html"><code class="xref"><span>fs.stat()</span></code></a>, <a href="x.html"><code>x</code>()</a>.</p>\n';
    const facts = parseSource({ path: 'p.html', kind: 'html', bytes: 0, hash: 'h', text: src, problems: [] }, testOptions());
    const starts = buildLineIndex(src);
    const [code, mixed] = facts.links;
    const range = linkTextRange(src, starts, code!, 'html');
    expect(range && [src.slice(range.start, range.end), range.code]).toEqual(['<code class="xref"><span>fs.stat()</span></code>', 'fs.stat()']);
    expect(linkTextRange(src, starts, mixed!, 'html')).toBeNull();
  });
});
