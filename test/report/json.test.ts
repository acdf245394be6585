import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { jsonPieces } from '../../src/report/formatters/json.js';
import { buildReport, formatReport, formatReportPieces } from '../../src/report/index.js';
import type { Report } from '../../src/types.js';
import { runRules } from '../../src/rules/index.js';
import { buildSite } from '../rules/helpers.js';
import { SITE, SUGGESTIONS } from './fixture.js';

/** A seeded shuffle (mulberry32), so a failure can be replayed. */
function shuffled<T>(items: readonly T[], seed: number): T[] {
  let a = seed >>> 0;
  const random = (): number => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const out = [...items];
  for (let i = out.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [out[i], out[j]] = [out[j]!, out[i]!];
  }
  return out;
}

function jsonOf(seed: number | null): string {
  const spec = seed === null ? SITE : { ...SITE, pages: shuffled(SITE.pages, seed) };
  const ctx = buildSite(spec);
  const options = { ...ctx.options, root: '/work/docs' };
  const findings = runRules({ ...ctx, options });
  const graph = seed === null ? ctx.graph : { ...ctx.graph, links: shuffled(ctx.graph.links, seed + 1) };
  const report = buildReport({
    options,
    graph,
    ranking: ctx.ranking,
    findings: seed === null ? findings : shuffled(findings, seed + 2),
    suggestions: seed === null ? SUGGESTIONS : shuffled(SUGGESTIONS, seed + 3),
    files: ctx.facts.length,
    version: '0.1.0',
  });
  return formatReport(report, 'json');
}

describe('json formatter', () => {
  it('gives byte-identical output for the same site from inputs in any order', () => {
    const reference = jsonOf(null);
    for (const seed of [1, 7, 42, 1234]) expect(jsonOf(seed)).toBe(reference);
  });

  it('is the report as indented JSON with a final newline', () => {
    const text = jsonOf(null);
    expect(text.endsWith('}\n')).toBe(true);
    expect(text.split('\n')[1]).toBe('  "schema": "linkweave/report@1",');
    const parsed = JSON.parse(text) as { pages: { route: string; depth: number | null }[] };
    expect(parsed.pages.find((p) => p.route === '/notes/old/')!.depth).toBeNull();
  });
});

describe('the JSON writer in pieces', () => {
  it('joins to exactly JSON.stringify(report, null, 2) for a real report', () => {
    const report = JSON.parse(jsonOf(null)) as Report;
    const pieces = [...formatReportPieces(report, 'json')];
    expect(pieces.join('')).toBe(`${JSON.stringify(report, null, 2)}\n`);
    expect(formatReport(report, 'json')).toBe(pieces.join(''));
  });

  it('joins to exactly JSON.stringify(value, null, 2) for any JSON-like value (fast-check)', () => {
    const value = fc.oneof(
      fc.jsonValue(),
      fc.dictionary(fc.string(), fc.oneof(fc.jsonValue(), fc.constant(undefined), fc.array(fc.oneof(fc.jsonValue(), fc.constant(undefined))))),
    );
    fc.assert(
      fc.property(value, (v) => {
        expect([...jsonPieces(v as unknown as Report)].join('')).toBe(`${JSON.stringify(v, null, 2)}\n`);
      }),
      { numRuns: 500, seed: 3 },
    );
  });

  it('cuts a long report into pieces of one to two megabytes', () => {
    const row = { from: '/a/', to: '/b/', file: 'a.md', line: 1, column: 1, text: 'x'.repeat(40), context: 'content' };
    const report = { schema: 'linkweave/report@1', links: Array.from({ length: 30_000 }, () => row) } as unknown as Report;
    const pieces = [...jsonPieces(report)];
    expect(pieces.length).toBeGreaterThan(3);
    expect(Math.max(...pieces.map((p) => p.length))).toBeLessThan(2 * (1 << 20)); // a piece ends after the 1,000-item slice that passes 1 MiB
    expect(pieces.join('')).toBe(`${JSON.stringify(report, null, 2)}\n`);
  });
});
