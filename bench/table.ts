/**
 * The bench's one table: a row per measurement, a column per site size, and the target with a
 * pass/miss mark beside each measured ratio that has one.
 */
import type { HtmlOpenResult } from './html.js';
import { htmlCell } from './html.js';
import type { MeasureResult, RelatedResult, RssResult } from './one-size.js';
import type { BenchStage, RunTiming } from './pipeline.js';
import { STAGES, median } from './pipeline.js';

/** Everything measured for one size (a child that failed leaves its error). */
export interface SizeResult {
  readonly size: number;
  /** The site kind (bench/site/plan.ts). */
  readonly vocabulary: string;
  readonly generateMs: number;
  readonly rss: RssResult | { readonly error: string };
  readonly measure: MeasureResult | { readonly error: string };
  /** The HTML report of the first cold run, opened in chromium (absent in older results). */
  readonly html?: HtmlOpenResult | { readonly error: string };
}

/** The machine the bench ran on. */
export interface MachineInfo {
  readonly date: string;
  readonly cpu: string;
  readonly cores: number;
  readonly memoryBytes: number;
  readonly node: string;
  readonly platform: string;
  /** 1-minute load average at the start and the end of the run (other work on the machine). */
  readonly load: readonly [number, number];
}

/** Targets of the speed-at-scale issues (the ratios the bench marks pass or miss). */
export const TARGETS = {
  coldCheckOverBareAt10k: 1.0,
  coldSuggestOverBareAt10k: 1.3,
  /** At 5,000 and 10,000 pages. */
  warmOverCold: 0.03,
  /** `suggest`, at 10,000 pages. */
  warmChangedOverCold: 0.08,
  textSuggestOverParse: 0.3,
  pagerankSpeedup: 20,
  iterationOverBound: 4,
  relatedSpeedup: 40,
  textGrowth10kTo50k: 6,
  peakRssAt100kBytes: 2.5 * 1024 ** 3,
  /** The HTML report at 100,000 pages: bytes, and milliseconds to open in chromium. */
  htmlAt100k: { bytes: 15 * 1024 * 1024, openMs: 3000 },
} as const;

const int = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/** Milliseconds (or any positive number) with a sensible number of digits. */
export function num(v: number): string {
  if (!Number.isFinite(v)) return 'n/a';
  if (Math.abs(v) >= 100) return int.format(v);
  if (Math.abs(v) >= 10) return v.toFixed(1);
  if (Math.abs(v) >= 0.1) return v.toFixed(2);
  return v.toPrecision(2);
}

function mark(ok: boolean): string {
  return ok ? 'pass' : 'MISS';
}

type Measured = MeasureResult;
const isMeasured = (m: SizeResult['measure']): m is Measured => 'mode' in m;
const isRss = (r: SizeResult['rss']): r is RssResult => 'mode' in r;

function stageMedian(m: Measured, stage: BenchStage): number {
  return median(m.cold.map((r) => r.stages[stage]));
}

