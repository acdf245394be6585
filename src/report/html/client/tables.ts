/**
 * The tables: findings and suggested links, with sorting (column header buttons, so Enter and
 * Space work as well as clicks; `aria-sort` tells the order) and filters (rule, folder,
 * severity, free text). Long tables show 200 rows with a button for the rest; printing shows
 * every row.
 */
import { DATA } from './data.js';
import type { Finding, Suggestion } from './data.js';
import { byId, code, el } from './dom.js';
import { fmtRank, plural } from './text.js';

const PAGE_ROWS = 200;

type SortValue = string | number | null | undefined;

/** A column: its header, how it sorts (absent: not sortable) and how a cell shows. */
interface Column<R> {
  readonly key: string;
  readonly label: string;
  readonly numeric?: boolean;
  readonly cls?: string;
  /** The first direction when the header is chosen. */
  readonly firstDir?: 'asc' | 'desc';
  readonly sort?: (row: R) => SortValue;
  readonly render: (row: R) => string | Node;
}

/** A select filter over the values of one field. */
interface Filter<R> {
  readonly key: string;
  readonly label: string;
  /** The option that shows every row. */
  readonly all: string;
  readonly value: (row: R) => string;
}

/** What a table shows and how. */
interface TableSpec<R> {
  /** The table's id in the markup: `lw-<id>-table`, `lw-<id>-controls`, ... */
  readonly id: string;
  readonly rows: readonly R[];
  /** Text of a table without rows. */
  readonly empty: string;
  readonly defaultKey?: string;
  readonly defaultDir?: 'asc' | 'desc';
  readonly filters: readonly Filter<R>[];
  /** The words the text filter searches. */
  readonly text: (row: R) => string;
  readonly columns: readonly Column<R>[];
}

interface TableState {
  key: string | null;
  dir: 'asc' | 'desc';
  filters: Record<string, string>;
  text: string;
  all: boolean;
}

function compareValues(a: SortValue, b: SortValue): number {
  if (a === b) return 0;
  if (a === null || a === undefined) return 1;
  if (b === null || b === undefined) return -1;
  if (typeof a === 'number' && typeof b === 'number') return a - b;
  return String(a).localeCompare(String(b), 'en');
}

