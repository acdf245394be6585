/**
 * `npm run bench`: generate synthetic sites, run the real pipeline and the references on each
 * in fresh child processes, print one table.
 *
 *   node --expose-gc dist-bench/bench/run.js [--sizes 1000,10000] [--full] [--runs N] [--record] [--seed S]
 *     [--vocabulary topical,shared]
 *
 * Default sizes 1,000 / 10,000 / 50,000; `--full` adds 100,000. Medians of `--runs` runs
 * (default 3 below 50,000 pages, 1 from 50,000). `--record` puts the table on top of
 * bench/RESULTS.md (older tables are kept below). Sites are generated into os.tmpdir() and
 * removed afterwards. `--vocabulary` names the site kinds measured at every size (default
 * `topical`; `shared` adds a large site-wide vocabulary, see bench/site/plan.ts); the related-pages
 * check against brute force runs on both kinds.
 *
 * The HTML report of each size (written from the first cold run) is opened in chromium in a
 * fresh process (bench/html.ts); at 100,000 pages the HTML is measured on the browser tests'
 * fixture report (test/browser/report-fixture.ts) unless the sizes include 100,000 (`--full`),
 * where the generated site's real report is measured too.
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, loadavg, tmpdir, totalmem } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseArgs } from 'node:util';
import { generateSite } from './generate.js';
import type { HtmlOpenResult } from './html.js';
import type { MeasureResult, RelatedResult, RssResult } from './one-size.js';
import type { Vocabulary } from './site/plan.js';
import type { MachineInfo, SizeResult } from './table.js';
import { renderTable } from './table.js';

/** Pages of the site the relatedness reference runs on (the brute force is quadratic). */
const RELATED_PAGES = 2000;
/** Pages of the fixture report whose HTML is measured (the issue's size for the HTML target). */
const HTML_FIXTURE_PAGES = 100_000;
/** Opens of each HTML report (medians). */
const HTML_RUNS = '3';

function log(message: string): void {
  process.stderr.write(`[bench] ${message}\n`);
}

