/**
 * The HTML report: one self-contained page (styles, script and data inline; nothing loaded
 * from the network, works from `file://`) showing the site's structure as pictures: the gate
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
/** The page's script: the parts in one function scope, run once the document is parsed. */
export const CLIENT_SCRIPT = `(function () {${CLIENT_CORE}${CLIENT_DRAW}${CLIENT_FOCUS}${CLIENT_TABLES}${CLIENT_GRAPH}})();`;
function cspHash(text) {
    return `sha256-${createHash('sha256').update(text, 'utf8').digest('base64')}`;
}
/**
 * Render the HTML report.
 * @param report the report
 * @returns the whole HTML document
 */
export function formatHtml(report) {
    const data = buildHtmlData(report);
    return renderPage(data, {
        styles: STYLES,
        script: CLIENT_SCRIPT,
        json: jsonForScript(embedData(data)),
        styleHash: cspHash(STYLES),
        scriptHash: cspHash(CLIENT_SCRIPT),
    });
}
/** The `html` formatter (`--format html --output report.html`). */
export const htmlFormatter = {
    id: 'html',
    fileExtension: '.html',
    format(report, _ctx) {
        return formatHtml(report);
    },
};
