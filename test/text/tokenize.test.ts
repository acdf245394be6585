import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import naturalTokenizers from 'natural/lib/natural/tokenizers/regexp_tokenizer.js';
import { createStemCache, forEachWord, isStopWord, stemToken, tokenize, tokenizeWithOffsets } from '../../src/text/tokenize.js';

describe('Porter stemming', () => {
  // Porter, "An algorithm for suffix stripping" (1980), examples of the paper (from memory).
  it.each([
    ['caresses', 'caress'],
    ['ponies', 'poni'],
    ['cats', 'cat'],
    ['motoring', 'motor'],
    ['hopping', 'hop'],
    ['falling', 'fall'],
    ['happy', 'happi'],
    ['generalizations', 'gener'],
  ])('Porter 1980: %s -> %s', (word, stem) => {
    expect(tokenize(word)).toEqual([stem]);
  });

  // More of the paper's step examples, run through all steps (from memory): the final stems.
  it.each([
    ['agreed', 'agre'],
    ['relational', 'relat'],
    ['hopeful', 'hope'],
    ['goodness', 'good'],
    ['adjustment', 'adjust'],
  ])('Porter 1980 (all steps): %s -> %s', (word, stem) => {
    expect(stemToken(word, createStemCache())).toBe(stem);
  });
});

describe('tokenize', () => {
  it('lower-cases, drops natural stop words and stems', () => {
    expect(tokenize('The Cache Server stores the PONIES of a cluster')).toEqual(['cach', 'server', 'store', 'poni', 'cluster']);
  });

  it('drops tokens without a letter and over-long tokens', () => {
    expect(tokenize(`port 8080 ${'x'.repeat(41)} v2`)).toEqual(['port', 'v2']);
  });

  it('knows natural stop words case-insensitively', () => {
    expect(isStopWord('The')).toBe(true);
    expect(isStopWord('cache')).toBe(false);
  });

  it('splits words exactly where natural WordTokenizer does', () => {
    const tokenizer = new naturalTokenizers.WordTokenizer();
    const text = fc.string({ unit: fc.constantFrom('a', 'B', 'é', 'ж', '1', '_', ' ', '-', '.', '\n', "'", 'ß', 'Z') , maxLength: 60 });
    fc.assert(
      fc.property(text, (s) => {
        const ours: string[] = [];
        forEachWord(s, (raw) => ours.push(raw));
        expect(ours).toEqual(tokenizer.tokenize(s));
      }),
      { numRuns: 300 },
    );
  });

  it('splits where natural WordTokenizer does at the edges of its word class', () => {
    // The characters next to each range of [A-Za-zА-Яа-я0-9_]: '/' ':' '@' '[' '`' '{', Ё and ё
    // (outside А-я), and the first and last letter of each range.
    const tokenizer = new naturalTokenizers.WordTokenizer();
    const edges = ['/', '0', '9', ':', '@', 'A', 'Z', '[', '_', '`', 'a', 'z', '{', 'Ё', 'А', 'я', 'ё', ' '];
    const text = fc.string({ unit: fc.constantFrom(...edges), maxLength: 40 });
    fc.assert(
      fc.property(text, (s) => {
        const ours: string[] = [];
        forEachWord(s, (raw) => ours.push(raw));
        expect(ours).toEqual(tokenizer.tokenize(s));
      }),
      { numRuns: 400 },
    );
    const words: string[] = [];
    forEachWord('/09:@AZ[_`az{ЁАяё', (raw) => words.push(raw));
    expect(words).toEqual(['09', 'AZ', '_', 'az', 'Ая']);
  });

  it('gives offsets that slice the word as written', () => {
    const text = 'Configure\tthe  Cache-Server, then restart.';
    const tokens = tokenizeWithOffsets(text);
    expect(tokens.map((t) => t.stem)).toEqual(['configur', 'cach', 'server', 'restart']);
    expect(tokens.map((t) => text.slice(t.start, t.end))).toEqual(['Configure', 'Cache', 'Server', 'restart']);
  });

  it('caches one stem per distinct raw token and gives the same result with or without a cache', () => {
    const cache = createStemCache();
    const text = 'Caching caching CACHING cached';
    expect(tokenize(text, cache)).toEqual(tokenize(text));
    expect([...cache.keys()].sort()).toEqual(['CACHING', 'Caching', 'cached', 'caching']);
  });
});
