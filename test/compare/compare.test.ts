/**
 * `--compare` on two versions of one site (test/fixtures/pr-base -> pr-head): a page removed,
 * a page added, a link added (home -> reference/codes.md: its depth goes 2 -> 1), a line
 * inserted above a finding. The base report goes through the JSON writer and back, as in CI.
 */
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import { compareReports, parseReportFile } from '../../src/compare/index.js';
import { formatReport } from '../../src/report/index.js';
import type { Report } from '../../src/types.js';

const fixtures = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', 'fixtures');
const noCache = { cache: { enabled: false } };

async function reports(): Promise<{ base: Report; head: Report }> {
  const [base, head] = await Promise.all([
    analyze({ root: path.join(fixtures, 'pr-base'), command: 'suggest', ...noCache }),
    analyze({ root: path.join(fixtures, 'pr-head'), command: 'suggest', ...noCache }),
  ]);
  return { base, head };
}

describe('compareReports', () => {
  it('lists new and fixed findings, pages added and removed, and the depth and rank changes', async () => {
    const { base, head } = await reports();
    const read = parseReportFile(formatReport(base, 'json'), 'base.json');
    const c = compareReports(read, head);
    expect(c.base).toEqual({ version: base.tool.version, pages: 7, findings: base.findings.length });
    expect(c.newFindings.map((f) => [f.rule, f.file, f.target])).toEqual([['broken-link', 'guide/faq.md', 'guide/wiring-checklist.md']]);
    expect(c.fixedFindings.map((f) => [f.rule, f.route])).toEqual([['orphan-page', '/notes/legacy/']]);
    // The broken link on the home page moved from line 8 to line 10: known, not new.
    expect(c.knownFindings).toBe(head.findings.length - 1);
    expect(c.pagesAdded).toEqual([{ route: '/guide/faq/', file: 'guide/faq.md' }]);
    expect(c.pagesRemoved).toEqual([{ route: '/notes/legacy/', file: 'notes/legacy.md' }]);
    expect(c.depthChanges.map((p) => [p.route, p.depthBefore, p.depthAfter, p.depthChange])).toEqual([['/reference/codes/', 2, 1, -1]]);
    expect(c.changedPages.depth).toBe(1);

    // Rank changes: the pages in both runs, by absolute change then route, each the real difference.
    const rankOf = (r: Report, route: string) => r.pages.find((p) => p.route === route)!.rank;
    expect(c.rankChanges.length).toBeGreaterThan(0);
    expect(c.rankChanges.length).toBeLessThanOrEqual(10);
    for (const p of c.rankChanges) {
      expect(p.rankBefore).toBe(rankOf(base, p.route));
      expect(p.rankAfter).toBe(rankOf(head, p.route));
      expect(p.rankChange).toBeCloseTo(p.rankAfter - p.rankBefore, 4);
      expect(Math.abs(p.rankChange)).toBeGreaterThanOrEqual(0.005);
    }
    const sizes = c.rankChanges.map((p) => Math.abs(p.rankChange));
    expect(sizes).toEqual([...sizes].sort((a, b) => b - a));
    // The page that gained a link from the home page gains the most rank.
    expect(c.rankChanges[0]!.route).toBe('/reference/codes/');
    expect(c.rankChanges[0]!.rankChange).toBeGreaterThan(0);
  });

  it('the same run compared with itself has no changes', async () => {
    const { head } = await reports();
    const c = compareReports(parseReportFile(formatReport(head, 'json'), 'head.json'), head);
    expect(c).toMatchObject({ newFindings: [], fixedFindings: [], pagesAdded: [], pagesRemoved: [], rankChanges: [], depthChanges: [] });
    expect(c.changedPages).toEqual({ rank: 0, depth: 0 });
  });

  it('keeps the top 10 of each, sorted by absolute change then route; reachability changes first', () => {
    const page = (route: string, rank: number, depth: number | null) => ({ route, file: `${route.slice(1) || 'index'}.md`, title: route, rank, depth });
    const routes = Array.from({ length: 14 }, (_, i) => `/p${String(i).padStart(2, '0')}`);
    const base = { root: '/', version: '0', findings: [], suggestions: [], pages: routes.map((r) => page(r, 1, 2)) };
    const head = {
      findings: [],
      pages: routes.map((r, i) => ({
        ...page(r, i % 2 === 0 ? 1 + i / 10 : 1 - i / 10, i === 13 ? null : i < 12 ? 2 + (i % 3) : 2),
        pagerank: 0, inlinks: 0, contentInlinks: 0, outlinks: 0, importance: 'normal' as const,
      })),
    };
    const c = compareReports(base, head);
    expect(c.changedPages).toEqual({ rank: 13, depth: 9 });
    expect(c.rankChanges.map((p) => p.route)).toEqual(['/p13', '/p12', '/p11', '/p10', '/p09', '/p08', '/p07', '/p06', '/p05', '/p04']);
    expect(c.depthChanges.map((p) => [p.route, p.depthChange])).toEqual([
      ['/p13', null],
      ['/p02', 2], ['/p05', 2], ['/p08', 2], ['/p11', 2],
      ['/p01', 1], ['/p04', 1], ['/p07', 1], ['/p10', 1],
    ]);
  });
});

describe('parseReportFile', () => {
  it('refuses what is not a linkweave JSON report, naming the file, key or line', async () => {
    expect(() => parseReportFile('{"schema": "linkweave/baseline@1", "findings": []}', 'base.json')).toThrow(
      /^base\.json: key "schema": expected "linkweave\/report@1" \(a report written with --format json\); got "linkweave\/baseline@1"/,
    );
    expect(() => parseReportFile('<html>', 'base.json')).toThrow(/^base\.json: not valid JSON/);
    const { base } = await reports();
    const broken = JSON.parse(formatReport(base, 'json')) as { pages: { rank: unknown }[] };
    broken.pages[2]!.rank = 'high';
    expect(() => parseReportFile(JSON.stringify(broken), 'base.json')).toThrow(/^base\.json: key "pages\.2\.rank": /);
  });
});
