/**
 * The overview drawings: pages or folders on rings by click depth from the entry page, the
 * unreachable ones in a box apart. The positions come from the formatter (layout.ts), so the
 * picture follows from the data alone.
 */
import type { Box, PageOverview, Rings } from '../layout.js';
import { addHit, ctx2d, drawPageNode, label, nameNode, nodeRadius, shapePath, tryLabel, tryLines, twoLines, unit } from './canvas.js';
import { DATA, MAX_DEPTH, PAGES } from './data.js';
import type { FolderOverview } from './data.js';
import { COLORS } from './pages.js';
import { pageName, plural, shortText } from './text.js';

/** Rings by click depth; the zone past the limit is shaded and the limit ring dashed. */
function drawRings(rings: Rings): void {
  const count = rings.radii.length - 1;
  if (rings.limit < rings.outer) {
    ctx2d.beginPath();
    ctx2d.arc(rings.cx, rings.cy, rings.outer, 0, Math.PI * 2);
    ctx2d.arc(rings.cx, rings.cy, rings.limit, 0, Math.PI * 2, true);
    ctx2d.fillStyle = 'rgba(224,123,57,0.09)';
    ctx2d.fill();
  }
  for (let d = 1; d <= count; d++) {
    ctx2d.beginPath();
    ctx2d.arc(rings.cx, rings.cy, rings.radii[d], 0, Math.PI * 2);
    ctx2d.lineWidth = 1 * unit;
    ctx2d.strokeStyle = '#e3e6ec';
    ctx2d.stroke();
  }
  ctx2d.beginPath();
  ctx2d.arc(rings.cx, rings.cy, rings.limit, 0, Math.PI * 2);
  ctx2d.setLineDash([6 * unit, 5 * unit]);
  ctx2d.lineWidth = 1.6 * unit;
  ctx2d.strokeStyle = COLORS.fail;
  ctx2d.stroke();
  ctx2d.setLineDash([]);
}

/**
 * Ring names on their rings where they cover no node and no other name: the top of the ring
 * first, then other places round it; the limit's name low on the right.
 */
function drawRingLabels(rings: Rings): void {
  const spots = [-0.5, -0.62, -0.38, -0.75, -0.25, 0.5, 0.62, 0.38, 1, 0];
  const onRing = (text: string, radius: number, px: number, weight: number, order: readonly number[]): void => {
    for (const t of order) {
      const a = Math.PI * t;
      const x = rings.cx + Math.cos(a) * radius, y = rings.cy + Math.sin(a) * radius;
      if (tryLabel(text, x, y, 'center', px, weight)) return;
    }
    const a = Math.PI * order[0];
    label(text, rings.cx + Math.cos(a) * radius, rings.cy + Math.sin(a) * radius, 'center', px, weight);
  };
  onRing('limit: ' + plural(MAX_DEPTH, 'click', 'clicks'), rings.limit, 11, 650, [0.25, 0.3, 0.2, 0.35, 0.15, 0.4, 0.1]);
  for (let d = 1; d < rings.radii.length; d++) onRing(plural(d, 'click', 'clicks'), rings.radii[d], 10.5, 400, spots);
}

function drawBox(box: Box | null, caption: string): void {
  if (!box) return;
  ctx2d.setLineDash([5 * unit, 4 * unit]);
  ctx2d.lineWidth = 1.2 * unit;
  ctx2d.strokeStyle = '#8a8f98';
  ctx2d.fillStyle = 'rgba(138,143,152,0.07)';
  ctx2d.beginPath();
  ctx2d.rect(box.x, box.y, box.w, box.h);
  ctx2d.fill();
  ctx2d.stroke();
  ctx2d.setLineDash([]);
  label(caption, box.x + 10, box.y + 18, 'left', 12, 650);
}

/**
 * Every page on its ring, the links between them, and the names that fit.
 * @returns the ids of the pages drawn (all of them)
 */
