import { describe, it, expect } from 'vitest';
import { formatHtml } from '../../src/report/html/format.js';
import { buildHtmlData, SUMMARY_LIMITS } from '../../src/report/html/data.js';
import type { SummaryLimits } from '../../src/report/html/data.js';
import { buildFixtureReport } from '../browser/report-fixture.js';

const small: SummaryLimits = { pages: 100, rows: 1000, worstPages: 20, findings: 5, suggestions: 3, rankSamples: 10 };

describe('HTML report summary of a large site', () => {
  const report = buildFixtureReport({ pages: 400, seed: 3 });
  const full = buildHtmlData(report, { ...small, pages: 10_000 });
  const data = buildHtmlData(report, small);

  it('embeds everything up to the limits, a summary above them', () => {
    expect(full.summary).toBeNull();
    expect(full.pages).toHaveLength(report.pages.length);
    expect(data.summary).toEqual({
      pages: { kept: data.pages.length, total: report.pages.length },
      findings: { kept: Math.min(5, report.findings.length), total: report.findings.length },
      suggestions: { kept: Math.min(3, report.suggestions.length), total: report.suggestions.length },
    });
    expect(data.pages.length).toBeLessThan(report.pages.length);
  });

  it('keeps the counts and the click-depth histogram of the whole site', () => {
    expect(data.stats).toEqual(full.stats);
    expect(data.gate).toEqual(full.gate);
    expect(data.histogram).toEqual(full.histogram);
  });

  it('keeps errors first, the best suggestions, and every page they name', () => {
    const errors = full.findings.filter((f) => f.severity === 'error');
    expect(data.findings).toEqual([...errors, ...full.findings.filter((f) => f.severity !== 'error')].slice(0, 5));
    expect(data.suggestions).toEqual(full.suggestions.slice(0, 3));
    const routes = new Set(data.pages.map((p) => p.route));
    for (const f of data.findings) if (full.pages.some((p) => p.route === f.route)) expect(routes.has(f.route)).toBe(true);
    for (const s of data.suggestions) expect(routes.has(s.source) && routes.has(s.target)).toBe(true);
  });

  it('keeps the pages with the most findings, the top pages by PageRank and the deepest page, renumbered in route order', () => {
    const routes = data.pages.map((p) => p.route);
    expect(routes).toEqual([...routes].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0)));
    const most = Math.max(...full.pages.map((p) => p.findings));
    for (const p of full.pages) if (p.findings === most) expect(routes).toContain(p.route);
    expect(data.topPages.map((id) => data.pages[id]!.route)).toEqual(full.topPages.map((id) => full.pages[id]!.route));
    expect(data.pages[data.deepestPage]!.route).toBe(full.pages[full.deepestPage]!.route);
  });

  it('keeps exactly the links between kept pages', () => {
    const key = (d: typeof data, e: number): string => `${d.pages[d.edges[e]!]!.route} ${d.pages[d.edges[e + 1]!]!.route} ${d.edges[e + 2]}`;
    const kept = new Set(data.pages.map((p) => p.route));
    const expected: string[] = [];
    for (let e = 0; e < full.edges.length; e += 3) {
      if (kept.has(full.pages[full.edges[e]!]!.route) && kept.has(full.pages[full.edges[e + 1]!]!.route)) expected.push(key(full, e));
    }
    const got: string[] = [];
    for (let e = 0; e < data.edges.length; e += 3) got.push(key(data, e));
    expect(got).toEqual(expected);
    expect(got.length).toBeGreaterThan(0);
  });

  it('says so in the page, and not on a small site', () => {
    const big = buildFixtureReport({ pages: SUMMARY_LIMITS.pages + 200, seed: 4 });
    const html = formatHtml(big);
    expect(html).toContain('id="lw-summary-notice"');
    expect(html).toContain(`of ${big.pages.length} pages`);
    expect(html).toContain('--format json --output report.json');
    expect(formatHtml(report)).not.toContain('lw-summary-notice');
  });
});
