import type { CollectResult } from './collect/index.js';
import type { Redirect } from './parse/index.js';
import type { ParseHooks } from './parallel/index.js';
import type { AuxProblem } from './rules/index.js';
import type { Config, ResolvedOptions } from './options.js';
import type { Finding, PageFacts, RawLink, Report } from './types.js';
/** The stages `analyze` runs, in order, as reported to hooks. */
export type StageName = 'collect' | 'parse' | 'graph' | 'rank' | 'text' | 'suggest' | 'rules' | 'report';
/** Callbacks for progress displays and benchmarks. Never called with anything but plain values. */
export interface AnalyzeHooks {
    /** A stage starts or ends. */
    onStage?(stage: StageName, phase: 'start' | 'end'): void;
    /** Progress inside a stage (files parsed so far). */
    onProgress?(stage: StageName, done: number, total: number): void;
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
    readonly baseline?: {
        readonly findings: readonly Finding[];
    };
};
/**
 * Analyse a site: collect its sources, build the link graph, rank it, run the rules (and, for
 * `command: 'suggest'`, propose links) and return the report.
 * @throws EngineError with code `E_CONFIG_INVALID` (bad configuration) or `E_IO` (unreadable root
 *   or auxiliary file). A bad source file is a finding, never a throw.
 */
export declare function analyze(input: AnalyzeInput, hooks?: AnalyzeHooks): Promise<Report>;
/** Everything read from disk before parsing. */
export interface CollectedInputs {
    readonly sources: CollectResult;
    readonly navigation: {
        readonly file: string;
        readonly links: readonly RawLink[];
    } | null;
    readonly redirects: readonly Redirect[];
    readonly traffic: ReadonlyMap<string, number> | null;
    readonly auxProblems: readonly AuxProblem[];
}
/** Read everything `analyze` reads before parsing: the sources, navigation, redirects and traffic files. */
export declare function collectInputs(options: ResolvedOptions): Promise<CollectedInputs>;
/**
 * The parse stage: facts from the cache where they are current, the rest parsed on the main
 * thread or in worker threads (`options.workers`), the cache saved. Cache problems never fail
 * the run; they are in the stats given to `hooks.onParseStats`.
 */
export declare function parseAll(sources: CollectResult, options: ResolvedOptions, hooks: AnalyzeHooks & ParseHooks): Promise<PageFacts[]>;
/** What the stages after parsing take. */
export interface FinishInput {
    readonly options: ResolvedOptions;
    readonly command: 'check' | 'suggest';
    readonly facts: readonly PageFacts[];
    readonly collected: CollectedInputs;
    readonly hooks: AnalyzeHooks;
    readonly baseline?: {
        readonly findings: readonly Finding[];
    };
}
/** The stages after parsing; shared by `analyze` and the unified plugin's collector. */
export declare function finishAnalysis(input: FinishInput): Promise<Report>;
