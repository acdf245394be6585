/**
 * The HTML report of the bundled example site (examples/docs-site, analysed by the real
 * pipeline with its own configuration), opened in chromium from file://: the histogram
 * matches the report's depth counts, a search shows the page's neighbours, the tables sort
 * and filter, and nothing is requested from outside the file.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { analyze } from '../../src/analyze.js';
import { loadConfig } from '../../src/config/discover.js';
import type { Report } from '../../src/types.js';
import { launchReportBrowser, rowTexts } from './open-report.js';
import type { ReportBrowser } from './open-report.js';

const ROOT = resolve('examples/docs-site');

let browser: ReportBrowser;
let report: Report;
const cacheDir = mkdtempSync(join(tmpdir(), 'lw-example-cache-'));

beforeAll(async () => {
  const loaded = await loadConfig({ explicit: null, root: ROOT, cwd: process.cwd() });
  report = await analyze({ ...(loaded.config as object), root: ROOT, command: 'suggest', configOrigin: loaded.origin, cache: { dir: cacheDir } });
  browser = await launchReportBrowser();
});

afterAll(async () => {
  await browser?.close();
  rmSync(cacheDir, { recursive: true, force: true });
});

/** Pages a link reaches (a broken fragment still reaches its page); navigation links apart. */
function pageLinks(r: Report): { from: string; to: string }[] {
  return r.links
    .filter((l) => l.kind === 'internal' && (l.status === 'ok' || l.status === 'broken-fragment') && l.from !== '')
    .map((l) => ({ from: l.from, to: l.to.split('#')[0]! }))
    .filter((l) => l.from !== l.to);
}

describe('the example site report in chromium', () => {
  it('shows the example site as the report has it', async () => {
    const o = await browser.open(report, 'example-site');
    try {
      // Histogram: one bar per depth and one for unreachable pages, heights proportional to counts.
      const bars = await o.page.$$eval('#lw-depth-chart rect.lw-bar', (rects) =>
        rects.map((r) => ({ depth: r.getAttribute('data-depth')!, count: Number(r.getAttribute('data-count')), height: r.getBoundingClientRect().height })),
      );
      const counts = new Map<string, number>();
      for (const p of report.pages) {
        const key = p.depth === null ? 'unreachable' : String(p.depth);
        counts.set(key, (counts.get(key) ?? 0) + 1);
      }
      expect(bars.length).toBe(Math.max(report.stats.maxDepth ?? 0, report.options.maxDepth) + 2);
      const tallest = bars.reduce((a, b) => (b.count > a.count ? b : a));
      for (const b of bars) {
        expect(b.count).toBe(counts.get(b.depth) ?? 0);
        expect(b.height).toBeCloseTo((tallest.height * b.count) / tallest.count, 0);
      }
      expect(await o.page.textContent('#lw-stat-pages dd')).toContain(String(report.stats.pages));
      expect(await o.page.getAttribute('#lw-gate', 'data-passed')).toBe(String(report.gate.passed));

      // Search: the page with the most pages linking to it (and some links out).
      const links = pageLinks(report);
      const inOf = (route: string): string[] => [...new Set(links.filter((l) => l.to === route).map((l) => l.from))].sort();
      const outOf = (route: string): string[] => [...new Set(links.filter((l) => l.from === route).map((l) => l.to))].sort();
      const target = report.pages
        .filter((p) => outOf(p.route).length > 0)
        .reduce((a, b) => (inOf(b.route).length > inOf(a.route).length ? b : a));
      await o.page.fill('#lw-search', target.route);
      await o.page.press('#lw-search', 'Enter');
      expect(await o.page.textContent('#lw-focus-title')).toBe(target.title);
      const listed = async (id: string): Promise<string[]> => (await o.page.$$eval(`#${id} button`, (b) => b.map((x) => x.getAttribute('data-route')!))).sort();
      expect(await listed('lw-in-list')).toEqual(inOf(target.route));
      expect(await listed('lw-out-list')).toEqual(outOf(target.route));
      await o.page.locator('#lw-graph').screenshot({ path: '/tmp/lw-example-site-focus.png' });

      // Tables: sort findings by rule, filter by severity; suggestions name file:line:column.
      await o.page.click('#lw-findings-table thead button[data-key="rule"]');
      expect(await rowTexts(o.page, 'findings', 1)).toEqual(report.findings.map((f) => f.rule).sort((a, b) => a.localeCompare(b, 'en')));
      await o.page.selectOption('#lw-findings-filter-severity', 'error');
      expect(await o.page.$$eval('#lw-findings-table tbody tr', (r) => r.length)).toBe(report.stats.findings.error);
      expect(await o.page.$$eval('#lw-suggestions-table tbody tr', (r) => r.length)).toBe(report.suggestions.length);
      const s = report.suggestions[0]!;
      expect((await rowTexts(o.page, 'suggestions', 0))[0]).toContain(`${s.file}:${s.line}:${s.column}`);

      for (const url of o.requests) expect(url === o.url || url.startsWith('data:')).toBe(true);
      expect(o.errors).toEqual([]);
      await o.page.screenshot({ path: '/tmp/lw-example-site.png', fullPage: true });
    } finally {
      await o.close();
    }
  });
});
