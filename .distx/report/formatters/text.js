/**
 * The terminal writer: findings grouped by file, each as `file:line:column  severity  rule-id`
 * with its message wrapped on the lines below (the location stays whole, so editors and CI logs
 * can link it), suggested links grouped by source file the same way, then (with `--baseline` or
 * `--compare`) the new and fixed findings and the structure changes, then the counts and the
 * gate result last, where a CI log ends.
 * Colour through picocolors, only when `ctx.color`.
 */
import pc from 'picocolors';
import { describeFailure, displayPath, formatDepth, formatRank, formatSimilarity, impactOf, plural, problemsLine, repairLine, summaryParts, } from './common.js';
/**
 * Lay `words` out after `prefix` (already painted; `prefixWidth` visible columns): lines of at
 * most `width` columns, continuation lines indented by `indent`. `width` 0: one line.
 */
function wrap(prefix, prefixWidth, words, width, indent) {
    const lines = [];
    let line = prefix;
    let used = prefixWidth;
    let empty = true;
    for (const word of words) {
        let sep = empty ? '' : word.sep;
        if (width > 0 && !empty && used + sep.length + word.text.length > width) {
            lines.push(line);
            line = ' '.repeat(indent);
            used = indent;
            sep = '';
        }
        line += sep + word.paint(word.text);
        used += sep.length + word.text.length;
        empty = false;
    }
    lines.push(line);
    return lines;
}
/**
 * Control characters (a file name or anchor could carry terminal escapes) shown as U+FFFD, so
 * report text can never drive the terminal.
 */
