/**
 * The HTML report: one self-contained page (styles, script and data inline; nothing loaded
 * from the network, works from `file://`) showing the site's structure as pictures: the verdict
 * and headline numbers, the click-depth histogram, the PageRank distribution, an interactive
 * link graph and sortable, filterable tables of findings and suggested links.
 *
 * Pure: builds a string from the report. The charts are SVG written here; the graph is drawn
 * on a canvas by hand-written script. No charting or graph library is bundled: one would have
 * to be inlined from `node_modules` (file-system access, which a formatter may not do) or kept
 * as a copied source blob, and the few drawings needed here are small. The overview layout is
 * computed here without randomness, so the same report gives byte-identical HTML.
 *
 * Safety: every text from the report is HTML-escaped in markup and `\u003c`-escaped in the
 * embedded JSON; a Content-Security-Policy lets only the page's own hashed style and script
 * run and forbids every request.
 */
import { createHash } from 'node:crypto';
import type { Report } from '../../types.js';
import type { FormatContext, Formatter } from '../types.js';
import { CLIENT_CORE } from '../html/client-core.js';
import { CLIENT_DRAW } from '../html/client-draw.js';
import { CLIENT_FOCUS } from '../html/client-focus.js';
import { CLIENT_GRAPH } from '../html/client-graph.js';
import { CLIENT_TABLES } from '../html/client-tables.js';
import { buildHtmlData } from '../html/data.js';
import { embedData } from '../html/embed.js';
import { jsonForScript } from '../html/escape.js';
import { STYLES } from '../html/styles.js';
import { renderPage } from '../html/template.js';
import { displayRoot } from './common.js';

/** The page's script: the parts in one function scope, run once the document is parsed. */
export const CLIENT_SCRIPT = `(function () {${CLIENT_CORE}${CLIENT_DRAW}${CLIENT_FOCUS}${CLIENT_TABLES}${CLIENT_GRAPH}})();`;

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
  return renderPage(data, {
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
