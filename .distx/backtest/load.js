/**
 * Reading a site for the backtest exactly the way `analyze` reads it: `collectInputs` (sources,
 * navigation, redirects, traffic) and `parseAll` (cache, then the parallel parser).
 */
import { collectInputs, parseAll } from '../analyze.js';
/**
 * Collect and parse the site under `options.root`.
 * @throws EngineError `E_IO` for an unreadable root or a missing auxiliary file
 */
export async function loadSite(options, hooks = {}) {
    hooks.onStage?.('collect', 'start');
    const collected = await collectInputs(options);
    hooks.onStage?.('collect', 'end');
    hooks.onStage?.('parse', 'start');
    const facts = await parseAll(collected.sources, options, hooks);
    hooks.onStage?.('parse', 'end');
    return { collected, facts };
}
