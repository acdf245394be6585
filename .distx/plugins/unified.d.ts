/**
 * `linkweave/unified`: linkweave inside a unified (remark) pipeline that processes a site's
 * Markdown file by file.
 *
 * ```js
 * import { unified } from 'unified';
 * import remarkParse from 'remark-parse';
 * import { createCollector, linkweaveCollect, linkweaveReport } from 'linkweave/unified';
 *
 * const collector = createCollector({ root: 'docs' });
 * const collect = unified().use(remarkParse).use(linkweaveCollect, { collector });
 * for (const file of files) await collect.run(collect.parse(file), file);
 * const report = await collector.report();          // the same Report as analyze({ root: 'docs' })
 * for (const file of files) collector.attach(file); // findings as vfile messages
 * ```
 *
 * The page facts come from the file's own text through the parse stage (the same code as
 * `analyze`), not from the pipeline's tree: other plugins in the pipeline cannot change them,
 * and the results equal `analyze` on the same files.
 */
import type { Plugin } from 'unified';
import type { Collector } from './collector.js';
export { createCollector } from './collector.js';
export type { Collector } from './collector.js';
export { MESSAGE_SOURCE } from './messages.js';
export type { VFile, VFileMessage } from './messages.js';
/** Options of `linkweaveCollect` and `linkweaveReport`. */
export interface LinkweaveCollectOptions {
    /** The collector shared by every file of the site (`createCollector(options)`). */
    readonly collector: Collector;
}
/** unified plugin: each file that runs through the pipeline adds its page facts to the collector. */
export declare const linkweaveCollect: Plugin<[LinkweaveCollectOptions]>;
/**
 * unified plugin for a second pass, after every file was collected: waits for the report and
 * attaches each file's findings to it as messages, for the pipeline's reporter to print.
 */
export declare const linkweaveReport: Plugin<[LinkweaveCollectOptions]>;
