/**
 * The HTML report: one self-contained page (styles, script and data inline; nothing loaded
 * from the network, works from `file://`) showing the site's structure as pictures: the verdict
 * and headline numbers, the click-depth histogram, the PageRank distribution, an interactive
 * link graph and sortable, filterable tables of findings and suggested links.
 *
 * Pure: builds a string from the report. The charts are SVG written here; the graph is drawn
 * on a canvas by the page's own script: the TypeScript modules in `client/`, bundled at build
 * time (scripts/build-client.mjs) into the constant of `client.generated.ts`, which is inlined.
 * No charting or graph library is bundled: the few drawings needed here are small. The overview
 * layout is computed here without randomness, so the same report gives byte-identical HTML.
 *
 * This is the only file of `report/html/` that uses the formatters' shared words
 * (`formatters/common.ts`); nothing under `formatters/` imports `report/html/`.
 *
 * Safety: every text from the report is HTML-escaped in markup and `\u003c`-escaped in the
 * embedded JSON; a Content-Security-Policy lets only the page's own hashed style and script
 * run and forbids every request.
 */
import { createHash } from 'node:crypto';
import type { Report } from '../../types.js';
import { describeFailure, displayRoot } from '../formatters/common.js';
import type { FormatContext, Formatter } from '../types.js';
import { CLIENT_SCRIPT } from './client.generated.js';
import { buildHtmlData } from './data.js';
import { embedData } from './embed.js';
import { jsonForScript } from './escape.js';
import { STYLES } from './styles.js';
import { renderPage } from './template.js';

function cspHash(text: string): string {
  return `sha256-${createHash('sha256').update(text, 'utf8').digest('base64')}`;
}

/**
 * Render the HTML report.
 * @param report the report
 * @param cwd the working folder: the page names the content root relative to it, as typed
 *   (absent: the report's own root)
 * @returns the whole HTML document
 */
export function formatHtml(report: Report, cwd?: string): string {
  const data = { ...buildHtmlData(report), root: displayRoot(report.root, cwd) };
  const failures = data.gate.failures.map((f) => describeFailure(f, data.gate.failOn));
  return renderPage(data, failures, {
    styles: STYLES,
    script: CLIENT_SCRIPT,
    json: jsonForScript(embedData(data)),
    styleHash: cspHash(STYLES),
    scriptHash: cspHash(CLIENT_SCRIPT),
  });
}

/** The `html` formatter (`--format html --output report.html`). */
export const htmlFormatter: Formatter = {
  id: 'html',
  fileExtension: '.html',
  format(report: Report, ctx: FormatContext): string {
    return formatHtml(report, ctx.cwd);
  },
};
