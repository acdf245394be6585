/**
 * The collector shared by the files of one build: each file a build tool processes adds its
 * page facts (parsed from the file's own text by the parse stage, exactly as `analyze` parses
 * it); `report()` reads the rest of the site as `analyze` does (assets, navigation, redirects,
 * traffic) and runs the same later stages. State lives in the collector object, never in the
 * module: two collectors never see each other's files.
 */
import fs from 'node:fs';
import { isAbsolute, relative, resolve, sep } from 'node:path';
import { collectInputs, finishAnalysis } from '../analyze.js';
import { EngineError } from '../errors.js';
import { resolveOptions } from '../options.js';
import { parseSource } from '../parse/index.js';
import { validateRuleConfig } from '../rules/index.js';
import { absolutePathOf, attachReport, MESSAGE_SOURCE } from './messages.js';
import { sourceFileFrom } from './source.js';
/**
 * Create a collector.
 * @param input the same object `analyze` takes: configuration keys, `root`, `command`
 * @throws EngineError `E_CONFIG_INVALID` for a bad configuration, naming the key
 */
export function createCollector(input) {
    const { root, command = 'check', configOrigin = 'configuration', ...config } = input;
    const options = resolveOptions(config, resolve(root), configOrigin);
    validateRuleConfig(options, configOrigin);
    const roots = rootsOf(options.root);
    const entries = new Map();
    let cached = null;
    let generation = 0;
    let last = null;
    const relativePath = (path) => {
        for (const r of roots) {
            const rel = relative(r, isAbsolute(path) ? path : resolve(r, path));
            if (rel !== '' && !rel.startsWith(`..${sep}`) && rel !== '..' && !isAbsolute(rel))
                return rel.split(sep).join('/');
        }
        return null;
    };
    const add = (path, value) => {
        const rel = relativePath(path);
        if (rel === null)
            return null;
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
            const problem = path === null ? 'a file without a path' : file.value === undefined || file.value === null ? 'a file without contents' : null;
            if (problem !== null || add(path, file.value) === null) {
                const reason = problem ?? `a file outside the content root "${options.root}"`;
                file.message(`Unexpected ${reason}, expected a file under the content root; not collected`, {
                    ruleId: 'not-collected',
                    source: MESSAGE_SOURCE,
                });
                return false;
            }
            return true;
        },
        attach(file) {
            if (last === null)
                throw new EngineError('E_USAGE', 'collector.attach(file): call `await collector.report()` first');
            const path = absolutePathOf(file);
            const rel = path === null ? null : relativePath(path);
            return rel === null ? [] : attachReport(file, rel, last);
        },
        files: () => [...entries.keys()].sort(compare),
        lastReport: () => last,
        report() {
            if (cached === null || cached.generation !== generation) {
                const at = generation;
                const report = build(options, command, [...entries.values()]).then((r) => {
                    if (cached?.generation === at)
                        last = r;
                    return r;
                }, (error) => {
                    // A failed run is not kept: the next call tries again.
                    if (cached?.generation === at)
                        cached = null;
                    throw error;
                });
                cached = { generation: at, report };
            }
            return cached.report;
        },
    };
}
async function build(options, command, added) {
    if (added.length === 0) {
        throw new EngineError('E_USAGE', 'collector.report(): no files were added; run the pipeline over the site first');
    }
    const collected = await collectInputs(options);
    // Pages come from the files the build processed, in the order `collect` gives (by path).
    const sorted = added.slice().sort((a, b) => compare(a.source.path, b.source.path));
    const paths = new Set(sorted.map((e) => e.source.path));
    const sources = {
        ...collected.sources,
        files: sorted.map((e) => e.source),
        assets: collected.sources.assets.filter((a) => !paths.has(a)),
    };
    return finishAnalysis({ options, command, facts: sorted.map((e) => e.facts), collected: { ...collected, sources }, hooks: {} });
}
/** The root as given and its real path (a vfile may name either). */
function rootsOf(root) {
    try {
        const real = fs.realpathSync.native(root);
        return real === root ? [root] : [root, real];
    }
    catch {
        return [root];
    }
}
/** Code-unit order, as `collect` sorts. */
function compare(a, b) {
    return a < b ? -1 : a > b ? 1 : 0;
}
