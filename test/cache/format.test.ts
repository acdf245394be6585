import { describe, expect, it } from 'vitest';
import { isCacheable, packFacts, shardFileName, shardOfPath, SHARDS, unpackFacts } from '../../src/cache/index.js';
import { handFacts, sourceFile } from './helpers.js';

describe('packFacts / unpackFacts', () => {
  const file = sourceFile('guide/start.md', '# Start here\n\nSome prose about setup.\nMore words follow.\n');
  const facts = handFacts(file);

  it('stores spans as numbers and gives back the same JSON (key order included)', () => {
    const packed = packFacts(facts, file.text);
    expect(packed.spans).toEqual(facts.spans.flatMap((s) => [s.offset, s.text.length, s.line, s.column]));
    expect(JSON.stringify(unpackFacts(JSON.parse(JSON.stringify(packed)), file.text))).toBe(JSON.stringify(facts));
  });

  it('keeps spans as written when a span text is not the source slice at its offset', () => {
    const odd = { ...facts, spans: [{ text: 'not in the source', offset: 0, line: 1, column: 1 }] };
    const packed = packFacts(odd, file.text);
    expect(packed.spans).toEqual(odd.spans);
    expect(JSON.stringify(unpackFacts(packed, file.text))).toBe(JSON.stringify(odd));
  });

  it('keeps spans as written when their keys are in another order', () => {
    const s = facts.spans[0]!;
    const reordered = { ...facts, spans: [{ offset: s.offset, text: s.text, line: s.line, column: s.column }] };
    const packed = packFacts(reordered, file.text);
    expect(JSON.stringify(unpackFacts(packed, file.text))).toBe(JSON.stringify(reordered));
  });

  it('refuses a packed span that reaches past the end of the source', () => {
    const packed = { ...packFacts(facts, file.text), spans: [0, file.text.length + 1, 1, 1] };
    expect(unpackFacts(packed, file.text)).toBeNull();
  });
});

describe('shards', () => {
  it('puts every path in one of the shards, the same one every time', () => {
    const paths = Array.from({ length: 2000 }, (_, i) => `section-${i % 37}/page-${i}.md`);
    const counts = new Array<number>(SHARDS).fill(0);
    for (const p of paths) {
      const s = shardOfPath(p);
      expect(s).toBe(shardOfPath(p));
      counts[s]!++;
    }
    // Spread over all shards (common practice, no source: FNV-1a spreads short keys well).
    expect(Math.min(...counts)).toBeGreaterThan(2000 / SHARDS / 2);
    expect(shardFileName(10)).toBe('facts-a.json');
  });
});

describe('isCacheable', () => {
  it('caches files whose problems follow from their bytes alone', () => {
    expect(isCacheable(sourceFile('a.md', 'x'))).toBe(true);
    expect(isCacheable(sourceFile('a.md', '', [{ code: 'binary', message: 'binary' }]))).toBe(true);
    expect(isCacheable(sourceFile('a.md', 'x\uFFFD', [{ code: 'invalid-utf8', message: 'bad', line: 1, column: 2 }]))).toBe(true);
  });

  it('never caches a file skipped for its size (that depends on maxFileBytes) or unreadable', () => {
    expect(isCacheable(sourceFile('a.md', '', [{ code: 'too-large', message: 'big' }]))).toBe(false);
    expect(isCacheable(sourceFile('a.md', '', [{ code: 'unreadable', message: 'gone' }]))).toBe(false);
  });
});
