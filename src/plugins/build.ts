/**
 * The build plugin shared by `linkweave/vite` and `linkweave/rollup`: after the bundle is
 * written (`closeBundle`), analyse the output folder's HTML pages with `analyze`, print the
 * summary through the build's logger, write the configured reports atomically, and fail the
 * build when the gate fails (unless `failBuild: false`). Only hooks Vite and Rollup share.
 */
import { dirname, isAbsolute, relative, resolve, sep } from 'node:path';
import { analyze } from '../analyze.js';
import { loadConfig } from '../config/discover.js';
import type { Config } from '../config/config.js';
import { EngineError } from '../errors.js';
import { FORMAT_IDS, formatReportPieces, isFormatId, writeFileAtomic } from '../report/index.js';
import type { FormatId } from '../report/index.js';
import type { Report } from '../types.js';
import { failingFindings, findingLines, gateErrorMessage, summaryOf } from './summary.js';

/** A report file to write after the analysis. */
export interface ReportTarget {
  /** Output format: `text`, `json`, `markdown`, `sarif` or `html`. */
  readonly format: FormatId;
  /** Path of the file, relative to the project root (Vite's `root`; for Rollup, the working folder). */
  readonly file: string;
}

/** Options of the Vite / Rollup plugin. */
export interface LinkweaveBuildOptions {
  /** Folder to analyse, relative to the project root. @default the bundle's output folder (Vite `build.outDir`, Rollup `output.dir` or the folder of `output.file`) */
  readonly outDir?: string;
  /**
   * The configuration (the keys of `linkweave.config.json`), or the path of a `.json`/`.mjs`
   * configuration file read as the CLI's `--config` reads it. `include` defaults to the HTML
   * pages, `**\/*.html`, here. @default {}
   */
  readonly config?: Config | string;
  /** Reports to write (atomically) after the analysis, also when the gate fails. @default [] */
  readonly reports?: readonly ReportTarget[];
  /** Throw, failing the build, when the gate fails. @default true */
  readonly failBuild?: boolean;
}

/** Where the plugin prints: Vite's logger, or the Rollup plugin context. */
export interface BuildLogger {
  info(message: string): void;
  warn(message: string): void;
}

/** The part of the bundler's plugin context the plugin uses (Rollup, Rolldown and Vite have it). */
export interface BuildPluginContext {
  warn(message: string): void;
  info?(message: string): void;
  /** Vite 6+: the environment being built; a server (SSR) build writes no pages and is skipped. */
  readonly environment?: { readonly config?: { readonly consumer?: string } };
}

/** The part of Vite's resolved configuration the plugin reads. */
export interface ViteConfigLike {
  readonly root: string;
  readonly build: {
    readonly outDir: string;
    /** `false`: nothing is written, so there is nothing to check. */
    readonly write?: boolean;
    /** An SSR build writes server code, not pages: skipped. */
    readonly ssr?: boolean | string | object;
  };
  readonly logger: BuildLogger;
}

/** The plugin object: the same shape for Vite and Rollup. */
export interface LinkweaveBuildPlugin {
  readonly name: 'linkweave';
  /** Vite: run in `vite build` only, never in the dev server. */
  readonly apply: 'build';
  /** Vite only: the project root, output folder and logger. */
  configResolved(config: ViteConfigLike): void;
  /** Records where the bundle was written. */
  writeBundle(this: BuildPluginContext, output: { readonly dir?: string | undefined; readonly file?: string | undefined }): void;
  /** Analyses the written output. @throws EngineError `E_GATE_FAILED` when the gate fails and `failBuild` is on */
  closeBundle(this: BuildPluginContext, error?: Error): Promise<void>;
}

/** The plugin's own defaults (the analysis defaults are `resolveOptions`'s). */
const PLUGIN_DEFAULTS = { include: ['**/*.html'], failBuild: true } as const;

const LABEL = 'linkweave';

/**
 * Create the build plugin.
 * @throws EngineError `E_CONFIG_INVALID` for a report with an unknown format or no file
 */
