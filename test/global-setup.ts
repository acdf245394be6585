/**
 * vitest globalSetup, run once before the tests:
 * - build `dist/` afresh from the sources (the old folder removed first), and stop on any type
 *   error: the CLI tests run `node dist/cli/bin.js`, and the parse worker threads load
 *   `dist/parallel/worker.js` while the test files run `src/`, so both must be the same code;
 *   the HTML report's script modules (`src/report/html/client/`, DOM types) are type-checked
 *   too. Their bundle is the committed `src/report/html/client.generated.ts`, compiled into
 *   `dist/` with the rest; test/report/html-client.test.ts fails when it is stale;
 * - unpack the registry package's Chromium binary once (`test/browser/launch.ts`), so that test
 *   files started side by side never race to unpack it;
 * - record the listing of the repository's own cache folder (`node_modules/.cache/linkweave`):
 *   `test/setup.ts` fails a test file that changed it, so tests use temporary cache folders and
 *   a stale cache there can never answer them.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import registryChromium from '@sparticuz/chromium';
import type { TestProject } from 'vitest/node';
import { repoCacheListing } from './repo-cache.js';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

export default async function setup(project: TestProject): Promise<void> {
  fs.rmSync(path.join(repo, 'dist'), { recursive: true, force: true });
  const tsc = path.join(repo, 'node_modules', 'typescript', 'bin', 'tsc');
  const client = spawnSync(process.execPath, [tsc, '-p', 'tsconfig.client.json'], { cwd: repo, encoding: 'utf8' });
  if (client.status !== 0) {
    throw new Error(`test/global-setup: tsc -p tsconfig.client.json (the HTML report's script) reported errors:\n${client.stdout}${client.stderr}`);
  }
  const result = spawnSync(process.execPath, [tsc, '-p', 'tsconfig.build.json'], { cwd: repo, encoding: 'utf8' });
  if (result.status !== 0) {
    throw new Error(`test/global-setup: tsc -p tsconfig.build.json reported errors:\n${result.stdout}${result.stderr}`);
  }
  if (!fs.existsSync(path.join(repo, 'dist', 'parallel', 'worker.js'))) {
    throw new Error('test/global-setup: the build produced no dist/parallel/worker.js');
  }
  await registryChromium.executablePath();
  project.provide('repoCacheListing', repoCacheListing());
}
