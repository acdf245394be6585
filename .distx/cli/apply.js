/**
 * `linkweave apply [root]`: write chosen suggestions into the sources as links in the site's
 * prevailing style. The suggestions come from `--from report.json` or from a `suggest` run
 * made now. Planning is the pure `apply/` stage; this file reads, checks and writes files.
 *
 * Output: the applied, skipped and refused suggestions on stdout; with `--dry-run` the unified
 * diff on stdout (so it can be piped to `git apply`) and that summary on stderr, and nothing
 * written (not even the parse cache).
 *
 * Exit codes: 0 every chosen suggestion was applied (with `--all`, suggestions without an
 * anchor phrase are skipped and do not count); 1 some were refused (the file changed since the
 * report, overlapping anchors, ...) or an id given with `--ids` has no anchor phrase: the rest
 * were applied; 2 usage (no `--ids`/`--all`, an unknown id), an unreadable or invalid `--from`
 * report, or a file that could not be written.
 */
import fs from 'node:fs';
import { join, resolve } from 'node:path';
import { analyze } from '../analyze.js';
import { LINK_STYLES, addCounts, chooseStyle, countStyles, encodeText, groupByFile, hadBom, hrefFor, majority, planFile, selectSuggestions, unifiedDiff, } from '../apply/index.js';
import { collectSources, kindOfPath, readSource } from '../collect/index.js';
import { parseReportFile } from '../compare/index.js';
import { EngineError } from '../errors.js';
import { resolveOptions } from '../options.js';
import { parseSource } from '../parse/index.js';
import { displayPath } from '../report/formatters/common.js';
import { writeFileAtomic } from '../report/write.js';
import { readUserFile } from './review.js';
/** One line of help for `apply`. */
export const APPLY_SUMMARY = 'write chosen suggestions into the sources as links (--ids ID,ID or --all; --dry-run prints a diff)';
/** Flags of `apply`. */
export const APPLY_FLAGS = [
    { name: 'ids', kind: 'string', value: 'ID,ID', description: 'apply the suggestions with these ids' },
    { name: 'all', kind: 'boolean', description: 'apply every suggestion that has an anchor phrase' },
    { name: 'from', kind: 'string', value: 'FILE', description: 'take the suggestions from a JSON report (default: run suggest now)' },
    { name: 'dry-run', kind: 'boolean', description: 'print a unified diff of the changes; write nothing' },
    {
        name: 'link-style',
        kind: 'string',
        value: 'STYLE',
        choices: LINK_STYLES,
        description: "how links name their target (default: as the file's own links do, else the site's)",
    },
];
/** Run `apply`; returns the exit code. */
export async function runApplyCommand(ctx) {
    const { io, values, root } = ctx;
    for (const flag of ['format', 'output']) {
        if (values[flag] !== undefined)
            throw new EngineError('E_USAGE', `flag --${flag} is not used by "apply" (it prints a summary, or a diff with --dry-run)`);
    }
    const selection = selectionOf(values);
    const dryRun = values['dry-run'] === true;
    const forced = typeof values['link-style'] === 'string' ? values['link-style'] : null;
    const options = resolveOptions(ctx.config, root, ctx.configOrigin);
    const fromPath = typeof values.from === 'string' ? values.from : null;
    const source = fromPath === null ? await suggestNow(ctx, dryRun) : parseReportFile(readUserFile(io.cwd, fromPath, 'from'), fromPath);
    const selected = selectSuggestions(source.suggestions, selection);
    if (selected.unknown.length > 0) {
        const where = fromPath === null ? "this run's suggestions" : `"${fromPath}"`;
        throw new EngineError('E_USAGE', `flag --ids: no suggestion with id ${selected.unknown.map((id) => `"${id}"`).join(', ')} in ${where}; nothing was written`);
    }
    // A page row without a route or file (a hand-edited report) gives no address to link to: its
    // suggestions are refused as targets that are not pages of the report.
    const pages = new Map(source.pages.filter((p) => p.route.startsWith('/') && p.file !== '').map((p) => [p.route, { route: p.route, file: p.file }]));
    const out = { applied: [], skipped: [...selected.skipped], refused: [], styles: new Map(), diff: [], writeFailed: false };
    const realRoot = fs.realpathSync(root);
    let site = null;
    for (const [rel, group] of groupByFile(selected.chosen)) {
        const read = readForApply(rel, root, realRoot, options);
        if ('reason' in read) {
            for (const s of group)
                out.refused.push({ id: s.id, file: rel, reason: read.reason });
            continue;
        }
        const facts = parseSource(read.file, options);
        const own = countStyles(facts.links, read.file.kind);
        if (forced === null && majority(own) === null)
            site ??= await countSite(options);
        const { style, origin } = chooseStyle(own, () => site, forced);
        const from = { file: rel, kind: read.file.kind, route: facts.route, ...(facts.baseHref === undefined ? {} : { baseHref: facts.baseHref }) };
        const hrefs = new Map();
        for (const s of group) {
            const target = pages.get(s.target);
            if (target !== undefined)
                hrefs.set(s.id, hrefFor(from, target, style));
        }
        const plan = planFile({ file: read.file, suggestions: group, hrefs, style, options });
        out.refused.push(...plan.refused);
        if (plan.applied.length === 0)
            continue;
        out.styles.set(rel, `${style} (${origin === 'flag' ? '--link-style' : origin === 'file' ? "the file's own links" : origin === 'site' ? "the site's links" : 'default'})`);
        const shown = displayPath(rel, root, io.cwd);
        if (dryRun) {
            out.diff.push(unifiedDiff(shown, plan.before, plan.after));
            out.applied.push(...plan.applied);
            continue;
        }
        try {
            await writeFileAtomic(read.real, encodeText(plan.after, hadBom(read.file)), {
                label: shown,
                ...(io.tempFiles === undefined ? {} : { tracker: io.tempFiles }),
            });
            out.applied.push(...plan.applied);
        }
        catch (error) {
            out.writeFailed = true;
            for (const a of plan.applied)
                out.refused.push({ id: a.id, file: rel, reason: error.message });
        }
    }
    if (dryRun)
        io.stdout.write(out.diff.join(''));
    if (!ctx.flags.quiet)
        (dryRun ? io.stderr : io.stdout).write(summary(out, dryRun, (f) => displayPath(f, root, io.cwd)));
    if (out.writeFailed)
        return 2;
    const explicitSkip = selection !== 'all' && out.skipped.length > 0;
    return out.refused.length > 0 || explicitSkip ? 1 : 0;
}
function selectionOf(values) {
    const ids = typeof values.ids === 'string' ? values.ids : null;
    const all = values.all === true;
    if (ids !== null && all)
        throw new EngineError('E_USAGE', 'flags --ids and --all: give one of them, not both');
    if (all)
        return 'all';
    if (ids === null)
        throw new EngineError('E_USAGE', '"apply" needs --ids ID,ID (from the suggest output) or --all');
    const list = ids.split(',').map((id) => id.trim()).filter((id) => id !== '');
    if (list.length === 0)
        throw new EngineError('E_USAGE', `flag --ids: expected suggestion ids separated by commas; got "${ids}"`);
    return { ids: list };
}
/** A `suggest` run now; in a dry run without the cache, so nothing at all is written. */
async function suggestNow(ctx, dryRun) {
    const config = dryRun ? { ...ctx.config, cache: { ...ctx.config.cache, enabled: false } } : ctx.config;
    return analyze({ ...config, root: ctx.root, command: 'suggest', configOrigin: ctx.configOrigin });
}
/**
 * Read one source named by a report, refusing paths that are not a source file inside the
 * root (a report is input: it could name anything). The real path is where the write goes,
 * so a symlink inside the root is written through, never replaced.
 */
