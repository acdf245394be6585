/**
 * The code a cache entry was made by. Caches are keyed on this, not on the version string
 * alone: a local change, or an install from git at the same version, must not be answered by a
 * report or facts that other code computed.
 */
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import { dirname, join, relative, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import { compareText } from '../util/index.js';

let memo: string | null = null;

/**
 * A sha256 (hex) of the package's code as it runs: every `.js` file under the package's built
 * folder (`dist/`), or every `.ts` file under `src/` when the sources are run directly (the
 * test runner), each with its path. Read once per process and remembered. Where this module is
 * not in its own folder layout (the package bundled into another file), the file this module
 * was loaded from is hashed instead.
 */
export function codeHash(): string {
  if (memo !== null) return memo;
  const self = fileURLToPath(import.meta.url);
  const ext = self.endsWith('.ts') ? '.ts' : '.js';
  const top = dirname(dirname(self));
  const own = join(top, 'cache', `code${ext}`) === self;
  const hash = createHash('sha256');
  for (const file of own ? codeFiles(top, ext) : [self]) {
    hash.update(`${relative(top, file).split(sep).join('/')}\0`);
    hash.update(fs.readFileSync(file));
    hash.update('\0');
  }
  memo = hash.digest('hex');
  return memo;
}

/** The version string the caches store and require: the tool's version and the code's hash. */
export function codeVersion(version: string): string {
  return `${version}+${codeHash().slice(0, 16)}`;
}

/** Code files under `dir`, sorted by path (code-unit order), declaration files left out. */
function codeFiles(dir: string, ext: string): string[] {
  const out: string[] = [];
  const walk = (d: string): void => {
    for (const entry of fs.readdirSync(d, { withFileTypes: true })) {
      const path = join(d, entry.name);
      if (entry.isDirectory()) walk(path);
      else if (entry.isFile() && entry.name.endsWith(ext) && !entry.name.endsWith('.d.ts')) out.push(path);
    }
  };
  walk(dir);
  return out.sort(compareText);
}