export function createBuildPlugin(options: LinkweaveBuildOptions = {}): LinkweaveBuildPlugin {
  const reports = checkReports(options.reports ?? []);
  const failBuild = options.failBuild ?? PLUGIN_DEFAULTS.failBuild;
  let vite: ViteConfigLike | null = null;
  let written: string | null = null;
  return {
    name: 'linkweave',
    apply: 'build',
    configResolved(config) {
      vite = config;
    },
    writeBundle(output) {
      if (isServerBuild(this, vite)) return;
      written = output.dir ?? (output.file === undefined ? null : dirname(output.file));
    },
    async closeBundle(error) {
      // A failed build, a build that writes nothing, or server code: no pages to check.
      if (error !== undefined || vite?.build.write === false || isServerBuild(this, vite)) return;
      const project = vite === null ? process.cwd() : resolve(vite.root);
      const outDir =
        options.outDir !== undefined ? resolve(project, options.outDir) : (written ?? (vite === null ? null : resolve(project, vite.build.outDir)));
      if (outDir === null) throw new EngineError('E_USAGE', `${LABEL}: no output folder to analyse; set the plugin option outDir`);
      const logger: BuildLogger = vite?.logger ?? contextLogger(this);
      const targets = reports.map((r) => ({ ...r, path: resolve(project, r.file) }));
      const report = await analyzeOutput(outDir, options.config, project, targets.map((t) => t.path));
      for (const t of targets) {
        await writeFileAtomic(t.path, formatReportPieces(report, t.format, { color: false, cwd: project }), { label: t.file });
      }
      if (!report.gate.passed && failBuild) throw new EngineError('E_GATE_FAILED', gateErrorMessage(report, LABEL, project));
      logger.info(summaryOf(report, LABEL));
      const shown = report.gate.passed ? report.findings : failingFindings(report);
      if (shown.length > 0) logger.warn([`${LABEL}: findings`, ...findingLines(report, shown, project)].join('\n'));
    },
  };
}

/** `analyze` over the output folder, with the HTML pages as the default `include`. */
async function analyzeOutput(outDir: string, config: LinkweaveBuildOptions['config'], project: string, reportPaths: readonly string[]): Promise<Report> {
  const loaded =
    typeof config === 'string'
      ? await loadConfig({ explicit: config, root: outDir, cwd: project })
      : { config: config ?? {}, origin: `${LABEL} plugin option "config"` };
  const given = (loaded.config ?? {}) as Config;
  // Reports written into the output folder are never pages of the next build's analysis.
  const inside = reportPaths.map((p) => relative(outDir, p)).filter((r) => r !== '' && !r.startsWith(`..${sep}`) && !isAbsolute(r));
  const exclude = inside.length === 0 ? {} : { exclude: [...(Array.isArray(given.exclude) ? given.exclude : []), ...inside.map((r) => r.split(sep).join('/'))] };
  return analyze({ include: [...PLUGIN_DEFAULTS.include], ...given, ...exclude, root: outDir, configOrigin: loaded.origin });
}

function checkReports(reports: readonly ReportTarget[]): ReportTarget[] {
  return reports.map((r, i) => {
    if (r === null || typeof r !== 'object' || typeof r.file !== 'string' || r.file === '') {
      throw new EngineError('E_CONFIG_INVALID', `${LABEL} plugin option "reports.${i}.file": expected a file path`);
    }
    if (typeof r.format !== 'string' || !isFormatId(r.format)) {
      throw new EngineError('E_CONFIG_INVALID', `${LABEL} plugin option "reports.${i}.format": unknown format "${String(r.format)}", expected one of ${FORMAT_IDS.join(', ')}`);
    }
    return { format: r.format, file: r.file };
  });
}

function isServerBuild(ctx: BuildPluginContext, vite: ViteConfigLike | null): boolean {
  const ssr = vite?.build.ssr;
  return ctx.environment?.config?.consumer === 'server' || (ssr !== undefined && ssr !== false);
}

/** Rollup's context: `this.info` where the bundler has it (Rollup 3.28+, Rolldown), else `this.warn`. */
function contextLogger(ctx: BuildPluginContext): BuildLogger {
  return { info: (m) => (typeof ctx.info === 'function' ? ctx.info(m) : ctx.warn(m)), warn: (m) => ctx.warn(m) };
}
