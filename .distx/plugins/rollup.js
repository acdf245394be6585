/**
 * `linkweave/rollup`: the build plugin for Rollup (and Rolldown), the same object as
 * `linkweave/vite`. Rollup has no logger option here: the summary goes to `this.info` (or
 * `this.warn` where the bundler has no `info`), and the output folder is the bundle's
 * `output.dir` (or the folder of `output.file`) unless `outDir` is given.
 *
 * ```js
 * // rollup.config.js
 * import linkweave from 'linkweave/rollup';
 * export default { input: 'src/main.js', output: { dir: 'dist' }, plugins: [linkweave()] };
 * ```
 */
export { linkweave, linkweave as default } from './vite.js';
