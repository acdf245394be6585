/**
 * One timed run of the real pipeline: `analyze` with `command: 'suggest'` or `'check'` (stages timed from
 * its hooks), then the write stage as the command line does it: the bytes kept in the cache copied
 * (`copyCachedOutput`) when the report came from the whole-report cache, else
 * `formatReportPieces(report, 'json')` written by `writeFileAtomic`.
 */
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { siteConfig } from './front.js';
import type { Built } from './lib.js';
import type { StageName } from '../src/index.js';
import type { ReportCacheInfo } from '../src/cache/index.js';

/** Stages the bench reports, in pipeline order (`write` is timed by the bench itself). */
export const STAGES = ['collect', 'parse', 'graph', 'rank', 'text', 'suggest', 'rules', 'report', 'write'] as const;
/** A reported stage. */
export type BenchStage = (typeof STAGES)[number];

/** Timings of one run. */
export interface RunTiming {
  /** Milliseconds per stage (0 for a stage that did not run). */
  readonly stages: Record<BenchStage, number>;
  /** Wall time of `analyze` plus the write stage. */
  readonly totalMs: number;
  /** CPU time of the process (all threads) over the same span. */
  readonly cpuMs: number;
  readonly pages: number;
  readonly links: number;
  readonly suggestions: number;
  readonly findings: number;
}

/** How to run. */
export interface RunSettings {
  /** Cache folder, or null to run with the cache off. */
  readonly cacheDir: string | null;
  /** Where the JSON report is written (outside the site). */
  readonly outFile: string;
  /** @default 'suggest' */
  readonly command?: 'check' | 'suggest';
  /** Also write the report as HTML here, after the timed span (for the browser measurement). */
  readonly htmlOut?: string;
}

/** Run the pipeline once on the site at `root`. */
export async function runPipeline(lib: Built, root: string, settings: RunSettings): Promise<RunTiming> {
  const stages = Object.fromEntries(STAGES.map((s) => [s, 0])) as Record<BenchStage, number>;
  const started = new Map<StageName, number>();
  let reportCache: ReportCacheInfo | null = null;
  const hooks = {
    onStage(stage: StageName, phase: 'start' | 'end'): void {
      const now = performance.now();
      if (phase === 'start') started.set(stage, now);
      else stages[stage] += now - (started.get(stage) ?? now);
    },
    onReportCache(info: ReportCacheInfo): void {
      reportCache = info;
    },
  };
  const cache = settings.cacheDir === null ? { enabled: false } : { enabled: true, dir: settings.cacheDir };
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const report = await lib.api.analyze({ ...siteConfig(root), root, command: settings.command ?? 'suggest', cache }, hooks);
  const tw = performance.now();
  // As the command line writes it: a copy of the bytes written last time when the report came
  // from the whole-report cache, else in pieces (one string cannot hold a 100,000-page report).
  const info = reportCache as ReportCacheInfo | null;
  const copied = info !== null && (await lib.cache.copyCachedOutput(info, 'json', process.cwd(), settings.outFile));
  if (!copied) {
    await lib.write.writeFileAtomic(settings.outFile, lib.api.formatReportPieces(report, 'json'));
    if (info !== null) lib.cache.saveCachedOutput(info, 'json', process.cwd(), settings.outFile);
  }
  const end = performance.now();
  const cpu = process.cpuUsage(c0);
  stages.write = end - tw;
  if (settings.htmlOut !== undefined) await lib.write.writeFileAtomic(settings.htmlOut, lib.api.formatReportPieces(report, 'html'));
  return {
    stages,
    totalMs: end - t0,
    cpuMs: (cpu.user + cpu.system) / 1000,
    pages: report.stats.pages,
    links: report.stats.links,
    suggestions: report.suggestions.length,
    findings: report.findings.length,
  };
}

/** Bytes of the files under `dir` (0 when it does not exist): tells whether a cache was written. */
export function folderBytes(dir: string): number {
  if (!existsSync(dir)) return 0;
  let total = 0;
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    const st = statSync(p);
    total += st.isDirectory() ? folderBytes(p) : st.size;
  }
  return total;
}

/** Median of a non-empty list. */
export function median(values: readonly number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 === 1 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}
