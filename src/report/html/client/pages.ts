/** What the page shows of one page: its problem state and colour, its BFS parent, a button naming it. */
import { IN, MAX_DEPTH, PAGES } from './data.js';
import { el } from './dom.js';
import { depthText, pageName, shortText } from './text.js';

const ROOT_STYLE = getComputedStyle(document.documentElement);
function cssVar(name: string): string { return ROOT_STYLE.getPropertyValue(name).trim() || '#888'; }

/** The colours of styles.ts, read from its custom properties. */
export const COLORS = {
  depth: [cssVar('--lw-d0'), cssVar('--lw-d1'), cssVar('--lw-d2'), cssVar('--lw-d3'), cssVar('--lw-d4')],
  over: cssVar('--lw-over'), none: cssVar('--lw-none'), ink: cssVar('--lw-ink'), muted: cssVar('--lw-muted'),
  fail: cssVar('--lw-fail'), accent: cssVar('--lw-accent'), focus: cssVar('--lw-focus'),
  fine: cssVar('--lw-fine'), orphan: cssVar('--lw-orphan'), lost: cssVar('--lw-lost'),
};

/** A page's problem state: fine, deeper than the limit, orphan, or unreachable (but linked). */
export type PageState = 'fine' | 'over' | 'orphan' | 'lost';

/** A page's problem state, the graph's colour. */
export function pageState(i: number): PageState {
  const p = PAGES[i];
  if (p.orphan) return 'orphan';
  if (p.depth === null) return 'lost';
  return p.depth > MAX_DEPTH ? 'over' : 'fine';
}

export function stateColor(state: PageState): string { return COLORS[state]; }

/** BFS parent of a page: the in-neighbour one click closer with the highest PageRank. */
export function bfsParent(i: number): number {
  const d = PAGES[i].depth;
  if (d === null || d === 0) return -1;
  let best = -1;
  for (const pair of IN[i]) {
    const j = pair[0];
    if (PAGES[j].depth === d - 1 && (best < 0 || PAGES[j].pagerank > PAGES[best].pagerank)) best = j;
  }
  return best;
}

/** A button naming a page (title and route) that calls back with the page id. */
export function pageButton(i: number, onPick: (id: number) => void, note?: string): HTMLButtonElement {
  return el('button', { type: 'button', 'data-route': PAGES[i].route, on: { click: () => { onPick(i); } } }, [
    shortText(pageName(i), 70) + (note ? ' ' + note : ''),
    el('span', { cls: 'lw-route', text: PAGES[i].route + ' \u00b7 ' + depthText(PAGES[i].depth) }),
  ]);
}
