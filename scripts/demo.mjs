// `npm run demo`: run linkweave on the bundled example site the way a user would, print the
// terminal report, and write the JSON, Markdown and HTML reports into demo-output/ to look at.
// The example site fails its run on purpose (it is full of planted problems), so exit code 1
// from the tool is the expected result here; anything else is passed on.
import { spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const repo = fileURLToPath(new URL('..', import.meta.url));
const bin = fileURLToPath(new URL('../dist/cli/bin.js', import.meta.url));
const site = 'examples/docs-site';
mkdirSync(new URL('../demo-output', import.meta.url), { recursive: true });

function linkweave(args, quiet) {
  const run = spawnSync(process.execPath, [bin, ...args], { cwd: repo, stdio: quiet ? 'ignore' : 'inherit' });
  return run.status ?? 2;
}

const status = linkweave(['suggest', site], false);
for (const format of ['json', 'markdown', 'html']) {
  const ext = format === 'markdown' ? 'md' : format;
  linkweave(['suggest', site, '--format', format, '--output', `demo-output/report.${ext}`, '--quiet'], true);
}
console.log('\nReports written to demo-output/: report.json, report.md (a pull-request comment), report.html (open it in a browser).');
if (status === 1) console.log('The run failed (exit 1), as intended: the example site carries planted problems (see examples/README.md).');
process.exitCode = status === 1 ? 0 : status;
