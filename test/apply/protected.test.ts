/**
 * `apply --all` on random documents that mix prose with the syntax site generators read
 * (syntax-docs.ts): through the real Node API (`applySuggestions`) on real files in a temp
 * folder, every protected region stays byte-identical and every inserted link lies in prose.
 * The protected extents come from the generator, not from the code under test.
 */
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import { applySuggestions } from '../../src/apply/index.js';
import type { AppliedLink, ApplyResult } from '../../src/apply/index.js';
import { DEFAULT_OPTIONS } from '../../src/config/options.js';
import type { Suggestion } from '../../src/types.js';
import { tempDir, writeTree } from '../collect/tree.js';
import { htmlPieces, layout, markdownPieces, mdxPieces, TARGETS } from './syntax-docs.js';
import type { Piece } from './syntax-docs.js';

const TARGET_FILES = Object.fromEntries(TARGETS.map((t) => [t.file, `# ${t.title}\n\nWhat the ${t.title.toLowerCase()} page says.\n`]));
const PAGES = TARGETS.map((t) => ({ route: t.route, file: t.file }));

/** A suggestion for every occurrence of every target phrase in `text` (made by hand, as a report could hold). */
function everyOccurrence(file: string, text: string): Suggestion[] {
  const hash = createHash('sha256').update(Buffer.from(text, 'utf8')).digest('hex');
  const out: Suggestion[] = [];
  for (const t of TARGETS) {
    for (let at = text.indexOf(t.phrase); at !== -1; at = text.indexOf(t.phrase, at + 1)) {
      const before = text.slice(0, at).split('\n');
      out.push({
        id: `${t.file}@${at}`, source: '/page/', target: t.route, file, line: before.length, column: before[before.length - 1]!.length + 1,
        offset: at, endOffset: at + t.phrase.length, anchor: t.phrase, similarity: 0.3, score: 0.3, targetRankBefore: 0.5,
        targetRankAfter: null, depthBefore: 2, depthAfter: 1, reason: '', sourceHash: hash,
      });
    }
  }
  return out;
}

/** The edited text without the inserted markup. */
function unapply(after: string, applied: readonly AppliedLink[]): string {
  let out = after;
  for (const a of [...applied].sort((x, y) => y.offset - x.offset)) {
    const close = a.offset + a.open.length + a.anchor.length;
    out = out.slice(0, a.offset) + a.anchor + out.slice(close + a.close.length);
  }
  return out;
}

/** Original offsets of each applied anchor (the applied offsets are in the edited text). */
function originalAnchors(applied: readonly AppliedLink[]): [number, number][] {
  let shift = 0;
  return [...applied]
    .sort((x, y) => x.offset - y.offset)
    .map((a) => {
      const start = a.offset - shift;
      shift += a.open.length + a.close.length;
      return [start, start + a.anchor.length];
    });
}

const overlaps = (a: readonly [number, number], b: readonly [number, number]) => a[0] < b[1] && b[0] < a[1];
const inside = (a: readonly [number, number], b: readonly [number, number]) => a[0] >= b[0] && a[1] <= b[1];

/** Check one applied document against its pieces; returns what happened. */
function check(pieces: readonly Piece[], text: string, after: string, result: ApplyResult, suggestions: readonly Suggestion[]) {
  const { protectedRanges, proseRanges } = layout(pieces);
  // Only link markup was added.
  expect(unapply(after, result.applied)).toBe(text);
  const anchors = originalAnchors(result.applied);
  // Every inserted link lies in prose, never across a protected region.
  for (const a of anchors) {
    expect(protectedRanges.some((p) => overlaps(a, p)), JSON.stringify(text.slice(a[0], a[1]))).toBe(false);
    expect(proseRanges.some((p) => inside(a, p))).toBe(true);
  }
  // Every protected region is byte-identical at its shifted place.
  let shift = 0;
  const points = result.applied.flatMap((a, i) => [
    { at: anchors[i]![0], len: a.open.length },
    { at: anchors[i]![1], len: a.close.length },
  ]);
  for (const [s, e] of protectedRanges) {
    shift = points.filter((p) => p.at <= s).reduce((n, p) => n + p.len, 0);
    expect(after.slice(s + shift, e + shift)).toBe(text.slice(s, e));
  }
  // Anchors in protected syntax are refused as such; anchors in prose never are.
  const refused = new Map(result.notApplied.map((n) => [n.id, n]));
  let protectedRefusals = 0;
  for (const s of suggestions) {
    const range: [number, number] = [s.offset, s.endOffset];
    const n = refused.get(s.id);
    if (protectedRanges.some((p) => overlaps(range, p))) {
      expect(n, `${s.anchor} at ${s.offset} in ${JSON.stringify(text)}`).toBeDefined();
      if (n!.code === 'protected') protectedRefusals++;
    } else if (n !== undefined) {
      expect(n.code, `${n.reason} for ${JSON.stringify(text.slice(s.offset - 20, s.endOffset + 20))}`).not.toBe('protected');
    }
  }
  return { applied: result.applied.length, protectedRefusals };
}

