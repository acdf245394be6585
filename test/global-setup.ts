/**
 * vitest globalSetup, run once before the tests:
 * - build `dist/` afresh from the sources (the old folder removed first), and stop on any type
 *   error: the CLI tests run `node dist/cli/bin.js`, and the parse worker threads load
 *   `dist/parallel/worker.js` while the test files run `src/`, so both must be the same code;
 * - unpack the registry package's Chromium binary once (`test/browser/launch.ts`), so that test
 *   files started side by side never race to unpack it;
 * - check after the run that no test wrote the repository's own cache folder
 *   (`node_modules/.cache/linkweave`): tests use temporary cache folders, so a stale cache
 *   there can never answer them.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import registryChromium from '@sparticuz/chromium';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const repoCache = path.join(repo, 'node_modules', '.cache', 'linkweave');

/** Every file under `dir` with its size and modification time (empty when absent). */
function listing(dir: string): string[] {
  if (!fs.existsSync(dir)) return [];
  const out: string[] = [];
  for (const entry of fs.readdirSync(dir, { recursive: true, withFileTypes: true })) {
    const file = path.join(entry.parentPath, entry.name);
    const stat = fs.statSync(file);
    out.push(`${path.relative(dir, file)} ${stat.size} ${stat.mtimeMs}`);
  }
  return out.sort();
}

export default async function setup(): Promise<() => void> {
  fs.rmSync(path.join(repo, 'dist'), { recursive: true, force: true });
  const tsc = path.join(repo, 'node_modules', 'typescript', 'bin', 'tsc');
  const result = spawnSync(process.execPath, [tsc, '-p', 'tsconfig.build.json'], { cwd: repo, encoding: 'utf8' });
  if (result.status !== 0) {
    throw new Error(`test/global-setup: tsc -p tsconfig.build.json reported errors:\n${result.stdout}${result.stderr}`);
  }
  if (!fs.existsSync(path.join(repo, 'dist', 'parallel', 'worker.js'))) {
    throw new Error('test/global-setup: the build produced no dist/parallel/worker.js');
  }
  await registryChromium.executablePath();
  const before = listing(repoCache);
  return () => {
    const after = listing(repoCache);
    if (after.join('\n') !== before.join('\n')) {
      throw new Error(`test/global-setup: a test wrote the repository's cache folder ${repoCache}; give it a temporary cache folder`);
    }
  };
}
