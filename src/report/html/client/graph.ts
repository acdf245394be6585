/**
 * The link graph's interaction: the search box (Enter focuses the first match), the focused
 * view of one page (the pages linking to it and those it links to, laid out in two columns
 * sorted by PageRank: no randomness), the side panel that lists the same pages as text
 * (keyboard and screen-reader usable), hover tips and clicks on the canvas.
 */
import { canvas, clear, hits, sizeCanvas, unit, VH, VW } from './canvas.js';
import type { Hit } from './canvas.js';
import { BY_ROUTE, DATA, IN, MAX_DEPTH, OUT, PAGES } from './data.js';
import { byId, code, el } from './dom.js';
import { drawFocus, fillDrawnList } from './focus.js';
import type { FocusLayout } from './focus.js';
import { drawFoldersOverview, drawPagesOverview } from './overview.js';
import { bfsParent, pageButton } from './pages.js';
import { depthText, fmt, pageName, plural, shortText } from './text.js';

const COLUMN_MAX = 22;
const LIST_MAX = 300;
const graph = { mode: 'overview' as 'overview' | 'focus', focus: -1, folder: -1 };
const details = byId('lw-details');
const searchBox = byId<HTMLInputElement>('lw-search');
const matchList = byId('lw-matches');
const tip = byId('lw-tip');
const NAV = PAGES.map((_, i) => i).filter((i) => PAGES[i].nav);

/** A page's neighbours, each side sorted by PageRank, with the link flags by neighbour. */
interface Neighbours {
  readonly ins: number[];
  readonly outs: number[];
  readonly inFlags: Map<number, number>;
  readonly outFlags: Map<number, number>;
}

function neighbours(id: number): Neighbours {
  const ins = new Map<number, number>(), outs = new Map<number, number>();
  for (const pair of IN[id]) ins.set(pair[0], pair[1]);
  for (const pair of OUT[id]) outs.set(pair[0], pair[1]);
  const byRank = (a: number, b: number): number => PAGES[b].pagerank - PAGES[a].pagerank || a - b;
  return { ins: Array.from(ins.keys()).sort(byRank), outs: Array.from(outs.keys()).sort(byRank), inFlags: ins, outFlags: outs };
}

function columnY(k: number, count: number): number {
  const gap = Math.min(44, (VH - 80) / Math.max(1, count));
  return VH / 2 + (k - (count - 1) / 2) * gap;
}

function focusLayout(id: number): FocusLayout & { readonly nb: Neighbours } {
  const nb = neighbours(id);
  const leftIds = nb.ins.filter((i) => !nb.outFlags.has(i));
  const left = leftIds.slice(0, COLUMN_MAX), right = nb.outs.slice(0, COLUMN_MAX);
  return {
    nb, inCount: nb.ins.length, outCount: nb.outs.length,
    left: left.map((i, k) => ({ id: i, y: columnY(k, left.length), flags: nb.inFlags.get(i)!, mutual: false })),
    right: right.map((i, k) => ({ id: i, y: columnY(k, right.length), flags: nb.outFlags.get(i)!, mutual: nb.inFlags.has(i) })),
    leftMore: leftIds.length - left.length, rightMore: nb.outs.length - right.length, navCount: NAV.length,
  };
}

function draw(): void {
  sizeCanvas();
  clear();
  if (graph.mode === 'focus') fillDrawnList(drawFocus(graph.focus, focusLayout(graph.focus)));
  else if (DATA.overview.kind === 'pages') fillDrawnList(drawPagesOverview(DATA.overview));
  else { drawFoldersOverview(DATA.overview); fillDrawnList([], DATA.overview.folders); }
}

function section(title: string, kids: readonly Node[]): Node[] { return [el('h3', { text: title }), ...kids]; }