function makeTable<R>(spec: TableSpec<R>): { render: () => void; state: TableState } {
  const id = spec.id;
  const controls = byId('lw-' + id + '-controls');
  const table = byId<HTMLTableElement>('lw-' + id + '-table');
  const shown = byId('lw-' + id + '-shown');
  const more = byId('lw-' + id + '-more');
  const tbody = table.tBodies[0];
  const rows = spec.rows.map((row, index) => ({ row, index }));
  const state: TableState = { key: spec.defaultKey || null, dir: spec.defaultDir || 'asc', filters: {}, text: '', all: false };

  for (const f of spec.filters) {
    const values = Array.from(new Set(spec.rows.map(f.value))).sort(compareValues);
    const select: HTMLSelectElement = el('select', { id: 'lw-' + id + '-filter-' + f.key, 'data-filter': f.key,
      on: { change: () => { state.filters[f.key] = select.value; state.all = false; render(); } } },
      [el('option', { value: '', text: f.all }), ...values.map((v) => el('option', { value: v, text: v }))]);
    controls.appendChild(el('label', null, [f.label, select]));
  }
  const search: HTMLInputElement = el('input', { type: 'search', id: 'lw-' + id + '-filter-text', placeholder: 'words in any column',
    on: { input: () => { state.text = search.value.trim().toLowerCase(); state.all = false; render(); } } });
  controls.appendChild(el('label', null, ['Text', search]));

  const headRow = el('tr');
  const headers: HTMLTableCellElement[] = [];
  for (const col of spec.columns) {
    const th = el('th', { scope: 'col', 'data-key': col.key, cls: col.numeric ? 'lw-num' : null });
    if (col.sort) {
      th.setAttribute('aria-sort', 'none');
      th.appendChild(el('button', { type: 'button', 'data-key': col.key, title: 'Sort by ' + col.label.toLowerCase(),
        on: { click: () => { sortBy(col); } } }, [col.label]));
    } else {
      th.appendChild(el('span', { cls: 'lw-th', text: col.label }));
    }
    headers.push(th);
    headRow.appendChild(th);
  }
  table.tHead!.appendChild(headRow);

  function sortBy(col: Column<R>): void {
    if (state.key === col.key) state.dir = state.dir === 'asc' ? 'desc' : 'asc';
    else { state.key = col.key; state.dir = col.firstDir || 'asc'; }
    render();
  }

  function visible(): { row: R; index: number }[] {
    const out = rows.filter((r) => {
      for (const f of spec.filters) {
        const want = state.filters[f.key];
        if (want && String(f.value(r.row)) !== want) return false;
      }
      return !state.text || spec.text(r.row).toLowerCase().indexOf(state.text) >= 0;
    });
    const col = spec.columns.find((c) => c.key === state.key);
    if (col && col.sort) {
      const sort = col.sort;
      const sign = state.dir === 'asc' ? 1 : -1;
      out.sort((a, b) => {
        const va = sort(a.row), vb = sort(b.row);
        // Missing values go last in either direction; ties keep the report's order.
        if (va === null || va === undefined || vb === null || vb === undefined) return compareValues(va, vb) || a.index - b.index;
        return sign * compareValues(va, vb) || a.index - b.index;
      });
    }
    return out;
  }

  function render(): void {
    const list = visible();
    const limit = state.all ? list.length : Math.min(list.length, PAGE_ROWS);
    const frag = document.createDocumentFragment();
    for (let k = 0; k < limit; k++) {
      const r = list[k];
      const tr = el('tr', { 'data-index': r.index });
      for (const col of spec.columns) {
        const td = el('td', { cls: col.numeric ? 'lw-num' : col.cls || null });
        const v = col.render(r.row);
        td.appendChild(typeof v === 'string' ? document.createTextNode(v) : v);
        tr.appendChild(td);
      }
      frag.appendChild(tr);
    }
    if (list.length === 0) {
      frag.appendChild(el('tr', null, [el('td', { colspan: spec.columns.length, text: rows.length === 0 ? spec.empty : 'No rows match the filters.' })]));
    }
    tbody.replaceChildren(frag);
    for (const th of headers) {
      if (!th.hasAttribute('aria-sort')) continue;
      th.setAttribute('aria-sort', th.getAttribute('data-key') === state.key ? (state.dir === 'asc' ? 'ascending' : 'descending') : 'none');
    }
    shown.textContent = 'Showing ' + limit + ' of ' + list.length + (list.length !== rows.length ? ' matching (' + rows.length + ' in all)' : '');
    more.hidden = limit >= list.length;
    more.textContent = 'Show all ' + list.length + ' rows';
  }
  more.addEventListener('click', () => { state.all = true; render(); });
  window.addEventListener('beforeprint', () => { if (!state.all) { state.all = true; render(); } });
  render();
  return { render, state };
}

function placeOf(row: { readonly file: string; readonly line: number; readonly column: number }): string { return row.file + ':' + row.line + ':' + row.column; }

/** The sort key of a place: file, then line and column as numbers. */
function placeKey(row: { readonly file: string; readonly line: number; readonly column: number }): string {
  return row.file + '\u0000' + String(row.line).padStart(8, '0') + ':' + String(row.column).padStart(6, '0');
}

/** How a change reads beside the numbers: its words and whether it is for the better. */
interface Delta { readonly up: boolean; readonly text: string }

/** "4 -> 2" with the change in words beside it; colour only repeats what the words say. null reads as 'unreachable' unless told otherwise. */
function change(before: number | null, after: number | null, show: (v: number) => string, delta: (a: number, b: number) => Delta, nullAfter?: string): HTMLSpanElement {
  const span = el('span', null, [(before === null ? 'unreachable' : show(before)) + ' \u2192 ' + (after === null ? nullAfter || 'unreachable' : show(after))]);
  const note = before === null && after !== null ? { up: true, text: 'now reachable' } : before !== null && after !== null && before !== after ? delta(before, after) : null;
  if (note) span.appendChild(el('span', { cls: 'lw-delta ' + (note.up ? 'lw-up' : 'lw-down'), text: note.text }));
  return span;
}

