/**
 * The HTML report's tables in a real browser (see open-report.ts): sorting by clicks and by
 * keys, filters by rule, folder, severity and text, long tables and printing.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { launchReportBrowser, rowTexts } from './open-report.js';
import type { ReportBrowser } from './open-report.js';
import { buildFixtureReport } from './report-fixture.js';

// The callbacks of page.evaluate run in the browser; the project's tsconfig has no DOM library.
type HTMLElement = any;
declare function getComputedStyle(element: unknown): any;

let browser: ReportBrowser;

beforeAll(async () => {
  browser = await launchReportBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('HTML report tables in chromium', () => {
  const report = buildFixtureReport();
  const open = (...args: Parameters<ReportBrowser['open']>): ReturnType<ReportBrowser['open']> => browser.open(...args);

  it('sorts and filters the findings table', async () => {
    const o = await open(report, 'tables');
    try {
      const total = report.findings.length;
      expect(await o.page.$$eval('#lw-findings-table tbody tr', (r) => r.length)).toBe(total);
      // Sort by rule: ascending, then descending on a second click.
      await o.page.click('#lw-findings-table thead button[data-key="rule"]');
      const rules = report.findings.map((f) => f.rule);
      expect(await rowTexts(o.page, 'findings', 1)).toEqual([...rules].sort((a, b) => a.localeCompare(b, 'en')));
      expect(await o.page.getAttribute('#lw-findings-table th[data-key="rule"]', 'aria-sort')).toBe('ascending');
      await o.page.click('#lw-findings-table thead button[data-key="rule"]');
      expect(await rowTexts(o.page, 'findings', 1)).toEqual([...rules].sort((a, b) => b.localeCompare(a, 'en')));
      // Filter by rule, then by folder as well.
      await o.page.selectOption('#lw-findings-filter-rule', 'click-depth');
      const deep = report.findings.filter((f) => f.rule === 'click-depth');
      expect(await o.page.$$eval('#lw-findings-table tbody tr', (r) => r.length)).toBe(deep.length);
      const folder = deep[0]!.file.split('/')[0]!;
      await o.page.selectOption('#lw-findings-filter-folder', folder);
      const both = deep.filter((f) => f.file.startsWith(`${folder}/`));
      expect(await rowTexts(o.page, 'findings', 2)).toEqual(both.map((f) => `${f.file}:${f.line}:${f.column}`));
      expect(await o.page.textContent('#lw-findings-shown')).toContain(`${both.length} of ${both.length} matching (${total} in all)`);
      // Severity filter.
      await o.page.selectOption('#lw-findings-filter-rule', '');
      await o.page.selectOption('#lw-findings-filter-folder', '');
      await o.page.selectOption('#lw-findings-filter-severity', 'error');
      expect(await o.page.$$eval('#lw-findings-table tbody tr', (r) => r.length)).toBe(report.stats.findings.error);
      expect(new Set(await rowTexts(o.page, 'findings', 0))).toEqual(new Set(['\u25A0 error']));
      expect(o.errors).toEqual([]);
    } finally {
      await o.close();
    }
  });

  it('sorts and filters the suggestions table, naming file:line, anchor, target and impact', async () => {
    const o = await open(report, 'suggestions');
    try {
      const s = report.suggestions;
      expect(s.length).toBeGreaterThan(5);
      expect(await o.page.$$eval('#lw-suggestions-table tbody tr', (r) => r.length)).toBe(s.length);
      const first = await o.page.$eval('#lw-suggestions-table tbody tr', (r) => (r as HTMLElement).innerText);
      expect(first).toContain(`${s[0]!.file}:${s[0]!.line}:${s[0]!.column}`);
      expect(first).toContain(s[0]!.target);
      expect(first).toContain('\u2192');
      // Similarity: the first click sorts highest first.
      await o.page.click('#lw-suggestions-table thead button[data-key="similarity"]');
      const sims = (await rowTexts(o.page, 'suggestions', 3)).map(Number);
      expect(sims).toEqual([...sims].sort((a, b) => b - a));
      expect(sims[0]).toBeCloseTo(Math.max(...s.map((x) => x.similarity)), 2);
      // Folder filter.
      const folder = s[0]!.file.split('/')[0]!;
      await o.page.selectOption('#lw-suggestions-filter-folder', folder);
      expect(await o.page.$$eval('#lw-suggestions-table tbody tr', (r) => r.length)).toBe(s.filter((x) => x.file.split('/')[0] === folder).length);
      // Text filter.
      await o.page.selectOption('#lw-suggestions-filter-folder', '');
      await o.page.fill('#lw-suggestions-filter-text', 'orphan page');
      expect(await o.page.$$eval('#lw-suggestions-table tbody tr', (r) => r.length)).toBe(s.filter((x) => x.reason.includes('orphan page')).length);
    } finally {
      await o.close();
    }
  });

  it('prints without controls and with every row', async () => {
    const big = buildFixtureReport({ pages: 1200, seed: 5 });
    expect(big.findings.length).toBeGreaterThan(200);
    const o = await open(big, 'print');
    try {
      expect(await o.page.$$eval('#lw-findings-table tbody tr', (r) => r.length)).toBe(200);
      await o.page.click('#lw-findings-more');
      expect(await o.page.$$eval('#lw-findings-table tbody tr', (r) => r.length)).toBe(big.findings.length);
      await o.page.emulateMedia({ media: 'print' });
      expect(await o.page.$eval('#lw-findings-controls', (c) => getComputedStyle(c).display)).toBe('none');
      expect(await o.page.$eval('#lw-search', (c) => (c.closest('.lw-controls') as HTMLElement).offsetParent)).toBeNull();
    } finally {
      await o.close();
    }
  });

});
