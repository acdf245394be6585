/**
 * The focused view: one page in the centre, the pages linking to it on the left, the pages it
 * links to on the right (each column sorted by PageRank, so the picture follows from the data
 * alone), and the canvas's text alternative.
 */
import { arrowHead, ctx2d, drawPageNode, label, nodeRadius, unit, VH, VW } from './canvas.js';
import { byId, el } from './dom.js';
import { PAGES } from './data.js';
import type { FolderOverview } from './data.js';
import { depthText, pageName, plural, shortText } from './text.js';

/** A neighbour in a column of the focused view. */
export interface ColumnItem {
  readonly id: number;
  readonly y: number;
  /** Flag bits of the link (1 content, 2 template). */
  readonly flags: number;
  /** Linked both ways. */
  readonly mutual: boolean;
}

/** The focused view's columns (graph.ts lays them out). */
export interface FocusLayout {
  readonly inCount: number;
  readonly outCount: number;
  readonly left: readonly ColumnItem[];
  readonly right: readonly ColumnItem[];
  readonly leftMore: number;
  readonly rightMore: number;
  readonly navCount: number;
}

const drawnList = byId('lw-drawn');

/**
 * The focused page in the centre, pages linking to it on the left, pages it links to on the right.
 * @returns the ids of the pages drawn
 */
export function drawFocus(id: number, layout: FocusLayout): number[] {
  const cx = VW / 2, cy = VH / 2;
  const rc = nodeRadius(1.4) * unit;
  // Labels get the room between the column and the canvas edge (or the centre).
  const room = Math.max(8, Math.floor((210 - 16 * unit) / unit / 6.4));
  function column(items: readonly ColumnItem[], x: number, side: 1 | -1): void {
    for (const it of items) {
      const r = Math.max(5, nodeRadius()) * unit;
      const template = !(it.flags & 1);
      ctx2d.setLineDash(template ? [4 * unit, 4 * unit] : []);
      ctx2d.lineWidth = 1.2 * unit;
      ctx2d.strokeStyle = template ? 'rgba(60,72,96,0.35)' : 'rgba(60,72,96,0.55)';
      ctx2d.beginPath();
      const sx = side < 0 ? x : cx, sy = side < 0 ? it.y : cy, tx = side < 0 ? cx : x, ty = side < 0 ? cy : it.y;
      ctx2d.moveTo(sx, sy);
      ctx2d.bezierCurveTo((sx + tx) / 2, sy, (sx + tx) / 2, ty, tx, ty);
      ctx2d.stroke();
      ctx2d.setLineDash([]);
      arrowHead((sx + tx) / 2, ty, tx, ty, side < 0 ? rc + 2 * unit : r + 2 * unit, 'rgba(60,72,96,0.7)');
      if (it.mutual) arrowHead((sx + tx) / 2, sy, sx, sy, rc + 2 * unit, 'rgba(60,72,96,0.7)');
      drawPageNode(it.id, x, it.y, r, false);
      const text = shortText(pageName(it.id), room) + (it.mutual ? ' \u21C4' : '');
      label(text, x + side * (r + 8 * unit), it.y, side < 0 ? 'right' : 'left', 11.5);
    }
  }
  label('pages linking here (' + layout.inCount + ')', 230, 18, 'center', 12, 650);
  label('pages it links to (' + layout.outCount + ')', 770, 18, 'center', 12, 650);
  column(layout.left, 230, -1);
  column(layout.right, 770, 1);
  const leftNotes: string[] = [], rightNotes: string[] = [];
  if (layout.leftMore > 0) leftNotes.push('+ ' + layout.leftMore + ' more in the list');
  if (PAGES[id].nav) leftNotes.push('+ every page, through the navigation');
  if (layout.rightMore > 0) rightNotes.push('+ ' + layout.rightMore + ' more in the list');
  if (layout.navCount > 0) rightNotes.push('+ the navigation\u2019s ' + plural(layout.navCount, 'link', 'links') + ', on every page');
  leftNotes.forEach((t, k) => { label(t, 230, VH - 14 - 16 * unit * (leftNotes.length - 1 - k), 'center', 11); });
  rightNotes.forEach((t, k) => { label(t, 770, VH - 14 - 16 * unit * (rightNotes.length - 1 - k), 'center', 11); });
  drawPageNode(id, cx, cy, rc, true);
  label(shortText(pageName(id), 40), cx, cy - rc - 24 * unit, 'center', 13, 700);
  label(PAGES[id].route + ' \u00b7 ' + depthText(PAGES[id].depth), cx, cy - rc - 9 * unit, 'center', 11);
  if (layout.left.length === 0 && layout.right.length === 0) label('No links in or out', cx, cy + rc + 18 * unit, 'center', 12);
  return [id].concat(layout.left.map((it) => it.id), layout.right.map((it) => it.id));
}

/** The canvas's fallback content: the pages (and folders) drawn, as a list. */
export function fillDrawnList(ids: readonly number[], folders?: FolderOverview['folders']): void {
  const frag = document.createDocumentFragment();
  for (const i of ids) frag.appendChild(el('li', { text: pageName(i) + ' (' + PAGES[i].route + ', ' + depthText(PAGES[i].depth) + ')' }));
  if (folders) for (const f of folders) frag.appendChild(el('li', { text: 'folder ' + f.name + ': ' + plural(f.pages, 'page', 'pages') }));
  drawnList.replaceChildren(frag);
}
