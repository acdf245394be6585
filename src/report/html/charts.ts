/**
 * The report's two charts as inline SVG strings, drawn in the formatter so they read (and
 * print) without the page's script: the click-depth histogram and the PageRank distribution.
 * Every text from the report is escaped; numbers are written with fixed precision so the same
 * report gives the same bytes.
 */
import { escapeHtml, formatNumber } from './escape.js';
import type { DepthHistogram, HtmlPage } from './data.js';

const W = 560;
const H = 270;

/** Shorten a text to at most `max` characters (by code point), adding an ellipsis. */
export function shorten(text: string, max: number): string {
  const chars = Array.from(text);
  return chars.length <= max ? text : `${chars.slice(0, max - 1).join('')}\u2026`;
}

function n1(v: number): string {
  return (Math.round(v * 10) / 10).toFixed(1).replace(/\.0$/, '');
}

function plural(count: number, one: string, many: string): string {
  return `${count} ${count === 1 ? one : many}`;
}

/**
 * The click-depth histogram: one bar per depth 0..max, a separate bar for unreachable pages,
 * bars past the limit hatched, the limit marked by a dashed line, counts written on the bars.
 * Each bar carries `data-depth` and `data-count`; its height is proportional to the count.
 */
export function depthHistogramSvg(h: DepthHistogram): string {
  const left = 44;
  const right = 12;
  const top = 34;
  const bottom = 52;
  const plotW = W - left - right;
  const plotH = H - top - bottom;
  const base = top + plotH;
  const slots = h.counts.length + 1.6;
  const slot = plotW / slots;
  const bw = slot * 0.72;
  const max = Math.max(1, h.unreachable, ...h.counts);
  const out: string[] = [];
  const summary = h.counts.map((c, d) => `depth ${d}: ${c}`).join(', ') + `, unreachable: ${h.unreachable}`;
  out.push(
    `<svg class="lw-chart" id="lw-depth-chart" viewBox="0 0 ${W} ${H}" role="img" aria-labelledby="lw-depth-title lw-depth-desc">`,
    `<title id="lw-depth-title">Pages per click depth</title>`,
    `<desc id="lw-depth-desc">${escapeHtml(summary)}. Limit: ${h.maxDepth} clicks.</desc>`,
    '<defs>',
    '<pattern id="lw-hatch-over" width="7" height="7" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">',
    '<rect width="7" height="7" class="lw-fill-over"/><line x1="0" y1="0" x2="0" y2="7" class="lw-hatch-line"/></pattern>',
    '<pattern id="lw-hatch-none" width="8" height="8" patternUnits="userSpaceOnUse">',
    '<rect width="8" height="8" class="lw-fill-none"/><path d="M0 0L8 8M8 0L0 8" class="lw-hatch-line"/></pattern>',
    '</defs>',
  );
  for (const tick of axisTicks(max)) {
    const y = base - (tick / max) * plotH;
    out.push(
      `<line class="lw-grid" x1="${left}" x2="${W - right}" y1="${n1(y)}" y2="${n1(y)}"/>`,
      `<text class="lw-tick" x="${left - 6}" y="${n1(y + 4)}" text-anchor="end">${tick}</text>`,
    );
  }
  const bar = (x: number, count: number, depthAttr: string, label: string, cls: string, tip: string): void => {
    const bh = (count / max) * plotH;
    const cx = x + bw / 2;
    out.push(
      `<g class="lw-bar-group">`,
      `<rect class="lw-bar ${cls}" data-depth="${depthAttr}" data-count="${count}" x="${n1(x)}" y="${n1(base - bh)}" width="${n1(bw)}" height="${n1(bh)}"><title>${escapeHtml(tip)}</title></rect>`,
      `<text class="lw-count" x="${n1(cx)}" y="${n1(base - bh - 6)}" text-anchor="middle">${count}</text>`,
      `<text class="lw-tick" x="${n1(cx)}" y="${base + 16}" text-anchor="middle">${escapeHtml(label)}</text>`,
      `</g>`,
    );
  };
  h.counts.forEach((count, d) => {
    const over = d > h.maxDepth;
    const x = left + slot * d + (slot - bw) / 2;
    bar(x, count, String(d), String(d), over ? 'lw-bar-over' : `lw-bar-d${Math.min(d, 4)}`, `${plural(count, 'page', 'pages')} at depth ${d}${over ? ' (over the limit)' : ''}`);
  });
  const ux = left + slot * (h.counts.length + 0.6) + (slot - bw) / 2;
  out.push(`<line class="lw-sep" x1="${n1(ux - (slot - bw) / 2 - slot * 0.3)}" x2="${n1(ux - (slot - bw) / 2 - slot * 0.3)}" y1="${top}" y2="${base + 4}"/>`);
  bar(ux, h.unreachable, 'unreachable', 'unreachable', 'lw-bar-none', `${plural(h.unreachable, 'page', 'pages')} unreachable from the entry pages`);
  // The limit sits between the last allowed depth and the next one.
  const lx = left + slot * (h.maxDepth + 1);
  out.push(
    `<line class="lw-limit" id="lw-depth-limit" data-max-depth="${h.maxDepth}" x1="${n1(lx)}" x2="${n1(lx)}" y1="${top - 14}" y2="${base}"/>`,
    `<text class="lw-limit-label" x="${n1(lx - 4)}" y="${top - 18}" text-anchor="end">limit: ${plural(h.maxDepth, 'click', 'clicks')}</text>`,
    `<line class="lw-axis" x1="${left}" x2="${W - right}" y1="${base}" y2="${base}"/>`,
    `<text class="lw-caption" x="${left + plotW / 2}" y="${H - 6}" text-anchor="middle">clicks from the entry page</text>`,
    `<text class="lw-caption" transform="translate(12 ${top + plotH / 2}) rotate(-90)" text-anchor="middle">pages</text>`,
    '</svg>',
  );
  return out.join('\n');
}

