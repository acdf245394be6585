/**
 * The Node API entry point: `analyze(config) -> Promise<Report>`.
 *
 * This file only wires the stages together (DESIGN section 2); each stage is a pure function of
 * its inputs except `collect` (reads the sources) and the cache.
 */
import { availableParallelism } from 'node:os';
import { resolve } from 'node:path';
import { linkModelStore, parseWithCache, readResult, relatedStore, resultKey, writeResult } from './cache/index.js';
import type { ReportCacheInfo, ResultInputs } from './cache/index.js';
import { collectSources, readAuxFile } from './collect/index.js';
import type { CollectResult } from './collect/index.js';
import { parseNavigation, parseRedirects } from './parse/index.js';
import type { Redirect } from './parse/index.js';
import { parseFiles } from './parallel/index.js';
import type { ParseHooks, WorkerStats } from './parallel/index.js';
import { buildGraph } from './graph/index.js';
import { rankGraph } from './rank/index.js';
import { buildTermIndex, createStemCache, relatedPagesMemo, contentCentrality } from './text/index.js';
import { suggestLinks, parseTraffic } from './suggest/index.js';
import { runRules, validateRuleConfig } from './rules/index.js';
import type { AuxProblem } from './rules/index.js';
import { buildReport } from './report/index.js';
import { resolveOptions } from './options.js';
import { configWithPreset, readPreset } from './preset/index.js';
import type { PresetRun } from './preset/index.js';
import type { Config, ResolvedOptions } from './options.js';
import type { Finding, LinkModelReport, PageFacts, RawLink, RepairPlan, Report, Suggestion } from './types.js';
import { VERSION } from './version.js';

/** The stages `analyze` runs, in order, as reported to hooks. */
export type StageName = 'collect' | 'parse' | 'graph' | 'rank' | 'text' | 'suggest' | 'rules' | 'report';

/** Callbacks for progress displays and benchmarks. Never called with anything but plain values. */
export interface AnalyzeHooks {
  /** A stage starts or ends. */
  onStage?(stage: StageName, phase: 'start' | 'end'): void;
  /**
   * Where the report of this run is in the whole-report cache (only with the cache on): lets
   * a caller that writes the report copy the bytes it wrote last time (`readCachedOutput`).
   */
  onReportCache?(info: ReportCacheInfo): void;
  /** Progress inside a stage (files parsed so far). */
  onProgress?(stage: StageName, done: number, total: number): void;
  /** A line worth telling the user: what was read as the site's generator config, the heading-id style chosen. */
  onNote?(message: string): void;
}

/** What `analyze` takes: a configuration plus the content root and what to compute. */
export type AnalyzeInput = Config & {
  /** Content root (absolute, or relative to the working folder). */
  readonly root: string;
  /** `check` runs the rules; `suggest` adds link suggestions. @default 'check' */
  readonly command?: 'check' | 'suggest';
  /** Where the configuration came from, named in error messages. @default 'configuration' */
  readonly configOrigin?: string;
  /** Findings accepted for now (`--baseline`, read by `parseBaseline`): only new ones fail the gate. @default none */
  readonly baseline?: { readonly findings: readonly Finding[] };
};

/**
 * Analyse a site: collect its sources, build the link graph, rank it, run the rules (and, for
 * `command: 'suggest'`, propose links) and return the report.
 * @throws EngineError with code `E_CONFIG_INVALID` (bad configuration) or `E_IO` (unreadable root
 *   or auxiliary file). A bad source file is a finding, never a throw.
 */
export async function analyze(input: AnalyzeInput, hooks: AnalyzeHooks = {}): Promise<Report> {
  const { root, command = 'check', configOrigin = 'configuration', baseline, ...config } = input;
  // The configuration is checked as written first, so a bad key is reported against it.
  const written = resolveOptions(config, resolve(root), configOrigin);
  const preset = readPreset(resolve(root), written.preset);
  if (preset !== null) hooks.onNote?.(preset.summary);
  let options = preset === null ? written : resolveOptions(configWithPreset(preset, config), preset.contentRoot, configOrigin);
  validateRuleConfig(options, configOrigin);
  const stage = stageTimer(hooks);

  const collected = await stage('collect', () => collectInputs(options, preset));
  // A navigation list read from the generator's config is named like a navigation file.
  if (options.navigation === null && collected.navigation !== null) options = { ...options, navigation: collected.navigation.file };
  // Nothing changed since the last run with the cache on: its report is this run's report.
  const cacheDir = options.cache.enabled ? resolve(options.cache.dir) : null;
  const key = cacheDir === null ? '' : resultKey(reportInputs(options, command, collected, baseline));
  const cached = cacheDir === null ? null : readResult(cacheDir, command, key);
  if (cacheDir !== null) hooks.onReportCache?.({ dir: cacheDir, command, key, hit: cached !== null });
  if (cached !== null) return cached;
  // The facts are handed over without a binding here, so `finish` can let their texts go.
  const report = await finish({
    options,
    command,
    facts: await stage('parse', () => parseAll(collected.sources, options, hooks)),
    collected,
    hooks,
    ...(baseline === undefined ? {} : { baseline }),
    memoDir: cacheDir,
  });
  if (cacheDir !== null) writeResult(cacheDir, command, key, report);
  return report;
}

