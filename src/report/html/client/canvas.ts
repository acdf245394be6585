/**
 * The canvas and its drawing primitives: shapes, page nodes, labels that never overlap, arrow
 * heads. The graph is drawn on a canvas, not as SVG elements, so a large site costs one bitmap
 * rather than thousands of DOM nodes. Drawing happens in virtual units (a 1000 x 640 area,
 * layout.ts's size) scaled to the canvas; `unit` is virtual units per CSS pixel.
 */
import { OVERVIEW_HEIGHT, OVERVIEW_WIDTH } from '../layout.js';
import { PAGES } from './data.js';
import { byId } from './dom.js';
import { COLORS, pageState, stateColor } from './pages.js';
import { shortText } from './text.js';

export const VW = OVERVIEW_WIDTH, VH = OVERVIEW_HEIGHT;
export const canvas = byId<HTMLCanvasElement>('lw-canvas');
export const ctx2d = canvas.getContext('2d')!;

/** Text alignment of a label. */
export type Align = 'left' | 'right' | 'center';

/** Something drawn that answers hover and click: a page or a folder of the overview. */
export interface Hit {
  readonly x: number;
  readonly y: number;
  readonly r: number;
  readonly kind: 'page' | 'folder';
  readonly id: number;
}

interface LabelBox { x: number; y: number; w: number; h: number }

/** Virtual units per CSS pixel. */
export let unit = 1;
/** What was drawn, for hover and click. */
export let hits: Hit[] = [];
/** Boxes of the labels drawn so far, so that names never overlap. */
let placed: LabelBox[] = [];

export function sizeCanvas(): void {
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

function font(px: number, weight?: number): void { ctx2d.font = (weight || 400) + ' ' + (px * unit) + 'px system-ui, sans-serif'; }

/** Every page is drawn the same size: colour and shape carry its state, the rings its depth. */
export function nodeRadius(scale = 1): number {
  return 5.5 * scale;
}

export function shapePath(x: number, y: number, r: number, shape: 'square' | 'triangle' | 'circle'): void {
  ctx2d.beginPath();
  if (shape === 'square') ctx2d.rect(x - r * 0.9, y - r * 0.9, r * 1.8, r * 1.8);
  else if (shape === 'triangle') { ctx2d.moveTo(x, y - r * 1.15); ctx2d.lineTo(x + r, y + r * 0.75); ctx2d.lineTo(x - r, y + r * 0.75); ctx2d.closePath(); }
  else ctx2d.arc(x, y, r, 0, Math.PI * 2);
}

function pageShape(i: number): 'square' | 'triangle' | 'circle' {
  const p = PAGES[i];
  if (p.orphan) return 'square';
  if (p.depth === null) return 'triangle';
  return 'circle';
}

export function drawPageNode(i: number, x: number, y: number, r: number, emphasis: boolean): void {
  const p = PAGES[i];
  shapePath(x, y, r, pageShape(i));
  ctx2d.fillStyle = stateColor(pageState(i));
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
  hits.push({ x, y, r: Math.max(r, 5 * unit), kind: 'page', id: i });
}

/** Record something drawn that answers hover and click. */
export function addHit(hit: Hit): void { hits.push(hit); }

function labelBox(text: string, x: number, y: number, align: Align, px?: number): LabelBox {
  const w = ctx2d.measureText(text).width, h = (px || 11.5) * unit * 1.25;
  const left = align === 'left' ? x : align === 'right' ? x - w : x - w / 2;
  return { x: left - 2 * unit, y: y - h / 2, w: w + 4 * unit, h };
}

/** Whether a label box would cover another label or a drawn node, or leave the canvas. */
function overlaps(b: LabelBox): boolean {
  for (const o of placed) if (b.x < o.x + o.w && o.x < b.x + b.w && b.y < o.y + o.h && o.y < b.y + b.h) return true;
  for (const h of hits) {
    const nx = Math.max(b.x, Math.min(h.x, b.x + b.w)), ny = Math.max(b.y, Math.min(h.y, b.y + b.h));
    if ((nx - h.x) * (nx - h.x) + (ny - h.y) * (ny - h.y) < (h.r + 1 * unit) * (h.r + 1 * unit)) return true;
  }
  return b.x < 0 || b.x + b.w > VW || b.y < 0 || b.y + b.h > VH;
}

/** Draw a label only where it overlaps no other label; returns whether it was drawn. */
export function tryLabel(text: string, x: number, y: number, align: Align, px?: number, weight?: number): boolean {
  font(px || 11.5, weight);
  const b = labelBox(text, x, y, align, px);
  if (overlaps(b)) return false;
  label(text, x, y, align, px, weight);
  return true;
}

/** A name in at most two lines of about max characters, broken between words. */
export function twoLines(text: string, max: number): string[] {
  if (Array.from(text).length <= max) return [text];
  const words = text.split(' ');
  let first = '';
  while (words.length > 0 && Array.from(first + ' ' + words[0]).length <= max + 1) first = (first ? first + ' ' : '') + words.shift();
  if (first === '') return [shortText(text, max)];
  return [first, shortText(words.join(' '), max)];
}

/** Lines stacked from y (downwards, or upwards with dir -1), drawn only when every one fits. */
export function tryLines(lines: readonly string[], x: number, y: number, dir: 1 | -1): boolean {
  font(11);
  const step = 13 * unit;
  const ys = lines.map((_, k) => dir > 0 ? y + k * step : y - (lines.length - 1 - k) * step);
  for (let k = 0; k < lines.length; k++) if (overlaps(labelBox(lines[k], x, ys[k], 'center', 11))) return false;
  for (let k = 0; k < lines.length; k++) label(lines[k], x, ys[k], 'center', 11);
  return true;
}

/** A page's name beside its node, away from the ring centre, where there is room. */
export function nameNode(text: string, x: number, y: number, r: number, cx: number, cy: number, px: number): boolean {
  const a = Math.atan2(y - cy, x - cx);
  const d = r + 6 * unit;
  const c = Math.cos(a), s = Math.sin(a);
  const align: Align = c > 0.35 ? 'left' : c < -0.35 ? 'right' : 'center';
  const tries: [number, number, Align][] = [
    [x + c * d, y + s * (d + (align === 'center' ? 4 * unit : 0)), align],
    [x, y + r + 9 * unit, 'center'],
    [x, y - r - 9 * unit, 'center'],
  ];
  for (const t of tries) if (tryLabel(text, t[0], t[1], t[2], px)) return true;
  return false;
}

export function label(text: string, x: number, y: number, align?: Align, px?: number, weight?: number): void {
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

export function arrowHead(x1: number, y1: number, x2: number, y2: number, inset: number, color: string): void {
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

export function clear(): void {
  ctx2d.save();
  ctx2d.setTransform(1, 0, 0, 1, 0, 0);
  ctx2d.clearRect(0, 0, canvas.width, canvas.height);
  ctx2d.restore();
  hits = [];
  placed = [];
}