function pageList(ids: readonly number[], id: string, note?: (i: number) => string): HTMLUListElement {
  const ul = el('ul', { cls: 'lw-nlist', id });
  for (const i of ids.slice(0, LIST_MAX)) ul.appendChild(el('li', null, [pageButton(i, focusPage, note ? note(i) : '')]));
  if (ids.length > LIST_MAX) ul.appendChild(el('li', { text: '\u2026 and ' + (ids.length - LIST_MAX) + ' more' }));
  if (ids.length === 0) ul.appendChild(el('li', { text: 'none' }));
  return ul;
}

function pathTo(id: number): number[] {
  const path = [id];
  let cur = id;
  while (PAGES[cur].depth !== null && PAGES[cur].depth! > 0) {
    const up = bfsParent(cur);
    if (up < 0) break;
    path.unshift(up);
    cur = up;
  }
  return path;
}

function renderFocusDetails(id: number, layout: ReturnType<typeof focusLayout>): void {
  const p = PAGES[id];
  const flags: string[] = [];
  if (p.depth === 0) flags.push('entry page');
  if (p.orphan) flags.push('orphan: no page links here');
  else if (p.depth === null) flags.push('unreachable from the entry pages');
  if (p.depth !== null && p.depth > MAX_DEPTH) flags.push('deeper than the limit');
  if (p.nav) flags.push('in the navigation');
  const dl = el('dl', null, [
    el('dt', { text: 'Route' }), el('dd', null, [code(p.route)]),
    el('dt', { text: 'File' }), el('dd', null, [code(p.file)]),
    el('dt', { text: 'Click depth' }), el('dd', { text: depthText(p.depth) }),
    el('dt', { text: 'PageRank' }), el('dd', { text: fmt(p.rank) + ' \u00d7 average (' + fmt(p.pagerank) + ')' }),
    el('dt', { text: 'Links in' }), el('dd', { text: p.inlinks + ' pages (' + p.contentInlinks + ' from content)' }),
    el('dt', { text: 'Links out' }), el('dd', { text: p.outlinks + ' pages' }),
    el('dt', { text: 'Findings' }), el('dd', { text: String(p.findings) }),
  ].concat(flags.length ? [el('dt', { text: 'Note' }), el('dd', { id: 'lw-focus-flags', text: flags.join('; ') })] : []));
  const path = pathTo(id);
  const kids: Node[] = [el('h3', { id: 'lw-focus-title', text: pageName(id) }), dl];
  if (path.length > 1) {
    const ol = el('ol', { cls: 'lw-nlist', id: 'lw-path' });
    for (const i of path) ol.appendChild(el('li', null, [i === id ? el('span', { text: pageName(i) }) : pageButton(i, focusPage)]));
    kids.push(...section('Shortest click path', [ol]));
  }
  const templateNote = (flags: Map<number, number>) => (i: number): string => (flags.get(i)! & 1) ? '' : '(template link)';
  kids.push(...section('Linked from (' + layout.nb.ins.length + ')', [pageList(layout.nb.ins, 'lw-in-list', templateNote(layout.nb.inFlags))]));
  if (p.nav) kids.push(el('p', { cls: 'lw-hint', id: 'lw-nav-in', text: 'And from every page, through the navigation.' }));
  kids.push(...section('Links to (' + layout.nb.outs.length + ')', [pageList(layout.nb.outs, 'lw-out-list', templateNote(layout.nb.outFlags))]));
  if (NAV.length > 0) kids.push(el('p', { cls: 'lw-hint', id: 'lw-nav-out', text: 'Like every page, it also links to the ' + plural(NAV.length, 'page', 'pages') + ' of the navigation.' }));
  details.replaceChildren(...kids);
}