/** Run one-size.js in a fresh process and return its RESULT, or the error it died with. */
function child<T>(args: readonly string[], nodeFlags: readonly string[]): Promise<T | { error: string }> {
  const script = fileURLToPath(new URL('./one-size.js', import.meta.url));
  return new Promise((resolve) => {
    const proc = spawn(process.execPath, [...nodeFlags, script, ...args], { stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    let err = '';
    proc.stdout.setEncoding('utf8').on('data', (d: string) => (out += d));
    proc.stderr.setEncoding('utf8').on('data', (d: string) => {
      err += d;
      process.stderr.write(d);
    });
    proc.on('close', (code, signal) => {
      const line = out.split('\n').find((l) => l.startsWith('RESULT '));
      if (code === 0 && line !== undefined) resolve(JSON.parse(line.slice('RESULT '.length)) as T);
      else {
        const last = err.trim().split('\n').filter((l) => l.trim() !== '').at(-1) ?? '';
        resolve({ error: `exit ${code ?? signal}: ${last}` });
      }
    });
  });
}

function machineInfo(): MachineInfo {
  const cpu = cpus();
  return {
    date: new Date().toISOString().slice(0, 16).replace('T', ' ') + ' UTC',
    cpu: cpu[0]?.model.trim() ?? 'unknown CPU',
    cores: cpu.length,
    memoryBytes: totalmem(),
    node: process.version,
    platform: `${process.platform}-${process.arch}`,
    load: [loadavg()[0]!, loadavg()[0]!],
  };
}

function parseSizes(text: string | undefined, full: boolean): number[] {
  const base = text === undefined ? [1000, 10_000, 50_000] : text.split(',').map((s) => Number(s.trim().replace(/_/g, '')));
  for (const s of base) if (!Number.isInteger(s) || s < 1) throw new Error(`bench: --sizes takes positive integers separated by commas, got "${text}"`);
  const all = full ? [...base, 100_000] : base;
  return [...new Set(all)].sort((a, b) => a - b);
}

/** Put `table` on top of bench/RESULTS.md, below its heading; older tables stay below. */
function record(table: string, command: string): string {
  const file = fileURLToPath(new URL('../../bench/RESULTS.md', import.meta.url));
  const heading =
    '# Benchmark results\n\n' +
    'Tables written by `npm run bench -- --record`, newest first. Each was measured in one run on the machine named in ' +
    'its heading; the targets are those of the speed-and-scale issue.\n';
  const old = existsSync(file) ? readFileSync(file, 'utf8') : '';
  const at = old.indexOf('\n## ');
  const older = at === -1 ? '' : old.slice(at + 1);
  const [title, , ...rest] = table.split('\n');
  writeFileSync(file, `${heading}\n## ${title}\n\n\`${command}\`\n\n${rest.join('\n').trimEnd()}\n${older === '' ? '' : `\n${older}`}`);
  return file;
}

function parseVocabularies(text: string): Vocabulary[] {
  const kinds = text.split(',').map((s) => s.trim());
  for (const k of kinds) if (k !== 'topical' && k !== 'shared') throw new Error(`bench: --vocabulary takes topical and/or shared separated by commas, got "${text}"`);
  return [...new Set(kinds as Vocabulary[])];
}

async function main(): Promise<void> {
  const { values } = parseArgs({
    options: {
      sizes: { type: 'string' },
      full: { type: 'boolean', default: false },
      runs: { type: 'string' },
      record: { type: 'boolean', default: false },
      seed: { type: 'string', default: '1' },
      vocabulary: { type: 'string', default: 'topical' },
    },
  });
  const vocabularies = parseVocabularies(values.vocabulary);
  const sizes = parseSizes(values.sizes, values.full);
  const seed = Number(values.seed);
  if (values.runs !== undefined && !(Number.isInteger(Number(values.runs)) && Number(values.runs) >= 1)) {
    throw new Error(`bench: --runs takes a positive integer, got "${values.runs}"`);
  }
  const machine = machineInfo();
  log(`${machine.date} · ${machine.cpu} × ${machine.cores} · Node ${machine.node}; sizes ${sizes.join(', ')}`);
  const base = mkdtempSync(join(tmpdir(), 'lw-bench-'));
  const results: SizeResult[] = [];
  const related: (RelatedResult | { error: string })[] = [];
  let htmlFixture: HtmlOpenResult | { error: string } | null = null;
  try {
    // The related-pages check first: it is short, and a long run stopped early still has it.
    for (const vocabulary of ['topical', 'shared'] as const) {
      const dir = join(base, `site-related-${vocabulary}`);
      generateSite(dir, { pages: RELATED_PAGES, seed, vocabulary });
      log(`related pages (${vocabulary}): inverted index against brute force on ${RELATED_PAGES} pages...`);
      const result = await child<RelatedResult>(['--mode', 'related', '--size', String(RELATED_PAGES), '--dir', dir, '--runs', '3', '--vocabulary', vocabulary], ['--expose-gc']);
      related.push(result);
      rmSync(dir, { recursive: true, force: true });
    }
    for (const size of sizes) {
      for (const vocabulary of vocabularies) {
        const dir = join(base, `site-${vocabulary}-${size}`);
        const t = performance.now();
        const site = generateSite(dir, { pages: size, seed, vocabulary });
        const generateMs = performance.now() - t;
        log(`${size} pages (${vocabulary}): generated ${(site.bytes / 1e6).toFixed(1)} MB in ${(generateMs / 1000).toFixed(1)} s; peak RSS run...`);
        // The heap limit the command line would start with on this machine (src/cli/heap.ts,
        // three quarters of the memory): at 100,000 pages Node's default stops the run.
        const rss = await child<RssResult>(['--mode', 'rss', '--size', String(size), '--dir', dir], [`--max-old-space-size=${Math.floor((totalmem() * 0.75) / 2 ** 20)}`]);
        log(`${size} pages (${vocabulary}): measuring...`);
        const runs = values.runs ?? String(size >= 50_000 ? 1 : 3);
        const heap = `--max-old-space-size=${size >= 50_000 ? 12_288 : 4096}`;
        const htmlFile = join(base, `report-${vocabulary}-${size}.html`);
        const measure = await child<MeasureResult>(['--mode', 'measure', '--size', String(size), '--dir', dir, '--runs', runs, '--html-out', htmlFile], ['--expose-gc', heap]);
        rmSync(dir, { recursive: true, force: true });
        let html: HtmlOpenResult | { error: string } = { error: 'no HTML report was written' };
        if (existsSync(htmlFile)) {
          log(`${size} pages (${vocabulary}): opening the HTML report in chromium...`);
          html = await child<HtmlOpenResult>(['--mode', 'html', '--size', String(size), '--html', htmlFile, '--runs', HTML_RUNS], []);
          rmSync(htmlFile, { force: true });
        }
        results.push({ size, vocabulary, generateMs, rss, measure, html });
        // The table so far, so a long run that is stopped still leaves its numbers.
        log(`so far:\n${renderTable(results, related, { ...machine, load: [machine.load[0], loadavg()[0]!] }, htmlFixture)}`);
      }
    }
    log(`HTML report of the ${HTML_FIXTURE_PAGES.toLocaleString('en-US')}-page fixture: formatting and opening in chromium...`);
    htmlFixture = await child<HtmlOpenResult>(['--mode', 'html', '--size', String(HTML_FIXTURE_PAGES), '--runs', HTML_RUNS], ['--expose-gc']);
  } finally {
    rmSync(base, { recursive: true, force: true });
  }
  const table = renderTable(results, related, { ...machine, load: [machine.load[0], loadavg()[0]!] }, htmlFixture);
  process.stdout.write(`\n${table}`);
  if (values.record) {
    const command = `npm run bench -- ${process.argv.slice(2).join(' ')}`.trim();
    log(`recorded in ${record(table, command)}`);
  }
}

await main();