function rankChange(r: Suggestion): HTMLSpanElement {
  return change(r.targetRankBefore, r.targetRankAfter, fmtRank, (a, b) => {
    const pct = a > 0 ? Math.round((100 * (b - a)) / a) : 0;
    return { up: b > a, text: (pct >= 0 ? '+' : '\u2212') + Math.abs(pct) + '%' };
  }, 'not computed');
}

function depthChange(r: Suggestion): HTMLSpanElement {
  return change(r.depthBefore, r.depthAfter, String, (a, b) => ({ up: b < a, text: b < a ? plural(a - b, 'click', 'clicks') + ' fewer' : plural(b - a, 'click', 'clicks') + ' more' }));
}

/** Build the findings table and the suggestions table. */
export function startTables(): void {
  makeTable<Finding>({
    id: 'findings', rows: DATA.findings, empty: 'No findings: every check passed.',
    defaultKey: 'severity', defaultDir: 'asc',
    filters: [
      { key: 'rule', label: 'Check', all: 'all checks', value: (r) => r.rule },
      { key: 'folder', label: 'Folder', all: 'all folders', value: (r) => r.folder },
      { key: 'severity', label: 'Level', all: 'all levels', value: (r) => r.severity },
    ],
    text: (r) => [r.rule, r.severity, placeOf(r), r.route, r.message].join(' '),
    columns: [
      { key: 'severity', label: 'Level', sort: (r) => r.severity === 'error' ? 0 : 1,
        render: (r) => el('span', { cls: 'lw-sev lw-sev-' + r.severity, text: (r.severity === 'error' ? '\u25A0 ' : '\u25B2 ') + r.severity }) },
      { key: 'rule', label: 'Check', cls: 'lw-nowrap', sort: (r) => r.rule, render: (r) => code(r.rule) },
      { key: 'location', label: 'File:line', sort: placeKey, render: (r) => code(placeOf(r)) },
      { key: 'route', label: 'Page', sort: (r) => r.route, render: (r) => r.route },
      { key: 'message', label: 'Message', sort: (r) => r.message, render: (r) => r.message },
    ],
  });

  makeTable<Suggestion>({
    id: 'suggestions', rows: DATA.suggestions, empty: 'No suggestions in this report (the suggest command adds them).',
    filters: [
      { key: 'folder', label: 'Folder (where the link goes)', all: 'all folders', value: (r) => r.folder },
      { key: 'kind', label: 'Anchor', all: 'all suggestions', value: (r) => r.anchor === null ? 'needs a sentence written by hand' : 'has an anchor phrase (apply writes it)' },
    ],
    text: (r) => [placeOf(r), r.source, r.anchor || 'needs a sentence written by hand', r.target, r.targetTitle, r.reason].join(' '),
    columns: [
      { key: 'location', label: 'Write it in', sort: placeKey,
        render: (r) => el('span', null, [code(placeOf(r)), el('span', { cls: 'lw-route', text: r.source })]) },
      { key: 'anchor', label: 'Anchor text', sort: (r) => r.anchor,
        render: (r) => r.anchor === null ? el('em', { text: 'none: needs a sentence written by hand' }) : '\u201C' + r.anchor + '\u201D' },
      { key: 'target', label: 'Link to', sort: (r) => r.target,
        render: (r) => el('span', null, [r.targetTitle, el('span', { cls: 'lw-route', text: r.target })]) },
      { key: 'similarity', label: 'Similarity', numeric: true, firstDir: 'desc', sort: (r) => r.similarity, render: (r) => r.similarity.toFixed(2) },
      { key: 'rank', label: 'Target rank', firstDir: 'desc', sort: (r) => r.targetRankAfter === null ? null : r.targetRankAfter - r.targetRankBefore,
        render: rankChange },
      { key: 'depth', label: 'Target depth', firstDir: 'desc',
        sort: (r) => r.depthAfter === null ? null : (r.depthBefore === null ? 1000 : r.depthBefore) - r.depthAfter,
        render: depthChange },
      { key: 'reason', label: 'Why', sort: (r) => r.reason, render: (r) => r.reason },
    ],
  });
}
