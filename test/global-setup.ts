/**
 * vitest globalSetup: build `dist/` once before the tests, so the CLI tests run the command a
 * user runs (`node dist/cli/bin.js`). Type errors do not stop the build (`npm test` type-checks
 * first); a build that produces no CLI does.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

export default function setup(): void {
  const tsc = path.join(repo, 'node_modules', 'typescript', 'bin', 'tsc');
  const result = spawnSync(process.execPath, [tsc, '-p', 'tsconfig.build.json'], { cwd: repo, encoding: 'utf8' });
  if (result.status !== 0) {
    process.stderr.write(`test/global-setup: tsc -p tsconfig.build.json reported errors:\n${result.stdout}${result.stderr}\n`);
  }
  if (!fs.existsSync(path.join(repo, 'dist', 'cli', 'bin.js'))) {
    throw new Error('test/global-setup: the build produced no dist/cli/bin.js');
  }
}
