import { parseSource } from '../parse/index.js';
import { chooseThreads } from './plan.js';
import { parseInPool } from './pool.js';
/** Files parsed on the main thread between two turns of the event loop (progress, signals). */
const MAIN_STEP = 64;
/**
 * Facts of every file in the order of `files`, identical whichever path parses them: the main
 * thread (`options.workers` 1, or automatic below `AUTO_MIN_FILES` files) or a pool of worker
 * threads (`options.workers` N >= 2, or automatic: one per core).
 */
export async function parseFiles(files, options, settings) {
    const onParsed = settings.onParsed ?? (() => undefined);
    const threads = chooseThreads(options.workers, files.length, settings.cores);
    if (threads >= 2)
        return parseInPool(files, options, threads, onParsed);
    const facts = new Array(files.length);
    for (let i = 0; i < files.length; i += MAIN_STEP) {
        const end = Math.min(files.length, i + MAIN_STEP);
        for (let j = i; j < end; j++)
            facts[j] = parseSource(files[j], options);
        onParsed(end - i);
        if (end < files.length)
            await new Promise((resolve) => setImmediate(resolve));
    }
    return { facts, stats: { threads: 1, batches: 0, fallback: null } };
}