function readForApply(rel, root, realRoot, options) {
    const kind = kindOfPath(rel);
    const segments = rel.split('/');
    if (kind === null || rel.startsWith('/') || rel.includes('\\') || rel.includes('\0') || segments.some((s) => s === '..' || s === '.' || s === '')) {
        return { reason: `"${rel}" is not the path of a source file under the content root` };
    }
    let real;
    try {
        real = fs.realpathSync(join(root, ...segments));
    }
    catch (error) {
        const code = error.code;
        return { reason: code === 'ENOENT' ? `"${rel}" does not exist (any more)` : `"${rel}" cannot be read (${code ?? 'error'})` };
    }
    const read = readSource(real, rel, kind, { realRoot, maxFileBytes: options.maxFileBytes });
    if ('warning' in read)
        return { reason: read.warning.message };
    return { file: read.file, real };
}
/** The link styles of every source of the site (read only when a file has no links of its own). */
async function countSite(options) {
    const { files } = await collectSources(options);
    let counts = { relative: 0, absolute: 0, 'route-relative': 0 };
    for (const file of files)
        counts = addCounts(counts, countStyles(parseSource(file, options).links, file.kind));
    return counts;
}
/** The summary: applied (with the markup and style), skipped and refused suggestions. */
function summary(out, dryRun, shown) {
    const files = new Set(out.applied.map((a) => a.file)).size;
    const verb = dryRun ? 'Would apply' : 'Applied';
    const lines = [`${verb} ${count(out.applied.length, 'link')} in ${count(files, 'file')}${dryRun ? ' (dry run: nothing written)' : ''}`];
    const byFile = new Map();
    for (const a of out.applied)
        byFile.set(a.file, [...(byFile.get(a.file) ?? []), a]);
    for (const [file, links] of byFile) {
        lines.push(`  ${shown(file)}  link style ${out.styles.get(file)}`);
        for (const a of links)
            lines.push(`    ${a.line}:${a.column}  ${a.open}${a.anchor}${a.close}  -> ${a.target}  id ${a.id}`);
    }
    const list = (title, items) => {
        if (items.length === 0)
            return;
        lines.push(`${title} ${count(items.length, 'suggestion')}:`);
        for (const i of items)
            lines.push(`  ${shown(i.file)}  id ${i.id}: ${i.reason}`);
    };
    list('Skipped', out.skipped);
    list('Refused', out.refused);
    return `${lines.join('\n')}\n`;
}
function count(n, noun) {
    return `${n} ${noun}${n === 1 ? '' : 's'}`;
}
