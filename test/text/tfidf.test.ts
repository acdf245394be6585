import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { tokenize } from '../../src/text/tokenize.js';
import { buildTermIndex, cosine, inverseDocumentFrequency, termFrequency, termLeaders, topTerms } from '../../src/text/tfidf.js';
import type { PageText } from '../../src/types.js';

const page = (body: string, title = '', headings = ''): PageText => ({ title, headings, body });

describe('idf', () => {
  // Manning, Raghavan and Schuetze, "Introduction to Information Retrieval" (2008), section 6.2.1:
  // Reuters-RCV1, N = 806,791, idf = log10(N / df). (from memory; each value re-computed from the formula)
  const N = 806_791;
  const published: [string, number, number][] = [
    ['car', 18_165, 1.65],
    ['auto', 6_723, 2.08],
    ['insurance', 19_241, 1.62],
    ['best', 25_235, 1.5],
  ];

  it.each(published)('MRS 6.2.1: the smoothed idf of %s is ln(10) x the published idf + 1', (_term, df, idf) => {
    // ln((1+N)/(1+df)) + 1 differs from ln(10) * log10(N/df) + 1 only by the +1 smoothing (< 1e-4 here)
    // and the rounding of the published figure (at most 0.005 in log10 units).
    expect(Math.abs(inverseDocumentFrequency(N, df) - (Math.LN10 * idf + 1))).toBeLessThan(Math.LN10 * 0.005 + 1e-4);
  });

  it('the smoothed variant against hand-computed values', () => {
    // N = 4: df 1 -> ln(5/2) + 1; df 2 -> ln(5/3) + 1; df 4 -> ln(1) + 1 = 1
    expect(inverseDocumentFrequency(4, 1)).toBeCloseTo(1.916290731874155, 12);
    expect(inverseDocumentFrequency(4, 2)).toBeCloseTo(1.5108256237659907, 12);
    expect(inverseDocumentFrequency(4, 4)).toBe(1);
  });

  it('sublinear tf: 1 + ln(count)', () => {
    expect(termFrequency(1)).toBe(1);
    expect(termFrequency(Math.E)).toBeCloseTo(2, 12);
    expect(termFrequency(0)).toBe(0);
  });
});

describe('buildTermIndex', () => {
  // Hand-computed three-page corpus (N = 3):
  //   page 0: title "Cache", body "cache server"  -> cach: 3 (title) + 1 = 4, server: 1
  //   page 1: body "server logs"                   -> server: 1, log: 1
  //   page 2: heading "Logs", body "rotate"        -> log: 2 (heading), rotat: 1
  const index = buildTermIndex([page('cache server', 'Cache'), page('server logs'), page('rotate', '', 'Logs')]);

  it('sorts terms and counts document frequency', () => {
    expect(index.terms).toEqual(['cach', 'log', 'rotat', 'server']);
    expect([...index.df]).toEqual([1, 2, 1, 2]);
    expect([...index.docOffsets]).toEqual([0, 2, 4, 6]);
    expect([...index.docTerms]).toEqual([0, 3, 1, 3, 1, 2]);
  });

  it('weights = (1 + ln count) x (ln((1+N)/(1+df)) + 1), L2-normalised', () => {
    const idf1 = Math.log(4 / 2) + 1;
    const idf2 = Math.log(4 / 3) + 1;
    const row = (...w: number[]): number[] => {
      const norm = Math.hypot(...w);
      return w.map((x) => x / norm);
    };
    const expected = [
      ...row((1 + Math.log(4)) * idf1, 1 * idf2), // page 0: cach, server
      ...row(1 * idf2, 1 * idf2), // page 1: log, server
      ...row((1 + Math.log(2)) * idf2, 1 * idf1), // page 2: log, rotat
    ];
    [...index.docWeights].forEach((w, i) => expect(w).toBeCloseTo(expected[i]!, 6));
  });

  it('key terms: heaviest first', () => {
    expect(topTerms(index, 0, 1).map((t) => index.terms[t])).toEqual(['cach']);
    expect(topTerms(index, 2, 2).map((t) => index.terms[t])).toEqual(['log', 'rotat']);
  });

  it('keeps an empty row for a page without terms', () => {
    const empty = buildTermIndex([page('the and of'), page('cache')]);
    expect([...empty.docOffsets]).toEqual([0, 0, 1]);
    expect(cosine(empty, 0, 1)).toBe(0);
  });

  it('does not depend on the order in which terms first appear', () => {
    const a = buildTermIndex([page('zebra apple'), page('apple mango')]);
    const b = buildTermIndex([page('apple zebra'), page('mango apple')]);
    expect(a).toEqual(b);
  });
});

