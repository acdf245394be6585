/** Numbers and words as the page writes them. */
import { MAX_DEPTH, PAGES } from './data.js';

/** Three significant digits, no exponent for report ranges. */
export function fmt(v: number | null | undefined): string {
  if (v === null || v === undefined) return '\u2013';
  if (!isFinite(v)) return String(v);
  if (v === 0) return '0';
  if (Number.isInteger(v) && Math.abs(v) >= 100) return String(v);
  return String(Number(v.toPrecision(3)));
}

/** A rank (PageRank x pages) as the text report writes it: 2 decimals below 1, 1 below 10. */
export function fmtRank(v: number): string {
  if (v >= 10) return v.toFixed(0);
  if (v >= 1) return v.toFixed(1);
  return v.toFixed(2);
}

export function plural(n: number, one: string, many: string): string { return n + ' ' + (n === 1 ? one : many); }

export function depthText(d: number | null | undefined): string {
  if (d === null || d === undefined) return 'unreachable';
  return plural(d, 'click', 'clicks') + (d > MAX_DEPTH ? ' (over the limit of ' + MAX_DEPTH + ')' : '');
}

export function shortText(s: string, max: number): string {
  const chars = Array.from(s);
  return chars.length <= max ? s : chars.slice(0, max - 1).join('') + '\u2026';
}

export function pageName(i: number): string { return PAGES[i].title || PAGES[i].route; }
