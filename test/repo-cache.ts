/**
 * The repository's own cache folder (`node_modules/.cache/linkweave` of the checkout): no test
 * may read or write it, so a stale cache there can never answer a test. The global setup
 * records its listing; `test/setup.ts` fails the test file that changed it.
 */
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

/** The folder. */
export const REPO_CACHE = path.join(repo, 'node_modules', '.cache', 'linkweave');

/** Every file under the folder with its size and modification time, one a line (empty when absent). */
export function repoCacheListing(): string {
  if (!fs.existsSync(REPO_CACHE)) return '';
  const out: string[] = [];
  for (const entry of fs.readdirSync(REPO_CACHE, { recursive: true, withFileTypes: true })) {
    const file = path.join(entry.parentPath, entry.name);
    const stat = fs.statSync(file);
    out.push(`${path.relative(REPO_CACHE, file)} ${stat.size} ${stat.mtimeMs}`);
  }
  return out.sort().join('\n');
}

declare module 'vitest' {
  export interface ProvidedContext {
    repoCacheListing: string;
  }
}
