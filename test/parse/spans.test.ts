/**
 * Property test (fast-check) over random Markdown built from pieces: every span is exactly the
 * source text at its offset, on one line, at the line/column its offset gives, and never inside
 * code, headings, links, images, HTML or table headers. The words `codeword`, `headword`,
 * `linkword`, `altword`, `htmlword` and `thword` appear only inside those constructs, so no span
 * may hold one (and the body text holds none but link and table-header words).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseSource } from '../../src/parse/index.js';
import { options, sourceFile } from './helpers.js';

const FORBIDDEN = /codeword|headword|linkword|altword|htmlword|thword/i;

const word = fc.constantFrom('alpha', 'beta', 'gamma', 'Delta', 'über', 'naïve', '😀', 'x-y', '1.5', 'a,b', 'end.');
const prose = fc.array(word, { minLength: 1, maxLength: 5 }).map((w) => w.join(' '));

const inline = fc.oneof(
  { weight: 5, arbitrary: prose },
  prose.map((p) => `*${p}*`),
  prose.map((p) => `**${p}**`),
  fc.constant('`codeword alpha`'),
  prose.map((p) => `[linkword ${p}](/to/${p.length}/)`),
  fc.constant('[linkword][ref]'),
  fc.constant('![altword beta](pic.png)'),
  fc.constant('<a href="/raw/">linkword gamma</a>'),
  fc.constant('<code>codeword beta</code>'),
  fc.constant('<https://linkword.example/x>'),
  fc.constant('https://linkword.example/bare'),
  fc.constant('\\*escaped\\*'),
  fc.constant('&amp; ref'),
);
const paragraph = fc.array(inline, { minLength: 1, maxLength: 6 }).map((parts) => parts.join(' '));
const lines = fc.array(paragraph, { minLength: 1, maxLength: 3 }).map((ls) => ls.join('\n'));

const block = fc.oneof(
  { weight: 4, arbitrary: lines },
  fc.tuple(fc.integer({ min: 1, max: 6 }), prose).map(([d, p]) => `${'#'.repeat(d)} headword ${p.replace(/[^a-z ]/gi, '')}`),
  fc.constant('headword setext\n---'),
  fc.constant('```js\ncodeword alpha\nbeta codeword\n```'),
  // (Indented code is left out: after a list item, an indented line continues the item.)
  fc.constant('~~~~\ncodeword tilde\n~~~~'),
  lines.map((p) => p.split('\n').map((l) => `> ${l}`).join('\n')),
  fc.array(paragraph, { minLength: 1, maxLength: 3 }).map((items) => items.map((i) => `- ${i}`).join('\n')),
  fc.array(paragraph, { minLength: 1, maxLength: 3 }).map((items) => items.map((i, n) => `${n + 1}. ${i}`).join('\n')),
  fc.tuple(prose, paragraph).map(([h, c]) => `| thword ${h} |\n|---|\n| ${c.replace(/\|/g, '')} |`),
  fc.constant('<div>\nhtmlword block\n</div>'),
);

const doc = fc.record({
  blocks: fc.array(block, { minLength: 1, maxLength: 8 }),
  eol: fc.constantFrom('\n', '\r\n', '\r'),
  bom: fc.boolean(),
  frontmatter: fc.boolean(),
});

function lineColumn(text: string, offset: number): { line: number; column: number } {
  const before = text.slice(0, offset);
  const breaks = before.match(/\r\n|\r|\n/g) ?? [];
  const lastBreak = Math.max(before.lastIndexOf('\n'), before.lastIndexOf('\r'));
  return { line: breaks.length + 1, column: offset - (lastBreak + 1) + 1 };
}

describe('spans (property test, fast-check)', () => {
  it('are exact source slices on one line, placed right, never inside code, headings, links, images or HTML', () => {
    fc.assert(
      fc.property(doc, ({ blocks, eol, bom, frontmatter }) => {
        const body = [...(frontmatter ? ['---\ntitle: headword\n---'] : []), ...blocks, '[ref]: /ref/'].join('\n\n');
        const text = (bom ? '\uFEFF' : '') + body.replace(/\n/g, eol);
        const facts = parseSource(sourceFile('page.md', text), options());
        const stripped = bom ? text.slice(1) : text;
        for (const s of facts.spans) {
          expect(text.slice(s.offset, s.offset + s.text.length)).toBe(s.text);
          expect(s.text).not.toMatch(/[\r\n]/);
          expect(s.text).not.toMatch(FORBIDDEN);
          expect(s.text).toBe(s.text.trim());
          expect({ line: s.line, column: s.column }).toEqual(lineColumn(stripped, s.offset - (bom ? 1 : 0)));
        }
        for (let i = 1; i < facts.spans.length; i++) expect(facts.spans[i]!.offset).toBeGreaterThan(facts.spans[i - 1]!.offset);
        expect(facts.text.body).not.toMatch(/codeword|headword|altword|htmlword/i);
        expect(facts.problems).toEqual([]);
      }),
      { numRuns: 300, seed: 20240611 },
    );
  });

  it('prose that should give spans does: every plain paragraph word outside markup is in some span', () => {
    fc.assert(
      fc.property(fc.array(prose, { minLength: 1, maxLength: 6 }), (paras) => {
        const text = paras.join('\n\n');
        const facts = parseSource(sourceFile('p.md', text), options());
        expect(facts.spans.map((s) => s.text)).toEqual(paras.map((p) => p.trim()).filter((p) => /[\p{L}\p{N}]/u.test(p)));
      }),
      { numRuns: 100, seed: 7 },
    );
  });
});
