import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { removeTempFilesSync, TEMP_PREFIX, writeFileAtomic } from '../../src/util/write-file.js';
import { tempDirsPerTest } from '../collect/tree.js';

const dir = tempDirsPerTest();

const leftovers = (d: string) => fs.readdirSync(d).filter((n) => n.startsWith(TEMP_PREFIX));

describe('writeFileAtomic', () => {
  it('creates the file and its folders, leaving no temp file', async () => {
    const d = dir();
    const target = path.join(d, 'out', 'deep', 'report.json');
    await writeFileAtomic(target, '{"a":1}\n');
    expect(fs.readFileSync(target, 'utf8')).toBe('{"a":1}\n');
    expect(leftovers(path.dirname(target))).toEqual([]);
  });

  it('replaces existing content whole and keeps the permission bits', async () => {
    const d = dir();
    const target = path.join(d, 'page.md');
    fs.writeFileSync(target, 'old text that is longer than the new one');
    fs.chmodSync(target, 0o640);
    await writeFileAtomic(target, new Uint8Array(Buffer.from('new')));
    expect(fs.readFileSync(target, 'utf8')).toBe('new');
    expect(fs.statSync(target).mode & 0o777).toBe(0o640);
    expect(leftovers(d)).toEqual([]);
  });

  it('fails with E_IO when the target is a folder, leaving no temp file and the folder intact', async () => {
    const d = dir();
    const target = path.join(d, 'report.json');
    fs.mkdirSync(target);
    fs.writeFileSync(path.join(target, 'inside.txt'), 'keep');
    await expect(writeFileAtomic(target, 'x')).rejects.toMatchObject({
      code: 'E_IO',
      message: `cannot write "${target}": it is a folder (EISDIR)`,
    });
    expect(leftovers(d)).toEqual([]);
    expect(fs.readFileSync(path.join(target, 'inside.txt'), 'utf8')).toBe('keep');
  });

  it('fails with E_IO when a parent is a file', async () => {
    const d = dir();
    fs.writeFileSync(path.join(d, 'file'), 'x');
    await expect(writeFileAtomic(path.join(d, 'file', 'r.json'), 'x', { label: 'file/r.json' })).rejects.toMatchObject({
      code: 'E_IO',
      message: 'cannot write "file/r.json": a parent is not a folder (ENOTDIR)',
    });
    expect(leftovers(d)).toEqual([]);
  });

  it('records the temp file in the tracker only while it exists', async () => {
    const d = dir();
    const seen: string[] = [];
    const live = new Set<string>();
    const tracker = {
      add(p: string) {
        seen.push(p);
        live.add(p);
      },
      delete(p: string) {
        live.delete(p);
      },
    };
    await writeFileAtomic(path.join(d, 'r.txt'), 'x', { tracker });
    expect(seen).toHaveLength(1);
    expect(path.dirname(seen[0]!)).toBe(d);
    expect(path.basename(seen[0]!).startsWith(`${TEMP_PREFIX}r.txt-`)).toBe(true);
    expect(live.size).toBe(0);
    expect(fs.existsSync(seen[0]!)).toBe(false);
  });

  it('copies a file given as { copyOf }, keeping the old permission bits, and leaves the target as it was when the copy fails', async () => {
    const d = dir();
    const source = path.join(d, 'cached.json');
    const target = path.join(d, 'report.json');
    fs.writeFileSync(source, '{"from":"cache"}\n');
    fs.writeFileSync(target, 'old report');
    fs.chmodSync(target, 0o600);
    await writeFileAtomic(target, { copyOf: source });
    expect(fs.readFileSync(target, 'utf8')).toBe('{"from":"cache"}\n');
    expect(fs.statSync(target).mode & 0o777).toBe(0o600);
    await expect(writeFileAtomic(target, { copyOf: path.join(d, 'missing.json') })).rejects.toMatchObject({ code: 'E_IO' });
    expect(fs.readFileSync(target, 'utf8')).toBe('{"from":"cache"}\n');
    expect(leftovers(d)).toEqual([]);
  });

  it('removeTempFilesSync deletes the listed files and ignores missing ones', () => {
    const d = dir();
    const a = path.join(d, `${TEMP_PREFIX}a`);
    fs.writeFileSync(a, 'partial');
    removeTempFilesSync([a, path.join(d, 'missing')]);
    expect(fs.existsSync(a)).toBe(false);
  });
});
