/**
 * The HTML report's markup: header with the run's verdict and headline numbers, the two charts,
 * the link-graph section and the table sections. The tables and the graph are filled in by the
 * page's script from the embedded data; everything written here from the report is escaped.
 */
import { depthHistogramSvg, pagerankSvg, shorten } from './charts.js';
import type { HtmlData } from './data.js';
import { escapeHtml, formatNumber } from './escape.js';

/** The inline parts the page is assembled from, and their CSP hashes. */
export interface PageParts {
  readonly styles: string;
  readonly script: string;
  /** The data JSON, already escaped for a script element. */
  readonly json: string;
  /** `sha256-...` source expressions of the style and the script. */
  readonly styleHash: string;
  readonly scriptHash: string;
}

/**
 * Render the whole page.
 * @param data the report's HTML data
 * @param failures the gate's failures in words, one per `data.gate.failures` entry (the
 *   formatters' shared `describeFailure`)
 * @param parts styles, script and data, with their hashes
 */
export function renderPage(data: HtmlData, failures: readonly string[], parts: PageParts): string {
  // Nothing may load from outside the file: only the hashed inline style and script run.
  const csp = `default-src 'none'; style-src '${parts.styleHash}'; script-src '${parts.scriptHash}'; img-src data:`;
  return [
    '<!doctype html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<meta http-equiv="Content-Security-Policy" content="${csp}">`,
    `<title>Link report: ${escapeHtml(data.root)}</title>`,
    `<style>${parts.styles}</style>`,
    '</head>',
    '<body>',
    '<a class="lw-skip" href="#lw-graph">Skip to the link graph</a>',
    '<main>',
    header(data, failures),
    summaryNotice(data),
    toc(data),
    stats(data),
    '<div class="lw-row">',
    depthSection(data),
    rankSection(data),
    '</div>',
    graphSection(data),
    tableSection('findings', 'Findings', data.findings.length,
      'What the checks found, with the place in the source. Filter by check, folder or level; select a column header to sort.'),
    tableSection('suggestions', 'Suggested links', data.suggestions.length,
      'New links that would help pages that lack them: where to write the link, its anchor text and what it is predicted to change.'),
    `<footer class="lw-footer">linkweave ${escapeHtml(data.version)} \u00b7 report schema linkweave/report@1${data.stats.converged ? '' : ` \u00b7 PageRank did not settle in ${data.stats.iterations} rounds`}</footer>`,
    '</main>',
    `<script type="application/json" id="lw-data">${parts.json}</script>`,
    `<script>${parts.script}</script>`,
    '</body>',
    '</html>',
    '',
  ].join('\n');
}

function header(data: HtmlData, failureText: readonly string[]): string {
  const { gate } = data;
  const failures = failureText.map((text) => `<li>${escapeHtml(text)}</li>`);
  const errors = data.stats.findings.error;
  const warnings = data.stats.findings.warning;
  if (!gate.passed && failures.length === 0) {
    const count = gate.failOn === 'warning' ? errors + warnings : errors;
    failures.push(`<li>${count} finding${count === 1 ? '' : 's'} at or above <strong>${gate.failOn}</strong></li>`);
  }
  const verdict = `<strong>${gate.passed ? 'This run passes (exit 0)' : 'This run fails (exit 1)'}</strong>`;
  return [
    '<header class="lw-header">',
    '<div>',
    '<h1>Link structure report</h1>',
    `<p class="lw-root">${escapeHtml(data.root)}</p>`,
    '</div>',
    `<div class="lw-gate ${gate.passed ? 'lw-gate-pass' : 'lw-gate-fail'}" id="lw-gate" data-passed="${gate.passed}" role="status">`,
    verdict,
    ` <span>(a run fails on findings at or above ${gate.failOn} and on the limits; ${errors} error${errors === 1 ? '' : 's'}, ${warnings} warning${warnings === 1 ? '' : 's'})</span>`,
    failures.length > 0 ? `<ul>${failures.join('')}</ul>` : '',
    '</div>',
    '</header>',
  ].join('\n');
}

