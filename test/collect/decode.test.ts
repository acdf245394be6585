import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { decodeSource, firstInvalidUtf8, positionOfByte } from '../../src/collect/index.js';

const bytes = (...b: number[]) => new Uint8Array(b);
const cat = (...parts: (string | number[])[]) =>
  new Uint8Array(Buffer.concat(parts.map((p) => (typeof p === 'string' ? Buffer.from(p, 'utf8') : Buffer.from(p)))));

describe('firstInvalidUtf8', () => {
  // Ill-formed sequences from the Unicode Standard, Table 3-7 "Well-Formed UTF-8 Byte
  // Sequences" and the surrounding text (from memory): overlong forms, surrogates, > U+10FFFF,
  // stray continuation bytes, truncated sequences.
  it.each([
    ['overlong 2-byte C0 80', 1, [0x61, 0xc0, 0x80]],
    ['overlong 3-byte E0 80 80', 0, [0xe0, 0x80, 0x80]],
    ['surrogate ED A0 80', 2, [0x62, 0x62, 0xed, 0xa0, 0x80]],
    ['beyond U+10FFFF F4 90 80 80', 0, [0xf4, 0x90, 0x80, 0x80]],
    ['F5 lead byte', 0, [0xf5, 0x80, 0x80, 0x80]],
    ['stray continuation 80', 1, [0x41, 0x80]],
    ['truncated E2 82 at the end', 1, [0x41, 0xe2, 0x82]],
    ['truncated C3 before ASCII', 0, [0xc3, 0x28]],
  ])('%s -> offset %i', (_name, offset, input) => {
    expect(firstInvalidUtf8(new Uint8Array(input))).toBe(offset);
  });

  it.each([
    ['ASCII', 'plain'],
    ['2-byte é', 'é'],
    ['3-byte €', '€'],
    ['4-byte 😀', '😀'],
    ['U+FFFD itself', '\uFFFD'],
    ['edges U+D7FF U+E000 U+10FFFF', '\uD7FF\uE000\u{10FFFF}'],
  ])('well-formed %s -> -1', (_name, text) => {
    expect(firstInvalidUtf8(new Uint8Array(Buffer.from(text, 'utf8')))).toBe(-1);
  });

  // Reference: the WHATWG Encoding Standard's UTF-8 decoder as implemented by TextDecoder with
  // fatal: true (throws on the first error); with replacement, the first U+FFFD sits right after
  // the well-formed prefix.
  it('agrees with the WHATWG UTF-8 decoder on random bytes', () => {
    const fatal = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true });
    const lenient = new TextDecoder('utf-8', { ignoreBOM: true });
    fc.assert(
      fc.property(
        fc.array(fc.oneof(fc.integer({ min: 0, max: 255 }), fc.integer({ min: 0x80, max: 0xf4 })), { maxLength: 40 }),
        (arr) => {
          const input = new Uint8Array(arr);
          const bad = firstInvalidUtf8(input);
          let valid = true;
          try {
            fatal.decode(input);
          } catch {
            valid = false;
          }
          expect(bad === -1).toBe(valid);
          if (bad >= 0) {
            const prefix = lenient.decode(input.subarray(0, bad));
            expect(prefix.includes('\uFFFD')).toBe(false);
            expect(lenient.decode(input).indexOf('\uFFFD')).toBe(prefix.length);
          }
        },
      ),
      { numRuns: 2000, seed: 7 },
    );
  });
});

describe('positionOfByte', () => {
  it('counts LF, CRLF and lone CR as one line ending each', () => {
    const b = cat('a\nb\r\nc\rd', [0xff]);
    expect(positionOfByte(b, b.length - 1)).toEqual({ line: 4, column: 2 });
  });

  it('counts columns in UTF-16 code units of the decoded text', () => {
    const b = cat('x😀é', [0xff]);
    // 'x' (1) + '😀' (2) + 'é' (1) = 4 units before the bad byte.
    expect(positionOfByte(b, b.length - 1)).toEqual({ line: 1, column: 5 });
  });

  it('does not count a BOM on the first line', () => {
    const b = cat([0xef, 0xbb, 0xbf], 'ab', [0xff]);
    expect(positionOfByte(b, 5)).toEqual({ line: 1, column: 3 });
  });
});

describe('decodeSource', () => {
  it('removes a BOM and keeps CRLF', () => {
    expect(decodeSource(cat([0xef, 0xbb, 0xbf], '# T\r\nx'))).toEqual({ text: '# T\r\nx', problems: [] });
  });

  it('keeps a second BOM-like sequence that is not at the start', () => {
    expect(decodeSource(cat('a', [0xef, 0xbb, 0xbf])).text).toBe('a\uFEFF');
  });

  it('marks a NUL byte in the first 8 KiB as binary', () => {
    const result = decodeSource(cat('GIF89a', [0, 1, 2]));
    expect(result.text).toBe('');
    expect(result.problems).toMatchObject([{ code: 'binary' }]);
  });

  it('a NUL byte after the first 8 KiB is not a binary marker', () => {
    const result = decodeSource(cat('a'.repeat(8192), [0]));
    expect(result.problems).toEqual([]);
    expect(result.text).toHaveLength(8193);
  });

  it('reports the first invalid byte with line and column and replaces it', () => {
    const result = decodeSource(cat('ok\n  ', [0xe2, 0x82], ' and ', [0xff]));
    expect(result.text).toBe('ok\n  \uFFFD and \uFFFD');
    expect(result.problems).toMatchObject([{ code: 'invalid-utf8', line: 2, column: 3 }]);
    expect(result.problems[0]!.message).toContain('line 2, column 3');
  });

  it('a literal U+FFFD in valid UTF-8 is not a problem', () => {
    expect(decodeSource(bytes(0xef, 0xbf, 0xbd)).problems).toEqual([]);
  });

  it('an empty file decodes to empty text without problems', () => {
    expect(decodeSource(new Uint8Array(0))).toEqual({ text: '', problems: [] });
  });
});
