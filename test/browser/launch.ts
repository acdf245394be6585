/**
 * Which chromium the browser tests drive, and how it is started (no browser download):
 * - Debian's `/usr/bin/chromium` where it is installed (`apt-get install -y chromium`);
 * - otherwise the Chromium binary shipped inside the exact-pinned dev dependency
 *   `@sparticuz/chromium` (unpacked once into the temp folder by its `executablePath()`), so
 *   `npm ci && npm test` passes on a machine without Debian's chromium.
 *
 * `LINKWEAVE_TEST_BROWSER=registry` forces the registry binary even where Debian's is
 * installed (CI runs the browser tests once that way, see `.ci/run`); `=system` forces Debian's.
 */
import fs from 'node:fs';
import registryChromium from '@sparticuz/chromium';

/** Debian's chromium. */
export const SYSTEM_CHROMIUM = '/usr/bin/chromium';

/** Flags every launch gets (last, so they win over the package's own): no background network. */
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];

/** Flags of the registry package that the tests leave out. */
const DROPPED_PACKAGE_ARGS = new Set(['--single-process']);

/** Where the browser comes from. */
export type BrowserSource = 'system' | 'registry';

/** The source chosen for this run: the environment variable, else the system browser when present. */
export function browserSource(env: NodeJS.ProcessEnv = process.env): BrowserSource {
  const forced = env.LINKWEAVE_TEST_BROWSER;
  if (forced === 'system' || forced === 'registry') return forced;
  if (forced !== undefined && forced !== '') {
    throw new Error(`LINKWEAVE_TEST_BROWSER must be "system" or "registry", got "${forced}"`);
  }
  return fs.existsSync(SYSTEM_CHROMIUM) ? 'system' : 'registry';
}

/** What `chromium.launch` of playwright-core takes. */
export interface BrowserLaunch {
  readonly source: BrowserSource;
  readonly executablePath: string;
  readonly args: readonly string[];
}

/** The executable and flags for `source`; the registry binary is unpacked on first use. */
export async function browserLaunch(source: BrowserSource = browserSource()): Promise<BrowserLaunch> {
  if (source === 'system') return { source, executablePath: SYSTEM_CHROMIUM, args: CHROMIUM_ARGS };
  const executablePath = await registryChromium.executablePath();
  // `--single-process` (the package's choice for serverless hosts) ends the browser when the
  // first context is closed; the tests open and close one context per report.
  const args = registryChromium.args.filter((a) => !DROPPED_PACKAGE_ARGS.has(a));
  return { source, executablePath, args: [...args, ...CHROMIUM_ARGS] };
}
