/** Test helper: write a file tree from an object literal into a fresh temp folder. */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach } from 'vitest';

/** A tree: file path -> contents (string or bytes); `{ symlink: target }` makes a symlink. */
export type Tree = Record<string, string | Uint8Array | { readonly symlink: string }>;

/** Write `tree` under `dir` (created). Paths use `/`. */
export function writeTree(dir: string, tree: Tree): void {
  for (const [rel, content] of Object.entries(tree)) {
    const file = path.join(dir, ...rel.split('/'));
    fs.mkdirSync(path.dirname(file), { recursive: true });
    if (typeof content === 'object' && 'symlink' in content) fs.symlinkSync(content.symlink, file);
    else fs.writeFileSync(file, content);
  }
}

/** A new empty temp folder (real path), removed by the returned cleanup. */
export function tempDir(prefix = 'linkweave-test-'): { dir: string; cleanup: () => void } {
  const dir = fs.realpathSync(fs.mkdtempSync(path.join(os.tmpdir(), prefix)));
  return { dir, cleanup: () => fs.rmSync(dir, { recursive: true, force: true }) };
}

/**
 * For a test file: a maker of fresh temp folders, each removed after the test that made it
 * (registers an `afterEach`; call it once at the top of the file).
 */
export function tempDirsPerTest(): () => string {
  const cleanups: (() => void)[] = [];
  afterEach(() => {
    while (cleanups.length > 0) cleanups.pop()!();
  });
  return () => {
    const t = tempDir();
    cleanups.push(t.cleanup);
    return t.dir;
  };
}
