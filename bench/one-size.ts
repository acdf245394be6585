/**
 * One size of the benchmark, in a process of its own (so sizes do not pollute each other's
 * heap, JIT state or peak RSS). Prints one line `RESULT {json}` on stdout.
 *
 *   node dist-bench/bench/one-size.js --size N [--dir SITE] [--runs R] [--mode measure|rss|related]
 *
 * - `rss`: one cold run of the pipeline in this fresh process; reports its time and the
 *   process's peak RSS (`process.resourceUsage().maxRSS`).
 * - `measure`: the references (bare parse, PageRank against graphology, sequential-read rate)
 *   and the pipeline cold, warm with no change, warm with one link target changed, and warm with
 *   one file changed (a paragraph added); medians of R.
 * - `related`: the inverted-index top-10 against brute force on the site's term index.
 * - `html`: the HTML report's size and the time chromium takes to open it (bench/html.ts): the
 *   report at `--html FILE` (written by `measure --html-out FILE` from its first cold run), or,
 *   without `--html`, the browser tests' fixture report of `--size` pages
 *   (test/browser/report-fixture.ts) formatted by the built package.
 * Without `--dir`, the site is generated into a temporary folder and removed afterwards.
 */
import { appendFileSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseArgs } from 'node:util';
import { buildFixtureReport } from '../test/browser/report-fixture.js';
import { bruteForceRelated, compareRelated } from './brute-force.js';
import { runFront } from './front.js';
import { generateSite, relinkOne } from './generate.js';
import { measureHtmlOpen } from './html.js';
import type { HtmlOpenResult } from './html.js';
import { loadBuilt } from './lib.js';
import type { Built } from './lib.js';
import type { RunTiming } from './pipeline.js';
import { folderBytes, median, runPipeline } from './pipeline.js';
import type { PagerankComparison } from './references.js';
import type { Span } from './references.js';
import { bareParse, comparePagerank, edgesOf, measureBandwidth, startClock } from './references.js';

/** What `--mode rss` reports. */
export interface RssResult {
  readonly mode: 'rss';
  readonly size: number;
  readonly maxRssBytes: number;
  readonly coldMs: number;
  readonly pages: number;
}

/** What `--mode measure` reports. */
export interface MeasureResult {
  readonly mode: 'measure';
  readonly size: number;
  readonly runs: number;
  readonly files: number;
  readonly sourceBytes: number;
  readonly cold: RunTiming[];
  /** Cold `check` runs (no suggestions), a fresh cache folder each. */
  readonly coldCheck: RunTiming[];
  /** Empty when the cache wrote nothing (not built yet). */
  readonly warm: RunTiming[];
  readonly warmChanged: RunTiming[];
  /** Warm, after one content link of one page was pointed at another page (no text changed). */
  readonly warmRelinked?: RunTiming[];
  readonly cacheBytes: number;
  readonly bareParse: Span[];
  readonly pagerank: PagerankComparison[];
  readonly bandwidth: { float64: number; int32: number };
}

/** What `--mode related` reports. */
export interface RelatedResult {
  readonly mode: 'related';
  readonly size: number;
  readonly vocabulary: string;
  /** Posting entries read and row entries scored by the inverted-index search (its work). */
  readonly postingsRead: number;
  readonly entriesScored: number;
  /** Posting entries of all relating terms of all pages (what reading every posting would cost). */
  readonly postingsTotal: number;
  readonly terms: number;
  readonly inverted: Span[];
  readonly brute: Span;
  readonly differing: number;
  readonly differingBeyondTies: number;
}

const gc = (): void => (globalThis as { gc?: () => void }).gc?.();

async function rss(lib: Built, root: string, work: string): Promise<RssResult> {
  const t = await runPipeline(lib, root, { cacheDir: join(work, 'cache-rss'), outFile: join(work, 'report-rss.json') });
  return { mode: 'rss', size: t.pages, maxRssBytes: process.resourceUsage().maxRSS * 1024, coldMs: t.totalMs, pages: t.pages };
}

