import type { Config } from '../config.js';
import type { FormatId } from '../report/index.js';
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
    readonly environment?: {
        readonly config?: {
            readonly consumer?: string;
        };
    };
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
    writeBundle(this: BuildPluginContext, output: {
        readonly dir?: string | undefined;
        readonly file?: string | undefined;
    }): void;
    /** Analyses the written output. @throws EngineError `E_GATE_FAILED` when the gate fails and `failBuild` is on */
    closeBundle(this: BuildPluginContext, error?: Error): Promise<void>;
}
/**
 * Create the build plugin.
 * @throws EngineError `E_CONFIG_INVALID` for a report with an unknown format or no file
 */
export declare function createBuildPlugin(options?: LinkweaveBuildOptions): LinkweaveBuildPlugin;
