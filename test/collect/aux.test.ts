import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { readAuxFile } from '../../src/collect/index.js';
import { resolveOptions } from '../../src/config/options.js';
import { tempDirsPerTest, writeTree } from './tree.js';

const dir = tempDirsPerTest();

describe('readAuxFile', () => {
  it('reads a file relative to the content root, BOM removed', async () => {
    const root = dir();
    writeTree(root, { 'meta/toc.md': '\uFEFF- [Home](/)\n' });
    const result = await readAuxFile(resolveOptions({}, root), 'navigation', 'meta/toc.md');
    expect(result).toEqual({ file: 'meta/toc.md', text: '- [Home](/)\n' });
  });

  it('accepts an absolute path inside the root', async () => {
    const root = dir();
    writeTree(root, { '_redirects': '/old /new\n' });
    const result = await readAuxFile(resolveOptions({}, root), 'redirects', path.join(root, '_redirects'));
    expect(result.file).toBe('_redirects');
  });

  it('a missing file is E_IO naming the key and the path', async () => {
    const root = dir();
    await expect(readAuxFile(resolveOptions({}, root), 'traffic', 'views.csv')).rejects.toMatchObject({
      code: 'E_IO',
      message: 'traffic: cannot read "views.csv": no such file (ENOENT)',
    });
  });

  it('refuses a file outside both the content root and the working folder; the canary is not read', async () => {
    const root = dir();
    const outside = dir();
    writeTree(outside, { 'secret.md': 'CANARY-aux-31' });
    const target = path.join(outside, 'secret.md');
    const attempt = readAuxFile(resolveOptions({}, root), 'navigation', target);
    await expect(attempt).rejects.toMatchObject({
      code: 'E_IO',
      message: `navigation: cannot read "${target}": it lies outside the content root and the working folder`,
    });
    // Also through a symlink inside the root.
    writeTree(root, { 'toc.md': { symlink: target } });
    await expect(readAuxFile(resolveOptions({}, root), 'navigation', 'toc.md')).rejects.toThrow(/outside the content root/);
  });

  it('a folder is E_IO', async () => {
    const root = dir();
    writeTree(root, { 'sub/a.md': 'a' });
    await expect(readAuxFile(resolveOptions({}, root), 'redirects', 'sub')).rejects.toThrow('redirects: cannot read "sub": not a regular file');
  });
});
