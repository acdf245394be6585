import { EngineError } from '../errors.js';
export { createCollector } from './collector.js';
export { MESSAGE_SOURCE } from './messages.js';
/** unified plugin: each file that runs through the pipeline adds its page facts to the collector. */
export const linkweaveCollect = function (options) {
    const collector = collectorOf(options, 'linkweaveCollect');
    return (_tree, file) => {
        collector.collect(file);
    };
};
/**
 * unified plugin for a second pass, after every file was collected: waits for the report and
 * attaches each file's findings to it as messages, for the pipeline's reporter to print.
 */
export const linkweaveReport = function (options) {
    const collector = collectorOf(options, 'linkweaveReport');
    return async (_tree, file) => {
        await collector.report();
        collector.attach(file);
    };
};
function collectorOf(options, plugin) {
    const collector = options?.collector;
    if (collector === undefined || typeof collector.collect !== 'function') {
        throw new EngineError('E_USAGE', `${plugin}: expected options { collector } with a collector from createCollector(options)`);
    }
    return collector;
}
