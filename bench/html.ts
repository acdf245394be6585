/**
 * The HTML report in a browser: its size in bytes and the time chromium takes to open it, with
 * a blank page opened the same way as the reference of the same run.
 *
 * Chromium is launched as the browser tests launch it (`test/browser/launch.ts`: Debian's
 * /usr/bin/chromium when present, else the binary of the `@sparticuz/chromium` package; flags
 * `--headless --no-sandbox --disable-gpu`), driven by playwright-core. Where no browser can be
 * started, the result says why instead of a time.
 *
 * What is timed, per open, in a new browser context (nothing cached from an earlier open):
 * - `openMs`: wall time from the driver's `page.goto(file://...)` until the driver sees
 *   `<html data-ready="true">`, which the report's own script sets after it has built the tables
 *   and drawn the graph (it runs inline, as the page is parsed);
 * - `inPageMs`: the page's own navigation timing, `domContentLoadedEventEnd` (milliseconds from
 *   the start of the navigation until the document, its embedded data and its script have been
 *   read and run), without the driver's round trips.
 * The blank page is `<html data-ready="true">` and nothing else, opened and timed the same way:
 * the cost of a navigation itself on this machine at this moment.
 */
import { mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium } from 'playwright-core';
import type { Browser } from 'playwright-core';
import { browserLaunch } from '../test/browser/launch.js';
import { median } from './pipeline.js';

/** One page opened `runs` times. */
export interface OpenTimes {
  readonly openMs: number[];
  readonly inPageMs: number[];
}

/** What the HTML measurement reports. */
export interface HtmlOpenResult {
  readonly mode: 'html';
  /** Where the report came from: a generated site's real report, or the browser tests' fixture. */
  readonly origin: 'site' | 'fixture';
  readonly pages: number;
  readonly bytes: number;
  /** Null when no browser could be started (`browserError` says why). */
  readonly browser: { readonly source: string; readonly version: string } | null;
  readonly browserError: string | null;
  readonly report: OpenTimes | null;
  readonly blank: OpenTimes | null;
  /** Errors the page reported while opening (should be none). */
  readonly pageErrors: string[];
}

async function openOnce(browser: Browser, url: string, errors: string[]): Promise<{ openMs: number; inPageMs: number }> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  try {
    const page = await context.newPage();
    page.on('pageerror', (e) => errors.push(String(e)));
    const t0 = performance.now();
    await page.goto(url, { waitUntil: 'commit', timeout: 120_000 });
    await page.waitForSelector('html[data-ready="true"]', { state: 'attached', timeout: 120_000 });
    const openMs = performance.now() - t0;
    // The navigation entry is complete once DOMContentLoaded has ended; wait for that. (Strings:
    // they run in the page, and the bench is type-checked without the DOM's types.)
    const dclEnd = 'performance.getEntriesByType("navigation")[0]?.domContentLoadedEventEnd ?? 0';
    await page.waitForFunction(`(${dclEnd}) > 0`, undefined, { timeout: 120_000 });
    const inPageMs = Number(await page.evaluate(dclEnd));
    return { openMs, inPageMs };
  } finally {
    await context.close();
  }
}

/**
 * Open the HTML report at `file` `runs` times (and a blank page as many times, interleaved),
 * after one untimed open of each (the browser's own start-up is not timed).
 */
export async function measureHtmlOpen(file: string, origin: HtmlOpenResult['origin'], pages: number, runs: number): Promise<HtmlOpenResult> {
  const bytes = statSync(file).size;
  const base = { mode: 'html' as const, origin, pages, bytes };
  let browser: Browser;
  let source: string;
  try {
    const launch = await browserLaunch();
    source = launch.source;
    browser = await chromium.launch({ executablePath: launch.executablePath, args: [...launch.args] });
  } catch (error) {
    const reason = (error as Error).message.split('\n')[0] ?? String(error);
    return { ...base, browser: null, browserError: reason, report: null, blank: null, pageErrors: [] };
  }
  const dir = mkdtempSync(join(tmpdir(), 'lw-bench-blank-'));
  try {
    const blankFile = join(dir, 'blank.html');
    writeFileSync(blankFile, '<!doctype html><html data-ready="true"><head><meta charset="utf-8"><title>blank</title></head><body></body></html>\n');
    const blankUrl = pathToFileURL(blankFile).href;
    const reportUrl = pathToFileURL(file).href;
    const errors: string[] = [];
    await openOnce(browser, blankUrl, []);
    await openOnce(browser, reportUrl, []);
    const report: OpenTimes = { openMs: [], inPageMs: [] };
    const blank: OpenTimes = { openMs: [], inPageMs: [] };
    for (let r = 0; r < runs; r++) {
      const b = await openOnce(browser, blankUrl, []);
      blank.openMs.push(b.openMs);
      blank.inPageMs.push(b.inPageMs);
      const o = await openOnce(browser, reportUrl, errors);
      report.openMs.push(o.openMs);
      report.inPageMs.push(o.inPageMs);
    }
    return { ...base, browser: { source, version: browser.version() }, browserError: null, report, blank, pageErrors: errors };
  } finally {
    await browser.close();
    rmSync(dir, { recursive: true, force: true });
  }
}

/** The table cell of one measurement: size, open time, blank-page time and their ratio. */
export function htmlCell(h: HtmlOpenResult, limits: { bytes: number; openMs: number }, marked: boolean): string {
  const mb = `${(h.bytes / 1e6).toFixed(1)} MB`;
  const sizeMark = marked ? ` ${h.bytes <= limits.bytes ? 'pass' : 'MISS'}` : '';
  if (h.report === null || h.blank === null) return `${mb}${sizeMark}; no browser (${(h.browserError ?? '').slice(0, 50)})`;
  const open = median(h.report.openMs);
  const blank = median(h.blank.openMs);
  const openMark = marked ? ` ${open < limits.openMs ? 'pass' : 'MISS'}` : '';
  const errors = h.pageErrors.length === 0 ? '' : `; ${h.pageErrors.length} page errors`;
  return `${mb}${sizeMark}; open ${Math.round(open)} ms${openMark} (in page ${Math.round(median(h.report.inPageMs))}); blank page ${Math.round(blank)} ms; ${(open / blank).toFixed(0)}x blank${errors}`;
}