function clean(text) {
    // eslint-disable-next-line no-control-regex
    return text.replace(/[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/g, '\uFFFD');
}
function words(text, paint, firstSep = ' ') {
    return clean(text)
        .split(/\s+/)
        .filter((t) => t !== '')
        .map((t, i) => ({ text: t, sep: i === 0 ? firstSep : ' ', paint }));
}
/** Phrases kept whole when wrapping, each but the last followed by `punct`. */
function phrases(list, punct) {
    return list.map((p, i) => ({ text: i < list.length - 1 ? `${p}${punct}` : p, sep: ' ', paint: (s) => s }));
}
/** Consecutive items with the same file, in order. */
function groupByFile(items) {
    const groups = [];
    for (const item of items) {
        const last = groups[groups.length - 1];
        if (last !== undefined && last[0].file === item.file)
            last.push(item);
        else
            groups.push([item]);
    }
    return groups;
}
/** Message lines sit under their location, indented by this much. */
const BODY_INDENT = 4;
function findingLines(report, ctx, c, width) {
    const loc = (f) => `${clean(displayPath(f.file, report.root, ctx.cwd)) || '(site)'}:${f.line}:${f.column}`;
    const out = [];
    const shown = report.findings.slice(0, ctx.maxItems ?? report.findings.length);
    for (const group of groupByFile(shown)) {
        if (out.length > 0)
            out.push('');
        for (const f of group) {
            const location = loc(f);
            const paintSev = f.severity === 'error' ? c.red : c.yellow;
            const cut = location.lastIndexOf(':', location.lastIndexOf(':') - 1);
            out.push(`${location.slice(0, cut)}${c.dim(location.slice(cut))}  ${paintSev(f.severity)}  ${c.dim(f.rule)}`);
            append(out, wrap(' '.repeat(BODY_INDENT), BODY_INDENT, words(f.message, (s) => s), width, BODY_INDENT));
        }
    }
    if (shown.length < report.findings.length)
        out.push('', c.dim(moreLine(report.findings.length - shown.length, 'finding')));
    return out;
}
/** The line after a cut list. */
function moreLine(count, noun) {
    return `... and ${plural(count, `more ${noun}`)}, in the full report`;
}
function suggestionHead(s, c) {
    const plain = (x) => x;
    return [
        ...words(s.anchor === null ? 'add a link' : 'add link', c.green),
        ...(s.anchor === null ? [] : words(`"${s.anchor}"`, plain)),
        { text: '->', sep: ' ', paint: plain },
        { text: clean(s.target), sep: ' ', paint: c.cyan },
    ];
}
function suggestionDetail(s, c) {
    const impact = `similarity ${formatSimilarity(s.similarity)}, ${impactOf(s, 'target rank')}`;
    return [...words(impact, c.dim, ''), { text: `id ${s.id}`, sep: '  ', paint: () => `${c.dim('id')} ${c.bold(s.id)}` }];
}
function suggestionLines(report, ctx, c, width) {
    const where = (s) => clean(displayPath(s.file, report.root, ctx.cwd));
    const anchored = report.suggestions.filter((s) => s.anchor !== null);
    const loose = report.suggestions.filter((s) => s.anchor === null);
    const limit = ctx.maxItems ?? report.suggestions.length;
    const out = [c.bold(`Suggested links (${anchored.length})`)];
    for (const group of groupByFile(anchored.slice(0, limit))) {
        out.push('');
        for (const s of group) {
            const location = `${where(s)}:${s.line}:${s.column}`;
            append(out, wrap(`${location}  `, location.length + 2, suggestionHead(s, c), width, BODY_INDENT));
            append(out, wrap(' '.repeat(BODY_INDENT), BODY_INDENT, suggestionDetail(s, c), width, BODY_INDENT));
        }
    }
    if (anchored.length > limit)
        out.push('', c.dim(moreLine(anchored.length - limit, 'suggested link')));
    if (loose.length > 0) {
        // No phrase of the source names the target: a writer has to add a sentence, so these come
        // last, one line each, without a position.
        out.push('', c.bold(`Related pages with no anchor phrase (${loose.length}): a sentence that links would help`), '');
        for (const s of loose.slice(0, limit)) {
            const head = `${where(s)} -> `;
            append(out, wrap(head, head.length, [
                { text: clean(s.target), sep: '', paint: c.cyan },
                ...words(`(similarity ${formatSimilarity(s.similarity)}, ${impactOf(s, 'target rank')})`, c.dim, '  '),
                { text: `id ${s.id}`, sep: '  ', paint: () => `${c.dim('id')} ${c.bold(s.id)}` },
            ], width, BODY_INDENT));
        }
    }
    if (loose.length > limit)
        out.push('', c.dim(moreLine(loose.length - limit, 'related page')));
    const repair = repairLine(report);
    if (repair !== null)
        append(out, ['', ...wrap('', 0, words(repair, c.bold, ''), width, 0)]);
    const ids = (anchored.length > 0 ? anchored : loose).slice(0, 2).map((s) => s.id).join(',');
    out.push('', c.dim(`Apply chosen links with: linkweave apply --ids ${ids}${report.suggestions.length > 2 ? ',...' : ''}`));
    return out;
}
/** New and fixed findings, one line each: `file:line:column  rule  message`. */
function changedFindings(title, list, report, ctx, c, width) {
    if (list.length === 0)
        return [];
    const out = [`${title} (${list.length}):`];
    for (const f of list) {
        const location = `  ${clean(displayPath(f.file, report.root, ctx.cwd)) || '(site)'}:${f.line}:${f.column}  `;
        const width0 = location.length + f.rule.length + 2;
        append(out, wrap(`${location}${c.dim(f.rule)}  `, width0, words(f.message, (x) => x, ''), width, BODY_INDENT));
    }
    return out;
}
function pageChangeLine(p) {
    const rank = p.rankBefore === p.rankAfter ? `rank ${formatRank(p.rankAfter)}` : `rank ${formatRank(p.rankBefore)} -> ${formatRank(p.rankAfter)}`;
    const depth = p.depthBefore === p.depthAfter ? `depth ${formatDepth(p.depthAfter)}` : `depth ${formatDepth(p.depthBefore)} -> ${formatDepth(p.depthAfter)}`;
    return `  ${clean(p.route)}  ${rank}, ${depth}`;
}
/** The baseline's and the base report's new and fixed findings, and the structure changes. */
function reviewLines(report, ctx, c, width) {
    const out = [];
    const { baseline, comparison } = report;
    if (baseline !== undefined) {
        out.push(c.bold(`Against the baseline: ${baseline.known} known, ${baseline.new.length} new, ${baseline.fixed.length} fixed`));
        append(out, changedFindings('New', baseline.new, report, ctx, c, width));
        append(out, changedFindings('Fixed', baseline.fixed, report, ctx, c, width));
    }
    if (comparison !== undefined) {
        if (out.length > 0)
            out.push('');
        const { newFindings, fixedFindings, pagesAdded, pagesRemoved } = comparison;
        out.push(c.bold(`Compared with the base report: ${plural(newFindings.length, 'new finding')}, ${fixedFindings.length} fixed, ${plural(pagesAdded.length, 'page')} added, ${pagesRemoved.length} removed`));
        append(out, changedFindings('New', newFindings, report, ctx, c, width));
        append(out, changedFindings('Fixed', fixedFindings, report, ctx, c, width));
        const routes = (title, pages) => pages.length === 0 ? [] : wrap(`${title}: `, title.length + 2, phrases(pages.map((p) => clean(p.route)), ','), width, BODY_INDENT);
        append(out, routes('Pages added', pagesAdded));
        append(out, routes('Pages removed', pagesRemoved));
        const seen = new Set();
        const rows = [...comparison.depthChanges, ...comparison.rankChanges].filter((p) => !seen.has(p.route) && seen.add(p.route));
        if (rows.length > 0)
            append(out, ['Biggest changes (depth first, then rank):', ...rows.map(pageChangeLine)]);
    }
    return out;
}
/**
 * Add `lines` (and `extra`) to `out` one by one: `out.push(...lines)` passes every line as an
 * argument, which overflows the call stack past about 100,000 lines (a large site's findings).
 */
function append(out, lines, ...extra) {
    for (const line of lines)
        out.push(line);
    for (const line of extra)
        out.push(line);
}
/** The terminal formatter. */
export const textFormatter = {
    id: 'text',
    fileExtension: '.txt',
    format(report, ctx) {
        const c = pc.createColors(ctx.color);
        const width = ctx.width ?? 80;
        const out = [];
        if (report.findings.length > 0)
            append(out, findingLines(report, ctx, c, width), '');
        if (report.suggestions.length > 0)
            append(out, suggestionLines(report, ctx, c, width), '');
        if (report.baseline !== undefined || report.comparison !== undefined)
            append(out, reviewLines(report, ctx, c, width), '');
        const { error, warning } = report.stats.findings;
        const problems = problemsLine(report);
        out.push(error > 0 ? c.red(c.bold(problems)) : warning > 0 ? c.yellow(c.bold(problems)) : c.green(problems));
        const parts = summaryParts(report);
        out.push(...wrap('', 0, phrases(parts, ','), width, 0));
        const { gate } = report;
        if (gate.passed) {
            out.push(c.green(`Gate passed (fail on ${gate.failOn})`));
        }
        else {
            const failures = gate.failures.map((f) => describeFailure(f, gate.failOn));
            const head = `Gate failed (fail on ${gate.failOn}):`;
            out.push(...wrap(`${c.red(c.bold(head))} `, head.length + 1, phrases(failures, ','), width, 2));
        }
        return `${out.join('\n')}\n`;
    },
};
