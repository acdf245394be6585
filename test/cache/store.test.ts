/** The cache folder on disk: entries survive a reopen, and nothing damaged or foreign is used. */
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { CACHE_SCHEMA, openCache, shardFileName, shardOfPath } from '../../src/cache/index.js';
import type { CacheKey } from '../../src/cache/index.js';
import type { SourceFile } from '../../src/types.js';
import { handFacts, sourceFile, tempDir } from './helpers.js';

const key: CacheKey = { version: '1.2.3', fingerprint: '{"routes":"x"}' };
const files: SourceFile[] = Array.from({ length: 40 }, (_, i) =>
  sourceFile(i % 4 === 0 ? `pages/p${i}.html` : `pages/p${i}.md`, `# Page ${i}\n\nWords of page ${i} here.\n`),
);

let dir: string;
let cleanup: () => void;
beforeEach(() => {
  ({ dir, cleanup } = tempDir());
  dir = path.join(dir, 'nested', 'cache');
});
afterEach(() => cleanup());

/** Open, store every file, save. */
function fill(k: CacheKey = key): void {
  const s = openCache(dir, k);
  for (const f of files) s.store(f, handFacts(f));
  expect(s.save().warning).toBeNull();
}

function hits(k: CacheKey = key, list: readonly SourceFile[] = files): number {
  const s = openCache(dir, k);
  return list.filter((f) => 'facts' in s.lookup(f)).length;
}

describe('openCache', () => {
  it('answers every stored file after a reopen with the same facts', () => {
    fill();
    const s = openCache(dir, key);
    expect(s.ignored).toEqual([]);
    for (const f of files) {
      const found = s.lookup(f);
      expect('facts' in found && JSON.stringify(found.facts)).toBe(JSON.stringify(handFacts(f)));
    }
    // Nothing changed: nothing is written.
    expect(s.save()).toEqual({ written: 0, warning: null });
  });

  it('misses a file whose content hash changed', () => {
    fill();
    const s = openCache(dir, key);
    const changed = sourceFile(files[1]!.path, '# Changed\n');
    expect(s.lookup(changed)).toEqual({ miss: 'changed' });
    expect(s.lookup(sourceFile('pages/new.md', 'x'))).toEqual({ miss: 'absent' });
  });

  it('ignores every shard of another tool version or fingerprint, and rewrites them', () => {
    fill();
    const other = openCache(dir, { ...key, version: '1.2.4' });
    expect(other.ignored.length).toBeGreaterThan(0);
    expect(other.ignored.every((i) => i.reason === 'version')).toBe(true);
    expect(files.filter((f) => 'facts' in other.lookup(f))).toEqual([]);
    expect(hits({ ...key, fingerprint: '{"routes":"y"}' })).toBe(0);
    expect(openCache(dir, { ...key, fingerprint: 'z' }).ignored.every((i) => i.reason === 'fingerprint')).toBe(true);
    // Saving under the new key replaces the foreign files.
    expect(other.save().warning).toBeNull();
    expect(openCache(dir, { ...key, version: '1.2.4' }).ignored).toEqual([]);
    expect(hits()).toBe(0);
  });

  it('drops entries of files that are gone from the site', () => {
    fill();
    const kept = files.slice(0, 10);
    const s = openCache(dir, key);
    for (const f of kept) expect('facts' in s.lookup(f)).toBe(true);
    expect(s.save().written).toBeGreaterThan(0);
    expect(hits(key, files)).toBe(10);
  });
});

