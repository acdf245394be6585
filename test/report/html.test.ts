import { createHash } from 'node:crypto';
import { describe, it, expect } from 'vitest';
import { CLIENT_SCRIPT } from '../../src/report/html/client.generated.js';
import { htmlFormatter, formatHtml } from '../../src/report/html/format.js';
import { escapeHtml, jsonForScript } from '../../src/report/html/escape.js';
import type { HtmlData } from '../../src/report/html/data.js';
import { decodeRows } from '../../src/report/html/embed.js';
import type { EmbeddedData } from '../../src/report/html/embed.js';
import type { Report } from '../../src/types.js';
import { buildFixtureReport } from '../browser/report-fixture.js';

const ctx = { color: false };

/** The embedded data, read back the way the page reads it (rows decoded to objects). */
function embedded(html: string): HtmlData {
  const m = /<script type="application\/json" id="lw-data">([\s\S]*?)<\/script>/.exec(html);
  expect(m).not.toBeNull();
  const raw = JSON.parse(m![1]!) as EmbeddedData;
  return {
    ...raw,
    pages: decodeRows(raw.pages, raw.fields.pages).map((p) => ({ ...p, orphan: p.orphan === 1, nav: p.nav === 1 })),
    findings: decodeRows(raw.findings, raw.fields.findings),
    suggestions: decodeRows(raw.suggestions, raw.fields.suggestions),
  } as unknown as HtmlData;
}

function withTitle(report: Report, index: number, title: string): Report {
  return { ...report, pages: report.pages.map((p, i) => (i === index ? { ...p, title } : p)) };
}

