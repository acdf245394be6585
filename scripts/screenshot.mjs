// `node scripts/screenshot.mjs [out.png] [--full] [--view=top|graph|focus|tables]`: the README's
// picture of the HTML report, and pictures of its other views.
// Writes the example site's HTML report the way a user would (from the repository folder, so
// the page names the root as typed: examples/docs-site), opens it in chromium through
// playwright-core and saves a screenshot (default docs/report.png, the top of the page at
// 1280 px wide; --full takes the whole page). Needs `npm run build` first. The browser is chosen
// as the tests choose it (test/browser/launch.ts, LINKWEAVE_TEST_BROWSER included): Debian's
// /usr/bin/chromium where it is installed, else the binary of the `@sparticuz/chromium` dev
// dependency.
// --view=graph takes the link-graph section in its overview, --view=focus the same section
// after a search for "install" (Enter focuses the first match), --view=tables the findings and
// suggestions sections.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import registryChromium from '@sparticuz/chromium';
import { chromium } from 'playwright-core';

const repo = fileURLToPath(new URL('..', import.meta.url));
const args = process.argv.slice(2);
const out = args.find((a) => !a.startsWith('--')) ?? join(repo, 'docs/report.png');
const full = args.includes('--full');
const view = (args.find((a) => a.startsWith('--view=')) ?? '--view=top').slice('--view='.length);
const views = ['top', 'graph', 'focus', 'tables'];
if (!views.includes(view)) throw new Error(`--view takes ${views.join(', ')}; got ${view}`);
const html = join(mkdtempSync(join(tmpdir(), 'lw-shot-')), 'report.html');
const run = spawnSync(process.execPath, ['dist/cli/bin.js', 'suggest', 'examples/docs-site', '--output', html, '--quiet'], { cwd: repo, encoding: 'utf8' });
if (run.status !== 0 && run.status !== 1) throw new Error(`linkweave exited ${run.status}: ${run.stderr}`);

const forced = process.env.LINKWEAVE_TEST_BROWSER;
const system = forced === 'system' || (forced !== 'registry' && existsSync('/usr/bin/chromium'));
const browser = await chromium.launch({
  executablePath: system ? '/usr/bin/chromium' : await registryChromium.executablePath(),
  // The package's `--single-process` would end the browser with its first page; the rest of its
  // flags are kept, and ours come last.
  args: [...(system ? [] : registryChromium.args.filter((a) => a !== '--single-process')), '--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
});
try {
  const page = await browser.newPage({ viewport: { width: 1280, height: 1500 }, deviceScaleFactor: 1 });
  await page.goto(pathToFileURL(html).href);
  await page.waitForSelector('html[data-ready="true"]');
  await page.waitForTimeout(300);
  if (view === 'top') {
    await page.screenshot({ path: out, fullPage: full });
  } else if (view === 'graph') {
    await page.locator('#lw-graph').screenshot({ path: out });
  } else if (view === 'focus') {
    await page.fill('#lw-search', 'install');
    await page.press('#lw-search', 'Enter');
    await page.waitForSelector('#lw-focus-title');
    await page.waitForTimeout(200);
    await page.locator('#lw-graph').screenshot({ path: out });
  } else {
    await page.locator('#lw-findings').screenshot({ path: out.replace(/\.png$/, '-findings.png') });
    await page.locator('#lw-suggestions').screenshot({ path: out });
  }
  console.log(`screenshot written to ${out}`);
} finally {
  await browser.close();
}
