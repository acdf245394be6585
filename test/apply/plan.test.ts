/**
 * Planning edits on random documents through the real parse stage: nothing but the link markup
 * changes (removing it gives back the original bytes, BOM, CRLF and non-ASCII text included),
 * and re-parsing the edited file shows each link with its anchor text at its line and column.
 */
import { createHash } from 'node:crypto';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { encodeText, hadBom, planFile } from '../../src/apply/index.js';
import type { AppliedLink, PlanInput } from '../../src/apply/index.js';
import { decodeSource } from '../../src/collect/index.js';
import { DEFAULT_OPTIONS } from '../../src/config/options.js';
import { parseSource } from '../../src/parse/index.js';
import type { FileKind, SourceFile, Suggestion } from '../../src/types.js';

const options = { ...DEFAULT_OPTIONS, root: '/site' };
const BOM = Uint8Array.of(0xef, 0xbb, 0xbf);

const word = fc.constantFrom('tide', 'gauge', 'calibration', 'buoy', 'mooring', 'sensor', 'Grüße', 'naïve', 'café', '日本語', 'señal', 'ölçüm', 'wave🌊', 'Ångström', 'réglage,', 'end.');
const sentence = fc.array(word, { minLength: 1, maxLength: 7 }).map((w) => w.join(' '));

const mdInline = fc.oneof(
  { weight: 4, arbitrary: sentence },
  fc.constant('`code span`'),
  word.map((w) => `*${w}*`),
  sentence.map((s) => `**${s}**`),
  word.map((w) => `[${w}](/elsewhere/)`),
);
const mdParagraph = fc.array(fc.tuple(mdInline, fc.boolean()), { minLength: 1, maxLength: 5 }).map((parts) =>
  parts.map(([p, br], i) => (i === 0 ? p : `${br ? '\n' : ' '}${p}`)).join(''),
);
const mdBlock = fc.oneof(
  { weight: 4, arbitrary: mdParagraph },
  sentence.map((s) => `## ${s}`),
  fc.array(sentence, { minLength: 1, maxLength: 3 }).map((items) => items.map((i) => `- ${i}`).join('\n')),
  sentence.map((s) => `> ${s}`),
  sentence.map((s) => '```\n' + s + '\n```'),
  fc.tuple(sentence, sentence).map(([a, b]) => `| Name | Note |\n| --- | --- |\n| ${a} | ${b} |`),
);
const markdownDoc = fc.array(mdBlock, { minLength: 1, maxLength: 6 }).map((blocks) => `# Page\n\n${blocks.join('\n\n')}\n`);

const htmlInline = fc.oneof(
  { weight: 4, arbitrary: sentence },
  word.map((w) => `<em>${w}</em>`),
  sentence.map((s) => `<strong>${s}</strong>`),
  word.map((w) => `<a href="/elsewhere/">${w}</a>`),
  word.map((w) => `<code>${w}</code>`),
);
const htmlBlock = fc.oneof(
  { weight: 4, arbitrary: fc.array(htmlInline, { minLength: 1, maxLength: 5 }).map((p) => `<p>${p.join(' ')}</p>`) },
  sentence.map((s) => `<h2>${s}</h2>`),
  fc.array(sentence, { minLength: 1, maxLength: 3 }).map((items) => `<ul>\n${items.map((i) => `  <li>${i}</li>`).join('\n')}\n</ul>`),
  sentence.map((s) => `<pre><code>${s}</code></pre>`),
  sentence.map((s) => `<nav><a href="/">${s}</a></nav>`),
  sentence.map((s) => `<blockquote>${s}</blockquote>`),
);
const htmlDoc = fc
  .tuple(sentence, fc.array(htmlBlock, { minLength: 1, maxLength: 6 }))
  .map(([title, blocks]) => `<!DOCTYPE html>\n<html lang="de">\n<head><meta charset="utf-8"><title>${title}</title></head>\n<body>\n${blocks.join('\n')}\n</body>\n</html>\n`);

/** A document as bytes, with LF or CRLF line endings and with or without a BOM. */
const bytesOf = (doc: string, crlf: boolean, bom: boolean): Uint8Array => {
  const body = new TextEncoder().encode(crlf ? doc.replace(/\n/g, '\r\n') : doc);
  return bom ? new Uint8Array([...BOM, ...body]) : body;
};

/** The file as collect reads it. */
function sourceFile(path: string, kind: FileKind, bytes: Uint8Array): SourceFile {
  return { path, kind, bytes: bytes.length, hash: createHash('sha256').update(bytes).digest('hex'), ...decodeSource(bytes) };
}

