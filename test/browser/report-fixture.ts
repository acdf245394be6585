/**
 * A realistic `Report` built in memory for the HTML report's tests: an invented documentation
 * site (a tide-table and harbour-scheduling tool) with sections, a navigation file, long
 * chains deeper than the limit, orphans, an unreachable island, broken links and fragments,
 * findings and suggested links. Click depth (BFS) and PageRank (power iteration) are computed
 * here from the generated links, so every number in the report agrees with the links.
 * Deterministic: a seeded generator, no clock.
 */
import type { Finding, Report, ReportLink, ReportPage, Suggestion } from '../../src/types.js';

/** What the site looks like. */
export interface FixtureOptions {
  /** Number of pages (about; at least 30). @default 60 */
  readonly pages?: number;
  /** Seed of the generator. @default 7 */
  readonly seed?: number;
  /** Title given to the first guide page (for escaping tests). */
  readonly hostileTitle?: string;
  /** @default 3 */
  readonly maxDepth?: number;
}

function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const SECTIONS = ['start', 'guides', 'reference', 'recipes', 'operations', 'api', 'integrations', 'harbours', 'vessels', 'tides'];
const WORDS = ['tide table', 'berth plan', 'pilot booking', 'mooring line', 'harbour clock', 'draught check', 'lock schedule',
  'cargo window', 'swell warning', 'quay roster', 'buoy map', 'ferry slot', 'crane queue', 'port notice', 'depth survey',
  'wind forecast', 'anchor zone', 'towage request', 'night arrival', 'customs form'];

function cap(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

function hashId(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193) >>> 0;
  return h.toString(16).padStart(8, '0') + ((h * 2654435761) >>> 0).toString(16).padStart(8, '0');
}

interface Draft {
  route: string;
  file: string;
  title: string;
  links: { to: string; context: 'content' | 'template'; status: ReportLink['status']; kind: ReportLink['kind']; text: string }[];
}

/**
 * Build the report.
 * @param opts size, seed, hostile title
 */