async function prepare(lib: Built, root: string) {
  const front = await runFront(lib, root);
  const { damping, pagerankIterations, pagerankTolerance } = front.options;
  return {
    paths: front.files.map((f) => join(root, f.path)),
    sourceBytes: front.files.reduce((s, f) => s + f.bytes, 0),
    edges: edgesOf(front.graph),
    damping,
    pagerankIterations,
    pagerankTolerance,
  };
}

async function measure(lib: Built, root: string, work: string, size: number, runs: number, htmlOut: string | undefined): Promise<MeasureResult> {
  // The front half once: the file list and the link graph for the references (also warms the JIT
  // for every run below, bare parse included, so they compare like with like).
  // Only what the references need is kept: the parsed facts must not stay on the heap during
  // the timed runs (a larger heap makes every major GC of the runs below slower).
  const { paths, sourceBytes, edges, damping, pagerankIterations, pagerankTolerance } = await prepare(lib, root);
  const changed = paths[Math.floor(paths.length / 2)]!;
  gc();

  // One untimed round first: both PageRanks then run with their code compiled by the JIT.
  comparePagerank(lib, edges, damping, pagerankTolerance, pagerankIterations);
  gc();
  const pagerank: PagerankComparison[] = [];
  for (let r = 0; r < runs; r++) {
    pagerank.push(comparePagerank(lib, edges, damping, pagerankTolerance, pagerankIterations));
    gc();
  }
  const bandwidth = measureBandwidth();
  gc();

  const cold: RunTiming[] = [];
  const coldCheck: RunTiming[] = [];
  const warm: RunTiming[] = [];
  const warmChanged: RunTiming[] = [];
  const warmRelinked: RunTiming[] = [];
  const bare: Span[] = [];
  let cacheBytes = 0;
  const original = readFileSync(changed, 'utf8');
  for (let r = 0; r < runs; r++) {
    let texts: string[] | null = paths.map((p) => readFileSync(p, 'utf8'));
    bare.push(bareParse(texts));
    texts = null;
    gc();
    const cacheDir = join(work, `cache-${r}`);
    const outFile = join(work, 'report.json');
    coldCheck.push(await runPipeline(lib, root, { cacheDir: join(work, `cache-check-${r}`), outFile, command: 'check' }));
    rmSync(join(work, `cache-check-${r}`), { recursive: true, force: true });
    gc();
    // The first cold run's report is also written as HTML (after its timed span) for `--mode html`.
    cold.push(await runPipeline(lib, root, { cacheDir, outFile, ...(r === 0 && htmlOut !== undefined ? { htmlOut } : {}) }));
    cacheBytes = folderBytes(cacheDir);
    gc();
    if (cacheBytes > 0) {
      warm.push(await runPipeline(lib, root, { cacheDir, outFile }));
      gc();
      // A pull request that only fixes a link: one link target changed, the words stay.
      const relinked = relinkOne(original);
      if (relinked !== null) {
        writeFileSync(changed, relinked);
        try {
          warmRelinked.push(await runPipeline(lib, root, { cacheDir, outFile }));
        } finally {
          writeFileSync(changed, original);
        }
        gc();
      }
      appendFileSync(changed, `\nThis paragraph was added by the benchmark run ${r + 1} to change one file; see [the section index](index.md).\n`);
      try {
        warmChanged.push(await runPipeline(lib, root, { cacheDir, outFile }));
      } finally {
        writeFileSync(changed, original);
      }
      gc();
    }
    rmSync(cacheDir, { recursive: true, force: true });
  }
  return {
    mode: 'measure', size, runs, files: paths.length, sourceBytes, cold, coldCheck, warm, warmChanged, warmRelinked, cacheBytes,
    bareParse: bare, pagerank, bandwidth,
  };
}