/** What a report depends on, for the whole-report cache key. */
function reportInputs(
  options: ResolvedOptions,
  command: string,
  collected: CollectedInputs,
  baseline: { readonly findings: readonly Finding[] } | undefined,
): ResultInputs {
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

/** Everything read from disk before parsing. */
export interface CollectedInputs {
  readonly sources: CollectResult;
  readonly navigation: { readonly file: string; readonly links: readonly RawLink[] } | null;
  readonly redirects: readonly Redirect[];
  readonly traffic: ReadonlyMap<string, number> | null;
  readonly auxProblems: readonly AuxProblem[];
}

/** Read everything `analyze` reads before parsing: the sources, navigation, redirects and traffic files. */
export async function collectInputs(options: ResolvedOptions, preset: PresetRun | null = null): Promise<CollectedInputs> {
  const aux = [options.navigation, options.redirects, options.traffic].filter((p): p is string => p !== null);
  const [sources, navText, redirectsText, trafficText] = await Promise.all([
    collectSources(options, aux),
    options.navigation === null ? null : readAuxFile(options, 'navigation', options.navigation),
    options.redirects === null ? null : readAuxFile(options, 'redirects', options.redirects),
    options.traffic === null ? null : readAuxFile(options, 'traffic', options.traffic),
  ]);
  const auxProblems: AuxProblem[] = [];
  let navigation = navText === null ? null : { file: navText.file, links: parseNavigation(navText.file, navText.text) };
  const presetNav = preset?.site.navigation ?? null;
  if (navigation === null && presetNav !== null) {
    const name = presetNav.format === 'yaml' && !/\.ya?ml$/i.test(presetNav.file) ? `${presetNav.file}.yml` : presetNav.file;
    navigation = { file: presetNav.file, links: parseNavigation(name, presetNav.text) };
  }
  let redirects: Redirect[] = (preset?.site.redirects ?? []).map((r) => ({ from: r.from, to: r.to, line: 0 }));
  if (redirectsText !== null) {
    const parsed = parseRedirects(redirectsText.file, redirectsText.text);
    redirects = [...parsed.redirects, ...redirects];
    for (const p of parsed.problems) auxProblems.push({ file: redirectsText.file, line: p.line, message: p.message });
  }
  let traffic: Map<string, number> | null = null;
  if (trafficText !== null) {
    const parsed = parseTraffic(trafficText.file, trafficText.text);
    traffic = parsed.views;
    for (const p of parsed.problems) auxProblems.push({ file: trafficText.file, line: p.line, message: p.message });
  }
  return { sources, navigation, redirects, traffic, auxProblems };
}

/**
 * The parse stage: facts from the cache where they are current, the rest parsed on the main
 * thread or in worker threads (`options.workers`), the cache saved. Cache problems never fail
 * the run; they are in the stats given to `hooks.onParseStats`.
 */
export async function parseAll(sources: CollectResult, options: ResolvedOptions, hooks: AnalyzeHooks & ParseHooks): Promise<PageFacts[]> {
  const cores = availableParallelism();
  let workers: WorkerStats = { threads: 1, batches: 0, fallback: null };
  const { facts, stats } = await parseWithCache(sources.files, options, {
    // `cache.dir` is relative to the working folder of this run.
    dir: options.cache.enabled ? resolve(options.cache.dir) : null,
    version: VERSION,
    parseMisses: async (files, onParsed) => {
      const parsed = await parseFiles(files, options, { cores, onParsed });
      workers = parsed.stats;
      return parsed.facts;
    },
    onProgress: (done, total) => hooks.onProgress?.('parse', done, total),
  });
  hooks.onParseStats?.({ cache: stats, workers });
  return facts;
}

/** What the stages after parsing take. */
export interface FinishInput {
  readonly options: ResolvedOptions;
  readonly command: 'check' | 'suggest';
  readonly facts: readonly PageFacts[];
  readonly collected: CollectedInputs;
  readonly hooks: AnalyzeHooks;
  readonly baseline?: { readonly findings: readonly Finding[] };
}

/** The stages after parsing; shared by `analyze` and the unified plugin's collector. */
export async function finishAnalysis(input: FinishInput): Promise<Report> {
  return finish({ ...input });
}

/**
 * {@link finishAnalysis} on an input object of its own: the facts are taken out of it, and once
 * the term index is built (at once for `check`) they are replaced by copies without their body
 * text, which nothing later reads. On a large site the bodies are a fifth of the memory held;
 * letting them go before the suggest, rules and report stages lowers the run's peak. The caller's
 * own facts are never changed.
 */
async function finish(input: { -readonly [K in keyof FinishInput]: FinishInput[K] } & { memoDir?: string | null }): Promise<Report> {
  const { options, command, collected, hooks, baseline } = input;
  const memoDir = input.memoDir ?? null;
  let facts = input.facts;
  input.facts = [];
  const stage = stageTimer(hooks);
  if (command === 'check') facts = withoutBodies(facts);
  const graph = await stage('graph', () =>
    buildGraph(
      { pages: facts, assets: collected.sources.assets, navigation: collected.navigation, redirects: collected.redirects },
      options,
    ),
  );
  const ids = graph.headingIds;
  if (ids !== undefined && ids.fragmentLinks > 0) {
    const how = ids.how === 'auto' ? 'chosen by the fragment links' : 'set by routes.headingIds';
    hooks.onNote?.(`heading ids: ${ids.style} style (${how}), ${ids.resolved} of ${ids.fragmentLinks} fragment links resolve`);
  }
  for (const inc of graph.includesOutside ?? []) {
    hooks.onNote?.(`${inc.file}:${inc.line}:${inc.column}: included file "${inc.written}" is outside the sources; its ids and links are unknown`);
  }
  const ranking = await stage('rank', () => rankGraph(graph, options));
  let suggestions: Suggestion[] = [];
  let importance: readonly ('high' | 'normal' | 'low')[] | undefined;
  let repair: RepairPlan | undefined;
  let model: LinkModelReport | undefined;
  if (command === 'suggest') {
    const text = await stage('text', () => {
      const stems = createStemCache();
      const index = buildTermIndex(graph.pages.map((p) => facts[p.factsIndex]!.text), stems);
      const related = relatedPagesMemo(index, options.suggest.relatedK, memoDir === null ? undefined : relatedStore(memoDir, VERSION));
      return { index, related, centrality: contentCentrality(related, graph.pages.length), stems };
    });
    facts = withoutBodies(facts);
    const ordered = graph.pages.map((p) => facts[p.factsIndex]!);
    const result = await stage('suggest', () =>
      suggestLinks({ graph, facts: ordered, ranking, ...text, traffic: collected.traffic, ...(memoDir === null ? {} : { fitMemo: linkModelStore(memoDir, VERSION) }) }, options),
    );
    suggestions = result.suggestions;
    importance = result.importance;
    repair = result.plan;
    model = result.model;
  }
  const findings = await stage('rules', () =>
    runRules({ graph, facts, ranking, options, warnings: collected.sources.warnings, auxProblems: collected.auxProblems }),
  );
  return stage('report', () =>
    buildReport({
      options,
      graph,
      ranking,
      findings,
      suggestions,
      files: collected.sources.files.length,
      version: VERSION,
      ...(importance === undefined ? {} : { importance }),
      ...(repair === undefined ? {} : { repair }),
      ...(model === undefined ? {} : { model }),
      ...(baseline === undefined ? {} : { baseline }),
    }),
  );
}

/** Copies of the facts with an empty `text.body` (title and headings kept). */
function withoutBodies(facts: readonly PageFacts[]): PageFacts[] {
  return facts.map((f) => (f.text.body === '' ? f : { ...f, text: { title: f.text.title, headings: f.text.headings, body: '' } }));
}

function stageTimer(hooks: AnalyzeHooks) {
  return async <T>(name: StageName, fn: () => T | Promise<T>): Promise<T> => {
    hooks.onStage?.(name, 'start');
    const value = await fn();
    hooks.onStage?.(name, 'end');
    return value;
  };
}