export function buildFixtureReport(opts: FixtureOptions = {}): Report {
  const total = Math.max(30, opts.pages ?? 60);
  const maxDepth = opts.maxDepth ?? 3;
  const rnd = mulberry32(opts.seed ?? 7);
  const sectionCount = Math.min(SECTIONS.length * 8, Math.max(5, Math.round(Math.sqrt(total) / 1.4)));
  const sectionName = (k: number): string => (k < SECTIONS.length ? SECTIONS[k]! : `${SECTIONS[k % SECTIONS.length]}-${Math.floor(k / SECTIONS.length)}`);
  const drafts: Draft[] = [{ route: '/', file: 'index.md', title: 'Harbourmaster documentation', links: [] }];
  const island = 3; // orphan -> b <-> c: one orphan and two unreachable pages that have inlinks
  const orphans = 3;
  const body = total - 1 - sectionCount - island - (orphans - 1);
  const sections: number[][] = [];
  for (let s = 0; s < sectionCount; s++) {
    const name = sectionName(s);
    const index = drafts.length;
    drafts.push({ route: `/${name}/`, file: `${name}/index.md`, title: `${cap(name.replace(/-\d+$/, ''))} overview${s >= SECTIONS.length ? ` ${s}` : ''}`, links: [] });
    sections.push([index]);
  }
  for (let k = 0; k < body; k++) {
    const s = k % sectionCount;
    const name = sectionName(s);
    const word = WORDS[Math.floor(rnd() * WORDS.length)]!;
    const n = sections[s]!.length;
    const sub = total > 300 && n > 6 ? `part-${Math.floor(n / 12)}/` : '';
    const slug = `${word.replace(/ /g, '-')}-${n}`;
    const title = k === 0 && opts.hostileTitle !== undefined ? opts.hostileTitle : `${cap(word)} ${['basics', 'in depth', 'checklist', 'examples', 'troubleshooting'][n % 5]}`;
    sections[s]!.push(drafts.length);
    drafts.push({ route: `/${name}/${sub}${slug}/`, file: `${name}/${sub}${slug}.md`, title, links: [] });
  }
  const link = (from: number, to: number, text: string, context: 'content' | 'template' = 'content'): void => {
    drafts[from]!.links.push({ to: drafts[to]!.route, context, status: 'ok', kind: 'internal', text });
  };
  // Home links to the first sections; the section index links its first pages; then a chain.
  for (let s = 0; s < Math.min(sectionCount, 6); s++) link(0, sections[s]![0]!, drafts[sections[s]![0]!]!.title);
  for (const members of sections) {
    const [index, ...pages] = members as [number, ...number[]];
    if (total <= 300) {
      // Small site: the overview links the first pages, then each page links the next.
      pages.slice(0, 4).forEach((p) => link(index, p, drafts[p]!.title));
      for (let i = 1; i < pages.length; i++) link(pages[i - 1]!, pages[i]!, `next: ${drafts[pages[i]!]!.title}`);
    } else {
      // Large site: parts of 12 pages; the overview links each part's first page, which links
      // the next eight; the last three form a chain.
      for (let start = 0; start < pages.length; start += 12) {
        const part = pages.slice(start, start + 12);
        link(index, part[0]!, drafts[part[0]!]!.title);
        part.slice(1, 9).forEach((p) => link(part[0]!, p, drafts[p]!.title));
        for (let i = 9; i < part.length; i++) link(part[i - 1]!, part[i]!, `next: ${drafts[part[i]!]!.title}`);
      }
    }
    for (const p of pages) {
      if (rnd() < 0.5) link(p, index, 'back to the overview');
      if (rnd() < 0.35) {
        const other = sections[Math.floor(rnd() * sections.length)]!;
        const target = other[Math.min(other.length - 1, Math.floor(rnd() * 3))]!;
        if (target !== p) link(p, target, drafts[target]!.title.toLowerCase());
      }
    }
    if (pages.length > 0) link(pages[0]!, 0, 'home', 'template');
  }
  // Orphans (nobody links to them) and an island only an orphan links to.
  const lost: number[] = [];
  for (let k = 0; k < orphans - 1; k++) {
    lost.push(drafts.length);
    drafts.push({ route: `/archive/old-notes-${k + 1}/`, file: `archive/old-notes-${k + 1}.md`, title: `Old release notes ${k + 1}`, links: [] });
  }
  const islandStart = drafts.length;
  drafts.push({ route: '/archive/', file: 'archive/index.md', title: 'Archive', links: [] });
  drafts.push({ route: '/archive/moorings-2019/', file: 'archive/moorings-2019.html', title: 'Moorings in 2019', links: [] });
  drafts.push({ route: '/archive/moorings-2020/', file: 'archive/moorings-2020.html', title: 'Moorings in 2020', links: [] });
  link(islandStart, islandStart + 1, 'moorings 2019');
  link(islandStart + 1, islandStart + 2, 'the next year');
  link(islandStart + 2, islandStart + 1, 'the year before');
  for (const o of lost) link(o, 0, 'home');
  // Broken links, broken fragments and external links on the first few pages of the sections.
  const broken: { from: number; to: string; status: 'broken' | 'broken-fragment' }[] = [];
  sections.slice(0, 4).forEach((m, s) => {
    const p = m[Math.min(m.length - 1, 1)]!;
    drafts[p]!.links.push({ to: `/${sectionName(s)}/removed-page/`, context: 'content', status: 'broken', kind: 'internal', text: 'the old page' });
    broken.push({ from: p, to: `/${sectionName(s)}/removed-page/`, status: 'broken' });
    if (s < 2) {
      const q = m[Math.min(m.length - 1, 2)]!;
      const to = `${drafts[m[0]!]!.route}#no-such-heading`;
      drafts[q]!.links.push({ to, context: 'content', status: 'broken-fragment', kind: 'internal', text: 'see above' });
      broken.push({ from: q, to, status: 'broken-fragment' });
    }
    drafts[p]!.links.push({ to: 'https://example.org/tides', context: 'content', status: 'external', kind: 'external', text: 'tide data' });
  });
  return assemble(drafts, sections, maxDepth, broken);
}

