import { failureParts, formatDepth, formatRank, formatSimilarity, impactOf, plural, repairLine, summaryParts } from './common.js';
/** Rows shown before the rest is collapsed. */
const SHOWN = 10;
/** Escape text for Markdown (ASCII punctuation that could start markup); keeps it on one line. */
export function escapeMarkdown(text) {
    return text.replace(/\s+/g, ' ').replace(/[\\`*_[\]<>|~&]/g, (ch) => `\\${ch}`);
}
/** Inline code that survives backticks inside. */
function code(text) {
    const ticks = text.includes('`') ? '``' : '`';
    const pad = text.startsWith('`') || text.endsWith('`') ? ' ' : '';
    return `${ticks}${pad}${text.replace(/\s+/g, ' ')}${pad}${ticks}`;
}
function location(f, withColumn = true) {
    const place = withColumn && f.column !== undefined ? `${f.line}:${f.column}` : `${f.line}`;
    return f.file === '' ? '(site)' : `${f.file}:${place}`;
}
function findingsTable(findings) {
    return [
        '| Severity | Location | Finding | Rule |',
        '| --- | --- | --- | --- |',
        ...findings.map((f) => `| ${f.severity} | ${code(location(f))} | ${escapeMarkdown(f.message)} | ${code(f.rule)} |`),
    ];
}
/**
 * Most items of one list in the comment. A pull-request comment has a size limit (65,536
 * characters on the largest code host; common practice, no source), and a reviewer reads the
 * first screens: a long list stops here and points to the full reports.
 */
const LISTED = 60;
/**
 * `lines` as they are when short, else the first `SHOWN` and the rest in `<details>`, at most
 * `LISTED` items in all, then how many more there are.
 */
function collapse(items, render, noun) {
    if (items.length <= SHOWN + 2)
        return render(items);
    const listed = Math.min(items.length, LISTED);
    const unlisted = items.length - listed;
    return [
        ...render(items.slice(0, SHOWN)),
        '',
        '<details>',
        `<summary>${plural(items.length - SHOWN, `more ${noun}`, `more ${noun}s`)}</summary>`,
        '',
        ...render(items.slice(SHOWN, listed)),
        ...(unlisted === 0 ? [] : ['', `... and ${plural(unlisted, `more ${noun}`, `more ${noun}s`)}, not listed here: the JSON and HTML reports have them all.`]),
        '',
        '</details>',
    ];
}
function suggestionItem(s) {
    const what = s.anchor === null ? `a link (no anchor phrase found) in ${code(`${s.file}:${s.line}`)}` : `"${escapeMarkdown(s.anchor)}" in ${code(`${s.file}:${s.line}`)}`;
    return `- [ ] ${what} -> ${code(s.target)} (${impactOf(s)}; similarity ${formatSimilarity(s.similarity)}) id ${code(s.id)}`;
}
function gateSection(report) {
    const { gate } = report;
    const known = report.baseline === undefined
        ? []
        : ['', `${plural(report.baseline.known, 'finding')} known from the baseline ${report.baseline.known === 1 ? 'does' : 'do'} not count; ${report.baseline.new.length} new.`];
    if (gate.passed)
        return [`### linkweave: gate passed`, '', `Nothing at or above ${code(gate.failOn)} and no limit crossed.`, ...known];
    const rows = gate.failures.map((f) => {
        const { check, found, allowed } = failureParts(f, gate.failOn);
        return `| ${code(check)} | ${found} | ${allowed} |`;
    });
    return [
        `### linkweave: gate failed`,
        '',
        `The gate fails on findings at or above ${code(gate.failOn)} and on the configured limits.`,
        '',
        '| Check | Found | Allowed |',
        '| --- | --- | --- |',
        ...rows,
        ...known,
    ];
}
/** Errors before warnings, keeping the report's order otherwise. */
function errorsFirst(findings) {
    return [...findings].sort((a, b) => Number(a.severity !== 'error') - Number(b.severity !== 'error'));
}
/** New and fixed findings against the base report (preferred) or the baseline; every finding collapsed. */
function reviewSections(report, against, added, fixed) {
    const out = ['', added.length === 0 ? `#### New findings: none (compared with the ${against})` : `#### New findings (${added.length}, not in the ${against})`];
    if (added.length > 0)
        out.push('', ...collapse(errorsFirst(added), findingsTable, 'finding'));
    out.push('', fixed.length === 0 ? '#### Fixed findings: none' : `#### Fixed findings (${fixed.length}, in the ${against}, gone now)`);
    if (fixed.length > 0)
        out.push('', ...collapse(errorsFirst(fixed), findingsTable, 'finding'));
    if (report.findings.length > 0) {
        out.push('', '<details>', `<summary>All ${plural(report.findings.length, 'finding')} of this run</summary>`, '', ...findingsTable(errorsFirst(report.findings)), '', '</details>');
    }
    return out;
}
function change(before, after) {
    return before === after ? after : `${before} -> ${after}`;
}
/** One row of the structure table; a rank change below 0.005 (0.00 at two decimals) shows as none. */
function changeRow(c) {
    const rank = Math.abs(c.rankChange) < 0.005
        ? formatRank(c.rankAfter)
        : `${formatRank(c.rankBefore)} -> ${formatRank(c.rankAfter)} (${c.rankChange > 0 ? '+' : '-'}${formatRank(Math.abs(c.rankChange))})`;
    return `| ${code(c.route)} | ${rank} | ${change(formatDepth(c.depthBefore), formatDepth(c.depthAfter))} |`;
}
function pageList(pages) {
    return pages.map((p) => `- ${code(p.route)} (${code(p.file)})`);
}
/** Pages added and removed, then the pages whose depth or rank changed most, in one table. */
function structureSection(report, c) {
    const out = ['', '#### Structure changes', ''];
    const head = `${plural(report.pages.length, 'page')} (base ${c.base.pages}): ${c.pagesAdded.length} added, ${c.pagesRemoved.length} removed; ${plural(c.changedPages.depth, 'page')} changed click depth, ${c.changedPages.rank} changed rank.`;
    out.push(head);
    if (c.pagesAdded.length > 0)
        out.push('', `Added (${c.pagesAdded.length}):`, '', ...collapse(c.pagesAdded, pageList, 'page'));
    if (c.pagesRemoved.length > 0)
        out.push('', `Removed (${c.pagesRemoved.length}):`, '', ...collapse(c.pagesRemoved, pageList, 'page'));
    const seen = new Set();
    const rows = [...c.depthChanges, ...c.rankChanges].filter((p) => !seen.has(p.route) && seen.add(p.route));
    if (rows.length > 0) {
        out.push('', 'Biggest changes (depth first, then rank):', '');
        out.push(...collapse(rows, (part) => ['| Page | Rank | Depth |', '| --- | --- | --- |', ...part.map(changeRow)], 'page'));
    }
    return out;
}
/** The Markdown formatter. */
export const markdownFormatter = {
    id: 'markdown',
    fileExtension: '.md',
    format(report) {
        const out = [...gateSection(report), '', `${summaryParts(report).join(' · ')}.`];
        const { error, warning } = report.stats.findings;
        const counts = error + warning === 0 ? 'none' : `${plural(error, 'error')}, ${plural(warning, 'warning')}`;
        const { comparison, baseline } = report;
        if (comparison !== undefined)
            out.push(...reviewSections(report, 'base report', comparison.newFindings, comparison.fixedFindings));
        else if (baseline !== undefined)
            out.push(...reviewSections(report, 'baseline', baseline.new, baseline.fixed));
        else {
            out.push('', `#### Findings: ${counts}`);
            // Stable sorts over the report's order: errors before warnings, best suggestions first.
            const findings = errorsFirst(report.findings);
            if (findings.length > 0)
                out.push('', ...collapse(findings, findingsTable, 'finding'));
        }
        if (comparison !== undefined)
            out.push(...structureSection(report, comparison));
        if (report.suggestions.length > 0) {
            const suggestions = [...report.suggestions].sort((a, b) => b.score - a.score || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
            out.push('', `#### Suggested links (${suggestions.length})`, '');
            const repair = repairLine(report, code);
            if (repair !== null)
                out.push(repair, '');
            out.push(...collapse(suggestions, (part) => part.map(suggestionItem), 'suggestion'));
            const ids = suggestions.slice(0, 2).map((s) => s.id).join(',');
            out.push('', `Accept links by id: ${code(`linkweave apply --ids ${ids}`)}`);
        }
        return `${out.join('\n')}\n`;
    },
};