/** Word-aligned anchors picked from the parse stage's spans, as the suggest stage picks them. */
function anchors(file: SourceFile, picks: readonly [number, number, number][]): Suggestion[] {
  const spans = parseSource(file, options).spans;
  if (spans.length === 0) return [];
  return picks.flatMap(([si, wi, len], n) => {
    const span = spans[si % spans.length]!;
    const words = [...span.text.matchAll(/\S+/g)];
    if (words.length === 0) return [];
    const first = words[wi % words.length]!;
    const last = words[Math.min(words.length - 1, (wi % words.length) + (len % 3))]!;
    const offset = span.offset + first.index;
    const endOffset = span.offset + last.index + last[0].length;
    return [suggestion(`s${n}`, file, offset, endOffset)];
  });
}

function suggestion(id: string, file: SourceFile, offset: number, endOffset: number, over: Partial<Suggestion> = {}): Suggestion {
  const before = file.text.slice(0, offset).split(/\r\n|\r|\n/);
  return {
    id,
    source: '/page/',
    target: `/target-${id}/`,
    file: file.path,
    line: before.length,
    column: before[before.length - 1]!.length + 1,
    offset,
    endOffset,
    anchor: file.text.slice(offset, endOffset),
    similarity: 0.5,
    score: 0.5,
    targetRankBefore: 0.5,
    targetRankAfter: 1,
    depthBefore: 4,
    depthAfter: 2,
    reason: '',
    sourceHash: file.hash,
    ...over,
  };
}

const hrefsOf = (list: readonly Suggestion[]) => new Map(list.map((s) => [s.id, `/target-${s.id}/`]));

/** Remove exactly the inserted markup again (checking it is there), last link first. */
function unapply(text: string, applied: readonly AppliedLink[]): string {
  let out = text;
  for (const a of [...applied].sort((x, y) => y.offset - x.offset)) {
    const anchorAt = a.offset + a.open.length;
    const closeAt = anchorAt + a.anchor.length;
    expect(out.slice(a.offset, anchorAt)).toBe(a.open);
    expect(out.slice(anchorAt, closeAt)).toBe(a.anchor);
    expect(out.slice(closeAt, closeAt + a.close.length)).toBe(a.close);
    out = out.slice(0, a.offset) + a.anchor + out.slice(closeAt + a.close.length);
  }
  return out;
}

const squash = (s: string) => s.replace(/\s+/g, ' ').trim();

/** `planFile` with the regions and links of the file as read now, as `applySuggestions` passes them. */
const planNow = (input: Omit<PlanInput, 'regions' | 'links'>) => {
  const now = parseSource(input.file, options);
  return planFile({ ...input, regions: now.protected, links: now.links });
};

function checkProperty(kind: FileKind, doc: fc.Arbitrary<string>, path: string) {
  let applied = 0;
  fc.assert(
    fc.property(doc, fc.boolean(), fc.boolean(), fc.array(fc.tuple(fc.nat(), fc.nat(), fc.nat()), { minLength: 1, maxLength: 3 }), (text, crlf, bom, picks) => {
      const original = bytesOf(text, crlf, bom);
      const file = sourceFile(path, kind, original);
      const chosen = anchors(file, picks);
      const plan = planNow({ file, suggestions: chosen, hrefs: hrefsOf(chosen), style: 'absolute', options });
      // Every suggestion is applied or refused; only overlaps are refused here.
      expect(plan.applied.length + plan.refused.length).toBe(chosen.length);
      for (const r of plan.refused) expect(r.reason).toMatch(/overlaps/);
      // Byte preservation: without the markup, the bytes are the original ones exactly.
      const out = encodeText(plan.after, hadBom(file));
      expect(hadBom(file)).toBe(bom);
      expect(encodeText(unapply(plan.after, plan.applied), hadBom(file))).toEqual(original);
      expect(out.length - original.length).toBe(
        plan.applied.reduce((n, a) => n + new TextEncoder().encode(a.open + a.close).length, 0),
      );
      // Re-parsed, each link is there: its href, its anchor text, at its line and column.
      const links = parseSource(sourceFile(path, kind, out), options).links;
      for (const a of plan.applied) {
        const found = links.filter((l) => l.href === a.href);
        expect(found).toHaveLength(1);
        expect(found[0]).toMatchObject({ line: a.line, column: a.column });
        expect(squash(found[0]!.text)).toBe(squash(a.anchor));
      }
      // A single link sits where the suggestion said.
      if (chosen.length === 1 && plan.applied.length === 1) {
        expect([plan.applied[0]!.line, plan.applied[0]!.column]).toEqual([chosen[0]!.line, chosen[0]!.column]);
      }
      applied += plan.applied.length;
    }),
    { numRuns: 120 },
  );
  expect(applied).toBeGreaterThan(60);
}