/** Render the table (Markdown, readable as plain text too). */
export function renderTable(
  results: readonly SizeResult[],
  related: readonly (RelatedResult | { error: string })[],
  machine: MachineInfo,
  htmlFixture: HtmlOpenResult | { error: string } | null = null,
): string {
  const kinds = new Set(results.map((r) => r.vocabulary));
  const header = ['measurement', ...results.map((r) => `${int.format(r.size)} pages${kinds.size > 1 || r.vocabulary !== 'topical' ? ` (${r.vocabulary})` : ''}`), 'target'];
  const rows: string[][] = [];
  const row = (label: string, cell: (r: SizeResult, i: number) => string, target = ''): void => {
    rows.push([label, ...results.map((r, i) => cell(r, i)), target]);
  };
  const m = (cell: (x: Measured, i: number) => string) => (r: SizeResult, i: number): string =>
    isMeasured(r.measure) ? cell(r.measure, i) : `error: ${r.measure.error.slice(0, 60)}`;

  row('site: files / MB of sources', m((x) => `${int.format(x.files)} / ${(x.sourceBytes / 1e6).toFixed(1)}`));
  row('site: pages / links in the report', m((x) => `${int.format(x.cold[0]!.pages)} / ${int.format(x.cold[0]!.links)}`));
  row('runs (medians of)', m((x) => String(x.runs)));
  row('generate site ms (bench set-up, not timed in totals)', (r) => num(r.generateMs));
  for (const stage of ['collect', 'parse', 'graph', 'rank', 'text', 'suggest'] as const) {
    row(`${stage} ms`, m((x) => num(stageMedian(x, stage))));
  }
  row('rules + report ms', m((x) => num(stageMedian(x, 'rules') + stageMedian(x, 'report'))));
  row('write ms (JSON format + atomic write)', m((x) => num(stageMedian(x, 'write'))));
  row('total ms, cold', m((x) => num(median(x.cold.map((c) => c.totalMs)))));
  row('total ms, cold, fresh process', (r) => (isRss(r.rss) ? num(r.rss.coldMs) : `error: ${r.rss.error.slice(0, 60)}`));
  row(
    'peak RSS, fresh process',
    (r) => {
      if (!isRss(r.rss)) return 'error';
      const v = `${int.format(r.rss.maxRssBytes / 1024 ** 2)} MB`;
      return r.size === 100_000 ? `${v} ${mark(r.rss.maxRssBytes <= TARGETS.peakRssAt100kBytes)}` : v;
    },
    '<= 2.5 GB at 100,000',
  );
  row('total CPU ms, cold (all threads)', m((x) => num(median(x.cold.map((c) => c.cpuMs)))));
  row('bare parse ms (remark-parse alone)', m((x) => num(median(x.bareParse.map((b) => b.ms)))));
  const overBare = (pick: (x: Measured) => readonly RunTiming[], limit: number) => m((x) => {
    const runs = pick(x);
    if (runs.length === 0) return 'n/a';
    const v = median(runs.map((c) => c.totalMs)) / median(x.bareParse.map((b) => b.ms));
    const c = median(runs.map((r) => r.cpuMs)) / median(x.bareParse.map((b) => b.cpuMs));
    const cpu = ` (CPU ${c.toFixed(2)})`;
    return x.size === 10_000 ? `${v.toFixed(2)} ${mark(v <= limit)}${cpu}` : `${v.toFixed(2)}${cpu}`;
  });
  row('total ms, cold check', m((x) => (x.coldCheck.length === 0 ? 'n/a' : num(median(x.coldCheck.map((c) => c.totalMs))))));
  row('cold check total / bare parse', overBare((x) => x.coldCheck, TARGETS.coldCheckOverBareAt10k), '<= 1.0 at 10,000');
  row('cold suggest total / bare parse', overBare((x) => x.cold, TARGETS.coldSuggestOverBareAt10k), '<= 1.3 at 10,000');
  row(
    '(text + suggest) / parse, cold suggest',
    m((x) => {
      const v = (stageMedian(x, 'text') + stageMedian(x, 'suggest')) / stageMedian(x, 'parse');
      return `${v.toFixed(2)} ${mark(v <= TARGETS.textSuggestOverParse)}`;
    }),
    '<= 0.3',
  );
  const warmRatio = (pick: (x: Measured) => readonly RunTiming[], limit: number, marked: (size: number) => boolean) => m((x) => {
    const w = pick(x);
    if (w.length === 0) return 'n/a (cache not built)';
    const v = median(w.map((c) => c.totalMs)) / median(x.cold.map((c) => c.totalMs));
    const c = median(w.map((r) => r.cpuMs)) / median(x.cold.map((r) => r.cpuMs));
    return `${v.toFixed(3)}${marked(x.size) ? ` ${mark(v <= limit)}` : ''} (CPU ${c.toFixed(3)})`;
  });
  row('warm, no change / cold suggest', warmRatio((x) => x.warm, TARGETS.warmOverCold, (n) => n === 5000 || n === 10_000), '<= 0.03 at 5,000 and 10,000');
  row('warm, one link target changed / cold suggest', warmRatio((x) => x.warmRelinked ?? [], TARGETS.warmChangedOverCold, () => false));
  row('warm, one file changed / cold suggest', warmRatio((x) => x.warmChanged, TARGETS.warmChangedOverCold, (n) => n === 10_000), '<= 0.08 at 10,000');
  const largest = (pick: (x: Measured) => readonly RunTiming[]) => m((x) => {
    const runs = pick(x);
    if (runs.length === 0) return 'n/a';
    const top = STAGES.map((st) => [st, median(runs.map((w) => w.stages[st]))] as const).sort((a, b) => b[1] - a[1]).slice(0, 3);
    return top.map(([st, v]) => `${st} ${num(v)}`).join(', ');
  });
  row('warm, no change: largest stages ms', largest((x) => x.warm));
  row('warm, one link target changed: largest stages ms', largest((x) => x.warmRelinked ?? []));
  row('warm, one file changed: largest stages ms', largest((x) => x.warmChanged));
  row('PageRank graph: nodes / edges', m((x) => `${int.format(x.pagerank[0]!.nodes)} / ${int.format(x.pagerank[0]!.edges)}`));
  row('PageRank ms, ours (CSR build + iterate)', m((x) => num(median(x.pagerank.map((p) => p.ours.ms)))));
  row('PageRank ms, graphology (graph build + pagerank)', m((x) => {
    const err = x.pagerank.find((p) => p.graphologyError !== null)?.graphologyError ?? null;
    return err === null ? num(median(x.pagerank.map((p) => p.graphology.ms))) : `threw: ${err.slice(0, 40)}`;
  }));
  row(
    'PageRank speed-up vs graphology',
    m((x) => {
      const v = median(x.pagerank.map((p) => p.graphology.ms)) / median(x.pagerank.map((p) => p.ours.ms));
      const c = median(x.pagerank.map((p) => p.graphology.cpuMs)) / median(x.pagerank.map((p) => p.ours.cpuMs));
      return `${v.toFixed(1)}x ${mark(v >= TARGETS.pagerankSpeedup)} (CPU ${c.toFixed(1)}x)`;
    }),
    '>= 20x',
  );
  row('PageRank iterations / max |ours - graphology|', m((x) => `${x.pagerank[0]!.oursIterations} / ${x.pagerank[0]!.maxAbsDiff.toExponential(1)}`));
  const perIteration = (x: Measured): number => median(x.pagerank.map((p) => p.oursIterateMs / p.oursIterations));
  const bound = (x: Measured): number => (x.pagerank[0]!.bytesPerIteration / Math.max(x.bandwidth.float64, x.bandwidth.int32)) * 1000;
  row('PageRank ms / iteration', m((x) => num(perIteration(x))));
  row('bandwidth bound ms / iteration (bytes read / read rate)', m((x) => `${num(bound(x))} (${(x.pagerank[0]!.bytesPerIteration / 1e6).toFixed(1)} MB at ${(Math.max(x.bandwidth.float64, x.bandwidth.int32) / 1e9).toFixed(1)} GB/s)`));
  row(
    'ms / iteration vs bound',
    m((x) => {
      const v = perIteration(x) / bound(x);
      return `${v.toFixed(1)}x ${mark(v <= TARGETS.iterationOverBound)}`;
    }),
    'within 4x',
  );
  const growth = (stage: BenchStage, limit: number | null) => (r: SizeResult, i: number): string => {
    const prev = results.slice(0, i).reverse().find((x) => x.vocabulary === r.vocabulary);
    if (prev === undefined) return '-';
    if (!isMeasured(r.measure) || !isMeasured(prev.measure)) return 'n/a';
    const v = stageMedian(r.measure, stage) / stageMedian(prev.measure, stage);
    const ratio = `${v.toFixed(1)}x for ${(r.size / prev.size).toFixed(0)}x pages`;
    return limit !== null && prev.size === 10_000 && r.size === 50_000 ? `${ratio} ${mark(v <= limit)}` : ratio;
  };
  row('text: time / previous size (same kind)', growth('text', TARGETS.textGrowth10kTo50k), '<= 6x from 10,000 to 50,000');
  row('suggest: time / previous size (same kind)', growth('suggest', null), '~ pages ratio');

  const HTML_TARGET = '<= 15 MB and open < 3,000 ms at 100,000';
  const htmlOf = (r: SizeResult): string => {
    if (r.html === undefined) return 'n/a';
    if (!('mode' in r.html)) return `error: ${r.html.error.slice(0, 60)}`;
    return htmlCell(r.html, TARGETS.htmlAt100k, r.size === 100_000);
  };
  row('HTML report (real, first cold run): size; open in chromium; blank page', htmlOf, HTML_TARGET);
  if (htmlFixture !== null) {
    const text = 'mode' in htmlFixture ? htmlCell(htmlFixture, TARGETS.htmlAt100k, true) : `error: ${htmlFixture.error.slice(0, 60)}`;
    const pages = 'mode' in htmlFixture ? int.format(htmlFixture.pages) : '100,000';
    row(`HTML report of the ${pages}-page test fixture: size; open in chromium; blank page`, (_r, i) => (i === 0 ? text : ''), HTML_TARGET);
  }

  const relatedCells = (text: string): ((r: SizeResult, i: number) => string) => (_r, i) => (i === 0 ? text : '');
  for (const rel of related) {
    if (!('mode' in rel)) {
      row('related top-10 on 2,000 pages', relatedCells(`error: ${rel.error.slice(0, 60)}`), '>= 40x');
      continue;
    }
    const inv = median(rel.inverted.map((s) => s.ms));
    const speed = rel.brute.ms / inv;
    const cpuSpeed = rel.brute.cpuMs / median(rel.inverted.map((s) => s.cpuMs));
    const on = `related top-10 on ${int.format(rel.size)} pages (${rel.vocabulary})`;
    row(`${on}: inverted / brute ms`, relatedCells(`${num(inv)} / ${num(rel.brute.ms)}`));
    row(`${on}: speed-up vs brute force`, relatedCells(`${speed.toFixed(0)}x ${mark(speed >= TARGETS.relatedSpeedup)} (CPU ${cpuSpeed.toFixed(0)}x)`), '>= 40x');
    const work = `${int.format(rel.postingsRead)} postings + ${int.format(rel.entriesScored)} row entries scored, of ${int.format(rel.postingsTotal)} postings`;
    row(`${on}: work`, relatedCells(work));
    const same = rel.differing === 0 ? 'identical' : `${rel.differing} pages differ (${rel.differingBeyondTies} beyond k-th place ties)`;
    row(`${on}: sets vs brute force`, relatedCells(same), 'identical');
  }

  const opened = [...results.map((r) => r.html), htmlFixture].find((h): h is HtmlOpenResult => h !== undefined && h !== null && 'mode' in h && h.browser !== null);
  const browserLine = opened?.browser ? [`HTML reports opened in headless chromium ${opened.browser.version} (${opened.browser.source === 'system' ? 'Debian\'s /usr/bin/chromium' : 'the @sparticuz/chromium binary'}); open = page.goto until the report's script has set data-ready, in a new context, median of 3; in page = the navigation's domContentLoadedEventEnd.`, ''] : [];
  const lines = [
    `${machine.date} · ${machine.cpu} × ${machine.cores} · ${(machine.memoryBytes / 1024 ** 3).toFixed(0)} GiB · Node ${machine.node} · ${machine.platform} · load average ${machine.load[0].toFixed(1)} at start, ${machine.load[1].toFixed(1)} at end`,
    '',
    ...browserLine,
    `| ${header.join(' | ')} |`,
    `| ${header.map((_, i) => (i === 0 ? '---' : '---:')).join(' | ')} |`,
    ...rows.map((r) => `| ${r.join(' | ')} |`),
  ];
  return `${lines.join('\n')}\n`;
}