function renderOverviewDetails(): void {
  const kids: Node[] = [el('h3', { text: 'Where the site is weak' })];
  const overview = DATA.overview;
  if (overview.kind === 'folders' && graph.folder >= 0) {
    const f = overview.folders[graph.folder];
    const ids = PAGES.map((_, i) => i).filter((i) => overview.pageFolder[i] === graph.folder);
    ids.sort((a, b) => (PAGES[b].depth === null ? 1e9 : PAGES[b].depth!) - (PAGES[a].depth === null ? 1e9 : PAGES[a].depth!) || a - b);
    kids.push(el('p', { id: 'lw-folder-summary', text: 'Folder ' + f.name + ': ' + plural(f.pages, 'page', 'pages') + ', ' + f.overLimit + ' too deep or unreachable, ' + plural(f.orphans, 'orphan', 'orphans') + '.' }));
    kids.push(...section('Its pages, deepest first', [pageList(ids, 'lw-folder-pages')]));
    details.replaceChildren(...kids);
    return;
  }
  const lost: number[] = [], deep: number[] = [];
  PAGES.forEach((p, i) => { if (p.depth === null) lost.push(i); else if (p.depth > MAX_DEPTH) deep.push(i); });
  lost.sort((a, b) => Number(PAGES[b].orphan) - Number(PAGES[a].orphan) || a - b);
  deep.sort((a, b) => PAGES[b].depth! - PAGES[a].depth! || a - b);
  kids.push(el('p', { text: 'Select a page, here or on the graph, to see its links. ' + plural(lost.length, 'page is', 'pages are') + ' unreachable and ' + plural(deep.length, 'page is', 'pages are') + ' deeper than ' + MAX_DEPTH + ' clicks.' }));
  kids.push(...section('Unreachable (' + lost.length + ')', [pageList(lost, 'lw-lost-list', (i) => PAGES[i].orphan ? '(orphan)' : '')]));
  kids.push(...section('Deeper than the limit (' + deep.length + ')', [pageList(deep, 'lw-deep-list')]));
  if (overview.kind === 'folders') {
    const order = overview.folders.map((_, k) => k);
    order.sort((a, b) => overview.folders[b].overLimit - overview.folders[a].overLimit || a - b);
    const ul = el('ul', { cls: 'lw-nlist', id: 'lw-folder-list' });
    for (const k of order) {
      const f = overview.folders[k];
      ul.appendChild(el('li', null, [el('button', { type: 'button', on: { click: () => { selectFolder(k); } } },
        [f.name, el('span', { cls: 'lw-route', text: plural(f.pages, 'page', 'pages') + ', ' + f.overLimit + ' too deep or unreachable' })])]));
    }
    kids.push(...section('Folders', [ul]));
  }
  details.replaceChildren(...kids);
}

function focusPage(id: number): void {
  matchList.replaceChildren();
  graph.mode = 'focus';
  graph.focus = id;
  const layout = focusLayout(id);
  draw();
  renderFocusDetails(id, layout);
  byId('lw-graph-mode').textContent = 'Showing ' + pageName(id) + ' with ' + plural(layout.nb.ins.length, 'page', 'pages') + ' linking to it (left) and ' + plural(layout.nb.outs.length, 'page', 'pages') + ' it links to (right). Dashed: template link only; \u21C4: links both ways.';
  if (history.replaceState) history.replaceState(null, '', '#page=' + encodeURIComponent(PAGES[id].route));
}

function selectFolder(k: number): void {
  graph.folder = k;
  renderOverviewDetails();
}

function showOverview(): void {
  graph.mode = 'overview';
  graph.focus = -1;
  graph.folder = -1;
  draw();
  renderOverviewDetails();
  byId('lw-graph-mode').textContent = DATA.overview.kind === 'pages'
    ? 'Every page, on rings by click depth from the entry page (centre); pages that cannot be reached stand apart on the right.'
    : 'The overview shows the site\u2019s ' + DATA.overview.folders.length + ' folders on rings by the click depth of their shallowest page. Search for a page to see its links.';
  if (history.replaceState && location.hash) history.replaceState(null, '', location.pathname + location.search);
}

function findMatches(query: string): number[] {
  const q = query.trim().toLowerCase();
  if (!q) return [];
  const scored: [number, number][] = [];
  PAGES.forEach((p, i) => {
    const route = p.route.toLowerCase(), title = p.title.toLowerCase();
    let score = -1;
    if (route === q || title === q) score = 0;
    else if (route.indexOf(q) === 0) score = 1;
    else if (title.indexOf(q) === 0) score = 2;
    else if (route.indexOf(q) >= 0 || title.indexOf(q) >= 0) score = 3;
    if (score >= 0) scored.push([score, i]);
  });
  scored.sort((a, b) => a[0] - b[0] || PAGES[b[1]].pagerank - PAGES[a[1]].pagerank || a[1] - b[1]);
  return scored.slice(0, 8).map((s) => s[1]);
}