function toc(data: HtmlData): string {
  return [
    '<nav class="lw-toc" aria-label="Sections">',
    '<a href="#lw-depth">Click depth</a>',
    '<a href="#lw-rank">PageRank</a>',
    '<a href="#lw-graph">Link graph</a>',
    `<a href="#lw-findings">Findings (${data.findings.length})</a>`,
    `<a href="#lw-suggestions">Suggested links (${data.suggestions.length})</a>`,
    '</nav>',
  ].join('\n');
}

function stats(data: HtmlData): string {
  const s = data.stats;
  const deepest = data.deepestPage >= 0 ? data.pages[data.deepestPage] : null;
  const deepCount = deepest === null ? 0 : data.histogram.counts[deepest.depth!];
  const card = (id: string, label: string, value: string, sub: string, bad: boolean): string =>
    `<div class="lw-stat ${bad ? 'lw-stat-bad' : 'lw-stat-ok'}" id="lw-stat-${id}"><dt>${label}</dt><dd>${value}<span class="lw-sub">${sub}</span><span class="lw-badge">to fix</span></dd></div>`;
  const deepSub = deepest === null
    ? 'no page is reachable'
    : `${escapeHtml(shorten(deepest.title || deepest.route, 60))}${deepCount > 1 ? ` and ${deepCount - 1} more` : ''}; limit ${data.maxDepth}`;
  return [
    '<dl class="lw-stats" aria-label="Headline numbers">',
    card('pages', 'Pages', String(s.pages), pagesSub(s.pages, s.files), false),
    card('links', 'Links', String(s.links), `${s.internalLinks} internal`, false),
    card('broken', 'Broken links', String(s.brokenLinks), `${s.brokenFragments} broken fragment${s.brokenFragments === 1 ? '' : 's'}`, s.brokenLinks + s.brokenFragments > 0),
    card('orphans', 'Orphan pages', String(s.orphans), 'no page links to them', s.orphans > 0),
    card('unreachable', 'Unreachable', String(s.unreachable), 'no path from the entry pages', s.unreachable > 0),
    card('deepest', 'Deepest page', s.maxDepth === null ? '\u2013' : `${s.maxDepth} click${s.maxDepth === 1 ? '' : 's'}`, deepSub,
      s.maxDepth !== null && s.maxDepth > data.maxDepth),
    '</dl>',
  ].join('\n');
}

function depthSection(data: HtmlData): string {
  const h = data.histogram;
  const over = h.counts.slice(h.maxDepth + 1).reduce((a, b) => a + b, 0);
  return [
    '<section class="lw-panel" id="lw-depth" aria-labelledby="lw-depth-h">',
    '<h2 id="lw-depth-h">Click depth</h2>',
    `<p class="lw-hint">Pages by the number of clicks needed from the entry page. ${over} page${over === 1 ? ' is' : 's are'} deeper than the limit of ${h.maxDepth} (hatched); ${h.unreachable} cannot be reached at all.</p>`,
    depthHistogramSvg(h),
    deepestList(data),
    '</section>',
  ].join('\n');
}

/** "from 52 source files; 1 is no page (a draft, a second file for a route, or unreadable)". */
function pagesSub(pages: number, files: number): string {
  const from = `from ${files} source file${files === 1 ? '' : 's'}`;
  const other = files - pages;
  if (other <= 0) return from;
  return `${from}; ${other} ${other === 1 ? 'is no page' : 'are no pages'} (a draft, a second file for a route, or unreadable)`;
}

/**
 * The pages a reader cannot reach, then the pages deeper than the limit (deepest first, then by
 * route), at most ten; when every page is within the limit, the deepest few, said so.
 */
