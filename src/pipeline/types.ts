/**
 * The data the pipeline's stages hand each other, and the hooks a caller watches them with.
 * Plain values only; the stage functions are in this folder, one file each.
 */
import type { CollectResult } from '../collect/index.js';
import type { Config, ResolvedOptions } from '../config/options.js';
import type { ParseHooks } from '../parallel/index.js';
import type { Redirect } from '../parse/index.js';
import type { PresetRun } from '../preset/index.js';
import type { AuxProblem, RuleSetting } from '../rules/index.js';
import type { ReportCacheInfo } from '../cache/index.js';
import type { Finding, RawLink } from '../types.js';

/** The stages a run reports to hooks, in order (`site` reports as `graph` then `rank`). */
export type StageName = 'collect' | 'parse' | 'graph' | 'rank' | 'text' | 'suggest' | 'rules' | 'report';

/** Callbacks for progress displays and benchmarks. Never called with anything but plain values. */
export interface AnalyzeHooks extends ParseHooks {
  /** A stage starts or ends. */
  onStage?(stage: StageName, phase: 'start' | 'end'): void;
  /**
   * Where the report of this run is in the whole-report cache (only with the cache on): lets
   * a caller that writes the report copy the bytes it wrote last time (`copyCachedOutput`).
   */
  onReportCache?(info: ReportCacheInfo): void;
  /** Progress inside a stage (files parsed so far). */
  onProgress?(stage: StageName, done: number, total: number): void;
  /** A line worth telling the user: what was read as the site's generator config, the heading-id style chosen. */
  onNote?(message: string): void;
}

/** The report commands. */
export type ReportCommand = 'check' | 'suggest';

/** Findings accepted for now (`--baseline`, read by `parseBaseline`). */
export interface BaselineInput {
  readonly findings: readonly Finding[];
}

/** What `analyze` takes: a configuration plus the content root and what to compute. */
export type AnalyzeInput = Config & {
  /** Content root (absolute, or relative to the working folder). */
  readonly root: string;
  /** `check` runs the rules; `suggest` adds link suggestions. @default 'check' */
  readonly command?: ReportCommand;
  /** Where the configuration came from, named in error messages. @default 'configuration' */
  readonly configOrigin?: string;
  /** Findings accepted for now (`--baseline`, read by `parseBaseline`): only new ones fail the gate. @default none */
  readonly baseline?: BaselineInput;
};

/**
 * A run after the prepare stage: the options resolved once (with the generator preset's keys
 * under the user's), the preset read, the checks' settings validated once.
 */
export interface PreparedRun {
  readonly options: ResolvedOptions;
  /** The generator config read for this run, or null (`preset: 'none'`, or none detected). */
  readonly preset: PresetRun | null;
  /**
   * The route style comes from the configuration or the preset; when false the collect stage may
   * read it from the site's links (`styleFromLinks`).
   */
  readonly routeStyleGiven: boolean;
  readonly command: ReportCommand;
  /** Where the configuration came from, named in error messages. */
  readonly configOrigin: string;
  /** Every check's level and options (`validateRuleConfig`). */
  readonly rules: readonly RuleSetting[];
  readonly baseline?: BaselineInput;
}

/** Everything read from disk before parsing. */
export interface CollectedInputs {
  readonly sources: CollectResult;
  readonly navigation: { readonly file: string; readonly links: readonly RawLink[] } | null;
  readonly redirects: readonly Redirect[];
  readonly traffic: ReadonlyMap<string, number> | null;
  readonly auxProblems: readonly AuxProblem[];
}