function updateMatches(): number[] {
  const found = findMatches(searchBox.value);
  const items: HTMLLIElement[] = found.map((i) => el('li', null, [el('button', { type: 'button', 'data-route': PAGES[i].route, on: { click: () => { focusPage(i); } } },
    [shortText(pageName(i), 50), el('span', { cls: 'lw-route', text: PAGES[i].route })])]));
  if (searchBox.value.trim() && found.length === 0) items.push(el('li', { cls: 'lw-hint', text: 'No page matches.' }));
  matchList.replaceChildren(...items);
  return found;
}

function hitAt(ev: MouseEvent): Hit | null {
  const rect = canvas.getBoundingClientRect();
  const x = (ev.clientX - rect.left) * VW / rect.width, y = (ev.clientY - rect.top) * VH / rect.height;
  let best: Hit | null = null, bestD = Infinity;
  for (const h of hits) {
    const d = Math.hypot(h.x - x, h.y - y);
    if (d <= h.r + 3 * unit && d < bestD) { best = h; bestD = d; }
  }
  return best;
}

/** Wire the search box, the canvas and the window, and draw the first view (the overview, or the page named in the address). */
export function startGraph(): void {
  searchBox.addEventListener('input', updateMatches);
  searchBox.addEventListener('keydown', (ev) => {
    if (ev.key === 'Enter') {
      ev.preventDefault();
      const found = updateMatches();
      if (found.length > 0) focusPage(found[0]);
    } else if (ev.key === 'Escape') {
      searchBox.value = '';
      updateMatches();
      showOverview();
    }
  });
  byId('lw-overview-btn').addEventListener('click', showOverview);

  canvas.addEventListener('mousemove', (ev) => {
    const h = hitAt(ev);
    canvas.style.cursor = h ? 'pointer' : 'default';
    if (!h) { tip.hidden = true; return; }
    if (h.kind === 'page') {
      const p = PAGES[h.id];
      tip.textContent = pageName(h.id) + '\n' + p.route + '\n' + depthText(p.depth) + ' \u00b7 PageRank ' + fmt(p.rank) + '\n' + p.inlinks + ' in, ' + p.outlinks + ' out' + (p.orphan ? ' \u00b7 orphan' : '');
    } else if (DATA.overview.kind === 'folders') {
      const f = DATA.overview.folders[h.id];
      tip.textContent = 'Folder ' + f.name + '\n' + plural(f.pages, 'page', 'pages') + ', ' + f.overLimit + ' too deep or unreachable\nshallowest: ' + depthText(f.minDepth);
    }
    const box = (canvas.parentNode as HTMLElement).getBoundingClientRect();
    tip.hidden = false;
    tip.style.left = Math.min(ev.clientX - box.left + 14, box.width - 290) + 'px';
    tip.style.top = (ev.clientY - box.top + 14) + 'px';
  });
  canvas.addEventListener('mouseleave', () => { tip.hidden = true; });
  canvas.addEventListener('click', (ev) => {
    const h = hitAt(ev);
    if (!h) return;
    if (h.kind === 'page') focusPage(h.id);
    else selectFolder(h.id);
  });

  let resizeTimer = 0;
  window.addEventListener('resize', () => { clearTimeout(resizeTimer); resizeTimer = setTimeout(draw, 80); });
  window.addEventListener('beforeprint', draw);

  let startRoute: string | null = null;
  try { if (location.hash.indexOf('#page=') === 0) startRoute = decodeURIComponent(location.hash.slice(6)); } catch { startRoute = null; }
  if (startRoute !== null && BY_ROUTE.has(startRoute)) focusPage(BY_ROUTE.get(startRoute)!);
  else showOverview();
}