function deepestList(data: HtmlData): string {
  const all = data.pages.map((_, i) => i);
  const lost = all.filter((i) => data.pages[i].depth === null);
  const over = all.filter((i) => data.pages[i].depth !== null && data.pages[i].depth! > data.maxDepth);
  over.sort((a, b) => data.pages[b].depth! - data.pages[a].depth! || a - b);
  const item = (i: number): string => {
    const p = data.pages[i];
    const tag = p.depth === null ? 'unreachable' : `${p.depth} click${p.depth === 1 ? '' : 's'}`;
    return `<li><span class="lw-depth-tag">${tag}</span> ${escapeHtml(shorten(p.title || p.route, 48))} <span class="lw-route lw-mono">${escapeHtml(p.route)}</span></li>`;
  };
  const problems = [...lost, ...over];
  if (problems.length > 0) {
    const more = problems.length > 10 ? `<p class="lw-hint">and ${problems.length - 10} more in the findings below</p>` : '';
    return [
      `<h3>Unreachable or deeper than ${data.maxDepth} click${data.maxDepth === 1 ? '' : 's'}</h3>`,
      `<ul class="lw-deep" id="lw-deepest-pages">${problems.slice(0, 10).map(item).join('')}</ul>`,
      more,
    ].join('\n');
  }
  const deepest = all.filter((i) => (data.pages[i].depth ?? 0) > 0);
  deepest.sort((a, b) => data.pages[b].depth! - data.pages[a].depth! || a - b);
  if (deepest.length === 0) return '';
  return ['<h3>Deepest pages (all within the limit)</h3>', `<ul class="lw-deep" id="lw-deepest-pages">${deepest.slice(0, 5).map(item).join('')}</ul>`].join('\n');
}

function rankSection(data: HtmlData): string {
  const items = data.topPages.map((id) => {
    const p = data.pages[id];
    return `<li><strong>${escapeHtml(shorten(p.title || p.route, 60))}</strong> <span class="lw-route"><span class="lw-mono">${escapeHtml(p.route)}</span> \u00b7 ${formatNumber(p.rank)}</span></li>`;
  });
  return [
    '<section class="lw-panel" id="lw-rank" aria-labelledby="lw-rank-h">',
    '<h2 id="lw-rank-h">PageRank</h2>',
    '<p class="lw-hint">Each page\u2019s share of the link weight, highest first, on a log scale (1 = an average page).</p>',
    pagerankSvg(data.pages, data.topPages),
    '<h3>Pages with the highest PageRank</h3>',
    `<ol class="lw-top" id="lw-top-pages">${items.join('')}</ol>`,
    '</section>',
  ].join('\n');
}

function graphSection(data: HtmlData): string {
  const o = data.overview;
  const mode = o.kind === 'pages'
    ? 'Every page, on rings by click depth from the entry page (centre); pages that cannot be reached stand apart on the right.'
    : `This site has ${data.pages.length} pages, so the overview shows its ${o.folders.length} folders, on rings by the click depth of their shallowest page. Search for a page to see its links.`;
  return [
    '<section class="lw-panel" id="lw-graph" aria-labelledby="lw-graph-h">',
    '<h2 id="lw-graph-h">Link graph</h2>',
    `<p class="lw-hint" id="lw-graph-mode">${escapeHtml(mode)}</p>`,
    '<div class="lw-controls">',
    '<div class="lw-search-box">',
    '<label for="lw-search">Find a page (route or title)</label>',
    '<input id="lw-search" type="search" autocomplete="off" spellcheck="false" placeholder="e.g. /guide/ or install" aria-describedby="lw-search-help" aria-controls="lw-matches">',
    '<ul class="lw-matches" id="lw-matches" aria-label="Matching pages"></ul>',
    '</div>',
    '<button id="lw-overview-btn" type="button">Whole site</button>',
    '<span id="lw-search-help" class="lw-hint">Enter shows the first match with the pages that link to it and the pages it links to; Escape goes back.</span>',
    '</div>',
    '<div class="lw-graph-wrap">',
    '<div class="lw-canvas-box">',
    '<canvas id="lw-canvas" width="1000" height="640" role="img" aria-label="Link graph; the panel beside it lists the same pages as text"><ul id="lw-drawn"></ul></canvas>',
    '<div class="lw-tip" id="lw-tip" hidden></div>',
    '</div>',
    '<aside class="lw-details" id="lw-details" aria-live="polite" aria-label="Selected page"></aside>',
    '</div>',
    legend(data.maxDepth, o.kind),
    '</section>',
  ].join('\n');
}

