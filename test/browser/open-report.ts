/**
 * Opening an HTML report in a real browser for the tests: chromium (Debian's, or the registry
 * package's binary, see `launch.ts`) driven by playwright-core (no browser download). The report is written to a temp folder and opened
 * from file://; every request, page error, console error and dialog is recorded.
 */
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium } from 'playwright-core';
import type { Page } from 'playwright-core';
import { htmlFormatter } from '../../src/report/html/format.js';
import type { Report } from '../../src/types.js';
import { browserLaunch } from './launch.js';
import type { BrowserSource } from './launch.js';


/** An opened report. */
export interface OpenedReport {
  readonly page: Page;
  readonly url: string;
  readonly requests: string[];
  readonly errors: string[];
  readonly dialogs: string[];
  close(): Promise<void>;
}

/** A browser that opens reports. */
export interface ReportBrowser {
  /** Where the running browser came from, and its executable. */
  readonly source: BrowserSource;
  readonly executablePath: string;
  open(report: Report, name: string, viewport?: { width: number; height: number }): Promise<OpenedReport>;
  close(): Promise<void>;
}

/** Start chromium and a temp folder for the report files. */
export async function launchReportBrowser(): Promise<ReportBrowser> {
  const launch = await browserLaunch();
  const browser = await chromium.launch({ executablePath: launch.executablePath, args: [...launch.args] });
  const dir = await mkdtemp(join(tmpdir(), 'lw-html-'));
  return {
    source: launch.source,
    executablePath: launch.executablePath,
    async open(report, name, viewport = { width: 1280, height: 900 }) {
      const file = join(dir, `${name}.html`);
      await writeFile(file, htmlFormatter.format(report, { color: false }));
      const context = await browser.newContext({ viewport });
      const page = await context.newPage();
      const requests: string[] = [];
      const errors: string[] = [];
      const dialogs: string[] = [];
      page.on('request', (r) => requests.push(r.url()));
      page.on('pageerror', (e) => errors.push(String(e)));
      page.on('console', (m) => {
        if (m.type() === 'error') errors.push(m.text());
      });
      page.on('dialog', (d) => {
        dialogs.push(d.message());
        void d.dismiss();
      });
      const url = pathToFileURL(file).href;
      await page.goto(url);
      await page.waitForSelector('html[data-ready="true"]');
      return { page, url, requests, errors, dialogs, close: () => context.close() };
    },
    async close() {
      await browser.close();
      await rm(dir, { recursive: true, force: true });
    },
  };
}

/** The visible text of one column of a report table, row by row. */
export async function rowTexts(page: Page, table: 'findings' | 'suggestions', column: number): Promise<string[]> {
  return page.$$eval(
    `#lw-${table}-table tbody tr`,
    (rows, c) => rows.map((r) => (r.children[c] as unknown as { innerText: string } | undefined)?.innerText ?? ''),
    column,
  );
}
