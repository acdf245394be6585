/**
 * Property tests (fast-check): random Markdown and HTML, malformed included, never throw out of
 * `parseSource`, and what comes out keeps its invariants: links in source order inside the text,
 * spans exact slices, ids sorted and unique, problems with a known code.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseNavigation, parseRedirects, parseSource } from '../../src/parse/index.js';
import type { PageFacts } from '../../src/types.js';
import { options, sourceFile } from './helpers.js';

const MD_CHARS = ['a', 'b', ' ', ' ', '\n', '\r', '\t', '[', ']', '(', ')', '<', '>', '*', '_', '`', '~', '#', '-', '+', '!', '|', ':', '"', "'", '\\', '&', ';', '=', '/', '{', '}', '1', '.', 'é', '😀', '\u0000', '\uFEFF', '\uD800'];
const MD_TOKENS = ['---\n', '```\n', '> ', '- ', '1. ', '[x](/y)', '[r]: /r\n', '<a href="/z">', '</a>', '<!--', '-->', '<div>', '</div>', '{{ref "a.md"}}', '## ', '| a | b |\n|---|---|\n', 'http://x.y', '\r\n', '    '];
const HTML_TOKENS = ['<a href="/x">', '</a>', '<a href=', '<p>', '</p>', '<nav>', '</nav>', '<base href="/b/">', '<h1 id="t">', '</h1>', '<title>', '</title>', '<!--', '-->', '<script>', '</script>', '<table><tr><td>', '</td>', '<![CDATA[', ']]>', '&amp;', '&#x', '<', '>', '"', "'", '=', 'text ', '\r\n', '\u0000', '<svg><a href="s">', '<template>', '<pre>'];

const mdText = fc.array(fc.oneof(fc.constantFrom(...MD_CHARS), fc.constantFrom(...MD_TOKENS)), { maxLength: 200 }).map((p) => p.join(''));
const htmlText = fc.array(fc.oneof(fc.constantFrom(...HTML_TOKENS), fc.constantFrom(...MD_CHARS)), { maxLength: 200 }).map((p) => p.join(''));

const CODES = new Set(['frontmatter', 'parse-failed', 'bad-link-pattern', 'too-many-links', 'deep-nesting', 'too-complex']);

function checkInvariants(text: string, facts: PageFacts): void {
  const src = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const lineCount = src.split(/\r\n|\r|\n/).length;
  for (let i = 0; i < facts.links.length; i++) {
    const l = facts.links[i]!;
    expect(l.line).toBeGreaterThanOrEqual(1);
    expect(l.line).toBeLessThanOrEqual(lineCount);
    expect(l.column).toBeGreaterThanOrEqual(1);
    if (i > 0) {
      const p = facts.links[i - 1]!;
      expect(p.line < l.line || (p.line === l.line && p.column <= l.column)).toBe(true);
    }
  }
  for (const s of facts.spans) expect(text.slice(s.offset, s.offset + s.text.length)).toBe(s.text);
  expect([...facts.ids].sort()).toEqual(facts.ids);
  expect(new Set(facts.ids).size).toBe(facts.ids.length);
  for (const p of facts.problems) expect(CODES.has(p.code)).toBe(true);
  // parse-failed would mean a fault of our own code, not of the input: never for these inputs.
  expect(facts.problems.filter((p) => p.code === 'parse-failed')).toEqual([]);
  // Output is plain data: JSON round trip keeps it.
  expect(JSON.parse(JSON.stringify(facts))).toEqual(facts);
}

describe('parseSource never throws (property tests, fast-check)', () => {
  const opts = options({ linkPatterns: [{ pattern: '\\{\\{ref "([^"]*)"\\}\\}', route: '$1' }], maxLinksPerPage: 25 });

  it('random Markdown', () => {
    fc.assert(
      fc.property(mdText, (text) => {
        const facts = parseSource(sourceFile('fuzz/page.md', text), opts);
        expect(facts.route).toBe('/fuzz/page/');
        checkInvariants(text, facts);
      }),
      { numRuns: 400, seed: 424242 },
    );
  });

  it('random HTML', () => {
    fc.assert(
      fc.property(htmlText, (text) => {
        const facts = parseSource(sourceFile('fuzz/page.html', text), opts);
        expect(facts.route).toBe('/fuzz/page.html');
        checkInvariants(text, facts);
      }),
      { numRuns: 400, seed: 515151 },
    );
  });

  it('random full-Unicode strings as Markdown and HTML', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 120 }), (text) => {
        checkInvariants(text, parseSource(sourceFile('u.md', text), opts));
        checkInvariants(text, parseSource(sourceFile('u.html', text), opts));
      }),
      { numRuns: 300, seed: 99 },
    );
  });

  it('random redirects and Markdown navigation files never throw', () => {
    fc.assert(
      fc.property(mdText, (text) => {
        const r = parseRedirects('_redirects', text);
        for (const x of r.redirects) expect(x.from.length > 0 && x.to.length > 0).toBe(true);
        for (const l of parseNavigation('SUMMARY.md', text)) expect(l.context).toBe('template');
      }),
      { numRuns: 200, seed: 31337 },
    );
  });
});
