/**
 * The collector shared by the files of one build: each file a build tool processes adds its
 * page facts (parsed from the file's own text by the parse stage, exactly as `analyze` parses
 * it); `report()` reads the rest of the site as `analyze` does (assets, navigation, redirects,
 * traffic) and runs the same later stages. State lives in the collector object, never in the
 * module: two collectors never see each other's files.
 */
import fs from 'node:fs';
import { isAbsolute, relative, resolve, sep } from 'node:path';
import { EngineError } from '../errors.js';
import type { ResolvedOptions } from '../config/options.js';
import { parseSource } from '../parse/index.js';
import { collect, finishAnalysis, prepare } from '../pipeline/index.js';
import type { AnalyzeInput, PreparedRun } from '../pipeline/index.js';
import type { PageFacts, Report, SourceFile } from '../types.js';
import { absolutePathOf, attachReport, MESSAGE_SOURCE } from './messages.js';
import type { VFile, VFileMessage } from './messages.js';
import { sourceFileFrom } from './source.js';

/** Collects page facts file by file and turns them into a report. */
export interface Collector {
  /** The resolved options (the pipeline's prepare stage, as every entry point). */
  readonly options: ResolvedOptions;
  /**
   * Add a file's page facts, replacing any earlier version of the same file.
   * @param path absolute, or relative to the content root
   * @param value the file's text or raw bytes
   * @returns the path relative to the root, or null when the file lies outside the root (not added)
   */
  add(path: string, value: string | Uint8Array): string | null;
  /** The path relative to the root of an absolute path or one relative to the root; null when outside the root. */
  relativePath(path: string): string | null;
  /** Paths (relative to the root) of the files added so far, sorted. */
  files(): string[];
  /**
   * The report over the files added so far: the same stages as `analyze`, fed with these
   * files' facts. Computed once per set of files (adding a file computes it again).
   * @throws EngineError `E_NO_ROOT` or `E_IO` as `analyze` does
   */
  report(): Promise<Report>;
  /** The last report computed, or null before the first `report()`. */
  lastReport(): Report | null;
  /**
   * Add a vfile (its `path` resolved against its `cwd`, its `value`). A file without a path or
   * value, or outside the root, is not added and gets a warning message saying so.
   * @returns true when the file was added
   */
  collect(file: VFile): boolean;
  /**
   * Add the last report's findings (and suggestions) for this file to it as messages
   * (`ruleId`, `source: 'linkweave'`, line and column; errors `fatal`). Call once per file.
   * @throws EngineError `E_USAGE` before the first `report()`
   */
  attach(file: VFile): VFileMessage[];
}

/** A file added to the collector. */
interface Entry {
  readonly source: SourceFile;
  readonly facts: PageFacts;
}

/**
 * Create a collector.
 * @param input the same object `analyze` takes: configuration keys, `root`, `command`
 * @throws EngineError `E_CONFIG_INVALID` for a bad configuration, naming the key
 */
export function createCollector(input: AnalyzeInput): Collector {
  const run = prepare(input);
  const { options } = run;
  const roots = rootsOf(options.root);
  const entries = new Map<string, Entry>();
  let cached: { generation: number; report: Promise<Report> } | null = null;
  let generation = 0;
  let last: Report | null = null;

  const relativePath = (path: string): string | null => {
    for (const r of roots) {
      const rel = relative(r, isAbsolute(path) ? path : resolve(r, path));
      if (rel !== '' && !rel.startsWith(`..${sep}`) && rel !== '..' && !isAbsolute(rel)) return rel.split(sep).join('/');
    }
    return null;
  };

  const add = (path: string, value: string | Uint8Array): string | null => {
    const rel = relativePath(path);
    if (rel === null) return null;
    const source = sourceFileFrom(rel, value, options);
    entries.set(rel, { source, facts: parseSource(source, options) });
    generation++;
    return rel;
  };

  return {
    options,
    relativePath,
    add,
    collect(file) {
      const path = absolutePathOf(file);
      const problem =
        path === null ? 'a file without a path' : file.value === undefined || file.value === null ? 'a file without contents' : null;
      if (problem !== null || add(path!, file.value as string | Uint8Array) === null) {
        const reason = problem ?? `a file outside the content root "${options.root}"`;
        file.message(`Not collected: ${reason}; only files under the content root are read`, {
          ruleId: 'not-collected',
          source: MESSAGE_SOURCE,
        });
        return false;
      }
      return true;
    },
    attach(file) {
      if (last === null) throw new EngineError('E_USAGE', 'collector.attach(file): call `await collector.report()` first');
      const path = absolutePathOf(file);
      const rel = path === null ? null : relativePath(path);
      return rel === null ? [] : attachReport(file, rel, last);
    },
    files: () => [...entries.keys()].sort(compare),
    lastReport: () => last,
    report() {
      if (cached === null || cached.generation !== generation) {
        const at = generation;
        const report = build(run, [...entries.values()]).then(
          (r) => {
            if (cached?.generation === at) last = r;
            return r;
          },
          (error: unknown) => {
            // A failed run is not kept: the next call tries again.
            if (cached?.generation === at) cached = null;
            throw error;
          },
        );
        cached = { generation: at, report };
      }
      return cached.report;
    },
  };
}

async function build(prepared: PreparedRun, added: readonly Entry[]): Promise<Report> {
  if (added.length === 0) {
    throw new EngineError('E_USAGE', 'collector.report(): no files were added; run the pipeline over the site first');
  }
  const { run, collected } = await collect(prepared);
  const { options, command, rules } = run;
  // Pages come from the files the build processed, in the order `collect` gives (by path).
  const sorted = added.slice().sort((a, b) => compare(a.source.path, b.source.path));
  const paths = new Set(sorted.map((e) => e.source.path));
  const sources = {
    ...collected.sources,
    files: sorted.map((e) => e.source),
    assets: collected.sources.assets.filter((a) => !paths.has(a)),
  };
  return finishAnalysis({ options, command, rules, facts: sorted.map((e) => e.facts), collected: { ...collected, sources }, hooks: {} });
}

/** The root as given and its real path (a vfile may name either). */
function rootsOf(root: string): string[] {
  try {
    const real = fs.realpathSync.native(root);
    return real === root ? [root] : [root, real];
  } catch {
    return [root];
  }
}

/** Code-unit order, as `collect` sorts. */
function compare(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
