/**
 * The HTML report in a real browser (see open-report.ts): charts, no requests, search and
 * neighbourhood, keyboard, hostile text, an empty site and a 5,000-page site. Screenshots go
 * to /tmp for a person to look at.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import type { Report } from '../../src/types.js';
import { launchReportBrowser, rowTexts } from './open-report.js';
import type { ReportBrowser } from './open-report.js';
import { buildFixtureReport } from './report-fixture.js';

// The callbacks of page.evaluate run in the browser; the project's tsconfig has no DOM
// library, so the few browser names used there are declared here, for this file only.
type HTMLCanvasElement = any;
declare const document: any;
declare const window: any;
declare function getComputedStyle(element: unknown): any;

let browser: ReportBrowser;
const open = (report: Report, name: string): ReturnType<ReportBrowser['open']> => browser.open(report, name);

beforeAll(async () => {
  browser = await launchReportBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('HTML report in chromium', () => {
  const report = buildFixtureReport();

  it('draws histogram bars with heights proportional to the depth counts, the limit marked', async () => {
    const o = await open(report, 'example');
    try {
      const bars = await o.page.$$eval('#lw-depth-chart rect.lw-bar', (rects) =>
        rects.map((r) => ({ depth: r.getAttribute('data-depth')!, count: Number(r.getAttribute('data-count')), height: r.getBoundingClientRect().height, label: r.parentElement!.querySelector('.lw-count')!.textContent })),
      );
      const counts = new Map<string, number>();
      for (const p of report.pages) counts.set(p.depth === null ? 'unreachable' : String(p.depth), (counts.get(p.depth === null ? 'unreachable' : String(p.depth)) ?? 0) + 1);
      const deepest = report.stats.maxDepth!;
      expect(bars.map((b) => b.depth)).toEqual([...Array.from({ length: Math.max(deepest, report.options.maxDepth) + 1 }, (_, d) => String(d)), 'unreachable']);
      for (const b of bars) {
        expect(b.count).toBe(counts.get(b.depth) ?? 0);
        expect(b.label).toBe(String(b.count));
      }
      const tallest = bars.reduce((a, b) => (b.count > a.count ? b : a));
      expect(tallest.height).toBeGreaterThan(50);
      for (const b of bars) expect(b.height).toBeCloseTo((tallest.height * b.count) / tallest.count, 0);
      // The limit line sits between the bar of depth maxDepth and the next one.
      const limit = await o.page.$eval('#lw-depth-limit', (l) => l.getBoundingClientRect().x);
      const xs = await o.page.$$eval('#lw-depth-chart rect.lw-bar', (rects) => rects.map((r) => r.getBoundingClientRect()));
      const m = report.options.maxDepth;
      expect(limit).toBeGreaterThan(xs[m]!.x + xs[m]!.width);
      expect(limit).toBeLessThan(xs[m + 1]!.x);
      await o.page.screenshot({ path: '/tmp/lw-report-example.png', fullPage: true });
      expect(o.errors).toEqual([]);
    } finally {
      await o.close();
    }
  });

  it('loads nothing but the file itself', async () => {
    const o = await open(report, 'requests');
    try {
      await o.page.fill('#lw-search', 'tide');
      await o.page.press('#lw-search', 'Enter');
      await o.page.click('#lw-findings-table thead button[data-key="rule"]');
      expect(o.requests.length).toBeGreaterThan(0);
      for (const url of o.requests) expect(url.startsWith('file://') || url.startsWith('data:')).toBe(true);
      expect(o.requests.filter((u) => u.startsWith('file://'))).toEqual([o.url]);
    } finally {
      await o.close();
    }
  });

  it('searching a page shows the pages linking to it and the pages it links to', async () => {
    const o = await open(report, 'search');
    try {
      // A page with links both ways: the first section overview.
      const target = report.pages.find((p) => p.route === '/guides/')!;
      // Links that reach a page (a broken fragment still reaches it); navigation links (from '') apart.
      const reaching = report.links.filter((l) => l.kind === 'internal' && (l.status === 'ok' || l.status === 'broken-fragment'));
      const page = (to: string): string => to.split('#')[0]!;
      const inFrom = [...new Set(reaching.filter((l) => page(l.to) === target.route && l.from !== '' && l.from !== target.route).map((l) => l.from))].sort();
      const outTo = [...new Set(reaching.filter((l) => l.from === target.route && page(l.to) !== target.route).map((l) => page(l.to)))].sort();
      expect(inFrom.length).toBeGreaterThan(0);
      expect(outTo.length).toBeGreaterThan(0);
      await o.page.fill('#lw-search', target.route);
      await expect.poll(() => o.page.$$eval('#lw-matches button', (b) => b.length)).toBeGreaterThan(0);
      await o.page.press('#lw-search', 'Enter');
      await o.page.waitForSelector('#lw-focus-title');
      expect(await o.page.textContent('#lw-focus-title')).toBe(target.title);
      const listed = async (id: string): Promise<string[]> => (await o.page.$$eval(`#${id} button`, (b) => b.map((x) => x.getAttribute('data-route')!))).sort();
      expect(await listed('lw-in-list')).toEqual(inFrom);
      expect(await listed('lw-out-list')).toEqual(outTo);
      // The navigation's links stand on every page: said in words, not listed on each page.
      expect(await o.page.textContent('#lw-nav-in')).toContain('every page');
      const navCount = report.links.filter((l) => l.from === '').length;
      expect(await o.page.textContent('#lw-nav-out')).toContain(`${navCount} pages of the navigation`);
      // The canvas's text alternative names the same neighbours.
      const drawn = await o.page.$$eval('#lw-drawn li', (li) => li.map((x) => x.textContent!));
      const firstIn = report.pages.find((p) => p.route === inFrom[0])!;
      expect(drawn.some((t) => t.includes(firstIn.route))).toBe(true);
      await o.page.locator('#lw-graph').screenshot({ path: '/tmp/lw-report-focus.png' });
      // Picking a neighbour from the list moves the focus to it.
      await o.page.click(`#lw-in-list button[data-route="${inFrom[0]}"]`);
      expect(await o.page.textContent('#lw-focus-title')).toBe(firstIn.title);
      // A search with no match says so and keeps the view.
      await o.page.fill('#lw-search', 'zzz-no-such-page');
      await o.page.press('#lw-search', 'Enter');
      expect(await o.page.textContent('#lw-matches')).toContain('No page matches');
      expect(o.errors).toEqual([]);
    } finally {
      await o.close();
    }
  });

  it('clicking a node on the canvas focuses its page; hovering names it', async () => {
    const o = await open(report, 'click');
    try {
      const target = report.pages.findIndex((p) => p.depth === null);
      await o.page.locator('#lw-canvas').scrollIntoViewIfNeeded();
      const at = await o.page.evaluate((id) => {
        const raw = JSON.parse(document.getElementById('lw-data').textContent);
        const box = document.getElementById('lw-canvas').getBoundingClientRect();
        const pos = raw.overview.positions;
        return { x: box.x + (pos[2 * id] * box.width) / 1000, y: box.y + (pos[2 * id + 1] * box.height) / 640 };
      }, target);
      await o.page.mouse.move(at.x, at.y);
      expect(await o.page.isVisible('#lw-tip')).toBe(true);
      expect(await o.page.textContent('#lw-tip')).toContain(report.pages[target]!.route);
      await o.page.mouse.click(at.x, at.y);
      expect(await o.page.textContent('#lw-focus-title')).toBe(report.pages[target]!.title);
      expect(await o.page.textContent('#lw-focus-flags')).toMatch(/orphan|unreachable/);
      // Whole site goes back to the overview.
      await o.page.click('#lw-overview-btn');
      expect(await o.page.$$eval('#lw-lost-list button', (b) => b.length)).toBe(report.stats.unreachable);
    } finally {
      await o.close();
    }
  });

  it('is keyboard usable: Tab reaches the search box, Enter on a header sorts', async () => {
    const o = await open(report, 'keyboard');
    try {
      let reached = false;
      for (let k = 0; k < 15 && !reached; k++) {
        await o.page.keyboard.press('Tab');
        reached = await o.page.evaluate(() => document.activeElement?.id === 'lw-search');
      }
      expect(reached).toBe(true);
      await o.page.keyboard.type('/guides/');
      await o.page.keyboard.press('Enter');
      await o.page.waitForSelector('#lw-focus-title');
      await o.page.focus('#lw-findings-table thead button[data-key="message"]');
      const outline = await o.page.$eval('#lw-findings-table thead button[data-key="message"]', (b) => getComputedStyle(b).outlineStyle as string);
      expect(outline).not.toBe('none');
      await o.page.keyboard.press('Enter');
      const messages = report.findings.map((f) => f.message).sort((a, b) => a.localeCompare(b, 'en'));
      expect(await rowTexts(o.page, 'findings', 4)).toEqual(messages);
      await o.page.keyboard.press('Space');
      expect(await rowTexts(o.page, 'findings', 4)).toEqual([...messages].reverse());
    } finally {
      await o.close();
    }
  });

  it('a hostile page title shows as text and runs nothing', async () => {
    const hostile = '<img src=x onerror=alert(1)><script>alert(2)</script>';
    const o = await open(buildFixtureReport({ hostileTitle: hostile }), 'hostile');
    try {
      expect(await o.page.$$eval('img', (i) => i.length)).toBe(0);
      await o.page.fill('#lw-search', 'alert');
      await o.page.press('#lw-search', 'Enter');
      expect(await o.page.textContent('#lw-focus-title')).toBe(hostile);
      expect(await o.page.$$eval('img', (i) => i.length)).toBe(0);
      expect(await o.page.$$eval('script', (s) => s.length)).toBe(2);
      expect(o.dialogs).toEqual([]);
      expect(o.errors).toEqual([]);
    } finally {
      await o.close();
    }
  });

  it('opens a report of an empty site without errors', async () => {
    const empty: Report = {
      ...report,
      stats: { ...report.stats, files: 0, pages: 0, links: 0, internalLinks: 0, brokenLinks: 0, brokenFragments: 0, orphans: 0, unreachable: 0, deadEnds: 0, maxDepth: null, findings: { error: 0, warning: 0 } },
      pages: [], links: [], findings: [], suggestions: [],
      gate: { passed: true, failOn: 'error', failures: [] },
    };
    const o = await open(empty, 'empty');
    try {
      expect(await o.page.textContent('#lw-gate')).toContain('This run passes (exit 0)');
      expect(await o.page.textContent('#lw-findings-table tbody')).toContain('No findings');
      expect(o.errors).toEqual([]);
    } finally {
      await o.close();
    }
  });

  it('opens a 5,000-page report and draws the folder overview and a focused page', async () => {
    const big = buildFixtureReport({ pages: 5000, seed: 11 });
    const o = await open(big, 'big');
    try {
      expect(await o.page.$$eval('#lw-folder-list button', (b) => b.length)).toBeGreaterThan(10);
      // The canvas has been drawn on: some pixels are not blank.
      const inked = await o.page.$eval('#lw-canvas', (c) => {
        const cv = c as HTMLCanvasElement;
        const data = cv.getContext('2d')!.getImageData(0, 0, cv.width, cv.height).data;
        let n = 0;
        for (let i = 3; i < data.length; i += 4 * 16) if (data[i]! > 0) n++;
        return n;
      });
      expect(inked).toBeGreaterThan(100);
      await o.page.screenshot({ path: '/tmp/lw-report-5000.png' });
      const hub = big.pages.reduce((a, b) => (b.inlinks > a.inlinks ? b : a));
      await o.page.fill('#lw-search', hub.route);
      await o.page.press('#lw-search', 'Enter');
      expect(await o.page.textContent('#lw-focus-title')).toBe(hub.title);
      expect(await o.page.$$eval('#lw-in-list li', (li) => li.length)).toBeGreaterThan(20);
      await o.page.screenshot({ path: '/tmp/lw-report-5000-focus.png' });
      expect(o.errors).toEqual([]);
    } finally {
      await o.close();
    }
  });
});
