/**
 * The HTML report of a large site in chromium: a summary that stays small and opens, with the
 * notice saying what it leaves out. The time to open is printed (speed is the bench's business,
 * so it is not asserted).
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { htmlFormatter } from '../../src/report/html/format.js';
import { launchReportBrowser } from './open-report.js';
import type { ReportBrowser } from './open-report.js';
import { buildFixtureReport } from './report-fixture.js';

let browser: ReportBrowser;
beforeAll(async () => {
  browser = await launchReportBrowser();
}, 60_000);
afterAll(async () => {
  await browser?.close();
});

describe('HTML report summary in chromium', () => {
  it('opens a 30,000-page report as a summary of a few MB and says what it leaves out', async () => {
    const big = buildFixtureReport({ pages: 30_000, seed: 5 });
    const bytes = Buffer.byteLength(htmlFormatter.format(big, { color: false }));
    expect(bytes).toBeLessThan(15 * 1024 * 1024);
    const started = performance.now();
    const o = await browser.open(big, 'summary');
    const openMs = performance.now() - started;
    try {
      process.stdout.write(`30,000-page HTML report: ${(bytes / 1e6).toFixed(1)} MB, formatted again, written and opened in ${openMs.toFixed(0)} ms (shared machine: not a measurement of the page alone)\n`);
      const notice = await o.page.textContent('#lw-summary-notice');
      expect(notice).toContain(`of ${big.pages.length} pages`);
      expect(notice).toContain('--format json');
      expect(await o.page.$$eval('#lw-findings-table tbody tr', (r) => r.length)).toBeGreaterThan(0);
      expect(o.errors).toEqual([]);
      expect(o.requests.filter((u) => !u.startsWith('file:'))).toEqual([]);
    } finally {
      await o.close();
    }
  }, 240_000);
});
