import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { checkOutputPath, formatFromOutput } from '../../src/cli/output.js';
import { tempDir, writeTree } from '../collect/tree.js';

const cleanups: (() => void)[] = [];
afterEach(() => {
  while (cleanups.length > 0) cleanups.pop()!();
});

describe('formatFromOutput', () => {
  it.each([
    ['out/report.json', 'json'],
    ['r.sarif', 'sarif'],
    ['r.sarif.json', 'sarif'],
    ['REPORT.MD', 'markdown'],
    ['r.html', 'html'],
    ['r.txt', 'text'],
    ['report', 'text'],
  ])('%s -> %s', (p, format) => {
    expect(formatFromOutput(p)).toBe(format);
  });
});

describe('checkOutputPath', () => {
  function setup() {
    const t = tempDir();
    cleanups.push(t.cleanup);
    writeTree(t.dir, { 'docs/index.md': '# Home', 'docs/link-out': { symlink: '..' }, 'docs/inner': { symlink: 'sub' }, 'docs/sub/a.md': 'a' });
    return { cwd: t.dir, root: path.join(t.dir, 'docs') };
  }

  it('refuses a source-extension file inside the content root, existing or not', () => {
    const { root } = setup();
    expect(() => checkOutputPath(path.join(root, 'index.md'), root, 'docs/index.md')).toThrow(
      /^flag --output: refusing to write "docs\/index\.md": it is inside the content root with a source extension/,
    );
    expect(() => checkOutputPath(path.join(root, 'new/report.html'), root, 'x')).toThrow(/refusing/);
  });

  it('sees through symlinks to the real target', () => {
    const { root } = setup();
    // docs/inner -> docs/sub: docs/inner/a.md is the source docs/sub/a.md.
    expect(() => checkOutputPath(path.join(root, 'inner/a.md'), root, 'x')).toThrow(/refusing/);
    // docs/link-out -> the project folder, outside the root: allowed.
    expect(() => checkOutputPath(path.join(root, 'link-out/report.html'), root, 'x')).not.toThrow();
  });

  it('allows other extensions inside the root and anything outside it', () => {
    const { cwd, root } = setup();
    expect(() => checkOutputPath(path.join(root, 'report.json'), root, 'x')).not.toThrow();
    expect(() => checkOutputPath(path.join(cwd, 'report.md'), root, 'x')).not.toThrow();
    expect(() => checkOutputPath(path.join(cwd, 'docs-report/r.html'), root, 'x')).not.toThrow();
  });
});
