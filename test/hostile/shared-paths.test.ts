/**
 * Paths that are shared or not what they seem: a content root reached through a symlink (every
 * other test passes its temp folder through realpathSync), and several runs at once sharing one
 * cache folder, as parallel CI jobs on one checkout do.
 */
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import type { Report } from '../../src/types.js';
import { cleanupAll, scratch } from './helpers.js';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const example = path.join(repo, 'examples', 'docs-site');
const config = JSON.parse(fs.readFileSync(path.join(example, 'linkweave.config.json'), 'utf8')) as Record<string, unknown>;
const bin = path.join(repo, 'dist', 'cli', 'bin.js');
afterEach(cleanupAll);

/** The report without the root, which names the folder as given. */
const withoutRoot = (r: Report) => JSON.stringify({ ...r, root: '' });

describe('a content root reached through a symlink', () => {
  it('gives the report of the real folder: every page, link and suggestion, nothing skipped as outside the root', async () => {
    const dir = scratch();
    const real = path.join(dir, 'real-site');
    fs.cpSync(example, real, { recursive: true });
    const link = path.join(dir, 'docs');
    fs.symlinkSync(real, link, 'dir');
    // And a symlinked folder above it: /tmp/x/up -> /tmp/x, so the root is up/docs.
    fs.symlinkSync(dir, path.join(dir, 'up'), 'dir');
    const direct = await analyze({ ...config, root: real, command: 'suggest', cache: { enabled: false } });
    expect(direct.pages.length).toBe(51);
    for (const root of [link, path.join(dir, 'up', 'docs')]) {
      const viaLink = await analyze({ ...config, root, command: 'suggest', cache: { enabled: false } });
      expect(viaLink.root).toBe(root);
      expect(withoutRoot(viaLink)).toBe(withoutRoot(direct));
      expect(viaLink.findings.filter((f) => /outside the content root/.test(f.message))).toEqual([]);
    }
  });
});

/** `linkweave <command> docs --format json` in `cwd`, as a separate process; resolves with its output. */
function runCli(cwd: string, command: string): Promise<{ code: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, [bin, command, 'docs', '--format', 'json'], { cwd, env: { ...process.env, NO_COLOR: '1' } });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (d: Buffer) => (stdout += d.toString()));
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    child.on('close', (code) => resolve({ code, stdout, stderr }));
  });
}

describe('runs in parallel sharing one cache folder', () => {
  it('four processes at once (check and suggest) each give the report of a run without the cache; the cache left behind is whole and answers the next run', async () => {
    const cwd = scratch();
    fs.cpSync(example, path.join(cwd, 'docs'), { recursive: true });
    const expected = {
      check: JSON.stringify(await analyze({ ...config, root: path.join(cwd, 'docs'), command: 'check', cache: { enabled: false } })),
      suggest: JSON.stringify(await analyze({ ...config, root: path.join(cwd, 'docs'), command: 'suggest', cache: { enabled: false } })),
    };
    const commands = ['check', 'suggest', 'check', 'suggest'] as const;
    const runs = await Promise.all(commands.map((c) => runCli(cwd, c)));
    runs.forEach((r, i) => {
      // Nothing but the note of the heading-id style chosen (no error, no warning of the cache).
      // A process that starts after another of its command has written the report reads it from
      // the cache, and a report from the cache chooses nothing, so it has no note: the four start
      // together, but on a loaded machine not always before the first is done.
      expect(['', 'linkweave: heading ids: github style (chosen by the fragment links), 20 of 23 fragment links resolve\n']).toContain(r.stderr);
      expect(r.code).toBe(1); // the example site fails its gate
      expect(JSON.stringify(JSON.parse(r.stdout))).toBe(expected[commands[i]!]);
    });
    const cache = path.join(cwd, 'node_modules', '.cache', 'linkweave');
    const files = fs.readdirSync(cache).sort();
    // No temp file is left, every facts shard and both reports are there.
    expect(files.filter((f) => f.endsWith('.tmp'))).toEqual([]);
    expect(files).toEqual(expect.arrayContaining(['report-check.json', 'report-suggest.json']));
    // The next runs read what the parallel ones wrote, and it is right.
    const stamps = fs.readdirSync(cache).map((f) => fs.statSync(path.join(cache, f)).mtimeMs);
    const [check, suggest] = await Promise.all([runCli(cwd, 'check'), runCli(cwd, 'suggest')]);
    expect(JSON.stringify(JSON.parse(check.stdout))).toBe(expected.check);
    expect(JSON.stringify(JSON.parse(suggest.stdout))).toBe(expected.suggest);
    // Answered from the cache: nothing was written again.
    expect(fs.readdirSync(cache).map((f) => fs.statSync(path.join(cache, f)).mtimeMs)).toEqual(stamps);
  }, 240_000);
});