/** Up to five round tick values from 0 to max. */
function axisTicks(max: number): number[] {
  const raw = max / 4;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? 10 * mag;
  const ticks: number[] = [];
  for (let t = 0; t <= max + 1e-9; t += Math.max(1, Math.round(step))) ticks.push(t);
  return ticks;
}

/**
 * The PageRank distribution: pages sorted by PageRank, highest first, on a log scale of
 * `rank` (PageRank x pages, so 1 is an average page), with the highest, the middle and the
 * lowest page named above their points.
 * @param pages the report's pages
 * @param top page ids of the top pages, highest first (for the chart's description)
 * @param named how many pages to name on the chart (at most 3)
 */
export function pagerankSvg(pages: readonly HtmlPage[], top: readonly number[], named = 3): string {
  const left = 48;
  const right = 16;
  const topM = 16;
  const bottom = 44;
  const plotW = W - left - right;
  const plotH = H - topM - bottom;
  const base = topM + plotH;
  const ranks = pages.map((p) => p.rank).filter((r) => r > 0).sort((a, b) => b - a);
  const out: string[] = [
    `<svg class="lw-chart" id="lw-rank-chart" viewBox="0 0 ${W} ${H}" role="img" aria-labelledby="lw-rank-title lw-rank-desc">`,
    `<title id="lw-rank-title">PageRank of every page, highest first (log scale)</title>`,
  ];
  if (ranks.length === 0) {
    out.push('<desc id="lw-rank-desc">No pages.</desc></svg>');
    return out.join('\n');
  }
  const lo = Math.floor(Math.log10(ranks[ranks.length - 1]));
  let hi = Math.ceil(Math.log10(ranks[0]));
  if (hi <= lo) hi = lo + 1;
  const y = (r: number): number => base - ((Math.log10(Math.max(r, 10 ** lo)) - lo) / (hi - lo)) * plotH;
  const x = (i: number): number => left + (ranks.length === 1 ? plotW / 2 : (i / (ranks.length - 1)) * plotW);
  out.push(`<desc id="lw-rank-desc">${escapeHtml(describeTop(pages, top))}</desc>`);
  for (let e = lo; e <= hi; e++) {
    const yy = y(10 ** e);
    out.push(
      `<line class="lw-grid" x1="${left}" x2="${W - right}" y1="${n1(yy)}" y2="${n1(yy)}"/>`,
      `<text class="lw-tick" x="${left - 6}" y="${n1(yy + 4)}" text-anchor="end">${formatNumber(10 ** e)}</text>`,
    );
  }
  // At most 400 columns: each takes the largest rank of its bucket.
  const cols = Math.min(ranks.length, 400);
  const pts: string[] = [];
  for (let c = 0; c < cols; c++) {
    const i = Math.floor((c * ranks.length) / cols);
    pts.push(`${n1(x(i))},${n1(y(ranks[i]))}`);
  }
  const lastX = n1(x(ranks.length - 1));
  pts.push(`${lastX},${n1(y(ranks[ranks.length - 1]))}`);
  out.push(
    `<polygon class="lw-rank-area" points="${n1(left)},${n1(base)} ${pts.join(' ')} ${lastX},${n1(base)}"/>`,
    `<polyline class="lw-rank-line" points="${pts.join(' ')}"/>`,
  );
  if (1 >= 10 ** lo && 1 <= 10 ** hi) {
    const ay = n1(y(1));
    out.push(
      `<line class="lw-average" x1="${left}" x2="${W - right}" y1="${ay}" y2="${ay}"/>`,
      `<text class="lw-average-label" x="${W - right - 4}" y="${n1(y(1) - 5)}" text-anchor="end">average page = 1</text>`,
    );
  }
  // Three pages named along the curve, spread across the chart: the highest, the middle one
  // and the lowest, each above its own point (the list below the chart names the top ten).
  const order = pages.map((_, i) => i).filter((i) => pages[i].rank > 0);
  order.sort((a, b) => pages[b].rank - pages[a].rank || a - b);
  const marks = [...new Set([0, Math.floor((order.length - 1) / 2), order.length - 1])].slice(0, named);
  const what = ['highest', 'middle', 'lowest'];
  marks.forEach((k, m) => {
    const p = pages[order[k]];
    const px = x(k);
    const py = y(p.rank);
    const anchor = k === 0 ? 'start' : k === order.length - 1 ? 'end' : 'middle';
    const ly = Math.max(topM + 10, py - 26);
    const lx = anchor === 'start' ? px + 4 : anchor === 'end' ? px - 4 : px;
    const name = `${marks.length > 1 ? `${what[m === 0 ? 0 : m === marks.length - 1 ? 2 : 1]}: ` : ''}${shorten(p.title || p.route, 30)} (${formatNumber(p.rank)})`;
    out.push(
      `<g class="lw-top-mark" data-route="${escapeHtml(p.route)}">`,
      `<circle class="lw-top-dot" cx="${n1(px)}" cy="${n1(py)}" r="3.5"/>`,
      `<line class="lw-leader" x1="${n1(px)}" y1="${n1(py - 4)}" x2="${n1(px)}" y2="${n1(ly + 4)}"/>`,
      `<text class="lw-top-label" x="${n1(lx)}" y="${n1(ly)}" text-anchor="${anchor}">${escapeHtml(name)}</text>`,
      '</g>',
    );
  });
  out.push(
    `<line class="lw-axis" x1="${left}" x2="${W - right}" y1="${base}" y2="${base}"/>`,
    `<text class="lw-tick" x="${left}" y="${base + 16}" text-anchor="start">1</text>`,
    `<text class="lw-tick" x="${W - right}" y="${base + 16}" text-anchor="end">${ranks.length}</text>`,
    `<text class="lw-caption" x="${left + plotW / 2}" y="${H - 6}" text-anchor="middle">pages, highest PageRank first</text>`,
    `<text class="lw-caption" transform="translate(12 ${topM + plotH / 2}) rotate(-90)" text-anchor="middle">PageRank \u00d7 pages (log)</text>`,
    '</svg>',
  );
  return out.join('\n');
}

function describeTop(pages: readonly HtmlPage[], top: readonly number[]): string {
  const names = top.slice(0, 5).map((id) => `${pages[id].title || pages[id].route} (${formatNumber(pages[id].rank)})`);
  return `${pages.length} pages. Highest: ${names.join('; ')}.`;
}
