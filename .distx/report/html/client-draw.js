/**
 * The page script's canvas drawing: primitives, and the overview (pages or folders on rings by
 * click depth, the unreachable box apart); client-focus.ts draws the focused view. The graph is
 * drawn on a canvas, not as SVG elements, so a large site costs one bitmap rather than
 * thousands of DOM nodes; the overview positions come from the formatter (deterministic).
 * Plain browser JavaScript kept as a string (see client-core.ts).
 */
export const CLIENT_DRAW = String.raw `
const VW = 1000, VH = 640;
const canvas = document.getElementById('lw-canvas');
const ctx2d = canvas.getContext('2d');
const drawnList = document.getElementById('lw-drawn');
let unit = 1;        // virtual units per CSS pixel
let hits = [];       // what was drawn, for hover and click: { x, y, r, kind, id }
let placed = [];     // boxes of the labels drawn so far, so that names never overlap

function sizeCanvas() {
  const css = canvas.clientWidth || VW;
  const dpr = window.devicePixelRatio || 1;
  canvas.width = Math.round(css * dpr);
  canvas.height = Math.round(css * VH / VW * dpr);
  unit = VW / css;
  // The side panel is as tall as the drawing and scrolls past it.
  const aside = document.getElementById('lw-details');
  if (aside && window.matchMedia('(min-width: 901px)').matches) aside.style.maxHeight = Math.max(320, css * VH / VW) + 'px';
  ctx2d.setTransform(canvas.width / VW, 0, 0, canvas.height / VH, 0, 0);
}

function font(px, weight) { ctx2d.font = (weight || 400) + ' ' + (px * unit) + 'px system-ui, sans-serif'; }

function nodeRadius(rank, scale) {
  return Math.max(3, Math.min(18, (2.5 + 4.2 * Math.sqrt(rank)) * (scale || 1)));
}

function shapePath(x, y, r, shape) {
  ctx2d.beginPath();
  if (shape === 'square') ctx2d.rect(x - r * 0.9, y - r * 0.9, r * 1.8, r * 1.8);
  else if (shape === 'triangle') { ctx2d.moveTo(x, y - r * 1.15); ctx2d.lineTo(x + r, y + r * 0.75); ctx2d.lineTo(x - r, y + r * 0.75); ctx2d.closePath(); }
  else ctx2d.arc(x, y, r, 0, Math.PI * 2);
}

function pageShape(i) {
  const p = PAGES[i];
  if (p.orphan) return 'square';
  if (p.depth === null) return 'triangle';
  return 'circle';
}

function drawPageNode(i, x, y, r, emphasis) {
  const p = PAGES[i];
  shapePath(x, y, r, pageShape(i));
  ctx2d.fillStyle = depthColor(p.depth);
  ctx2d.fill();
  ctx2d.lineWidth = emphasis ? 2.5 * unit : 1 * unit;
  ctx2d.strokeStyle = emphasis ? COLORS.focus : '#ffffff';
  ctx2d.stroke();
  if (p.depth === 0) {
    ctx2d.beginPath();
    ctx2d.arc(x, y, r + 3.5 * unit, 0, Math.PI * 2);
    ctx2d.lineWidth = 1.5 * unit;
    ctx2d.strokeStyle = COLORS.ink;
    ctx2d.stroke();
  }
  hits.push({ x: x, y: y, r: Math.max(r, 5 * unit), kind: 'page', id: i });
}

function labelBox(text, x, y, align, px) {
  const w = ctx2d.measureText(text).width, h = (px || 11.5) * unit * 1.25;
  const left = align === 'left' ? x : align === 'right' ? x - w : x - w / 2;
  return { x: left - 2 * unit, y: y - h / 2, w: w + 4 * unit, h: h };
}

function overlaps(b) {
  for (const o of placed) if (b.x < o.x + o.w && o.x < b.x + b.w && b.y < o.y + o.h && o.y < b.y + b.h) return true;
  return b.x < 0 || b.x + b.w > VW || b.y < 0 || b.y + b.h > VH;
}

/** Draw a label only where it overlaps no other label; returns whether it was drawn. */
function tryLabel(text, x, y, align, px, weight) {
  font(px || 11.5, weight);
  const b = labelBox(text, x, y, align, px);
  if (overlaps(b)) return false;
  label(text, x, y, align, px, weight);
  return true;
}

/** A page's name beside its node, away from the ring centre, where there is room. */
function nameNode(text, x, y, r, cx, cy, px) {
  const a = Math.atan2(y - cy, x - cx);
  const d = r + 6 * unit;
  const c = Math.cos(a), s = Math.sin(a);
  const align = c > 0.35 ? 'left' : c < -0.35 ? 'right' : 'center';
  const tries = [
    [x + c * d, y + s * (d + (align === 'center' ? 4 * unit : 0)), align],
    [x, y + r + 9 * unit, 'center'],
    [x, y - r - 9 * unit, 'center'],
  ];
  for (const t of tries) if (tryLabel(text, t[0], t[1], t[2], px)) return true;
  return false;
}

function label(text, x, y, align, px, weight) {
  font(px || 11.5, weight);
  placed.push(labelBox(text, x, y, align || 'center', px));
  ctx2d.textAlign = align || 'center';
  ctx2d.textBaseline = 'middle';
  ctx2d.lineJoin = 'round';
  ctx2d.lineWidth = 3.5 * unit;
  ctx2d.strokeStyle = 'rgba(255,255,255,0.92)';
  ctx2d.strokeText(text, x, y);
  ctx2d.fillStyle = COLORS.ink;
  ctx2d.fillText(text, x, y);
}

function arrowHead(x1, y1, x2, y2, inset, color) {
  const a = Math.atan2(y2 - y1, x2 - x1);
  const tx = x2 - Math.cos(a) * inset, ty = y2 - Math.sin(a) * inset;
  const s = 7 * unit;
  ctx2d.beginPath();
  ctx2d.moveTo(tx, ty);
  ctx2d.lineTo(tx - s * Math.cos(a - 0.45), ty - s * Math.sin(a - 0.45));
  ctx2d.lineTo(tx - s * Math.cos(a + 0.45), ty - s * Math.sin(a + 0.45));
  ctx2d.closePath();
  ctx2d.fillStyle = color;
  ctx2d.fill();
}

function clear() {
  ctx2d.save();
  ctx2d.setTransform(1, 0, 0, 1, 0, 0);
  ctx2d.clearRect(0, 0, canvas.width, canvas.height);
  ctx2d.restore();
  hits = [];
  placed = [];
}

/** Rings by click depth; the zone past the limit is shaded and the limit ring dashed. */
function drawRings(rings) {
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

/** Ring names, drawn over the nodes (with a halo) so that they stay readable. */
function drawRingLabels(rings) {
  for (let d = 1; d < rings.radii.length; d++) label(plural(d, 'click', 'clicks'), rings.cx, rings.cy - rings.radii[d], 'center', 10.5);
  const a = Math.PI * 0.25;
  label('limit: ' + plural(MAX_DEPTH, 'click', 'clicks'), rings.cx + Math.cos(a) * rings.limit + 4 * unit, rings.cy + Math.sin(a) * rings.limit, 'left', 11, 650);
}

function drawBox(box, caption) {
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

function drawPagesOverview(o) {
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
  const order = PAGES.map(function (_, i) { return i; });
  order.sort(function (a, b) { return PAGES[a].pagerank - PAGES[b].pagerank || b - a; });
  const radius = function (i) { return (PAGES[i].depth === null ? Math.max(6, nodeRadius(PAGES[i].rank)) : nodeRadius(PAGES[i].rank)) * unit; };
  for (const i of order) drawPageNode(i, pos[2 * i], pos[2 * i + 1], radius(i), false);
  drawRingLabels(o.rings);
  // Names where they fit: unreachable pages first (they are few and need reading), then the
  // entry pages, then the others by PageRank; a name that would overlap another is left out.
  const named = PAGES.map(function (_, i) { return i; });
  const prio = function (i) { return PAGES[i].depth === null ? 0 : PAGES[i].depth === 0 ? 1 : 2; };
  named.sort(function (a, b) { return prio(a) - prio(b) || PAGES[b].pagerank - PAGES[a].pagerank || a - b; });
  for (const i of named) {
    const r = radius(i);
    if (PAGES[i].depth === null) tryLabel(shortText(pageName(i), 22), pos[2 * i], pos[2 * i + 1] + r + 9 * unit, 'center', 11);
    else nameNode(shortText(pageName(i), 24), pos[2 * i], pos[2 * i + 1], r, o.rings.cx, o.rings.cy, 11);
  }
  return PAGES.map(function (_, i) { return i; });
}

function drawFoldersOverview(o) {
  drawRings(o.rings);
  const lost = o.folders.filter(function (f) { return f.minDepth === null; }).length;
  drawBox(o.box, 'Folders with no reachable page (' + lost + ')');
  // The strongest folder-to-folder links only (at most 3 per folder): all of them would be a hairball.
  const strong = [];
  for (let e = 0; e < o.edges.length; e += 3) strong.push(e);
  strong.sort(function (x, y) { return o.edges[y + 2] - o.edges[x + 2] || x - y; });
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
  const order = o.folders.map(function (_, i) { return i; });
  order.sort(function (a, b) { return o.folders[a].pagerank - o.folders[b].pagerank || b - a; });
  for (const k of order) {
    const f = o.folders[k];
    const r = Math.max(5, Math.min(30, 4 + 40 * Math.sqrt(f.pagerank))) * unit;
    shapePath(f.x, f.y, r, 'circle');
    ctx2d.fillStyle = depthColor(f.minDepth);
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
    hits.push({ x: f.x, y: f.y, r: Math.max(r, 6 * unit), kind: 'folder', id: k });
  }
  drawRingLabels(o.rings);
  for (const k of order.slice().reverse()) {
    const f = o.folders[k];
    const r = Math.max(5, Math.min(30, 4 + 40 * Math.sqrt(f.pagerank))) * unit;
    const text = shortText(f.name, 22) + ' (' + f.pages + ')';
    if (f.minDepth === null) tryLabel(text, f.x, f.y + r + 9 * unit, 'center', 11);
    else nameNode(text, f.x, f.y, r, o.rings.cx, o.rings.cy, 11);
  }
  return [];
}

`;
