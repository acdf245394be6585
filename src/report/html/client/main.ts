/**
 * The HTML report's script, as one entry: scripts/build-client.mjs bundles this module and
 * what it imports into one function scope (`client.generated.ts`), which the page inlines
 * under a CSP hash. The data, the colours and the canvas are read when the modules load; then
 * the tables are built, the graph is drawn, and the page says it is ready (the browser tests
 * wait for `data-ready`).
 */
import { startGraph } from './graph.js';
import { startTables } from './tables.js';

startTables();
startGraph();
document.documentElement.setAttribute('data-ready', 'true');
