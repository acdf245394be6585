/**
 * The caches are keyed on the code, not only on the version string: a built copy of the
 * package whose code changed (the version unchanged) does not take the report or the page facts
 * that the code before it cached, and an unchanged copy does.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { codeHash, codeVersion } from '../../src/cache/index.js';
import { VERSION } from '../../src/version.js';
import { tempDir, writeTree } from './helpers.js';

const repo = path.resolve(import.meta.dirname, '../..');
const temp = tempDir('linkweave-code-');
afterAll(() => temp.cleanup());

/** A copy of the built package (dist/ from the global setup) that the test may edit. */
const pkg = path.join(temp.dir, 'pkg');
fs.cpSync(path.join(repo, 'dist'), path.join(pkg, 'dist'), { recursive: true });
fs.copyFileSync(path.join(repo, 'package.json'), path.join(pkg, 'package.json'));
fs.symlinkSync(path.join(repo, 'node_modules'), path.join(pkg, 'node_modules'), 'dir');
/** The working folder: its `node_modules/.cache/linkweave` is the cache. */
const work = path.join(temp.dir, 'work');
writeTree(work, {
  'docs/index.md': '# Home\n\nSee [the guide](guide.md).\n',
  'docs/guide.md': '# Guide\n\nBack [home](index.md) and [a missing page](gone.md).\n',
});
const cache = path.join(work, 'node_modules', '.cache', 'linkweave');

function check(): { status: number | null; stdout: string } {
  const r = spawnSync(process.execPath, [path.join(pkg, 'dist', 'cli', 'bin.js'), 'check', 'docs', '--format', 'json'], { cwd: work, encoding: 'utf8' });
  return { status: r.status, stdout: r.stdout };
}

/** The key line of the cached report and the version line of a facts shard. */
function cacheState(): { reportKey: string; reportTime: number; factsVersion: string } {
  const reportFile = path.join(cache, 'report-check.json');
  const shard = fs.readdirSync(cache).find((f) => f.startsWith('facts-'))!;
  const header = JSON.parse(fs.readFileSync(path.join(cache, shard), 'utf8').split('\n')[0]!) as { version: string };
  return {
    reportKey: fs.readFileSync(reportFile, 'utf8').split('\n')[0]!,
    reportTime: fs.statSync(reportFile).mtimeMs,
    factsVersion: header.version,
  };
}

describe('the code in the cache key', () => {
  it('is the version and a hash of the code, the same for every call in one process', () => {
    expect(codeVersion(VERSION)).toMatch(/^0\.1\.0\+[0-9a-f]{16}$/);
    expect(codeVersion(VERSION)).toBe(`${VERSION}+${codeHash().slice(0, 16)}`);
    expect(codeHash()).toBe(codeHash());
  });

  it('a changed code file (same version) neither reads the cached report nor the cached facts; unchanged code does', async () => {
    const first = check();
    expect(first.status).toBe(1);
    const cold = cacheState();
    expect(cold.factsVersion.startsWith(`${VERSION}+`)).toBe(true);

    // Unchanged code: the cached report is the answer, the file is not written again.
    await new Promise((r) => setTimeout(r, 20));
    const again = check();
    expect(again.stdout).toBe(first.stdout);
    expect(cacheState()).toEqual(cold);

    // One byte more in one file of the copy (a comment, so the report stays the same): the
    // version is unchanged, the keys are not, and both caches are computed and written anew.
    const file = path.join(pkg, 'dist', 'rank', 'pagerank.js');
    fs.appendFileSync(file, '\n// changed\n');
    const changed = check();
    expect(changed.stdout).toBe(first.stdout);
    const after = cacheState();
    expect(after.reportKey).not.toBe(cold.reportKey);
    expect(after.reportTime).toBeGreaterThan(cold.reportTime);
    expect(after.factsVersion).not.toBe(cold.factsVersion);
    expect(after.factsVersion.startsWith(`${VERSION}+`)).toBe(true);
  });
});
