/**
 * The mention index tokenises prose with its own loop (`proseTokens` in `mentions.ts`, no string
 * per word) instead of `prepareSource` (`anchor.ts`); both must give the same kept words, offsets,
 * spans and phrase joins, or the mention index would find other mentions than the anchor search.
 */
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { prepareSource } from '../../src/suggest/anchor.js';
import { ProseTokens, proseTokens, proseWords } from '../../src/suggest/mention-tokens.js';
import { createStemCache } from '../../src/text/tokenize.js';
import { markdownPage } from './helpers.js';

function both(spans: readonly { text: string; line: number; column: number; offset: number }[]): { ours: unknown; theirs: unknown } {
  const expected = prepareSource(spans, createStemCache());
  const out = new ProseTokens();
  // A used buffer and a used word table, as from page to page of one build.
  const words = proseWords(createStemCache());
  proseTokens([{ text: 'Earlier page text - with the words, 42 and THE end' }], words, out);
  proseTokens(spans, words, out);
  const n = out.stem.length;
  return {
    ours: { stem: out.stem.slice(0, n), start: out.start.slice(0, n), end: out.end.slice(0, n), span: out.span.slice(0, n), joinNext: out.joinNext.slice(0, n) },
    theirs: { stem: expected.stem, start: expected.start, end: expected.end, span: expected.span, joinNext: expected.joinNext },
  };
}

describe('proseTokens', () => {
  it('equals prepareSource on every page of the example site', () => {
    const root = path.resolve(__dirname, '../../examples/docs-site');
    const files = fs.readdirSync(root, { recursive: true, encoding: 'utf8' }).filter((f) => f.endsWith('.md')).sort();
    expect(files.length).toBeGreaterThan(20);
    let kept = 0;
    for (const file of files) {
      const facts = markdownPage(file, fs.readFileSync(path.join(root, file), 'utf8'));
      const { ours, theirs } = both(facts.spans);
      expect(ours, file).toEqual(theirs);
      kept += (theirs as { stem: string[] }).stem.length;
    }
    expect(kept).toBeGreaterThan(1000);
  });

  it('equals prepareSource on random prose (stop words, numbers, long words, gaps of every kind)', () => {
    const unit = fc.constantFrom('The', 'the', 'of', 'A', 'cache', 'Tiles', 'warming', '42', 'x'.repeat(41), 'é', 'жук', ' ', '  ', '-', "'", '\u2019', '\u00a0', '\t', ',', '.', '\n', '_');
    const span = fc.array(unit, { maxLength: 30 }).map((parts) => parts.join(''));
    fc.assert(
      fc.property(fc.array(span, { maxLength: 4 }), (texts) => {
        const spans = texts.map((text, i) => ({ text, line: i + 1, column: 1, offset: i * 100 }));
        const { ours, theirs } = both(spans);
        expect(ours).toEqual(theirs);
      }),
      { numRuns: 500 },
    );
  });
});
