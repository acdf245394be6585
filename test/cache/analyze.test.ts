/** The cache through `analyze`: reports are byte-identical with and without it, cold or warm. */
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import type { AnalyzeHooks, AnalyzeInput } from '../../src/analyze.js';
import type { ParseHooks, ParseStats } from '../../src/parallel/index.js';
import { CONFIG, SITE } from './site.js';
import { tempDir, writeTree } from './helpers.js';

let base: string;
let root: string;
let cleanup: () => void;
beforeEach(() => {
  const t = tempDir();
  ({ cleanup } = t);
  base = t.dir;
  root = path.join(base, 'site');
  writeTree(root, SITE);
});
afterEach(() => cleanup());

/**
 * One `analyze` run: the report as JSON and the parse stats. The whole-report cache
 * (`report-*.json`, tested in result.test.ts) is removed first, so every run reaches the
 * page-facts cache these tests are about.
 */
async function run(input: Omit<AnalyzeInput, 'root'>): Promise<{ json: string; stats: ParseStats }> {
  for (const dir of [path.join(base, 'cache'), path.join(base, 'node_modules/.cache/linkweave'), path.join(process.cwd(), 'node_modules/.cache/linkweave')]) {
    for (const command of ['check', 'suggest']) fs.rmSync(path.join(dir, `report-${command}.json`), { force: true });
  }
  let stats: ParseStats | undefined;
  const hooks: AnalyzeHooks & ParseHooks = { onParseStats: (s) => (stats = s) };
  const report = await analyze({ ...CONFIG, command: 'suggest', ...input, root }, hooks);
  expect(stats).toBeDefined();
  return { json: JSON.stringify(report), stats: stats! };
}

const FILES = Object.keys(SITE).length;

describe('analyze with the cache', () => {
  it('cold, warm and partly changed runs give the report of a run without cache', async () => {
    const cache = { dir: path.join(base, 'cache') };
    const uncached = await run({ cache: { enabled: false } });
    expect(uncached.stats.cache).toMatchObject({ enabled: false, hits: 0, parsed: FILES });

    const cold = await run({ cache });
    expect(cold.stats.cache).toMatchObject({ enabled: true, hits: 0, parsed: FILES });
    expect(cold.json).toBe(uncached.json);
    const warm = await run({ cache });
    expect(warm.stats.cache).toMatchObject({ hits: FILES, parsed: 0, written: 0 });
    expect(warm.json).toBe(uncached.json);

    fs.appendFileSync(path.join(root, 'guide/oil.md'), '\nA paragraph on wick care and trimming the wick flat.\n');
    const partial = await run({ cache });
    expect(partial.stats.cache).toMatchObject({ hits: FILES - 1, parsed: 1 });
    const partialUncached = await run({ cache: { enabled: false } });
    expect(partial.json).toBe(partialUncached.json);
    expect(partial.json).not.toBe(uncached.json);
  });

  it('a relative cache.dir is taken from the working folder of the run', async () => {
    const work = path.join(base, 'work');
    fs.mkdirSync(work);
    const before = process.cwd();
    process.chdir(work);
    try {
      const first = await run({});
      expect(first.stats.cache.dir).toBe(path.join(work, 'node_modules', '.cache', 'linkweave'));
      expect(fs.readdirSync(first.stats.cache.dir!).length).toBeGreaterThan(0);
      expect((await run({ cache: { dir: 'elsewhere' } })).stats.cache.dir).toBe(path.join(work, 'elsewhere'));
      expect((await run({})).stats.cache.hits).toBe(FILES);
    } finally {
      process.chdir(before);
    }
  });

  it('a cache folder that cannot be written does not change the report', async () => {
    const blocked = path.join(base, 'blocked');
    fs.writeFileSync(blocked, 'a file, not a folder');
    const uncached = await run({ cache: { enabled: false } });
    const r = await run({ cache: { dir: path.join(blocked, 'cache') } });
    expect(r.json).toBe(uncached.json);
    expect(r.stats.cache.warning).toMatch(/^cache not saved in ".*blocked.cache": .*\((ENOTDIR|EEXIST)\)$/);
  });
});
