import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { boundedDistance, nearest } from '../../src/rules/index.js';

describe('boundedDistance', () => {
  // Levenshtein's textbook pair: kitten -> sitting takes 3 edits (common practice, no source).
  it.each([
    ['kitten', 'sitting', 10, 3],
    ['', 'abc', 10, 3],
    ['flaw', 'lawn', 10, 2],
    ['same', 'same', 0, 0],
    ['/guide/instal/', '/guide/install/', 4, 1],
  ])('%s -> %s within %i is %i', (a, b, max, d) => {
    expect(boundedDistance(a, b, max)).toBe(d);
    expect(boundedDistance(b, a, max)).toBe(d);
  });
  it('returns max + 1 past the bound, on length alone or mid-way', () => {
    expect(boundedDistance('a', 'abcdef', 2)).toBe(3);
    expect(boundedDistance('kitten', 'sitting', 2)).toBe(3);
  });
});

describe('nearest', () => {
  it('offers the closest route and breaks ties by sort order', () => {
    expect(nearest('/guide/instal/', ['/guide/', '/guide/install/', '/guide/uninstall/'])).toBe('/guide/install/');
    expect(nearest('/b/', ['/c/', '/a/'])).toBe('/a/');
  });
  it('offers nothing when all candidates are far, and never the word itself', () => {
    expect(nearest('/reference/cli/', ['/', '/guide/'])).toBeNull();
    expect(nearest('/a/', ['/a/'])).toBeNull();
  });
});

describe('boundedDistance against the full table (property, fast-check)', () => {
  /** The textbook dynamic programme over the whole table, no band, no early exit. */
  function full(a: string, b: string): number {
    const d = Array.from({ length: a.length + 1 }, (_, i) => Array.from({ length: b.length + 1 }, (_, j) => (i === 0 ? j : j === 0 ? i : 0)));
    for (let i = 1; i <= a.length; i++) {
      for (let j = 1; j <= b.length; j++) {
        d[i]![j] = Math.min(d[i - 1]![j]! + 1, d[i]![j - 1]! + 1, d[i - 1]![j - 1]! + (a[i - 1] === b[j - 1] ? 0 : 1));
      }
    }
    return d[a.length]![b.length]!;
  }
  it('is min(distance, max + 1) for any strings and bound', () => {
    const text = fc.string({ unit: fc.constantFrom('a', 'b', 'c', '/'), maxLength: 14 });
    fc.assert(
      fc.property(text, text, fc.integer({ min: 0, max: 6 }), (a, b, max) => {
        expect(boundedDistance(a, b, max)).toBe(Math.min(full(a, b), max + 1));
      }),
      { numRuns: 2000 },
    );
  });
});
