/**
 * `linkweave/vite`: check the built site at the end of `vite build`.
 *
 * ```js
 * // vite.config.js
 * import linkweave from 'linkweave/vite';
 * export default { plugins: [linkweave({ reports: [{ format: 'json', file: 'linkweave.json' }] })] };
 * ```
 *
 * After the bundle is written (`closeBundle`) the plugin analyses the output folder's HTML
 * pages (routes from the output layout: `a/index.html` is `/a/`, `a.html` is `/a.html`), prints
 * the summary through Vite's logger, writes the reports, and fails the build when the gate
 * fails, unless `failBuild: false`.
 */
import { createBuildPlugin } from './build.js';
/**
 * The Vite plugin (the same object works as a Rollup plugin: `linkweave/rollup`).
 * @param options output folder, configuration, reports, `failBuild`
 * @throws EngineError `E_CONFIG_INVALID` for a bad `reports` entry; the build fails with
 *   `E_GATE_FAILED` (message: the findings at file:line) when the gate fails
 */
export function linkweave(options = {}) {
    return createBuildPlugin(options);
}
export default linkweave;
