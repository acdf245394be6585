/**
 * The page script's tables: findings and suggested links, with sorting (column header buttons,
 * so Enter and Space work as well as clicks; `aria-sort` tells the order) and filters (rule,
 * folder, severity, free text). Long tables show 200 rows with a button for the rest; printing
 * shows every row. Plain browser JavaScript kept as a string (see client-core.ts).
 */
export const CLIENT_TABLES = String.raw`
const PAGE_ROWS = 200;

function compareValues(a, b) {
  if (a === b) return 0;
  if (a === null || a === undefined) return 1;
  if (b === null || b === undefined) return -1;
  if (typeof a === 'number' && typeof b === 'number') return a - b;
  return String(a).localeCompare(String(b), 'en');
}

function makeTable(spec) {
  const id = spec.id;
  const controls = document.getElementById('lw-' + id + '-controls');
  const table = document.getElementById('lw-' + id + '-table');
  const shown = document.getElementById('lw-' + id + '-shown');
  const more = document.getElementById('lw-' + id + '-more');
  const tbody = table.tBodies[0];
  const rows = spec.rows.map(function (row, index) { return { row: row, index: index }; });
  const state = { key: spec.defaultKey || null, dir: spec.defaultDir || 'asc', filters: {}, text: '', all: false };

  for (const f of spec.filters) {
    const values = Array.from(new Set(spec.rows.map(f.value))).sort(compareValues);
    const select = el('select', { id: 'lw-' + id + '-filter-' + f.key, 'data-filter': f.key,
      on: { change: function () { state.filters[f.key] = select.value; state.all = false; render(); } } },
      [el('option', { value: '', text: f.all })].concat(values.map(function (v) { return el('option', { value: v, text: v }); })));
    controls.appendChild(el('label', null, [f.label, select]));
  }
  const search = el('input', { type: 'search', id: 'lw-' + id + '-filter-text', placeholder: 'words in any column',
    on: { input: function () { state.text = search.value.trim().toLowerCase(); state.all = false; render(); } } });
  controls.appendChild(el('label', null, ['Text', search]));

  const headRow = el('tr');
  const headers = [];
  for (const col of spec.columns) {
    const th = el('th', { scope: 'col', 'data-key': col.key, cls: col.numeric ? 'lw-num' : null });
    if (col.sort) {
      th.setAttribute('aria-sort', 'none');
      th.appendChild(el('button', { type: 'button', 'data-key': col.key, title: 'Sort by ' + col.label.toLowerCase(),
        on: { click: function () { sortBy(col); } } }, [col.label]));
    } else {
      th.appendChild(el('span', { cls: 'lw-th', text: col.label }));
    }
    headers.push(th);
    headRow.appendChild(th);
  }
  table.tHead.appendChild(headRow);

  function sortBy(col) {
    if (state.key === col.key) state.dir = state.dir === 'asc' ? 'desc' : 'asc';
    else { state.key = col.key; state.dir = col.firstDir || 'asc'; }
    render();
  }

  function visible() {
    const out = rows.filter(function (r) {
      for (const f of spec.filters) {
        const want = state.filters[f.key];
        if (want && String(f.value(r.row)) !== want) return false;
      }
      return !state.text || spec.text(r.row).toLowerCase().indexOf(state.text) >= 0;
    });
    const col = spec.columns.find(function (c) { return c.key === state.key; });
    if (col) {
      const sign = state.dir === 'asc' ? 1 : -1;
      out.sort(function (a, b) {
        const va = col.sort(a.row), vb = col.sort(b.row);
        // Missing values go last in either direction; ties keep the report's order.
        if (va === null || va === undefined || vb === null || vb === undefined) return compareValues(va, vb) || a.index - b.index;
        return sign * compareValues(va, vb) || a.index - b.index;
      });
    }
    return out;
  }

  function render() {
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
  more.addEventListener('click', function () { state.all = true; render(); });
  window.addEventListener('beforeprint', function () { if (!state.all) { state.all = true; render(); } });
  render();
  return { render: render, state: state };
}

function code(text) { return el('code', { text: text }); }

function placeOf(row) { return row.file + ':' + row.line + ':' + row.column; }

/** "4 -> 2" with the change in words beside it; colour only repeats what the words say. null reads as 'unreachable' unless told otherwise. */
function change(before, after, show, delta, nullAfter) {
  const span = el('span', null, [(before === null ? 'unreachable' : show(before)) + ' \u2192 ' + (after === null ? nullAfter || 'unreachable' : show(after))]);
  const note = before === null && after !== null ? { up: true, text: 'now reachable' } : before !== null && after !== null && before !== after ? delta(before, after) : null;
  if (note) span.appendChild(el('span', { cls: 'lw-delta ' + (note.up ? 'lw-up' : 'lw-down'), text: note.text }));
  return span;
}

function rankChange(r) {
  return change(r.targetRankBefore, r.targetRankAfter, fmtRank, function (a, b) {
    const pct = a > 0 ? Math.round((100 * (b - a)) / a) : 0;
    return { up: b > a, text: (pct >= 0 ? '+' : '\u2212') + Math.abs(pct) + '%' };
  }, 'not computed');
}

function depthChange(r) {
  return change(r.depthBefore, r.depthAfter, String, function (a, b) {
    return { up: b < a, text: b < a ? plural(a - b, 'click', 'clicks') + ' fewer' : plural(b - a, 'click', 'clicks') + ' more' };
  });
}

makeTable({
  id: 'findings', rows: DATA.findings, empty: 'No findings: every check passed.',
  defaultKey: 'severity', defaultDir: 'asc',
  filters: [
    { key: 'rule', label: 'Check', all: 'all checks', value: function (r) { return r.rule; } },
    { key: 'folder', label: 'Folder', all: 'all folders', value: function (r) { return r.folder; } },
    { key: 'severity', label: 'Level', all: 'all levels', value: function (r) { return r.severity; } },
  ],
  text: function (r) { return [r.rule, r.severity, placeOf(r), r.route, r.message].join(' '); },
  columns: [
    { key: 'severity', label: 'Level', sort: function (r) { return r.severity === 'error' ? 0 : 1; },
      render: function (r) { return el('span', { cls: 'lw-sev lw-sev-' + r.severity, text: (r.severity === 'error' ? '\u25A0 ' : '\u25B2 ') + r.severity }); } },
    { key: 'rule', label: 'Check', cls: 'lw-nowrap', sort: function (r) { return r.rule; }, render: function (r) { return code(r.rule); } },
    { key: 'location', label: 'File:line', sort: function (r) { return r.file + '\u0000' + String(r.line).padStart(8, '0') + ':' + String(r.column).padStart(6, '0'); },
      render: function (r) { return code(placeOf(r)); } },
    { key: 'route', label: 'Page', sort: function (r) { return r.route; }, render: function (r) { return r.route; } },
    { key: 'message', label: 'Message', sort: function (r) { return r.message; }, render: function (r) { return r.message; } },
  ],
});

makeTable({
  id: 'suggestions', rows: DATA.suggestions, empty: 'No suggestions in this report (the suggest command adds them).',
  filters: [
    { key: 'folder', label: 'Folder (where the link goes)', all: 'all folders', value: function (r) { return r.folder; } },
    { key: 'kind', label: 'Anchor', all: 'all suggestions', value: function (r) { return r.anchor === null ? 'needs a sentence written by hand' : 'has an anchor phrase (apply writes it)'; } },
  ],
  text: function (r) { return [placeOf(r), r.source, r.anchor || 'needs a sentence written by hand', r.target, r.targetTitle, r.reason].join(' '); },
  columns: [
    { key: 'location', label: 'Write it in', sort: function (r) { return r.file + '\u0000' + String(r.line).padStart(8, '0') + ':' + String(r.column).padStart(6, '0'); },
      render: function (r) { return el('span', null, [code(placeOf(r)), el('span', { cls: 'lw-route', text: r.source })]); } },
    { key: 'anchor', label: 'Anchor text', sort: function (r) { return r.anchor; },
      render: function (r) { return r.anchor === null ? el('em', { text: 'none: needs a sentence written by hand' }) : '\u201C' + r.anchor + '\u201D'; } },
    { key: 'target', label: 'Link to', sort: function (r) { return r.target; },
      render: function (r) { return el('span', null, [r.targetTitle, el('span', { cls: 'lw-route', text: r.target })]); } },
    { key: 'similarity', label: 'Similarity', numeric: true, firstDir: 'desc', sort: function (r) { return r.similarity; }, render: function (r) { return r.similarity.toFixed(2); } },
    { key: 'rank', label: 'Target rank', firstDir: 'desc', sort: function (r) { return r.targetRankAfter === null ? null : r.targetRankAfter - r.targetRankBefore; },
      render: rankChange },
    { key: 'depth', label: 'Target depth', firstDir: 'desc',
      sort: function (r) { return r.depthAfter === null ? null : (r.depthBefore === null ? 1000 : r.depthBefore) - r.depthAfter; },
      render: depthChange },
    { key: 'reason', label: 'Why', sort: function (r) { return r.reason; }, render: function (r) { return r.reason; } },
  ],
});
`;
