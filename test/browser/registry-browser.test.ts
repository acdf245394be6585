/**
 * The browser from the registry: `npm ci && npm test` must pass on a machine without Debian's
 * chromium. This file always launches the Chromium binary shipped in `@sparticuz/chromium`
 * (never `/usr/bin/chromium`, whether or not it is installed) and opens a report in it; `.ci/run`
 * also runs every browser test once with `LINKWEAVE_TEST_BROWSER=registry`.
 */
import fs from 'node:fs';
import { tmpdir } from 'node:os';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium } from 'playwright-core';
import type { Browser } from 'playwright-core';
import { htmlFormatter } from '../../src/report/html/format.js';
import { browserLaunch, browserSource, SYSTEM_CHROMIUM } from './launch.js';
import { buildFixtureReport } from './report-fixture.js';

let browser: Browser;
let executablePath: string;

beforeAll(async () => {
  const launch = await browserLaunch('registry');
  executablePath = launch.executablePath;
  browser = await chromium.launch({ executablePath, args: [...launch.args] });
});

afterAll(async () => {
  await browser?.close();
});

describe('chromium from the registry package', () => {
  it('is the binary unpacked from node_modules into the temp folder, not Debian’s', () => {
    expect(executablePath).not.toBe(SYSTEM_CHROMIUM);
    expect(fs.realpathSync(executablePath).startsWith(fs.realpathSync(tmpdir()))).toBe(true);
    expect(fs.statSync(executablePath).mode & 0o111).not.toBe(0);
  });

  it('opens the HTML report and runs its script: the depth chart counts every page, search finds a page', async () => {
    const report = buildFixtureReport();
    const page = await browser.newPage();
    try {
      const errors: string[] = [];
      page.on('pageerror', (e) => errors.push(String(e)));
      await page.setContent(htmlFormatter.format(report, { color: false }));
      await page.waitForSelector('html[data-ready="true"]');
      expect(errors).toEqual([]);
      const counts = await page.$$eval('#lw-depth-chart rect.lw-bar', (rects) => rects.map((r) => Number(r.getAttribute('data-count'))));
      expect(counts.reduce((a, b) => a + b, 0)).toBe(report.pages.length);
      const target = report.pages[3]!;
      await page.fill('#lw-search', target.route);
      await page.press('#lw-search', 'Enter');
      await page.waitForSelector('#lw-focus-title');
      expect(await page.textContent('#lw-focus-title')).toBe(target.title);
    } finally {
      await page.close();
    }
  });

  it('is what the tests choose where Debian’s chromium is absent, or when forced', () => {
    expect(browserSource({ LINKWEAVE_TEST_BROWSER: 'registry' })).toBe('registry');
    expect(browserSource({ LINKWEAVE_TEST_BROWSER: 'system' })).toBe('system');
    expect(browserSource({})).toBe(fs.existsSync(SYSTEM_CHROMIUM) ? 'system' : 'registry');
    expect(() => browserSource({ LINKWEAVE_TEST_BROWSER: 'firefox' })).toThrow('LINKWEAVE_TEST_BROWSER');
  });
});