export function drawPagesOverview(o: PageOverview): number[] {
  const pos = o.positions;
  drawRings(o.rings);
  let unreachable = 0;
  for (const p of PAGES) if (p.depth === null) unreachable++;
  drawBox(o.box, 'Not reachable from the entry page (' + unreachable + ')');
  ctx2d.lineWidth = 0.8 * unit;
  for (let e = 0; e < DATA.edges.length; e += 3) {
    const a = DATA.edges[e], b = DATA.edges[e + 1], f = DATA.edges[e + 2];
    ctx2d.strokeStyle = (f & 1) ? 'rgba(60,72,96,0.20)' : 'rgba(60,72,96,0.07)';
    ctx2d.beginPath();
    ctx2d.moveTo(pos[2 * a], pos[2 * a + 1]);
    ctx2d.lineTo(pos[2 * b], pos[2 * b + 1]);
    ctx2d.stroke();
  }
  const order = PAGES.map((_, i) => i);
  order.sort((a, b) => PAGES[a].pagerank - PAGES[b].pagerank || b - a);
  const radius = (i: number): number => (PAGES[i].depth === null ? Math.max(6, nodeRadius()) : nodeRadius()) * unit;
  for (const i of order) drawPageNode(i, pos[2 * i], pos[2 * i + 1], radius(i), false);
  // Names where they fit: unreachable pages first (they are few and need reading), then the
  // entry pages, then the pages deeper than the limit, then the others by PageRank; a name that would overlap another is left out.
  const named = PAGES.map((_, i) => i);
  const prio = (i: number): number => { const d = PAGES[i].depth; return d === null ? 0 : d === 0 ? 1 : d > MAX_DEPTH ? 2 : 3; };
  named.sort((a, b) => prio(a) - prio(b) || PAGES[b].pagerank - PAGES[a].pagerank || a - b);
  let ringsNamed = false;
  for (const i of named) {
    // The ring names go in after the names of the pages with a problem, before the others.
    if (!ringsNamed && prio(i) > 2) { drawRingLabels(o.rings); ringsNamed = true; }
    const r = radius(i);
    const x = pos[2 * i], y = pos[2 * i + 1];
    if (PAGES[i].depth === null) {
      const lines = twoLines(pageName(i), 19);
      if (!tryLines(lines, x, y + r + 9 * unit, 1)) tryLines(lines, x, y - r - 9 * unit, -1);
    } else if (PAGES[i].depth === 0) {
      if (!nameNode(shortText(pageName(i), 24), x, y, r, o.rings.cx, o.rings.cy, 11)) {
        label(shortText(pageName(i), 24), x, y + r + 9 * unit, 'center', 11);
      }
    } else nameNode(shortText(pageName(i), 24), x, y, r, o.rings.cx, o.rings.cy, 11);
  }
  if (!ringsNamed) drawRingLabels(o.rings);
  return PAGES.map((_, i) => i);
}

/** A folder's size: its number of pages. */
function folderRadius(f: FolderOverview['folders'][number]): number { return Math.max(5, Math.min(26, 3 + 2.2 * Math.sqrt(f.pages))); }

/** The folders of a large site on their rings, with the strongest links between them. */
export function drawFoldersOverview(o: FolderOverview): void {
  drawRings(o.rings);
  const lost = o.folders.filter((f) => f.minDepth === null).length;
  drawBox(o.box, 'Folders with no reachable page (' + lost + ')');
  // The strongest folder-to-folder links only (at most 3 per folder): all of them would be a hairball.
  const strong: number[] = [];
  for (let e = 0; e < o.edges.length; e += 3) strong.push(e);
  strong.sort((x, y) => o.edges[y + 2] - o.edges[x + 2] || x - y);
  const keep = strong.slice(0, Math.max(20, 3 * o.folders.length));
  const most = keep.length ? o.edges[keep[0] + 2] : 1;
  for (const e of keep) {
    const a = o.folders[o.edges[e]], b = o.folders[o.edges[e + 1]];
    const w = Math.log(1 + o.edges[e + 2]) / Math.log(1 + most);
    ctx2d.lineWidth = (0.6 + 3 * w) * unit;
    ctx2d.strokeStyle = 'rgba(60,72,96,' + (0.06 + 0.22 * w).toFixed(3) + ')';
    ctx2d.beginPath();
    ctx2d.moveTo(a.x, a.y);
    ctx2d.lineTo(b.x, b.y);
    ctx2d.stroke();
  }
  const order = o.folders.map((_, i) => i);
  order.sort((a, b) => o.folders[a].pagerank - o.folders[b].pagerank || b - a);
  for (const k of order) {
    const f = o.folders[k];
    const r = folderRadius(f) * unit;
    shapePath(f.x, f.y, r, 'circle');
    ctx2d.fillStyle = f.minDepth === null ? COLORS.lost : COLORS.fine;
    ctx2d.fill();
    ctx2d.lineWidth = 1 * unit;
    ctx2d.strokeStyle = '#fff';
    ctx2d.stroke();
    if (f.overLimit > 0) {
      ctx2d.beginPath();
      ctx2d.arc(f.x, f.y, r + 3 * unit, -Math.PI / 2, -Math.PI / 2 + 2 * Math.PI * f.overLimit / f.pages);
      ctx2d.lineWidth = 3.5 * unit;
      ctx2d.strokeStyle = COLORS.over;
      ctx2d.stroke();
    }
    addHit({ x: f.x, y: f.y, r: Math.max(r, 6 * unit), kind: 'folder', id: k });
  }
  drawRingLabels(o.rings);
  for (const k of order.slice().reverse()) {
    const f = o.folders[k];
    const r = folderRadius(f) * unit;
    const text = shortText(f.name, 22) + ' (' + f.pages + ')';
    if (f.minDepth === null) tryLabel(text, f.x, f.y + r + 9 * unit, 'center', 11);
    else nameNode(text, f.x, f.y, r, o.rings.cx, o.rings.cy, 11);
  }
}