async function related(lib: Built, root: string, size: number, runs: number, vocabulary: string): Promise<RelatedResult> {
  const front = await runFront(lib, root);
  const index = lib.text.buildTermIndex(front.ordered.map((f) => f.text));
  const k = 10;
  const inverted: Span[] = [];
  // One untimed call of each first, so both are timed with their code compiled by the JIT.
  let fast = lib.text.relatedPages(index, k);
  gc();
  for (let r = 0; r < runs; r++) {
    const clock = startClock();
    fast = lib.text.relatedPages(index, k);
    inverted.push(clock.stop());
  }
  bruteForceRelated(lib.text.buildTermIndex(front.ordered.slice(0, 200).map((f) => f.text)), k);
  const clock = startClock();
  const slow = bruteForceRelated(index, k);
  const brute = clock.stop();
  const agreement = compareRelated(fast, slow);
  const stats = lib.text.relatedPagesWithStats(index, k);
  return {
    mode: 'related', size, vocabulary, terms: index.terms.length, inverted, brute, ...agreement,
    postingsRead: stats.postingsRead, entriesScored: stats.entriesScored, postingsTotal: stats.postingsRead + stats.postingsSkipped,
  };
}

/** `--mode html`: the report at `file`, or the fixture report of `size` pages written to a temp file. */
async function html(size: number, runs: number, file: string | undefined): Promise<HtmlOpenResult> {
  if (file !== undefined) return measureHtmlOpen(file, 'site', size, runs);
  const lib = await loadBuilt();
  const work = mkdtempSync(join(tmpdir(), 'lw-bench-html-'));
  try {
    const out = join(work, 'report.html');
    let report: ReturnType<typeof buildFixtureReport> | null = buildFixtureReport({ pages: size, seed: 5 });
    const pages = report.pages.length;
    await lib.write.writeFileAtomic(out, lib.api.formatReportPieces(report, 'html'));
    report = null;
    gc();
    return await measureHtmlOpen(out, 'fixture', pages, runs);
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

async function main(): Promise<void> {
  const { values } = parseArgs({
    options: {
      size: { type: 'string' },
      dir: { type: 'string' },
      runs: { type: 'string' },
      mode: { type: 'string', default: 'rss' },
      seed: { type: 'string', default: '1' },
      vocabulary: { type: 'string', default: 'topical' },
      html: { type: 'string' },
      'html-out': { type: 'string' },
    },
  });
  const size = Number(values.size);
  if (!Number.isInteger(size) || size < 1) throw new Error(`one-size: --size must be a positive integer, got "${values.size ?? ''}"`);
  const mode = values.mode;
  if (mode !== 'rss' && mode !== 'measure' && mode !== 'related' && mode !== 'html') throw new Error(`one-size: --mode must be rss, measure, related or html, got "${mode}"`);
  const runs = values.runs === undefined ? (size >= 50_000 ? 1 : 3) : Number(values.runs);
  if (!Number.isInteger(runs) || runs < 1) throw new Error(`one-size: --runs must be a positive integer, got "${values.runs}"`);
  if (mode === 'html') {
    process.stdout.write(`RESULT ${JSON.stringify(await html(size, runs, values.html))}\n`);
    return;
  }
  const work = mkdtempSync(join(tmpdir(), 'lw-bench-work-'));
  const root = values.dir ?? join(work, 'site');
  try {
    const vocabulary = values.vocabulary;
    if (vocabulary !== 'topical' && vocabulary !== 'shared') throw new Error(`one-size: --vocabulary must be topical or shared, got "${vocabulary}"`);
    if (values.dir === undefined) generateSite(root, { pages: size, seed: Number(values.seed), vocabulary });
    const lib = await loadBuilt();
    const result = mode === 'rss' ? await rss(lib, root, work) : mode === 'measure' ? await measure(lib, root, work, size, runs, values['html-out']) : await related(lib, root, size, runs, vocabulary);
    process.stdout.write(`RESULT ${JSON.stringify(result)}\n`);
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

await main();