describe('html formatter', () => {
  const report = buildFixtureReport();

  it('is registered as html with the .html extension', () => {
    expect(htmlFormatter.id).toBe('html');
    expect(htmlFormatter.fileExtension).toBe('.html');
    expect(htmlFormatter.format(report, ctx).startsWith('<!doctype html>')).toBe(true);
  });

  it('gives byte-identical output for the same report, and for a copy of it', () => {
    const a = formatHtml(report);
    const b = formatHtml(structuredClone(report));
    expect(a).toBe(b);
    expect(formatHtml(buildFixtureReport())).toBe(a);
  });

  it('embeds data that parses back to the report numbers', () => {
    const data = embedded(formatHtml(report));
    expect(data.stats).toEqual(report.stats);
    expect(data.gate).toEqual(report.gate);
    expect(data.maxDepth).toBe(report.options.maxDepth);
    expect(data.pages.map((p) => [p.route, p.pagerank, p.rank, p.depth, p.inlinks, p.outlinks])).toEqual(
      report.pages.map((p) => [p.route, p.pagerank, p.rank, p.depth, p.inlinks, p.outlinks]),
    );
    expect(data.findings.map((f) => `${f.rule} ${f.file}:${f.line}:${f.column}`)).toEqual(
      report.findings.map((f) => `${f.rule} ${f.file}:${f.line}:${f.column}`),
    );
    expect(data.suggestions.map((s) => [s.id, s.anchor, s.targetRankBefore, s.targetRankAfter, s.depthBefore, s.depthAfter])).toEqual(
      report.suggestions.map((s) => [s.id, s.anchor, s.targetRankBefore, s.targetRankAfter, s.depthBefore, s.depthAfter]),
    );
    // Histogram: pages per depth, and the unreachable count, as the report's pages say.
    const perDepth = new Map<number, number>();
    for (const p of report.pages) if (p.depth !== null) perDepth.set(p.depth, (perDepth.get(p.depth) ?? 0) + 1);
    data.histogram.counts.forEach((c, d) => expect(c).toBe(perDepth.get(d) ?? 0));
    expect(data.histogram.unreachable).toBe(report.stats.unreachable);
    expect(data.histogram.counts.length).toBeGreaterThan(report.stats.maxDepth!);
  });

  it('keeps one edge per page pair, content links flagged, navigation links as a page flag', () => {
    const data = embedded(formatHtml(report));
    const pairs = new Set<string>();
    for (let e = 0; e < data.edges.length; e += 3) {
      const key = `${data.edges[e]}>${data.edges[e + 1]}`;
      expect(pairs.has(key)).toBe(false);
      pairs.add(key);
      expect(data.edges[e + 2]! & 3).toBeGreaterThan(0);
    }
    const first = report.links.find((l) => l.from === '/' && l.status === 'ok')!;
    const from = report.pages.findIndex((p) => p.route === first.from);
    const to = report.pages.findIndex((p) => p.route === first.to);
    expect(pairs.has(`${from}>${to}`)).toBe(true);
    const navTargets = new Set(report.links.filter((l) => l.from === '').map((l) => l.to));
    expect(data.pages.filter((p) => p.nav).map((p) => p.route).sort()).toEqual([...navTargets].sort());
  });

  it('marks the bars and the limit in the histogram', () => {
    const html = formatHtml(report);
    const bars = [...html.matchAll(/<rect class="lw-bar [^"]*" data-depth="([^"]+)" data-count="(\d+)"[^>]* height="([\d.]+)"/g)];
    const data = embedded(html);
    expect(bars.map((b) => b[1])).toEqual([...data.histogram.counts.map((_, d) => String(d)), 'unreachable']);
    expect(bars.map((b) => Number(b[2]))).toEqual([...data.histogram.counts, data.histogram.unreachable]);
    expect(html).toContain(`data-max-depth="${report.options.maxDepth}"`);
  });

  it('escapes a hostile page title in markup and in the embedded JSON', () => {
    const hostile = '<img src=x onerror=alert(1)></script><!-- "quoted" & \'single\'';
    const top = [...report.pages.keys()].sort((a, b) => report.pages[b]!.pagerank - report.pages[a]!.pagerank)[0]!;
    const html = formatHtml(withTitle(report, top, hostile));
    expect(html).not.toContain('<img');
    expect(html.split('</script>').length - 1).toBe(2); // only the two script elements close
    expect(html.split('<!--').length - 1).toBe(0);
    // The top page is named in the PageRank list and chart: escaped there.
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;&lt;/script&gt;&lt;!-- &quot;quoted&quot; &amp; &#39;single&#39;');
    // And the data gives the title back exactly.
    expect(embedded(html).pages[top]!.title).toBe(hostile);
  });

  it('escapes hostile file names, messages and anchors too', () => {
    const evil = '</script><script>alert(2)</script>';
    const r: Report = {
      ...report,
      root: `/tmp/${evil}`,
      findings: report.findings.map((f, i) => (i === 0 ? { ...f, message: evil, file: `<b>${f.file}` } : f)),
      suggestions: report.suggestions.map((s, i) => (i === 0 ? { ...s, anchor: evil } : s)),
    };
    const html = formatHtml(r);
    expect(html).not.toMatch(/<script>alert/);
    expect(html).not.toContain('<b>');
    const data = embedded(html);
    expect(data.findings[0]!.message).toBe(evil);
    expect(data.suggestions[0]!.anchor).toBe(evil);
    expect(data.root).toBe(`/tmp/${evil}`);
  });

  it('lets only its own script and style run, and loads nothing', () => {
    const html = formatHtml(report);
    const csp = /<meta http-equiv="Content-Security-Policy" content="([^"]+)">/.exec(html)![1]!;
    expect(csp).toContain("default-src 'none'");
    expect(csp).toMatch(/script-src 'sha256-[A-Za-z0-9+/=]+'/);
    expect(html).not.toMatch(/\s(src|href)="(https?:)?\/\//);
    expect(html).not.toMatch(/<link\b/);
    // The browser runs the inline script only if its sha256 is the one the policy names
    // (CSP Level 3, "hash-source"): the one script without a type is the client script.
    const scripts = [...html.matchAll(/<script(?: [^>]*)?>([\s\S]*?)<\/script>/g)].filter((m) => !m[0].startsWith('<script type='));
    expect(scripts).toHaveLength(1);
    expect(scripts[0]![1]).toBe(CLIENT_SCRIPT);
    const digest = createHash('sha256').update(scripts[0]![1]!, 'utf8').digest('base64');
    expect(csp).toContain(`script-src 'sha256-${digest}'`);
  });

  it('escapeHtml and jsonForScript', () => {
    expect(escapeHtml(`<a href="x">&'`)).toBe('&lt;a href=&quot;x&quot;&gt;&amp;&#39;');
    const s = jsonForScript({ t: '</script><!--&\u2028' });
    expect(s).not.toMatch(/[<>&\u2028]/);
    expect(JSON.parse(s)).toEqual({ t: '</script><!--&\u2028' });
  });

  it('shows folders instead of pages above 300 pages, with the same layout rules', () => {
    const big = buildFixtureReport({ pages: 800, seed: 3 });
    const data = embedded(formatHtml(big));
    expect(data.overview.kind).toBe('folders');
    if (data.overview.kind !== 'folders') return;
    expect(data.overview.pageFolder.length).toBe(big.pages.length);
    const sum = data.overview.folders.reduce((a, f) => a + f.pages, 0);
    expect(sum).toBe(big.pages.length);
    // A folder whose pages are all unreachable sits in the box; the others on their ring.
    const box = data.overview.box!;
    for (const f of data.overview.folders) {
      const inBox = f.x >= box.x && f.x <= box.x + box.w && f.y >= box.y && f.y <= box.y + box.h;
      expect(inBox).toBe(f.minDepth === null);
    }
    expect(embedded(formatHtml(report)).overview.kind).toBe('pages');
  });

  it('lays out pages on rings by click depth, unreachable ones in the box', () => {
    const data = embedded(formatHtml(report));
    const o = data.overview;
    if (o.kind !== 'pages') throw new Error('expected the page overview');
    data.pages.forEach((p, i) => {
      const x = o.positions[2 * i]!;
      const y = o.positions[2 * i + 1]!;
      if (p.depth === null) {
        expect(x).toBeGreaterThanOrEqual(o.box!.x);
        expect(x).toBeLessThanOrEqual(o.box!.x + o.box!.w);
      } else {
        const r = Math.hypot(x - o.rings.cx, y - o.rings.cy);
        expect(Math.abs(r - o.rings.radii[p.depth]!)).toBeLessThan(0.2);
        if (p.depth > 0) expect(o.rings.radii[p.depth]!).toBeGreaterThan(o.rings.radii[p.depth - 1]!);
        expect(r < o.rings.limit).toBe(p.depth <= data.maxDepth);
      }
    });
  });
});
