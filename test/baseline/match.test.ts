import { describe, expect, it } from 'vitest';
import { findingKey, matchFindings } from '../../src/baseline/index.js';
import type { Finding } from '../../src/types.js';

const broken = (line: number, over: Partial<Finding> = {}): Finding => ({
  rule: 'broken-link',
  severity: 'error',
  file: 'guide/index.md',
  line,
  column: 5,
  route: '/guide/',
  message: 'Broken link: no source file guide/old.md; fix or remove the link',
  target: 'guide/old.md',
  ...over,
});

const orphan = (route: string): Finding => ({
  rule: 'orphan-page',
  severity: 'error',
  file: `${route.slice(1, -1)}.md`,
  line: 1,
  column: 1,
  route,
  message: `No page links to ${route}; link it from /`,
});

describe('findingKey', () => {
  it('is rule, route and target: not file, line, column, message or severity', () => {
    const a = broken(3);
    const b = broken(40, { column: 1, message: 'reworded', severity: 'warning', file: 'guide/README.md' });
    expect(findingKey(a)).toBe(findingKey(b));
    expect(findingKey(a)).not.toBe(findingKey(broken(3, { target: 'guide/other.md' })));
    expect(findingKey(a)).not.toBe(findingKey(broken(3, { route: '/other/' })));
    expect(findingKey(a)).not.toBe(findingKey(broken(3, { rule: 'broken-fragment' })));
    // No target and an empty target are the same key; a target never runs into the route.
    expect(findingKey({ rule: 'r', route: '/a/', target: '' })).toBe(findingKey({ rule: 'r', route: '/a/' }));
    expect(findingKey({ rule: 'r', route: '/a', target: 'b' })).not.toBe(findingKey({ rule: 'r', route: '/ab' }));
  });
});

describe('matchFindings', () => {
  it('a line inserted above a finding keeps it known', () => {
    const m = matchFindings([broken(4)], [broken(3)]);
    expect(m).toEqual({ known: [broken(4)], new: [], fixed: [] });
  });

  it('counts multiplicity: two identical broken links, one fixed -> one known, one fixed', () => {
    const m = matchFindings([broken(12)], [broken(3), broken(12)]);
    expect(m.known).toEqual([broken(12)]);
    expect(m.new).toEqual([]);
    // The one at the same place is the one kept; the other is the fixed one.
    expect(m.fixed).toEqual([broken(3)]);
  });

  it('a second identical broken link is new, the first stays known', () => {
    const m = matchFindings([broken(3), broken(9)], [broken(3)]);
    expect(m.known).toEqual([broken(3)]);
    expect(m.new).toEqual([broken(9)]);
    expect(m.fixed).toEqual([]);
  });

  it('with every line shifted, pairs in order', () => {
    const m = matchFindings([broken(5), broken(11)], [broken(3), broken(9), broken(20)]);
    expect(m.known).toEqual([broken(5), broken(11)]);
    expect(m.fixed).toEqual([broken(20)]);
  });

  it('new and fixed pages by route; output sorted as the report sorts findings', () => {
    const m = matchFindings([orphan('/b/'), orphan('/a/'), broken(2)], [orphan('/c/'), broken(2)]);
    expect(m.new.map((f) => f.route)).toEqual(['/a/', '/b/']);
    expect(m.fixed.map((f) => f.route)).toEqual(['/c/']);
    expect(m.known).toEqual([broken(2)]);
  });

  it('empty sides', () => {
    expect(matchFindings([], [])).toEqual({ known: [], new: [], fixed: [] });
    expect(matchFindings([broken(1)], []).new).toEqual([broken(1)]);
    expect(matchFindings([], [broken(1)]).fixed).toEqual([broken(1)]);
  });
});

describe('matchFindings on a large site', () => {
  it('pairs 150,000 repeats of one key by count (no spread of that length, which overflows the stack)', () => {
    const then = Array.from({ length: 150_000 }, (_, i) => broken(i + 1));
    const now = Array.from({ length: 150_001 }, (_, i) => broken(i + 2));
    const result = matchFindings(now, then);
    expect(result.known).toHaveLength(150_000);
    expect(result.new).toHaveLength(1);
    expect(result.fixed).toHaveLength(0);
  });
});
