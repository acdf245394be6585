import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import type { Nodes } from 'mdast';
import { findAnchors, positionInSpan, prepareSource } from '../../src/suggest/anchor.js';
import { routeWords, targetNames } from '../../src/suggest/names.js';
import { createStemCache, tokenize } from '../../src/text/tokenize.js';
import type { TextSpan } from '../../src/types.js';
import { markdownPage, parseMarkdown } from './helpers.js';

const cache = createStemCache();
const span = (text: string, offset = 0, line = 1, column = 1): TextSpan => ({ text, offset, line, column });

describe('findAnchors', () => {
  it('finds the whole title across stop words, as written in the source', () => {
    const source = prepareSource([span('You can configure the cache server to keep entries.')], cache);
    const names = targetNames('Configuring the cache server', ['/ops/cache-server/'], [], cache);
    const [best] = findAnchors(source, names);
    expect(best).toMatchObject({ text: 'configure the cache server', kind: 'title', words: 3, offset: 8, endOffset: 34, line: 1, column: 9 });
  });

  it('prefers the longer phrase and the title over an alias or key terms', () => {
    const source = prepareSource([span('Eviction runs often. Tune the eviction policy for large caches.')], cache);
    const names = targetNames('Eviction policy', ['/cache/evict/'], tokenize('eviction caches'), cache);
    const found = findAnchors(source, names);
    expect(found[0]).toMatchObject({ text: 'eviction policy', kind: 'title' });
    // other options do not overlap the best one
    for (const f of found.slice(1)) expect(f.endOffset <= found[0]!.offset || f.offset >= found[0]!.endOffset).toBe(true);
  });

  it('matches the words of the last route segment (alias)', () => {
    expect(routeWords('/guide/rate-limits/', cache)).toEqual(['rate', 'limit']);
    expect(routeWords('/a/billing.html', cache)).toEqual(['bill']);
    const source = prepareSource([span('Clients that hit rate limits get a 429.')], cache);
    const [best] = findAnchors(source, targetNames('Throttling', ['/guide/rate-limits/'], [], cache));
    expect(best).toMatchObject({ text: 'rate limits', kind: 'alias' });
  });

  it('takes no alias from a route whose words the tokenizer partly drops (/n-api/ is not "API"), as the mention index does', () => {
    const page = markdownPage('documentation.md', '# About this documentation\n\nWelcome to the official API reference documentation.\n');
    const source = prepareSource(page.spans, cache, 'About this documentation');
    expect(targetNames('Node-API', ['/n-api/'], [], cache).aliases).toEqual([]);
    expect(findAnchors(source, targetNames('Node-API', ['/n-api/'], [], cache))).toEqual([]);
    // A route kept whole is an alias still.
    expect(findAnchors(source, targetNames('Reference', ['/api-reference/'], [], cache)).map((a) => [a.text, a.kind, a.line])).toEqual([['API reference', 'alias', 3]]);
  });

  it('does not join words across punctuation, line breaks or more than two stop words', () => {
    const names = targetNames('Cache server', [], [], cache);
    for (const text of ['the cache, server', 'the cache\nserver', 'cache and then the server', 'cache (server)']) {
      expect(findAnchors(prepareSource([span(text)], cache), names)).toEqual([]);
    }
  });

  it('takes one word only when it is the whole name', () => {
    const source = prepareSource([span('Rotate the logs daily.')], cache);
    expect(findAnchors(source, targetNames('Log rotation policy', [], ['log'], cache))).toEqual([]);
    expect(findAnchors(source, targetNames('Logs', [], [], cache)).map((a) => [a.text, a.kind])).toEqual([['logs', 'title']]);
  });

  it('takes part of a name only with its rarest word', () => {
    const df = (stem: string): number => ({ warm: 2, tile: 9, cach: 9 })[stem] ?? 0;
    const names = targetNames('Warming the tile cache', [], [], cache, df);
    expect(findAnchors(prepareSource([span('Every tile cache node keeps tiles.')], cache), names)).toEqual([]);
    expect(findAnchors(prepareSource([span('Start warming the tile store first.')], cache), names).map((a) => a.text)).toEqual(['warming the tile']);
  });

  it('never anchors on the source page speaking of its own subject', () => {
    const names = targetNames('Tile cache sizing', [], ['tile', 'cach'], cache);
    const text = 'The tile cache holds rendered tiles.';
    expect(findAnchors(prepareSource([span(text)], cache, 'Tile cache overview'), names)).toEqual([]);
    expect(findAnchors(prepareSource([span(text)], cache, 'Renderers'), names)[0]?.text).toBe('tile cache');
  });

  it('joins key terms only when they are written next to each other', () => {
    // "node" is strong and a word of an alias (the route), so the run "cache node" counts
    const names = targetNames('Warming', ['/ops/node-warmup/'], { all: ['warm', 'node', 'cach'], strong: ['node'] }, cache);
    expect(findAnchors(prepareSource([span('a cache node restarts')], cache), names).map((a) => a.text)).toEqual(['cache node']);
    // a run without a word of the title or an alias does not
    expect(findAnchors(prepareSource([span('a cache node restarts')], cache), targetNames('Warming', [], { all: ['node', 'cach'], strong: ['node'] }, cache))).toEqual([]);
    // a single key term, or key terms with a stop word between them, are no anchor
    expect(findAnchors(prepareSource([span('the node of the cache')], cache), names)).toEqual([]);
    // a run needs one strong term
    const weak = targetNames('Warming', [], { all: ['tile', 'cach'], strong: [] }, cache);
    expect(findAnchors(prepareSource([span('every tile cache')], cache), weak)).toEqual([]);
  });

  it('never gives a phrase made of stop words only', () => {
    const source = prepareSource([span('It is what it is, and then some.')], cache);
    expect(findAnchors(source, targetNames('What it is', ['/what-it-is/'], [], cache))).toEqual([]);
  });

  it('skips ranges taken by other targets', () => {
    const source = prepareSource([span('The cache server and the cache server again.')], cache);
    const names = targetNames('Cache server', [], [], cache);
    const first = findAnchors(source, names)[0]!;
    expect(first.offset).toBe(4);
    const second = findAnchors(source, names, [[first.offset, first.endOffset]])[0]!;
    expect(second.offset).toBe(25);
  });

  it('counts lines and columns inside a span (LF, CRLF and CR line ends)', () => {
    const s = span('first line\r\nsecond line\rthird cache server', 100, 7, 5);
    expect(positionInSpan(s, 0)).toEqual({ line: 7, column: 5 });
    expect(positionInSpan(s, 12)).toEqual({ line: 8, column: 1 });
    const [best] = findAnchors(prepareSource([s], cache), targetNames('Cache server', [], [], cache));
    expect(best).toMatchObject({ line: 9, column: 7, offset: 100 + 30, text: 'cache server' });
  });
});