function assemble(drafts: Draft[], sections: number[][], maxDepth: number, broken: { from: number; to: string; status: 'broken' | 'broken-fragment' }[]): Report {
  // Sort pages by route: the report's order. Map old indexes to new.
  const order = drafts.map((_, i) => i).sort((a, b) => (drafts[a]!.route < drafts[b]!.route ? -1 : 1));
  const newId = new Map(order.map((old, i) => [old, i]));
  const byRoute = new Map(drafts.map((d, i) => [d.route, newId.get(i)!]));
  const n = drafts.length;
  const navTargets = sections.map((m) => newId.get(m[0]!)!);
  const out: Map<number, number>[] = Array.from({ length: n }, () => new Map());
  for (let i = 0; i < n; i++) {
    const from = newId.get(i)!;
    for (const l of drafts[i]!.links) {
      if (l.status !== 'ok') continue;
      const to = byRoute.get(l.to)!;
      if (to !== from) out[from]!.set(to, (out[from]!.get(to) ?? 0) + (l.context === 'template' ? 0.2 : 1));
    }
  }
  // The navigation file (sidebar of every page) links to every section overview.
  for (let from = 0; from < n; from++) for (const t of navTargets) if (t !== from) out[from]!.set(t, (out[from]!.get(t) ?? 0) + 0.2);
  const home = byRoute.get('/')!;
  const depth = new Array<number>(n).fill(-1);
  depth[home] = 0;
  const queue = [home];
  for (let q = 0; q < queue.length; q++) {
    for (const t of out[queue[q]!]!.keys()) if (depth[t]! < 0) { depth[t] = depth[queue[q]!]! + 1; queue.push(t); }
  }
  // Unreachable pages are not in the navigation's reach: their sidebar links go out, not in,
  // so they stay unreachable. (Navigation gives every page outlinks, none inlinks.)
  const pr = pagerank(out, n);
  const inl = new Array<number>(n).fill(0);
  const cin = new Array<number>(n).fill(0);
  for (let f = 0; f < n; f++) for (const t of out[f]!.keys()) inl[t]!++;
  for (let i = 0; i < n; i++) {
    const contentTargets = new Set(drafts[i]!.links.filter((l) => l.status === 'ok' && l.context === 'content').map((l) => byRoute.get(l.to)!));
    for (const t of contentTargets) if (t !== newId.get(i)) cin[t]!++;
  }
  const pages: ReportPage[] = order.map((old, id) => ({
    route: drafts[old]!.route,
    file: drafts[old]!.file,
    title: drafts[old]!.title,
    pagerank: Number(pr[id]!.toFixed(8)),
    rank: Number((pr[id]! * n).toFixed(4)),
    depth: depth[id]! < 0 ? null : depth[id]!,
    inlinks: inl[id]!,
    contentInlinks: cin[id]!,
    outlinks: out[id]!.size,
    importance: id === home ? 'high' : 'normal',
  }));
  const links: ReportLink[] = [];
  order.forEach((old, id) => {
    drafts[old]!.links.forEach((l, k) => {
      links.push({ from: pages[id]!.route, to: l.to, file: pages[id]!.file, line: 3 + 2 * k, column: 5, text: l.text, context: l.context, kind: l.kind, status: l.status, nofollow: false });
    });
  });
  navTargets.forEach((t, k) => links.push({ from: '', to: pages[t]!.route, file: 'nav.md', line: k + 1, column: 3, text: pages[t]!.title, context: 'template', kind: 'internal', status: 'ok', nofollow: false }));
  links.sort((a, b) => (a.from < b.from ? -1 : a.from > b.from ? 1 : a.file < b.file ? -1 : a.file > b.file ? 1 : a.line - b.line));
  const findings = makeFindings(pages, links, maxDepth);
  const suggestions = makeSuggestions(pages, maxDepth);
  const errors = findings.filter((f) => f.severity === 'error');
  const errorRules = [...new Set(errors.map((f) => f.rule))].sort();
  const reachable = pages.filter((p) => p.depth !== null);
  return {
    schema: 'linkweave/report@1',
    tool: { name: 'linkweave', version: '0.1.0' },
    root: '/home/writer/harbourmaster-docs',
    stats: {
      files: n + 1,
      pages: n,
      links: links.length,
      internalLinks: links.filter((l) => l.kind === 'internal').length,
      brokenLinks: broken.filter((b) => b.status === 'broken').length,
      brokenFragments: broken.filter((b) => b.status === 'broken-fragment').length,
      outsideLinks: 0,
      templatedLinks: 0,
      includesOutside: 0,
      orphans: pages.filter((p) => p.inlinks === 0 && p.depth !== 0).length,
      unreachable: pages.length - reachable.length,
      deadEnds: pages.filter((p) => p.outlinks === 0).length,
      maxDepth: reachable.length === 0 ? null : Math.max(...reachable.map((p) => p.depth!)),
      iterations: pr.iterations,
      converged: true,
      findings: { error: errors.length, warning: findings.length - errors.length },
      headingIds: { style: 'github', how: 'auto', fragmentLinks: 0, resolved: 0 },
    },
    pages,
    links,
    findings,
    suggestions,
    gate: { passed: errors.length === 0, failOn: 'error', failures: errorRules.map((rule) => ({ rule, limit: 0, actual: errors.filter((f) => f.rule === rule).length })) },
    options: { maxDepth },
  };
}

