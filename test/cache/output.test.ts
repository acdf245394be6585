/**
 * The formatted report beside the whole-report cache, through the built command as CI runs it:
 * an unchanged site gets last run's bytes copied; any change formats the report again, and the
 * file always equals what a run without the cache writes.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { CONFIG, SITE } from './site.js';
import { tempDir, writeTree } from './helpers.js';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const bin = path.join(repo, 'dist', 'cli', 'bin.js');

let cwd: string;
let cleanup: () => void;
beforeEach(() => {
  ({ dir: cwd, cleanup } = tempDir());
  writeTree(path.join(cwd, 'docs'), SITE);
  fs.writeFileSync(path.join(cwd, 'docs', 'linkweave.config.json'), JSON.stringify(CONFIG));
});
afterEach(() => cleanup());

/** Each test starts the command about ten times (a shared machine can take seconds each). */
const CLI_RUNS_TIMEOUT = 300_000;

const cacheDir = (): string => path.join(cwd, 'node_modules', '.cache', 'linkweave');

/** Run `suggest` writing `out`; returns the file's bytes. */
function suggest(out: string, ...flags: string[]): Buffer {
  const r = spawnSync(process.execPath, [bin, 'suggest', 'docs', '--output', out, '--quiet', ...flags], { cwd, encoding: 'utf8', env: { PATH: process.env.PATH ?? '', NO_COLOR: '1' } });
  expect(r.status === 0 || r.status === 1, r.stderr).toBe(true);
  return fs.readFileSync(path.join(cwd, out));
}

const kept = (format: string): string[] => fs.readdirSync(cacheDir()).filter((n) => n.startsWith(`output-suggest-${format}-`));

describe('the formatted report in the cache', () => {
  it('copies the last bytes when nothing changed, and formats again after a change', () => {
    const cold = suggest('report.json');
    expect(cold.equals(suggest('plain.json', '--no-cache'))).toBe(true);
    expect(kept('json')).toHaveLength(1);
    const stored = path.join(cacheDir(), kept('json')[0]!);
    expect(fs.readFileSync(stored).equals(cold)).toBe(true);

    // A warm run writes the stored bytes: marked ones show that they were copied, not formatted.
    fs.appendFileSync(stored, ' ');
    expect(suggest('report.json').toString()).toBe(`${cold.toString()} `);
    fs.writeFileSync(stored, cold);

    // A change: formatted again, equal to a run without the cache, and the stored copy replaced.
    const [first] = Object.keys(SITE).sort();
    fs.appendFileSync(path.join(cwd, 'docs', first!), '\nA sentence added to change the page.\n');
    const changed = suggest('report.json');
    expect(changed.equals(suggest('plain.json', '--no-cache'))).toBe(true);
    expect(kept('json')).toHaveLength(1);
    expect(kept('json')[0]).not.toBe(path.basename(stored));
    expect(fs.readFileSync(path.join(cacheDir(), kept('json')[0]!)).equals(changed)).toBe(true);
  }, CLI_RUNS_TIMEOUT);

  it('keeps each format apart, and a warm run of each equals a run without the cache', () => {
    for (const out of ['report.html', 'report.sarif']) {
      const cold = suggest(out);
      const warm = suggest(out);
      expect(warm.equals(cold)).toBe(true);
      expect(warm.equals(suggest(`plain-${out}`, '--no-cache'))).toBe(true);
    }
    expect([...kept('html'), ...kept('sarif')]).toHaveLength(2);
  }, CLI_RUNS_TIMEOUT);

  it('after random edits, a warm report is byte-identical to a report made without the cache', () => {
    let seed = 4242;
    const next = (): number => {
      seed = (Math.imul(seed, 1103515245) + 12345) >>> 0;
      return seed / 2 ** 32;
    };
    const files = Object.keys(SITE).filter((f) => f.endsWith('.md')).sort();
    suggest('report.json');
    for (let round = 0; round < 3; round++) {
      const file = files[Math.floor(next() * files.length)]!;
      const edit = next() < 0.5 ? `\nSee [the setup page](/guide/setup/) for round ${round}.\n` : `\nPlain words for round ${round}, no link.\n`;
      fs.appendFileSync(path.join(cwd, 'docs', file), edit);
      const warm = suggest('report.json');
      expect(suggest('report.json').equals(warm)).toBe(true);
      expect(warm.equals(suggest('plain.json', '--no-cache'))).toBe(true);
    }
  }, CLI_RUNS_TIMEOUT);
});

describe('copyCachedOutput', () => {
  it('copies the kept bytes over the target with its permission bits, and says false when it has nothing to copy', async () => {
    const { copyCachedOutput } = await import('../../src/cache/output.js');
    const cold = suggest('report.json');
    const name = kept('json')[0]!;
    const hash = name.slice('output-suggest-json-'.length);
    expect(hash).toMatch(/^[0-9a-f]{32}$/);
    // The key behind the kept file is not known here; a kept file under the name of another key
    // is never read, and a miss (`hit: false`) never copies.
    const target = path.join(cwd, 'copy.json');
    fs.writeFileSync(target, 'old');
    fs.chmodSync(target, 0o600);
    const info = { dir: cacheDir(), command: 'suggest', key: 'not-the-key', hit: true };
    expect(await copyCachedOutput(info, 'json', cwd, target)).toBe(false);
    expect(await copyCachedOutput({ ...info, hit: false }, 'json', cwd, target)).toBe(false);
    expect(fs.readFileSync(target, 'utf8')).toBe('old');
    // Under its own name, the kept file is copied; the target keeps its mode and no temp file is left.
    const { createHash } = await import('node:crypto');
    const probe = (k: string): string => createHash('sha256').update(`${k}\njson\n${cwd}`).digest('hex').slice(0, 32);
    const head = JSON.parse(fs.readFileSync(path.join(cacheDir(), 'report-suggest.json'), 'utf8').split('\n')[0]!) as { key: string };
    const key = head.key;
    expect(probe(key)).toBe(hash);
    const tracked = new Set<string>();
    const seen: string[] = [];
    const tracker = { add: (p: string) => (seen.push(p), tracked.add(p)), delete: (p: string) => tracked.delete(p) };
    expect(await copyCachedOutput({ ...info, key }, 'json', cwd, target, tracker)).toBe(true);
    expect(fs.readFileSync(target).equals(cold)).toBe(true);
    expect(fs.statSync(target).mode & 0o777).toBe(0o600);
    expect(seen).toHaveLength(1);
    expect(tracked.size).toBe(0);
    expect(fs.readdirSync(cwd).filter((n) => n.startsWith('.linkweave-tmp-'))).toEqual([]);
    // A target folder that does not exist is made, as the report's own write makes it.
    expect(await copyCachedOutput({ ...info, key }, 'json', cwd, path.join(cwd, 'missing', 'r.json'))).toBe(true);
    expect(fs.readFileSync(path.join(cwd, 'missing', 'r.json')).equals(cold)).toBe(true);
    // A target in the way of a folder: false, and the file left as it was.
    fs.writeFileSync(path.join(cwd, 'file'), 'a file');
    expect(await copyCachedOutput({ ...info, key }, 'json', cwd, path.join(cwd, 'file', 'r.json'))).toBe(false);
    expect(fs.readFileSync(path.join(cwd, 'file'), 'utf8')).toBe('a file');
  }, CLI_RUNS_TIMEOUT);
});