// Random Markdown built from blocks that carry prose, links, code and headings.
const WORDS = ['cache', 'server', 'token', 'rotation', 'the', 'of', 'policy', 'queue', 'lease', 'and', 'é', 'naïve', 'shard'];
const words = fc.array(fc.constantFrom(...WORDS), { minLength: 1, maxLength: 8 }).map((w) => w.join(' '));
const inline = fc.oneof(
  words,
  words.map((w) => `[${w}](other.md)`),
  words.map((w) => `\`${w}\``),
  words.map((w) => `*${w}*`),
  words.map((w) => `![${w}](pic.png)`),
);
const paragraph = fc.array(inline, { minLength: 1, maxLength: 5 }).map((parts) => parts.join(' '));
const block = fc.oneof(
  paragraph,
  words.map((w) => `## ${w}`),
  words.map((w) => `\`\`\`\n${w}\n\`\`\``),
  fc.array(paragraph, { minLength: 1, maxLength: 3 }).map((items) => items.map((i) => `- ${i}`).join('\n')),
  fc.tuple(paragraph, paragraph).map(([a, b]) => `${a}\n${b}`),
);
const documentArb = fc.tuple(fc.array(block, { minLength: 1, maxLength: 6 }), fc.boolean()).map(([blocks, crlf]) => {
  const text = `# Page\n\n${blocks.join('\n\n')}\n`;
  return crlf ? text.replace(/\n/g, '\r\n') : text;
});