describe('planFile on random documents', () => {
  it('Markdown: only the link markup is inserted, and it reads back as the link (LF/CRLF, BOM, non-ASCII)', () => {
    checkProperty('markdown', markdownDoc, 'guide/page.md');
  });

  it('HTML: only the <a> markup is inserted, and it reads back as the link (LF/CRLF, BOM, non-ASCII)', () => {
    checkProperty('html', htmlDoc, 'legacy/page.html');
  });
});

describe('planFile refusals', () => {
  const text = '# Tides\r\n\r\nThe tide gauge and the wave buoy report every minute.\r\n';
  const file = sourceFile('guide/tides.md', 'markdown', new TextEncoder().encode(text));
  const at = (phrase: string) => text.indexOf(phrase);

  it('several links in one file and on one line: positions after earlier insertions', () => {
    const a = suggestion('a', file, at('tide gauge'), at('tide gauge') + 10);
    const b = suggestion('b', file, at('wave buoy'), at('wave buoy') + 9);
    const plan = planNow({ file, suggestions: [b, a], hrefs: hrefsOf([a, b]), style: 'absolute', options });
    expect(plan.after).toBe('# Tides\r\n\r\nThe [tide gauge](/target-a/) and the [wave buoy](/target-b/) report every minute.\r\n');
    expect(plan.applied.map((x) => [x.id, x.line, x.column])).toEqual([
      ['a', 3, 5],
      ['b', 3, 5 + 'tide gauge'.length + '[](/target-a/) and the '.length],
    ]);
  });

  it('refuses a changed file, a moved anchor, an overlap and an unknown target; applies the rest', () => {
    const ok = suggestion('ok', file, at('wave buoy'), at('wave buoy') + 9);
    const stale = suggestion('stale', file, at('tide'), at('tide') + 4, { sourceHash: 'f'.repeat(64) });
    const moved = suggestion('moved', file, at('tide gauge') + 1, at('tide gauge') + 11, { anchor: 'tide gauge' });
    const overlap = suggestion('overlap', file, at('buoy'), at('buoy') + 4);
    const nowhere = suggestion('nowhere', file, at('minute'), at('minute') + 6);
    const hrefs = hrefsOf([ok, stale, moved, overlap]);
    const plan = planNow({ file, suggestions: [ok, stale, moved, overlap, nowhere], hrefs, style: 'absolute', options });
    expect(plan.applied.map((a) => a.id)).toEqual(['ok']);
    expect(Object.fromEntries(plan.refused.map((r) => [r.id, r.reason]))).toEqual({
      stale: `the source changed since the report (content hash ffffffffffff, now ${file.hash.slice(0, 12)}); run "linkweave suggest" again`,
      moved: 'the anchor "tide gauge" is not at offset ' + (at('tide gauge') + 1),
      overlap: 'its anchor overlaps the anchor of ok ("wave buoy")',
      nowhere: 'the target /target-nowhere/ is not a page of the report',
    });
  });

  it('refuses what would not parse as a link (an anchor right after "!" would become an image)', () => {
    const bang = sourceFile('b.md', 'markdown', new TextEncoder().encode('# B\n\nWow!Calibration matters.\n'));
    const s = suggestion('img', bang, 'Wow!'.length + 5, 'Wow!Calibration'.length + 5);
    expect(s.anchor).toBe('Calibration');
    const plan = planNow({ file: bang, suggestions: [s], hrefs: hrefsOf([s]), style: 'absolute', options });
    expect(plan.applied).toEqual([]);
    expect(plan.after).toBe(bang.text);
    expect(plan.refused[0]!.reason).toMatch(/would not be read as a link/);
  });

  it('refuses files that do not decode exactly (invalid UTF-8) and anchors that split a character', () => {
    const bad = sourceFile('bad.md', 'markdown', Uint8Array.from([...new TextEncoder().encode('# Bad\n\nwave '), 0xff, 0x0a]));
    const s = suggestion('x', bad, bad.text.indexOf('wave'), bad.text.indexOf('wave') + 4);
    expect(planNow({ file: bad, suggestions: [s], hrefs: hrefsOf([s]), style: 'absolute', options }).refused[0]!.reason).toMatch(
      /^cannot be edited without changing other bytes: invalid UTF-8/,
    );
    const emoji = sourceFile('e.md', 'markdown', new TextEncoder().encode('# E\n\nwave🌊 buoy\n'));
    const half = suggestion('half', emoji, emoji.text.indexOf('wave'), emoji.text.indexOf('🌊') + 1);
    expect(planNow({ file: emoji, suggestions: [half], hrefs: hrefsOf([half]), style: 'absolute', options }).refused[0]!.reason).toMatch(/surrogate/);
  });
});
