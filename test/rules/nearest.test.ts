import { describe, expect, it } from 'vitest';
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