function flatten(node: Nodes, out: Nodes[] = []): Nodes[] {
  out.push(node);
  if ('children' in node) for (const c of node.children as Nodes[]) flatten(c, out);
  return out;
}

function textOf(node: Nodes): string {
  if ('value' in node && typeof node.value === 'string') return node.value;
  if ('children' in node) return (node.children as Nodes[]).map(textOf).join('');
  return '';
}

describe('anchor positions in real Markdown', () => {
  it('inserting [anchor](target) at the offsets gives a link with that text at that line and column, never inside code, headings or links', () => {
    let checked = 0;
    fc.assert(
      fc.property(documentArb, fc.constantFrom('Cache server', 'Token rotation policy', 'Queue lease', 'Naïve shard'), (source, title) => {
        const facts = markdownPage('page.md', source);
        const anchors = findAnchors(prepareSource(facts.spans, createStemCache()), targetNames(title, [], tokenize(title), createStemCache()));
        const blocked = flatten(parseMarkdown(source)).filter((n) =>
          ['link', 'heading', 'code', 'inlineCode', 'image'].includes(n.type),
        );
        for (const a of anchors) {
          expect(source.slice(a.offset, a.endOffset)).toBe(a.text);
          for (const b of blocked) {
            expect(a.endOffset <= b.position!.start.offset! || a.offset >= b.position!.end.offset!).toBe(true);
          }
          const edited = `${source.slice(0, a.offset)}[${a.text}](/target/)${source.slice(a.endOffset)}`;
          // re-parsed by the parse stage ...
          const links = markdownPage('page.md', edited).links.filter((l) => l.href === '/target/');
          expect(links).toHaveLength(1);
          expect(links[0]).toMatchObject({ text: a.text, line: a.line, column: a.column });
          // ... and by remark itself
          const nodes = flatten(parseMarkdown(edited)).filter((n) => n.type === 'link' && n.url === '/target/');
          expect(nodes).toHaveLength(1);
          expect(textOf(nodes[0]!)).toBe(a.text);
          expect(nodes[0]!.position!.start).toMatchObject({ line: a.line, column: a.column, offset: a.offset });
          checked++;
        }
      }),
      { numRuns: 150 },
    );
    expect(checked).toBeGreaterThan(20);
  });
});

describe('anchor positions in HTML', () => {
  it('finds a phrase in paragraph text, not in code, headings or links, at the right line and column', () => {
    const source = [
      '<!doctype html>',
      '<html><head><title>Ops</title></head><body>',
      '<h1>Cache server</h1>',
      '<p>Restart the <code>cache server</code> first, see <a href="x.html">cache server</a>.</p>',
      '<p>Then the cache server warms up.</p>',
      '</body></html>',
    ].join('\r\n');
    const facts = markdownPage('ops.html', source);
    const [best] = findAnchors(prepareSource(facts.spans, createStemCache()), targetNames('Cache server', [], [], createStemCache()));
    expect(best).toMatchObject({ text: 'cache server', line: 5, column: 13 });
    const edited = `${source.slice(0, best!.offset)}<a href="/target/">${best!.text}</a>${source.slice(best!.endOffset)}`;
    const link = markdownPage('ops.html', edited).links.find((l) => l.href === '/target/');
    expect(link).toMatchObject({ text: 'cache server', line: 5, column: 13 });
  });
});