function pagerank(out: Map<number, number>[], n: number): number[] & { iterations: number } {
  let x = new Array<number>(n).fill(1 / n);
  let it = 0;
  for (; it < 200; it++) {
    const next = new Array<number>(n).fill(0);
    let dangling = 0;
    for (let f = 0; f < n; f++) {
      let sum = 0;
      for (const w of out[f]!.values()) sum += w;
      if (sum === 0) { dangling += x[f]!; continue; }
      for (const [t, w] of out[f]!) next[t]! += (0.85 * x[f]! * w) / sum;
    }
    let delta = 0;
    for (let i = 0; i < n; i++) {
      next[i]! += (0.15 + 0.85 * dangling) / n;
      delta += Math.abs(next[i]! - x[i]!);
    }
    x = next;
    if (delta < 1e-10) break;
  }
  return Object.assign(x, { iterations: it + 1 });
}

function makeFindings(pages: ReportPage[], links: ReportLink[], maxDepth: number): Finding[] {
  const byRoute = new Map(pages.map((p) => [p.route, p]));
  const out: Finding[] = [];
  for (const l of links) {
    if (l.status === 'broken') out.push({ rule: 'broken-link', severity: 'error', file: l.file, line: l.line, column: l.column, route: l.from, message: `Broken link: no page ${l.to}; fix or remove the link`, target: l.to });
    if (l.status === 'broken-fragment') out.push({ rule: 'broken-fragment', severity: 'error', file: l.file, line: l.line, column: l.column, route: l.from, message: `Broken fragment: ${l.to.split('#')[0]} has no heading or id "${l.to.split('#')[1]}"; fix the fragment or add the heading`, target: l.to });
  }
  for (const p of pages) {
    if (p.inlinks === 0 && p.depth !== 0) out.push({ rule: 'orphan-page', severity: 'warning', file: p.file, line: 1, column: 1, route: p.route, message: `No page links to ${p.route}; link it from a related page` });
    if (p.depth === null) out.push({ rule: 'unreachable-page', severity: 'error', file: p.file, line: 1, column: 1, route: p.route, message: `${p.route} cannot be reached from /; link it from a reachable page` });
    else if (p.depth > maxDepth) out.push({ rule: 'click-depth', severity: 'warning', file: p.file, line: 1, column: 1, route: p.route, message: `${p.route} is ${p.depth} clicks from an entry page, over the limit of ${maxDepth}; link it from a page nearer the top` });
  }
  void byRoute;
  return out.sort((a, b) => (a.file < b.file ? -1 : a.file > b.file ? 1 : a.line - b.line || a.column - b.column || (a.rule < b.rule ? -1 : a.rule > b.rule ? 1 : 0)));
}

function makeSuggestions(pages: ReportPage[], maxDepth: number): Suggestion[] {
  const out: Suggestion[] = [];
  const shallow = pages.filter((p) => p.depth !== null && p.depth <= 1 && p.route !== '/');
  const needy = pages.filter((p) => p.depth === null || p.depth > maxDepth);
  needy.forEach((t, k) => {
    const section = t.route.split('/')[1];
    const source = shallow.find((p) => p.route.split('/')[1] === section && p.route !== t.route) ?? shallow[k % shallow.length]!;
    const anchor = k % 7 === 6 ? null : t.title.toLowerCase().split(' ').slice(0, 2).join(' ');
    const line = 6 + (k % 9) * 3;
    out.push({
      id: hashId(`${source.route}|${t.route}|${anchor}`),
      source: source.route, target: t.route, file: source.file, line, column: 12 + (k % 5) * 4,
      offset: anchor === null ? -1 : 100 + k, endOffset: anchor === null ? -1 : 100 + k + anchor.length,
      anchor, similarity: Number((0.62 - (k % 10) * 0.045).toFixed(4)), score: Number((0.9 - k * 0.01).toFixed(4)),
      targetRankBefore: t.rank, targetRankAfter: Number((t.rank * 1.35 + 0.08).toFixed(4)),
      depthBefore: t.depth, depthAfter: source.depth! + 1,
      reason: t.depth === null ? (t.inlinks === 0 ? 'orphan page' : 'unreachable page') : `too deep (${t.depth} clicks)`,
      sourceHash: hashId(source.file),
    });
  });
  return out.sort((a, b) => (a.file < b.file ? -1 : a.file > b.file ? 1 : a.line - b.line || a.column - b.column || (a.target < b.target ? -1 : 1)));
}