describe('damaged cache files', () => {
  const victim = files[5]!;
  const shardPath = (): string => path.join(dir, shardFileName(shardOfPath(victim.path)));
  const sameShard = (): SourceFile[] => files.filter((f) => shardOfPath(f.path) === shardOfPath(victim.path));

  function expectIgnoredThenRebuilt(reason: string): void {
    const s = openCache(dir, key);
    expect(s.ignored).toEqual([{ file: shardFileName(shardOfPath(victim.path)), reason }]);
    for (const f of sameShard()) expect(s.lookup(f)).toEqual({ miss: 'absent' });
    // The other shards still answer.
    expect(hits()).toBe(files.length - sameShard().length);
    for (const f of sameShard()) s.store(f, handFacts(f));
    for (const f of files) if (shardOfPath(f.path) !== shardOfPath(victim.path)) s.lookup(f);
    expect(s.save()).toEqual({ written: 1, warning: null });
    expect(openCache(dir, key).ignored).toEqual([]);
    expect(hits()).toBe(files.length);
  }

  it('ignores a truncated shard', () => {
    fill();
    const text = fs.readFileSync(shardPath(), 'utf8');
    fs.writeFileSync(shardPath(), text.slice(0, Math.floor(text.length * 0.6)));
    expectIgnoredThenRebuilt('corrupt');
  });

  it('ignores a shard cut right after its header line, and one with no newline at all', () => {
    fill();
    const text = fs.readFileSync(shardPath(), 'utf8');
    fs.writeFileSync(shardPath(), text.slice(0, text.indexOf('\n') + 1));
    expectIgnoredThenRebuilt('corrupt');
    fs.writeFileSync(shardPath(), text.slice(0, 30));
    expectIgnoredThenRebuilt('corrupt');
  });

  it('ignores garbage bytes', () => {
    fill();
    fs.writeFileSync(shardPath(), Buffer.from([0xff, 0x00, 0x12, 0x0a, 0x80, 0x7b, 0x5b]));
    expectIgnoredThenRebuilt('corrupt');
  });

  it('ignores a file of another schema', () => {
    fill();
    const text = fs.readFileSync(shardPath(), 'utf8');
    fs.writeFileSync(shardPath(), text.replace(CACHE_SCHEMA, 'linkweave/facts-cache@0'));
    expectIgnoredThenRebuilt('schema');
    fs.writeFileSync(shardPath(), '{"hello":"world"}\n[]\n');
    expectIgnoredThenRebuilt('schema');
  });

  it('ignores a header whose count does not match its entries (a lost line)', () => {
    fill();
    const lines = fs.readFileSync(shardPath(), 'utf8').split('\n');
    // Header, "[", entries..., "]", "": drop the first entry.
    const damaged = [lines[0], lines[1], ...lines.slice(3)].join('\n').replace('[\n,', '[\n');
    fs.writeFileSync(shardPath(), damaged);
    expectIgnoredThenRebuilt('corrupt');
  });

  it('rejects an entry of valid JSON with a wrong shape, and keeps the valid ones', () => {
    fill();
    const text = fs.readFileSync(shardPath(), 'utf8');
    const lines = text.split('\n');
    const i = lines.findIndex((l) => l.includes(`"file":"${victim.path}"`));
    const entry = JSON.parse(lines[i]!.replace(/,$/, ''));
    const wrongs: [string, (e: Record<string, any>) => void][] = [
      ['line as a string', (e) => (e.links[0].line = '2')],
      ['unknown link context', (e) => (e.links[0].context = 'sidebar')],
      ['meta missing', (e) => delete e.meta],
      ['spans not a multiple of four', (e) => e.spans.pop()],
      ['text.body a number', (e) => (e.text.body = 7)],
      ['kind of another file type', (e) => (e.kind = victim.kind === 'html' ? 'markdown' : 'html')],
      ['problem with an unknown code', (e) => e.problems.push({ code: 'oops', message: 'x' })],
    ];
    for (const [what, wreck] of wrongs) {
      const copy = structuredClone(entry);
      wreck(copy);
      lines[i] = JSON.stringify(copy) + (lines[i]!.endsWith(',') ? ',' : '');
      fs.writeFileSync(shardPath(), lines.join('\n'));
      const s = openCache(dir, key);
      expect(s.lookup(victim), what).toEqual({ miss: 'rejected' });
      for (const f of sameShard()) if (f !== victim) expect('facts' in s.lookup(f), what).toBe(true);
    }
  });

  it('ignores a shard whose entries are not objects with a file', () => {
    fill();
    const header = fs.readFileSync(shardPath(), 'utf8').split('\n')[0]!;
    const h = JSON.parse(header);
    fs.writeFileSync(shardPath(), `${JSON.stringify({ ...h, count: 2 })}\n[1, {"nofile": true}]\n`);
    expectIgnoredThenRebuilt('corrupt');
  });

  it('an unwritable cache folder gives one warning line and no throw', () => {
    fs.mkdirSync(path.dirname(dir), { recursive: true });
    fs.writeFileSync(dir, 'a file where the cache folder should be');
    const s = openCache(dir, key);
    expect(s.ignored).toEqual([]);
    s.store(files[0]!, handFacts(files[0]!));
    const saved = s.save();
    expect(saved.written).toBe(0);
    expect(saved.warning).toMatch(/^cache not saved in ".*cache": /);
    expect(saved.warning).not.toContain('\n');
    // No temp file left behind next to it.
    expect(fs.readdirSync(path.dirname(dir))).toEqual(['cache']);
  });
});
