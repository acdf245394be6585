/**
 * What happens to a held-out link's words: located in the source and kept as a prose span
 * (`--keep-link-text`), or taken out of the page's text. Facts come from the real parse stage.
 */
import { describe, expect, it } from 'vitest';
import { holdOut, linkTextRange, removeOnce, withoutWords, withSpans } from '../../src/backtest/index.js';
import { buildLineIndex, positionOf } from '../../src/util/line-index.js';
import { buildGraph } from '../../src/graph/index.js';
import { resolveOptions } from '../../src/config/options.js';
import { parseSource } from '../../src/parse/index.js';
import type { FileKind, PageFacts, SourceFile } from '../../src/types.js';

const options = resolveOptions({}, '/site', 'test');

function source(path: string, text: string): SourceFile {
  const kind: FileKind = path.endsWith('.html') ? 'html' : 'markdown';
  return { path, kind, bytes: text.length, hash: `h-${path}`, text, problems: [] };
}

describe('line positions', () => {
  it('finds line starts after LF, CRLF and lone CR', () => {
    const lines = buildLineIndex('a\nb\r\nc\rd');
    expect([...lines.starts]).toEqual([0, 2, 5, 7]);
    expect(positionOf(lines, 6)).toEqual({ line: 3, column: 2 });
    expect(positionOf(lines, 0)).toEqual({ line: 1, column: 1 });
  });
});

describe('linkTextRange', () => {
  it('locates Markdown and HTML link text from the parser positions, also after CRLF', () => {
    const md = 'Intro line.\r\nSee the [Install guide](install.md) now.\r\n';
    const facts = parseSource(source('a.md', md), options);
    const raw = facts.links[0]!;
    const r = linkTextRange(md, buildLineIndex(md), raw, 'markdown')!;
    expect(md.slice(r.start, r.end)).toBe('Install guide');

    const html = '<html><body><p>Read <a class="x" href="b.html">the manual</a> first.</p></body></html>';
    const hf = parseSource(source('a.html', html), options);
    const hr = linkTextRange(html, buildLineIndex(html), hf.links[0]!, 'html')!;
    expect(html.slice(hr.start, hr.end)).toBe('the manual');
  });

  it('gives null when the text is not there as written (markup inside the link) or for link patterns', () => {
    const md = 'Go [**bold** words](b.md).\n';
    const facts = parseSource(source('a.md', md), options);
    expect(facts.links[0]!.text).toBe('bold words');
    expect(linkTextRange(md, buildLineIndex(md), facts.links[0]!, 'markdown')).toBeNull();
    expect(linkTextRange(md, buildLineIndex(md), { ...facts.links[0]!, origin: 'pattern' }, 'markdown')).toBeNull();
  });
});

describe('withSpans', () => {
  it('adds spans in offset order with text equal to the source slice and leaves out overlapping ranges', () => {
    const src = 'alpha beta gamma delta';
    const spans = [{ text: 'alpha ', offset: 0, line: 1, column: 1 }, { text: ' delta', offset: 16, line: 1, column: 17 }];
    const out = withSpans(spans, src, buildLineIndex(src), [{ start: 6, end: 10 }, { start: 3, end: 8 }]);
    expect(out.map((s) => s.text)).toEqual(['alpha ', 'beta', ' delta']);
    for (const s of out) expect(src.slice(s.offset, s.offset + s.text.length)).toBe(s.text);
    expect(out[1]).toMatchObject({ line: 1, column: 7 });
  });
});

describe('removing a link text from the page text', () => {
  it('removes one whole-word occurrence only', () => {
    expect(removeOnce('caches hold the cache', 'cache')).toBe('caches hold the  ');
    expect(removeOnce('caches only', 'cache')).toBe('caches only');
    expect(removeOnce('a b a b', 'a b')).toBe('  a b');
  });

  it('takes the text from the body, else from the headings', () => {
    const t = withoutWords({ title: 'T', headings: 'Setup steps', body: 'read the setup guide' }, ['setup guide', 'Setup steps']);
    expect(t).toEqual({ title: 'T', headings: ' ', body: 'read the  ' });
  });
});

describe('holdOut on parsed pages', () => {
  const files = [
    source('index.md', '# Home\n\nStart with [Install guide](install.md) and the [tuning notes](tuning.md).\n'),
    source('install.md', '# Install guide\n\nBack [home](index.md). Then [tuning notes](tuning.md).\n'),
    source('tuning.md', '# Tuning notes\n\nSee the [Install guide](install.md) again, or go [home](index.md).\n'),
  ];
  const facts: PageFacts[] = files.map((f) => parseSource(f, options));
  const graph = buildGraph({ pages: facts, assets: [], navigation: null, redirects: [] }, options);
  const text = (file: string) => files.find((f) => f.path === file)?.text;

  it('keeps the words as a prose span at the link place with keepLinkText, and drops them from the text otherwise', () => {
    const kept = holdOut({ graph, facts, sourceText: text, keepLinkText: true }, 0.9, 7);
    expect(kept.heldOut.length).toBeGreaterThan(0);
    for (const pair of kept.heldOut) {
      const f = graph.pages[pair.source]!.factsIndex;
      const src = files[f]!.text;
      for (const l of pair.links) {
        expect(l.offset).toBeGreaterThanOrEqual(0);
        expect(src.slice(l.offset, l.endOffset)).toBe(l.text);
        expect(kept.facts[f]!.spans.some((s) => s.offset === l.offset && s.text === l.text)).toBe(true);
      }
      expect(kept.facts[f]!.text).toEqual(facts[f]!.text);
      for (const s of kept.facts[f]!.spans) expect(src.slice(s.offset, s.offset + s.text.length)).toBe(s.text);
    }

    const dropped = holdOut({ graph, facts, sourceText: text }, 0.9, 7);
    expect(dropped.heldOut).toEqual(kept.heldOut);
    for (const pair of dropped.heldOut) {
      const f = graph.pages[pair.source]!.factsIndex;
      expect(dropped.facts[f]!.spans).toBe(facts[f]!.spans);
      for (const l of pair.links) expect(dropped.facts[f]!.text.body.includes(l.text)).toBe(facts[f]!.text.body.split(l.text).length > 2);
    }
  });
});
