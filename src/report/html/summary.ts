/**
 * The HTML report's summary of a large site: the same `HtmlData`, with its long lists cut to
 * what a reader acts on first. Pure and deterministic, like the rest of the data preparation.
 *
 * Kept pages: the `worstPages` with the most to fix (most findings, then unreachable, then
 * deepest, then fewest inlinks, then route), the top pages by PageRank, the deepest page, every
 * page a kept finding or suggestion names, and `rankSamples` pages at even steps of the PageRank
 * order (so the PageRank chart keeps the shape of the whole distribution). Kept pages keep route
 * order and are renumbered; only the links between kept pages stay. Findings: errors first, then
 * warnings, each in the report's order. Suggestions: the report's first ones (best first).
 */
import { buildOverview } from './layout.js';
import type { HtmlData, HtmlPage, SummaryLimits } from './types.js';

/**
 * Cut full HTML data down to a summary.
 * @param full the data of the whole report
 * @param overviewLimit above this many kept pages, the overview shows folders
 */
export function selectSummary(full: HtmlData, limits: SummaryLimits, overviewLimit: number): HtmlData {
  const pages = full.pages;
  const idOf = new Map<string, number>();
  pages.forEach((p, i) => idOf.set(p.route, i));
  const keep = new Uint8Array(pages.length);
  const mark = (route: string): void => {
    const id = idOf.get(route);
    if (id !== undefined) keep[id] = 1;
  };

  const findings = [...full.findings.filter((f) => f.severity === 'error'), ...full.findings.filter((f) => f.severity !== 'error')].slice(0, limits.findings);
  const suggestions = full.suggestions.slice(0, limits.suggestions);
  for (const f of findings) mark(f.route);
  for (const s of suggestions) {
    mark(s.source);
    mark(s.target);
  }
  for (const id of worstPages(pages, limits.worstPages)) keep[id] = 1;
  for (const id of full.topPages) keep[id] = 1;
  if (full.deepestPage >= 0) keep[full.deepestPage] = 1;
  const byRank = pages.map((_, i) => i).sort((a, b) => pages[b].pagerank - pages[a].pagerank || a - b);
  const samples = Math.min(limits.rankSamples, byRank.length);
  for (let c = 0; c < samples; c++) keep[byRank[Math.floor((c * byRank.length) / samples)]] = 1;
  if (byRank.length > 0) keep[byRank[byRank.length - 1]] = 1;

  const newId = new Int32Array(pages.length).fill(-1);
  const kept: HtmlPage[] = [];
  for (let i = 0; i < pages.length; i++) {
    if (keep[i] === 0) continue;
    newId[i] = kept.length;
    kept.push(pages[i]);
  }
  const edges: number[] = [];
  for (let e = 0; e < full.edges.length; e += 3) {
    const from = newId[full.edges[e]];
    const to = newId[full.edges[e + 1]];
    if (from >= 0 && to >= 0) edges.push(from, to, full.edges[e + 2]);
  }
  return {
    ...full,
    pages: kept,
    edges,
    topPages: full.topPages.map((id) => newId[id]),
    deepestPage: full.deepestPage < 0 ? -1 : newId[full.deepestPage],
    findings,
    suggestions,
    overview: buildOverview(kept, edges, full.maxDepth, overviewLimit),
    summary: {
      pages: { kept: kept.length, total: pages.length },
      findings: { kept: findings.length, total: full.findings.length },
      suggestions: { kept: suggestions.length, total: full.suggestions.length },
    },
  };
}

/** Ids of the `k` pages with the most to fix, most first. */
function worstPages(pages: readonly HtmlPage[], k: number): number[] {
  const depthKey = (p: HtmlPage): number => (p.depth === null ? Infinity : p.depth);
  const ids = pages.map((_, i) => i);
  ids.sort((a, b) => {
    const pa = pages[a];
    const pb = pages[b];
    return pb.findings - pa.findings || depthKey(pb) - depthKey(pa) || pa.inlinks - pb.inlinks || a - b;
  });
  return ids.slice(0, k);
}
