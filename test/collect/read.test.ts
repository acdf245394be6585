import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { kindOfPath, readSource } from '../../src/collect/index.js';
import { tempDir, writeTree } from './tree.js';

const cleanups: (() => void)[] = [];
afterEach(() => {
  while (cleanups.length > 0) cleanups.pop()!();
});

function root(): string {
  const t = tempDir();
  cleanups.push(t.cleanup);
  return t.dir;
}

describe('readSource', () => {
  it('reads a file: size, sha256 (node:crypto), decoded text', async () => {
    const dir = root();
    writeTree(dir, { 'a.md': 'héllo\n' });
    const outcome = await readSource(path.join(dir, 'a.md'), 'a.md', 'markdown', { realRoot: dir, maxFileBytes: 100 });
    expect(outcome).toEqual({
      file: {
        path: 'a.md',
        kind: 'markdown',
        bytes: 7,
        hash: createHash('sha256').update('héllo\n').digest('hex'),
        text: 'héllo\n',
        problems: [],
      },
    });
  });

  it('a file deleted between listing and reading gives a "vanished" warning, not a throw', async () => {
    const dir = root();
    writeTree(dir, { 'gone.md': 'soon gone' });
    const abs = path.join(dir, 'gone.md');
    fs.rmSync(abs);
    const outcome = await readSource(abs, 'gone.md', 'markdown', { realRoot: dir, maxFileBytes: 100 });
    expect(outcome).toEqual({
      warning: { file: 'gone.md', code: 'vanished', message: '"gone.md" disappeared while the site was being read; skipped' },
    });
  });

  it('a path that turned into a folder gives an "unreadable" warning', async () => {
    const dir = root();
    fs.mkdirSync(path.join(dir, 'odd.md'));
    const outcome = await readSource(path.join(dir, 'odd.md'), 'odd.md', 'markdown', { realRoot: dir, maxFileBytes: 100 });
    expect(outcome).toMatchObject({ warning: { file: 'odd.md', code: 'unreadable' } });
  });

  it('a FIFO named like a page is skipped as unreadable instead of blocking the run', async () => {
    const dir = root();
    const fifo = path.join(dir, 'pipe.md');
    expect(spawnSync('mkfifo', [fifo]).status).toBe(0);
    const outcome = readSource(fifo, 'pipe.md', 'markdown', { realRoot: dir, maxFileBytes: 100 });
    expect(outcome).toEqual({ warning: { file: 'pipe.md', code: 'unreadable', message: '"pipe.md" is not a regular file; skipped' } });
  });

  it('a file swapped for a symlink to outside the root after listing is not read', async () => {
    const dir = root();
    const outside = tempDir('linkweave-outside-');
    cleanups.push(outside.cleanup);
    writeTree(outside.dir, { 'secret.md': 'CANARY-51ab' });
    writeTree(dir, { 'page.md': { symlink: path.join(outside.dir, 'secret.md') } });
    const outcome = await readSource(path.join(dir, 'page.md'), 'page.md', 'markdown', { realRoot: dir, maxFileBytes: 100 });
    expect(outcome).toMatchObject({ warning: { file: 'page.md', code: 'symlink-outside' } });
    expect(JSON.stringify(outcome)).not.toContain('CANARY-51ab');
  });
});

describe('readSource with the folder memo (as collectSources reads)', () => {
  it('resolves each folder once, a symlinked file alone, and keeps out a file that leads outside', () => {
    const dir = root();
    const outside = tempDir('linkweave-outside-');
    cleanups.push(outside.cleanup);
    writeTree(outside.dir, { 'secret.md': 'CANARY-77cd' });
    writeTree(dir, {
      'shared/part.md': 'shared part\n',
      'guide/a.md': 'page a\n',
      'guide/part.md': { symlink: '../shared/part.md' },
      'guide/leak.md': { symlink: path.join(outside.dir, 'secret.md') },
      'linked': { symlink: 'shared' },
    });
    const realFolders = new Map<string, string>();
    const ctx = { realRoot: dir, maxFileBytes: 100, realFolders };
    const read = (rel: string) => readSource(path.join(dir, rel), rel, 'markdown', ctx);
    expect(read('guide/a.md')).toMatchObject({ file: { path: 'guide/a.md', text: 'page a\n' } });
    expect(read('guide/part.md')).toMatchObject({ file: { path: 'guide/part.md', text: 'shared part\n' } });
    expect(read('linked/part.md')).toMatchObject({ file: { path: 'linked/part.md', text: 'shared part\n' } });
    const leak = read('guide/leak.md');
    expect(leak).toMatchObject({ warning: { file: 'guide/leak.md', code: 'symlink-outside' } });
    expect(JSON.stringify(leak)).not.toContain('CANARY-77cd');
    expect(realFolders.get(path.join(dir, 'linked'))).toBe(fs.realpathSync(path.join(dir, 'shared')));
    expect(read('missing/x.md')).toMatchObject({ warning: { file: 'missing/x.md', code: 'vanished' } });
  });

  it('gives each file its own bytes and hash when files of different sizes are read one after another', () => {
    const dir = root();
    const texts = ['x'.repeat(200_000), 'short\n', 'é'.repeat(70_000), '', 'y'.repeat(2_000_000), 'last\n'];
    writeTree(dir, Object.fromEntries(texts.map((t, i) => [`p${i}.md`, t])));
    const ctx = { realRoot: dir, maxFileBytes: 10_000_000, realFolders: new Map<string, string>() };
    for (const [i, t] of texts.entries()) {
      const outcome = readSource(path.join(dir, `p${i}.md`), `p${i}.md`, 'markdown', ctx);
      expect(outcome).toMatchObject({ file: { text: t, bytes: Buffer.byteLength(t), hash: createHash('sha256').update(t).digest('hex') } });
    }
  });
});

describe('kindOfPath', () => {
  it.each([
    ['a.md', 'markdown'],
    ['a/b.markdown', 'markdown'],
    ['c.MDX', 'markdown'],
    ['d.html', 'html'],
    ['e.htm', 'html'],
    ['f.txt', null],
    ['md', null],
    ['dir.md/file', null],
  ] as const)('%s -> %s', (p, kind) => {
    expect(kindOfPath(p)).toBe(kind);
  });
});
