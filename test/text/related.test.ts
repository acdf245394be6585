import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { buildTermIndex } from '../../src/text/tfidf.js';
import { relatedPages, relatedPagesWithStats, maxRelatingDf } from '../../src/text/related.js';
import { relatedPagesBruteForce } from '../../src/text/brute.js';
import type { PageText } from '../../src/types.js';

const VOCAB = ['cache', 'server', 'token', 'route', 'graph', 'anchor', 'stem', 'index', 'queue', 'shard', 'lease', 'quorum'];

/** Random corpora with a small vocabulary: many shared terms, duplicate pages, exact ties. */
const corpus = fc.array(
  fc.record({
    title: fc.array(fc.constantFrom(...VOCAB), { maxLength: 2 }),
    body: fc.array(fc.constantFrom(...VOCAB), { maxLength: 12 }),
    copies: fc.integer({ min: 1, max: 3 }),
  }),
  { minLength: 1, maxLength: 14 },
);

function texts(docs: { title: string[]; body: string[]; copies: number }[]): PageText[] {
  return docs.flatMap((d) => Array.from({ length: d.copies }, () => ({ title: d.title.join(' '), headings: '', body: d.body.join(' ') })));
}

describe('relatedPages', () => {
  it('equals brute-force all-pairs top-k on random corpora, ties included', () => {
    fc.assert(
      fc.property(corpus, fc.integer({ min: 1, max: 6 }), (docs, k) => {
        const index = buildTermIndex(texts(docs));
        expect(relatedPages(index, k)).toEqual(relatedPagesBruteForce(index, k));
      }),
      { numRuns: 200 },
    );
  });

  it('equals brute force on random Zipf-like corpora large enough for the bounds to cut', () => {
    fc.assert(
      fc.property(fc.integer({ min: 20, max: 150 }), fc.integer({ min: 1, max: 12 }), fc.integer(), fc.double({ min: 1, max: 4, noNaN: true }), (pages, k, seed, power) => {
        let s = seed >>> 0;
        const next = (): number => {
          s = (Math.imul(s, 1103515245) + 12345) >>> 0;
          return s / 2 ** 32;
        };
        const docs: PageText[] = [];
        for (let p = 0; p < pages; p++) {
          const words: string[] = [];
          const length = 1 + Math.floor(next() * 30);
          for (let i = 0; i < length; i++) words.push(`v${String.fromCharCode(97 + Math.floor(26 * next() ** power))}${String.fromCharCode(97 + Math.floor(next() * 8))}`);
          docs.push({ title: '', headings: '', body: words.join(' ') });
        }
        const index = buildTermIndex(docs);
        expect(relatedPages(index, k)).toEqual(relatedPagesBruteForce(index, k));
      }),
      { numRuns: 60 },
    );
  });

  it('breaks ties by page id', () => {
    // Pages 1, 2 and 3 are identical, so page 0 is exactly as similar to each of them.
    const index = buildTermIndex([
      { title: '', headings: '', body: 'cache server' },
      { title: '', headings: '', body: 'cache lease' },
      { title: '', headings: '', body: 'cache lease' },
      { title: '', headings: '', body: 'cache lease' },
      { title: '', headings: '', body: 'quorum shard' },
      { title: '', headings: '', body: 'quorum shard' },
      { title: '', headings: '', body: 'route graph' },
      { title: '', headings: '', body: 'route graph' },
    ]);
    const list = relatedPages(index, 2)[0]!.related;
    expect(list.map((r) => r.page)).toEqual([1, 2]);
    expect(list[0]!.similarity).toBe(list[1]!.similarity);
  });

  it('relates pages only through terms with 2 <= df <= N/2', () => {
    expect(maxRelatingDf(3)).toBe(2);
    expect(maxRelatingDf(10)).toBe(5);
    // "cache" is on 3 of 4 pages (df > N/2): it relates nothing; "lease" (df 2) relates pages 0 and 1.
    const index = buildTermIndex([
      { title: '', headings: '', body: 'cache lease' },
      { title: '', headings: '', body: 'cache lease' },
      { title: '', headings: '', body: 'cache' },
      { title: '', headings: '', body: 'quorum' },
    ]);
    const lists = relatedPages(index, 5);
    expect(lists[0]!.related.map((r) => r.page)).toEqual([1]);
    expect(lists[2]!.related).toEqual([]);
  });

  it('skips long postings on a larger corpus and still equals brute force', () => {
    // 240 pages in 12 topics: each page has 4 words of its topic and 8 shared words, so every
    // pair shares terms and only the pruning keeps the work below all pairs.
    let seed = 12345;
    const next = (): number => {
      seed = (Math.imul(seed, 1103515245) + 12345) >>> 0;
      return seed / 2 ** 32;
    };
    const shared = Array.from({ length: 30 }, (_, i) => `shared${String.fromCharCode(97 + (i % 26))}${String.fromCharCode(97 + Math.floor(i / 26))}`);
    const pages: PageText[] = [];
    for (let p = 0; p < 240; p++) {
      const topic = p % 12;
      const words: string[] = [];
      for (let i = 0; i < 4; i++) words.push(`topic${String.fromCharCode(97 + topic)}word${String.fromCharCode(97 + Math.floor(next() * 6))}`);
      for (let i = 0; i < 8; i++) words.push(shared[Math.floor(next() * shared.length)]!);
      pages.push({ title: '', headings: '', body: words.join(' ') });
    }
    const index = buildTermIndex(pages);
    const result = relatedPagesWithStats(index, 10);
    expect(result.lists).toEqual(relatedPagesBruteForce(index, 10));
    // Exact scores for a small share of the pairs; reading plus scoring costs about as much as
    // reading every posting once (the whole inverted index), never the all-pairs merge.
    expect(result.pagesScored).toBeLessThan(0.1 * 240 * 239);
    expect(result.postingsRead + result.entriesScored).toBeLessThan(1.5 * (result.postingsRead + result.postingsSkipped));
  });

  it('stays well below all pairs when a large shared vocabulary relates every pair, and equals brute force', () => {
    // 600 pages in 20 topics: 6 words of the page's topic and 40 drawn from 2,000 shared words
    // with a Zipf-like popularity (index = floor(2000 u^3)), as in real prose: hundreds of terms
    // are on 1-50% of the pages, so every pair of pages shares relating terms.
    let seed = 777;
    const next = (): number => {
      seed = (Math.imul(seed, 1103515245) + 12345) >>> 0;
      return seed / 2 ** 32;
    };
    const word = (i: number): string => `w${i.toString(36).replace(/[0-9]/g, (d) => 'qrstuvwxyz'[Number(d)]!)}x`;
    const pages: PageText[] = [];
    for (let p = 0; p < 600; p++) {
      const words: string[] = [];
      for (let i = 0; i < 6; i++) words.push(`topic${String.fromCharCode(97 + (p % 20))}k${String.fromCharCode(97 + Math.floor(next() * 10))}`);
      for (let i = 0; i < 40; i++) words.push(word(Math.floor(2000 * next() ** 3)));
      pages.push({ title: '', headings: '', body: words.join(' ') });
    }
    const index = buildTermIndex(pages);
    const result = relatedPagesWithStats(index, 10);
    expect(result.lists).toEqual(relatedPagesBruteForce(index, 10));
    const allPostings = result.postingsRead + result.postingsSkipped;
    expect(result.pagesScored).toBeLessThan(0.05 * 600 * 599);
    expect(result.postingsRead + result.entriesScored).toBeLessThan(1.5 * allPostings);
  });

  it('lists nothing for k = 0 and for pages without relating terms', () => {
    const index = buildTermIndex([
      { title: '', headings: '', body: 'cache' },
      { title: '', headings: '', body: 'cache' },
      { title: '', headings: '', body: 'the of' },
    ]);
    expect(relatedPages(index, 0).map((l) => l.related)).toEqual([[], [], []]);
    expect(relatedPages(index, 3)[2]!.related).toEqual([]);
  });
});
