// Run linkweave from Node: analyse the example site and print a short summary.
//   npm run build && node examples/api/report.mjs
import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { analyze, formatReport, isEngineError } from 'linkweave';

const root = fileURLToPath(new URL('../docs-site/', import.meta.url));
// The same configuration file the CLI reads: one set of keys for every entry point.
const config = JSON.parse(await readFile(`${root}linkweave.config.json`, 'utf8'));

try {
  const report = await analyze({ ...config, root, command: 'suggest' });
  const { stats } = report;
  console.log(`${stats.pages} pages, ${stats.links} links, ${stats.brokenLinks} broken links, ${stats.orphans} orphans, deepest page ${stats.maxDepth} clicks`);
  const top = [...report.pages].sort((a, b) => b.pagerank - a.pagerank).slice(0, 3);
  console.log(`Top pages by PageRank: ${top.map((p) => p.route).join(', ')}`);
  console.log(`${report.findings.length} findings, ${report.suggestions.length} suggested links; the run ${report.gate.passed ? 'passes' : 'fails'}`);
  // Every writer is a pure function of the report: text, json, markdown, sarif, html.
  const comment = formatReport(report, 'markdown');
  console.log(`Markdown comment: ${comment.split('\n').length} lines`);
  process.exitCode = report.gate.passed ? 0 : 1;
} catch (error) {
  // Every error of linkweave is an EngineError with a stable code.
  if (!isEngineError(error)) throw error;
  console.error(`${error.code}: ${error.message}`);
  process.exitCode = 2;
}