/** Legend swatches: colour and shape together, each with its words. */
function legend(maxDepth: number, kind: 'pages' | 'folders'): string {
  const circle = (cls: string): string => `<svg viewBox="0 0 18 18" aria-hidden="true"><circle cx="9" cy="9" r="6.5" class="${cls}"/></svg>`;
  const clicks = `${maxDepth} click${maxDepth === 1 ? '' : 's'}`;
  const items = [
    `<li>${circle('lw-sw-fine')}within ${clicks} of the entry page</li>`,
    `<li>${circle('lw-sw-over')}deeper than ${clicks} (outside the dashed ring)</li>`,
    '<li><svg viewBox="0 0 18 18" aria-hidden="true"><rect x="3" y="3" width="12" height="12" class="lw-sw-orphan"/></svg>square: orphan, no page links to it</li>',
    '<li><svg viewBox="0 0 18 18" aria-hidden="true"><path d="M9 2L16 15H2Z" class="lw-sw-lost"/></svg>triangle: unreachable, linked only from unreachable pages</li>',
    '<li><svg viewBox="0 0 18 18" aria-hidden="true"><circle cx="9" cy="9" r="4.5" class="lw-sw-fine"/><circle cx="9" cy="9" r="7.5" class="lw-sw-line"/></svg>ringed: entry page</li>',
    '<li>rings: click depth</li>',
  ];
  if (kind === 'folders') {
    items.push(
      '<li><svg viewBox="0 0 18 18" aria-hidden="true"><circle cx="9" cy="9" r="5" class="lw-sw-fine"/><path d="M9 1.5A7.5 7.5 0 0 1 16.5 9" class="lw-sw-arc"/></svg>folder overview: outer arc = share of its pages too deep or unreachable; size = its number of pages</li>',
    );
  }
  return `<ul class="lw-legend" aria-label="Legend">${items.join('')}</ul>`;
}

function tableSection(id: 'findings' | 'suggestions', title: string, count: number, hint: string): string {
  return [
    `<section class="lw-panel lw-table-section" id="lw-${id}" aria-labelledby="lw-${id}-h">`,
    `<h2 id="lw-${id}-h">${title} (${count})</h2>`,
    `<p class="lw-hint">${hint}</p>`,
    `<div class="lw-controls" id="lw-${id}-controls" role="group" aria-label="Filter ${title.toLowerCase()}"></div>`,
    `<p class="lw-shown" id="lw-${id}-shown" aria-live="polite"></p>`,
    `<div class="lw-table-wrap"><table class="lw-table" id="lw-${id}-table"><caption class="lw-sr">${title}; select a column header to sort</caption><thead></thead><tbody></tbody></table></div>`,
    `<button type="button" class="lw-more" id="lw-${id}-more" hidden>Show all rows</button>`,
    '</section>',
  ].join('\n');
}

/** On a large site, what the page leaves out and where the rest is. */
function summaryNotice(data: HtmlData): string {
  const s = data.summary;
  if (s === null) return '';
  const of = (part: { kept: number; total: number }, what: string): string => `${part.kept} of ${part.total} ${what}`;
  return [
    '<section class="lw-panel" id="lw-summary-notice" role="note">',
    `<p>This site is large, so this page is a summary. It shows ${of(s.pages, 'pages')} (those with the most to fix, the highest PageRank and a sample across the PageRank range, with the links between them), ${of(s.findings, 'findings')} (errors first) and ${of(s.suggestions, 'suggested links')} (best first). The counts, the gate and the click-depth histogram cover the whole site.</p>`,
    '<p>Everything is in the JSON report: run the same command with <code>--format json --output report.json</code>.</p>',
    '</section>',
  ].join('\n');
}
