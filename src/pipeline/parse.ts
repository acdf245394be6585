/**
 * The parse stage: facts from the cache where they are current, the rest parsed on the main
 * thread or in worker threads (`options.workers`), the cache saved. Cache problems never fail
 * the run; they are in the stats given to `hooks.onParseStats`.
 */
import { availableParallelism } from 'node:os';
import { resolve } from 'node:path';
import { parseWithCache } from '../cache/index.js';
import type { CollectResult } from '../collect/index.js';
import type { ResolvedOptions } from '../config/options.js';
import { parseFiles } from '../parallel/index.js';
import type { WorkerStats } from '../parallel/index.js';
import type { PageFacts } from '../types.js';
import { VERSION } from '../version.js';
import type { AnalyzeHooks } from './types.js';

/** Facts of every collected source file, in the order collected. */
export async function parseAll(sources: CollectResult, options: ResolvedOptions, hooks: AnalyzeHooks = {}): Promise<PageFacts[]> {
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
