import type { AnalyzeHooks, CollectedInputs } from '../analyze.js';
import type { ResolvedOptions } from '../options.js';
import type { PageFacts } from '../types.js';
/** The collected inputs and the facts of every source file. */
export interface LoadedSite {
    readonly collected: CollectedInputs;
    readonly facts: PageFacts[];
}
/**
 * Collect and parse the site under `options.root`.
 * @throws EngineError `E_IO` for an unreadable root or a missing auxiliary file
 */
export declare function loadSite(options: ResolvedOptions, hooks?: AnalyzeHooks): Promise<LoadedSite>;