const CASES = [
  ['Markdown', markdownPieces, 'page.md'],
  ['MDX', mdxPieces, 'page.mdx'],
  ['HTML with Liquid', htmlPieces, 'page.html'],
] as const;

describe('apply --all on random documents with generator syntax', () => {
  for (const [name, pieces, file] of CASES) {
    it(`${name}: protected regions stay byte-identical, links only in prose`, async () => {
      const totals = { applied: 0, protectedRefusals: 0 };
      const t = tempDir('linkweave-protect-');
      try {
        let run = 0;
        await fc.assert(
          fc.asyncProperty(pieces, async (doc) => {
            const root = path.join(t.dir, `site-${run++}`);
            const { text } = layout(doc);
            writeTree(root, { ...TARGET_FILES, [file]: text });
            const suggestions = everyOccurrence(file, text);
            const result = await applySuggestions({ options: { ...DEFAULT_OPTIONS, root }, report: { suggestions, pages: PAGES }, selection: 'all' });
            const after = fs.readFileSync(path.join(root, file), 'utf8');
            const seen = check(doc, text, after, result, suggestions);
            totals.applied += seen.applied;
            totals.protectedRefusals += seen.protectedRefusals;
            fs.rmSync(root, { recursive: true, force: true });
          }),
          { numRuns: 40, seed: 19 },
        );
      } finally {
        t.cleanup();
      }
      // The property was exercised both ways: links went into prose, and syntax was refused.
      expect(totals.applied).toBeGreaterThan(20);
      expect(totals.protectedRefusals).toBeGreaterThan(20);
    });
  }

  it('suggest then apply --all (the real pipeline) on a site of such documents', async () => {
    const t = tempDir('linkweave-protect-site-');
    try {
      const docs = [...fc.sample(markdownPieces, { numRuns: 8, seed: 7 }), ...fc.sample(mdxPieces, { numRuns: 4, seed: 8 })];
      const tree: Record<string, string> = { ...TARGET_FILES };
      docs.forEach((d, i) => (tree[`guide/page-${i}.${i < 8 ? 'md' : 'mdx'}`] = layout(d).text));
      writeTree(t.dir, tree);
      const options = { ...DEFAULT_OPTIONS, root: t.dir, suggest: { ...DEFAULT_OPTIONS.suggest, targets: 'all' as const } };
      const report = await analyze({ root: t.dir, command: 'suggest', cache: { enabled: false }, suggest: { targets: 'all' } });
      const anchored = report.suggestions.filter((s) => s.anchor !== null);
      expect(anchored.length).toBeGreaterThan(0);
      const result = await applySuggestions({ options, report, selection: 'all' });
      expect(result.applied.length).toBeGreaterThan(0);
      expect(result.notApplied.filter((n) => n.code === 'protected')).toEqual([]);
      docs.forEach((d, i) => {
        const file = `guide/page-${i}.${i < 8 ? 'md' : 'mdx'}`;
        const applied = result.applied.filter((a) => a.file === file);
        const after = fs.readFileSync(path.join(t.dir, file), 'utf8');
        check(d, tree[file]!, after, { ...result, applied, notApplied: [] }, []);
      });
    } finally {
      t.cleanup();
    }
  });
});
