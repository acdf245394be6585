/**
 * The page script's shared part (plain browser JavaScript, kept as a string: the formatter is
 * pure and writes one self-contained file, so the script is inlined, never loaded).
 *
 * It reads the embedded data, builds the adjacency lists and offers small DOM helpers. Text
 * from the report only ever reaches the page through `textContent`, never as markup.
 */
export const CLIENT_CORE = String.raw `
'use strict';
const DATA = JSON.parse(document.getElementById('lw-data').textContent);

/** Rows of values back to objects (embed.ts writes them). */
function decodeRows(rows, fields) {
  return rows.map(function (row) {
    const o = {};
    for (let k = 0; k < fields.length; k++) o[fields[k]] = row[k] === undefined ? null : row[k];
    return o;
  });
}

/** Top-level source folder: 'guide' for guide/a/b.md, '(root)' for a file at the root. */
function topFolder(file) {
  const slash = file.indexOf('/');
  return slash < 0 ? '(root)' : file.slice(0, slash);
}

DATA.pages = decodeRows(DATA.pages, DATA.fields.pages);
DATA.findings = decodeRows(DATA.findings, DATA.fields.findings);
DATA.suggestions = decodeRows(DATA.suggestions, DATA.fields.suggestions);
for (const p of DATA.pages) { p.orphan = p.orphan === 1; p.nav = p.nav === 1; p.folder = topFolder(p.file); }
for (const f of DATA.findings) f.folder = topFolder(f.file);
for (const s of DATA.suggestions) s.folder = topFolder(s.file);
const PAGES = DATA.pages;
const N = PAGES.length;
const MAX_DEPTH = DATA.maxDepth;
const BY_ROUTE = new Map();
PAGES.forEach(function (p, i) { BY_ROUTE.set(p.route, i); });

// Adjacency from the flat [from, to, flags] triples: OUT[i] and IN[i] hold [page, flags] pairs.
const OUT = [];
const IN = [];
for (let i = 0; i < N; i++) { OUT.push([]); IN.push([]); }
for (let e = 0; e < DATA.edges.length; e += 3) {
  const a = DATA.edges[e], b = DATA.edges[e + 1], f = DATA.edges[e + 2];
  OUT[a].push([b, f]);
  IN[b].push([a, f]);
}

/** Create an element: props.text sets textContent, props.cls the class, others are attributes. */
function el(tag, props, kids) {
  const node = document.createElement(tag);
  if (props) {
    for (const k of Object.keys(props)) {
      const v = props[k];
      if (v === undefined || v === null || v === false) continue;
      if (k === 'text') node.textContent = String(v);
      else if (k === 'cls') node.className = v;
      else if (k === 'on') { for (const ev of Object.keys(v)) node.addEventListener(ev, v[ev]); }
      else node.setAttribute(k, v === true ? '' : String(v));
    }
  }
  if (kids) {
    for (const kid of kids) {
      if (kid === null || kid === undefined) continue;
      node.appendChild(typeof kid === 'string' ? document.createTextNode(kid) : kid);
    }
  }
  return node;
}

/** Three significant digits, no exponent for report ranges. */
function fmt(v) {
  if (v === null || v === undefined) return '\u2013';
  if (!isFinite(v)) return String(v);
  if (v === 0) return '0';
  if (Number.isInteger(v) && Math.abs(v) >= 100) return String(v);
  return String(Number(v.toPrecision(3)));
}

/** A rank (PageRank x pages) as the text report writes it: 2 decimals below 1, 1 below 10. */
function fmtRank(v) {
  if (v >= 10) return v.toFixed(0);
  if (v >= 1) return v.toFixed(1);
  return v.toFixed(2);
}

function plural(n, one, many) { return n + ' ' + (n === 1 ? one : many); }

function depthText(d) {
  if (d === null || d === undefined) return 'unreachable';
  return plural(d, 'click', 'clicks') + (d > MAX_DEPTH ? ' (over the limit of ' + MAX_DEPTH + ')' : '');
}

function shortText(s, max) {
  const chars = Array.from(s);
  return chars.length <= max ? s : chars.slice(0, max - 1).join('') + '\u2026';
}

function pageName(i) { return PAGES[i].title || PAGES[i].route; }

const ROOT_STYLE = getComputedStyle(document.documentElement);
function cssVar(name) { return ROOT_STYLE.getPropertyValue(name).trim() || '#888'; }
const COLORS = {
  depth: [cssVar('--lw-d0'), cssVar('--lw-d1'), cssVar('--lw-d2'), cssVar('--lw-d3'), cssVar('--lw-d4')],
  over: cssVar('--lw-over'), none: cssVar('--lw-none'), ink: cssVar('--lw-ink'), muted: cssVar('--lw-muted'),
  fail: cssVar('--lw-fail'), accent: cssVar('--lw-accent'), focus: cssVar('--lw-focus'),
};

function depthColor(d) {
  if (d === null || d === undefined) return COLORS.none;
  if (d > MAX_DEPTH) return COLORS.over;
  return COLORS.depth[Math.min(d, 4)];
}

/** BFS parent of a page: the in-neighbour one click closer with the highest PageRank. */
function bfsParent(i) {
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
function pageButton(i, onPick, note) {
  return el('button', { type: 'button', 'data-route': PAGES[i].route, on: { click: function () { onPick(i); } } }, [
    shortText(pageName(i), 70) + (note ? ' ' + note : ''),
    el('span', { cls: 'lw-route', text: PAGES[i].route + ' \u00b7 ' + depthText(PAGES[i].depth) }),
  ]);
}
`;