describe('cosine', () => {
  // Cosine of L2-normalised vectors: identical documents 1, no shared term 0 (common practice, no source).
  const index = buildTermIndex([
    page('graph ranking with damping', 'PageRank'),
    page('graph ranking with damping', 'PageRank'),
    page('tokenizer stemming stop words'),
  ]);

  it('is 1 for identical documents', () => {
    expect(cosine(index, 0, 1)).toBeCloseTo(1, 6);
  });

  it('is 0 for documents with no shared term', () => {
    expect(cosine(index, 0, 2)).toBe(0);
  });
});

describe('termLeaders', () => {
  it('lists the pages where each term weighs most, ties by page id', () => {
    const index = buildTermIndex([page('lease lease quorum'), page('lease quorum'), page('quorum lease'), page('shard')]);
    const leaders = termLeaders(index, 2);
    const of = (term: string): number[] => {
      const t = index.terms.indexOf(term);
      return [...leaders.subarray(t * 2, t * 2 + 2)];
    };
    expect(of('leas')).toEqual([0, 1]); // page 0 says it twice; pages 1 and 2 tie, 1 comes first
    expect(of('shard')).toEqual([3, -1]);
  });
});

describe('buildTermIndex against tokenize', () => {
  // The index scans words with its own loop; it must see exactly what `tokenize` sees.
  const unit = fc.constantFrom('a', 'b', 'c', 'ing', 'é', 'ж', 'Ё', 'ё', 'Q', '1', '_', ' ', '-', '\n', '.', 'the', 'cache', 'ponies');
  const text = fc.array(unit, { maxLength: 30 }).map((parts) => parts.join(''));
  const pageArb = fc.record({ title: text, headings: text, body: text });

  it('gives the terms, document frequencies and weights that tokenize implies', () => {
    fc.assert(
      fc.property(fc.array(pageArb, { minLength: 1, maxLength: 6 }), (pages) => {
        const index = buildTermIndex(pages);
        const counts = pages.map((p) => {
          const c = new Map<string, number>();
          for (const [field, boost] of [[p.title, 3], [p.headings, 2], [p.body, 1]] as const) {
            for (const stem of tokenize(field)) c.set(stem, (c.get(stem) ?? 0) + boost);
          }
          return c;
        });
        const terms = [...new Set(counts.flatMap((c) => [...c.keys()]))].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
        expect(index.terms).toEqual(terms);
        const df = terms.map((t) => counts.filter((c) => c.has(t)).length);
        expect([...index.df]).toEqual(df);
        counts.forEach((c, d) => {
          const raw = [...c].map(([t, k]) => [t, termFrequency(k) * inverseDocumentFrequency(pages.length, df[terms.indexOf(t)]!)] as const);
          const norm = Math.hypot(...raw.map(([, w]) => w));
          const expected = new Map(raw.map(([t, w]) => [t, w / norm]));
          for (let e = index.docOffsets[d]!; e < index.docOffsets[d + 1]!; e++) {
            expect(index.docWeights[e]).toBeCloseTo(expected.get(index.terms[index.docTerms[e]!]!)!, 6);
          }
          expect(index.docOffsets[d + 1]! - index.docOffsets[d]!).toBe(c.size);
        });
      }),
      { numRuns: 200 },
    );
  });
});
