/**
 * The HTML report's style sheet. Colours are CSS custom properties: the page's script reads the
 * depth colours from them, so the legend, the charts and the canvas use one palette. Colour is
 * never the only signal: bars past the limit are hatched, shapes mark orphan and unreachable
 * pages, and every number is written out.
 */
export const STYLES = `
:root {
  color-scheme: light;
  --lw-ink: #1d2330; --lw-muted: #5b6372; --lw-line: #d9dde5; --lw-bg: #f5f6f8; --lw-card: #fff;
  --lw-accent: #2f5597; --lw-focus: #c2410c;
  --lw-d0: #1b2a57; --lw-d1: #2f5597; --lw-d2: #3f7fc1; --lw-d3: #6fa9d8; --lw-d4: #a9cdea;
  --lw-over: #e07b39; --lw-none: #8a8f98;
  --lw-pass: #1f7a4d; --lw-fail: #b42318;
  font: 14px/1.45 system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif;
}
* { box-sizing: border-box; }
body { margin: 0; background: var(--lw-bg); color: var(--lw-ink); }
main { max-width: 1240px; margin: 0 auto; padding: 0 20px 40px; }
a { color: var(--lw-accent); }
h1 { font-size: 22px; margin: 0; }
h2 { font-size: 17px; margin: 0 0 4px; }
h3 { font-size: 14px; margin: 12px 0 4px; }
code, .lw-mono { font-family: ui-monospace, SFMono-Regular, Menlo, Consolas, monospace; font-size: 12.5px; }
:focus-visible { outline: 3px solid var(--lw-focus); outline-offset: 2px; }
.lw-sr { position: absolute; width: 1px; height: 1px; overflow: hidden; clip: rect(0 0 0 0); white-space: nowrap; }
.lw-skip { position: absolute; left: 8px; top: -40px; background: var(--lw-card); padding: 6px 10px; z-index: 10; }
.lw-skip:focus { top: 8px; }
.lw-header { display: flex; flex-wrap: wrap; gap: 16px; align-items: center; justify-content: space-between;
  padding: 18px 0 12px; }
.lw-root { margin: 2px 0 0; color: var(--lw-muted); }
.lw-gate { border: 2px solid; border-radius: 8px; padding: 8px 14px; background: var(--lw-card); max-width: 560px; }
.lw-gate strong { font-size: 16px; }
.lw-gate ul { margin: 4px 0 0; padding-left: 18px; }
.lw-gate-pass { border-color: var(--lw-pass); color: var(--lw-pass); }
.lw-gate-fail { border-color: var(--lw-fail); color: var(--lw-fail); }
.lw-gate li { color: var(--lw-ink); }
.lw-toc { display: flex; flex-wrap: wrap; gap: 6px 18px; margin: 0 0 12px; }
.lw-stats { display: grid; grid-template-columns: repeat(auto-fit, minmax(150px, 1fr)); gap: 10px; margin: 0 0 14px; }
.lw-stat { position: relative; background: var(--lw-card); border: 1px solid var(--lw-line); border-radius: 8px; padding: 10px 12px;
  border-left-width: 5px; }
.lw-stat dt { color: var(--lw-muted); font-size: 12.5px; white-space: nowrap; }
.lw-stat dd { margin: 0; font-size: 24px; font-weight: 650; }
.lw-stat .lw-sub { display: block; font-size: 12px; font-weight: 400; color: var(--lw-muted); overflow-wrap: anywhere; }
.lw-stat-bad { border-left-color: var(--lw-fail); }
.lw-badge { display: none; }
.lw-stat-bad .lw-badge { display: inline-block; margin-top: 4px; font-size: 11px; font-weight: 650;
  color: var(--lw-fail); border: 1px solid currentColor; border-radius: 10px; padding: 0 7px; }
.lw-stat-ok { border-left-color: var(--lw-line); }
.lw-row { display: grid; grid-template-columns: 1fr 1fr; gap: 14px; }
.lw-panel { background: var(--lw-card); border: 1px solid var(--lw-line); border-radius: 8px; padding: 14px 16px;
  margin: 0 0 14px; min-width: 0; }
.lw-hint { color: var(--lw-muted); margin: 0 0 8px; }
.lw-chart { width: 100%; height: auto; display: block; }
.lw-chart text { font-size: 11px; fill: var(--lw-ink); }
.lw-chart .lw-tick { fill: var(--lw-muted); }
.lw-chart .lw-caption { fill: var(--lw-muted); font-size: 11.5px; }
.lw-chart .lw-count { font-weight: 650; font-size: 12px; }
.lw-grid { stroke: #edf0f4; }
.lw-axis { stroke: #8b93a1; }
.lw-sep { stroke: #b8bec9; stroke-dasharray: 2 3; }
.lw-bar-d0 { fill: var(--lw-d0); } .lw-bar-d1 { fill: var(--lw-d1); } .lw-bar-d2 { fill: var(--lw-d2); }
.lw-bar-d3 { fill: var(--lw-d3); } .lw-bar-d4 { fill: var(--lw-d4); stroke: var(--lw-d2); }
.lw-bar-over { fill: url(#lw-hatch-over); stroke: #b4561d; }
.lw-bar-none { fill: url(#lw-hatch-none); stroke: #5d626b; }
.lw-fill-over { fill: var(--lw-over); } .lw-fill-none { fill: #c9ccd2; }
.lw-hatch-line { stroke: rgba(0,0,0,.35); stroke-width: 2; }
.lw-limit { stroke: var(--lw-fail); stroke-width: 2; stroke-dasharray: 5 4; }
.lw-chart .lw-limit-label { fill: var(--lw-fail); font-weight: 650; }
.lw-rank-area { fill: #dce7f5; }
.lw-rank-line { fill: none; stroke: var(--lw-accent); stroke-width: 1.6; }
.lw-average { stroke: #6b7280; stroke-dasharray: 4 4; }
.lw-chart .lw-average-label { fill: var(--lw-muted); }
.lw-top-dot { fill: var(--lw-accent); stroke: #fff; }
.lw-leader { stroke: #9aa3b2; stroke-width: .8; }
.lw-top { margin: 6px 0 0; padding-left: 22px; columns: 2; column-gap: 24px; }
.lw-top li { break-inside: avoid; overflow-wrap: anywhere; margin: 0 0 3px; }
.lw-top .lw-route, .lw-deep .lw-route { display: block; color: var(--lw-muted); font-size: 12px; }
.lw-deep { margin: 6px 0 0; padding-left: 0; list-style: none; columns: 2; column-gap: 24px; }
.lw-deep li { break-inside: avoid; overflow-wrap: anywhere; margin: 0 0 3px; }
.lw-deep .lw-depth-tag { display: inline-block; min-width: 5.5em; font-weight: 650; }
.lw-controls { display: flex; flex-wrap: wrap; gap: 8px 14px; align-items: end; margin: 6px 0 8px; }
.lw-controls label { display: flex; flex-direction: column; font-size: 12px; color: var(--lw-muted); gap: 2px; }
input, select, button { font: inherit; }
input[type=search], select { border: 1px solid #b8bec9; border-radius: 6px; padding: 5px 8px; background: #fff; color: var(--lw-ink); }
input[type=search] { min-width: 260px; }
button { border: 1px solid #b8bec9; border-radius: 6px; padding: 5px 10px; background: #fff; color: var(--lw-ink); cursor: pointer; }
button:hover { background: #eef2f8; }
.lw-search-box { position: relative; display: flex; flex-direction: column; gap: 2px; }
.lw-search-box > label { font-size: 12px; color: var(--lw-muted); }
.lw-matches { list-style: none; margin: 0; padding: 4px; position: absolute; top: 100%; left: 0; z-index: 5; min-width: 100%;
  max-width: 560px; background: #fff; border: 1px solid #b8bec9; border-radius: 6px; box-shadow: 0 6px 18px rgba(0,0,0,.12); }
.lw-matches:empty { display: none; }
.lw-matches li { margin: 0; }
.lw-matches button { width: 100%; text-align: left; border: 0; padding: 4px 8px; font-size: 13px; white-space: nowrap; overflow: hidden; text-overflow: ellipsis; }
.lw-matches .lw-route { color: var(--lw-muted); font-size: 12px; margin-left: 6px; }
.lw-graph-wrap { display: grid; grid-template-columns: minmax(0, 1fr) 300px; gap: 14px; align-items: start; }
.lw-canvas-box { position: relative; border: 1px solid var(--lw-line); border-radius: 6px; background: #fcfcfd; }
#lw-canvas { display: block; width: 100%; aspect-ratio: 1000 / 640; cursor: default; }
.lw-tip { position: absolute; pointer-events: none; background: rgba(29,35,48,.94); color: #fff; padding: 5px 8px;
  border-radius: 5px; font-size: 12px; max-width: 280px; white-space: pre-line; }
.lw-details { font-size: 13px; max-height: 660px; overflow: auto; }
.lw-details dl { display: grid; grid-template-columns: auto 1fr; gap: 2px 10px; margin: 6px 0; }
.lw-details dt { color: var(--lw-muted); } .lw-details dd { margin: 0; overflow-wrap: anywhere; }
.lw-nlist { list-style: none; margin: 0; padding: 0; }
.lw-nlist li { margin: 2px 0; }
.lw-nlist button { width: 100%; text-align: left; padding: 3px 6px; border-color: transparent; background: transparent; }
.lw-nlist button:hover { border-color: #b8bec9; }
.lw-nlist .lw-route { display: block; color: var(--lw-muted); font-size: 11.5px; overflow-wrap: anywhere; }
.lw-legend { display: flex; flex-wrap: wrap; gap: 4px 16px; margin: 10px 0 0; padding: 0; list-style: none; font-size: 12.5px; }
.lw-legend li { display: flex; align-items: center; gap: 6px; }
.lw-legend svg { width: 18px; height: 18px; }
.lw-sw-d0 { fill: var(--lw-d0); } .lw-sw-d1 { fill: var(--lw-d1); } .lw-sw-d2 { fill: var(--lw-d2); }
.lw-sw-d3 { fill: var(--lw-d3); } .lw-sw-d4 { fill: var(--lw-d4); } .lw-sw-over { fill: var(--lw-over); }
.lw-sw-none { fill: var(--lw-none); }
.lw-sw-line { fill: none; stroke: var(--lw-ink); stroke-width: 1.5; }
.lw-sw-arc { fill: none; stroke: var(--lw-over); stroke-width: 3; }
.lw-table-wrap { overflow-x: auto; }
.lw-table { width: 100%; border-collapse: collapse; font-size: 13px; }
.lw-table th { text-align: left; border-bottom: 2px solid var(--lw-line); padding: 0; white-space: nowrap; }
.lw-table th button { border: 0; background: none; font-weight: 650; padding: 6px 8px; width: 100%; text-align: left; border-radius: 0; }
.lw-table th[aria-sort=ascending] button::after { content: " \\25B2"; }
.lw-table th[aria-sort=descending] button::after { content: " \\25BC"; }
.lw-table td { border-bottom: 1px solid #eceff3; padding: 5px 8px; vertical-align: top; overflow-wrap: anywhere; }
.lw-table tbody tr:hover { background: #f7f9fc; }
.lw-num { text-align: right; white-space: nowrap; font-variant-numeric: tabular-nums; }
.lw-sev { font-weight: 650; white-space: nowrap; }
.lw-sev-error { color: var(--lw-fail); } .lw-sev-warning { color: #8a5a00; }
.lw-shown { color: var(--lw-muted); margin: 4px 0; }
.lw-up { color: var(--lw-pass); } .lw-down { color: var(--lw-fail); }
.lw-delta { display: block; font-size: 12px; }
.lw-table .lw-nowrap { white-space: nowrap; overflow-wrap: normal; }
.lw-table .lw-route { display: block; color: var(--lw-muted); font-size: 12px; }
.lw-footer { color: var(--lw-muted); font-size: 12px; margin-top: 20px; }
@media (max-width: 900px) {
  .lw-row, .lw-graph-wrap { grid-template-columns: 1fr; }
  .lw-top, .lw-deep { columns: 1; }
}
@media print {
  body { background: #fff; }
  main { max-width: none; padding: 0; }
  .lw-controls, .lw-skip, .lw-toc, .lw-more, .lw-tip, .lw-matches, #lw-overview-btn { display: none !important; }
  .lw-panel { border: 0; padding: 0; break-inside: avoid-page; }
  .lw-table-section { break-inside: auto; }
  .lw-details { max-height: none !important; overflow: visible; }
  .lw-row { grid-template-columns: 1fr 1fr; }
  .lw-graph-wrap { grid-template-columns: 1fr; }
  .lw-top, .lw-deep { columns: 1; }
  .lw-table th button::after { content: none !important; }
  * { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
}
`;
