/**
 * The pipeline in order: prepare -> collect -> parse -> site (graph, rank) -> text -> suggest
 * -> check -> report, each stage announced to the hooks (`onStage` start and end: the progress
 * display and the benchmark's timings). `analyze`, the unified collector and `apply` run it;
 * the backtest runs its stages one by one.
 */
import { resolve } from 'node:path';
import { linkModelStore, readResult, relatedStore, resultKey, writeResult } from '../cache/index.js';
import type { ResultInputs } from '../cache/index.js';
import type { ResolvedOptions } from '../config/options.js';
import { validateRuleConfig } from '../rules/index.js';
import type { RuleSetting } from '../rules/index.js';
import type { SuggestResult } from '../suggest/index.js';
import type { PageFacts, Report } from '../types.js';
import { VERSION } from '../version.js';
import { checkSite } from './check.js';
import { collect } from './collect.js';
import { parseAll } from './parse.js';
import { prepare } from './prepare.js';
import { reportOf } from './report.js';
import { graphNotes, graphOf, rankOf, siteInputs } from './site.js';
import { suggestFor } from './suggest.js';
import { textOf } from './text.js';
import type { AnalyzeHooks, AnalyzeInput, BaselineInput, CollectedInputs, PreparedRun, ReportCommand, StageName } from './types.js';

/** Run `fn` as stage `name`: `hooks.onStage` is told when it starts and ends. */
export async function stage<T>(hooks: AnalyzeHooks, name: StageName, fn: () => T | Promise<T>): Promise<T> {
  hooks.onStage?.(name, 'start');
  const value = await fn();
  hooks.onStage?.(name, 'end');
  return value;
}

/** Collect and parse the site of a prepared run, as every command reads it. */
export async function readSite(run: PreparedRun, hooks: AnalyzeHooks = {}): Promise<{ run: PreparedRun; collected: CollectedInputs; facts: PageFacts[] }> {
  const read = await stage(hooks, 'collect', () => collect(run, hooks));
  const facts = await stage(hooks, 'parse', () => parseAll(read.collected.sources, read.run.options, hooks));
  return { ...read, facts };
}

/** The whole pipeline: prepare, then {@link runPrepared}. */
export async function runPipeline(input: AnalyzeInput, hooks: AnalyzeHooks = {}): Promise<Report> {
  return runPrepared(prepare(input, hooks), hooks);
}

/**
 * The pipeline after prepare. With the cache on, a run whose inputs did not change since the
 * last one returns that run's report (the whole-report cache) without parsing.
 */
export async function runPrepared(prepared: PreparedRun, hooks: AnalyzeHooks = {}): Promise<Report> {
  const { run, collected } = await stage(hooks, 'collect', () => collect(prepared, hooks));
  const { options, command, baseline } = run;
  const cacheDir = options.cache.enabled ? resolve(options.cache.dir) : null;
  const key = cacheDir === null ? '' : resultKey(reportInputs(options, command, collected, baseline));
  const cached = cacheDir === null ? null : readResult(cacheDir, command, key);
  if (cacheDir !== null) hooks.onReportCache?.({ dir: cacheDir, command, key, hit: cached !== null });
  if (cached !== null) return cached;
  // The facts are handed over without a binding here, so `finish` can let their texts go.
  const report = await finish({
    options,
    command,
    rules: run.rules,
    facts: await stage(hooks, 'parse', () => parseAll(collected.sources, options, hooks)),
    collected,
    hooks,
    ...(baseline === undefined ? {} : { baseline }),
    ...(cacheDir === null ? {} : { memoDir: cacheDir }),
  });
  if (cacheDir !== null) writeResult(cacheDir, command, key, report);
  return report;
}

/** What a report depends on, for the whole-report cache key. */
function reportInputs(options: ResolvedOptions, command: string, collected: CollectedInputs, baseline: BaselineInput | undefined): ResultInputs {
  const { sources, navigation, redirects, traffic, auxProblems } = collected;
  return {
    version: VERSION,
    command,
    options,
    sources: sources.files.map((f) => ({ path: f.path, hash: f.hash, problems: f.problems })),
    rest: {
      assets: sources.assets,
      warnings: sources.warnings,
      navigation,
      redirects,
      traffic: traffic === null ? null : [...traffic],
      auxProblems,
      baseline: baseline?.findings ?? null,
    },
  };
}

/** What the stages after parsing take. */
export interface FinishInput {
  readonly options: ResolvedOptions;
  readonly command: ReportCommand;
  readonly facts: readonly PageFacts[];
  readonly collected: CollectedInputs;
  readonly hooks: AnalyzeHooks;
  /** The checks' settings from the prepare stage. @default validated from `options` */
  readonly rules?: readonly RuleSetting[];
  readonly baseline?: BaselineInput;
  /**
   * The cache folder, where the text and suggest stages keep their last related lists and fit
   * (exact: the same report with or without them). Only a run with the cache on passes it.
   */
  readonly memoDir?: string;
}

/** The stages after parsing (site, text, suggest, check, report) over facts parsed elsewhere (the unified collector's). */
export async function finishAnalysis(input: FinishInput): Promise<Report> {
  return finish({ ...input });
}

/**
 * {@link finishAnalysis} on an input object of its own: the facts are taken out of it, and once
 * the term index is built (at once for `check`) they are replaced by copies without their body
 * text, which nothing later reads. On a large site the bodies are a fifth of the memory held;
 * letting them go before the suggest, check and report stages lowers the run's peak. The
 * caller's own facts are never changed.
 */
async function finish(input: { -readonly [K in keyof FinishInput]: FinishInput[K] }): Promise<Report> {
  const { options, command, collected, hooks, baseline, rules, memoDir } = input;
  let facts = input.facts;
  input.facts = [];
  if (command === 'check') facts = withoutBodies(facts);
  const graph = await stage(hooks, 'graph', () => graphOf(facts, siteInputs(collected), options));
  for (const note of graphNotes(graph)) hooks.onNote?.(note);
  const ranking = await stage(hooks, 'rank', () => rankOf(graph, options));
  let suggested: SuggestResult | null = null;
  if (command === 'suggest') {
    const text = await stage(hooks, 'text', () =>
      textOf(graph.pages.map((p) => facts[p.factsIndex]), options, undefined, memoDir === undefined ? undefined : relatedStore(memoDir, VERSION)),
    );
    facts = withoutBodies(facts);
    const ordered = graph.pages.map((p) => facts[p.factsIndex]);
    const fitMemo = memoDir === undefined ? undefined : linkModelStore(memoDir, VERSION);
    suggested = await stage(hooks, 'suggest', () => suggestFor({ graph, ranking }, ordered, text, collected.traffic, options, fitMemo));
  }
  const site = { graph, ranking, facts };
  const findings = await stage(hooks, 'rules', () => checkSite(site, collected, options, rules ?? validateRuleConfig(options)));
  return stage(hooks, 'report', () =>
    reportOf({ options, graph, ranking, findings, suggested, files: collected.sources.files.length, baseline }),
  );
}

/** Copies of the facts with an empty `text.body` (title and headings kept). */
function withoutBodies(facts: readonly PageFacts[]): PageFacts[] {
  return facts.map((f) => (f.text.body === '' ? f : { ...f, text: { title: f.text.title, headings: f.text.headings, body: '' } }));
}
