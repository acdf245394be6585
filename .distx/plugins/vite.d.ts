import type { LinkweaveBuildOptions, LinkweaveBuildPlugin } from './build.js';
export type { BuildLogger, BuildPluginContext, LinkweaveBuildOptions, LinkweaveBuildPlugin, ReportTarget, ViteConfigLike } from './build.js';
/**
 * The Vite plugin (the same object works as a Rollup plugin: `linkweave/rollup`).
 * @param options output folder, configuration, reports, `failBuild`
 * @throws EngineError `E_CONFIG_INVALID` for a bad `reports` entry; the build fails with
 *   `E_GATE_FAILED` (message: the findings at file:line) when the gate fails
 */
export declare function linkweave(options?: LinkweaveBuildOptions): LinkweaveBuildPlugin;
export default linkweave;
