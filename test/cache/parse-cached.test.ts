/**
 * The parse stage behind the cache, with the real parser on real files: results equal parsing
 * every file, and each key of the cache (content, tool version, every parse option) invalidates.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { parseWithCache } from '../../src/cache/index.js';
import type { CacheStats } from '../../src/cache/index.js';
import { collectSources } from '../../src/collect/index.js';
import { resolveOptions } from '../../src/config/options.js';
import type { Config, ResolvedOptions } from '../../src/config/options.js';
import { parseSource } from '../../src/parse/index.js';
import type { PageFacts } from '../../src/types.js';
import { CONFIG, SITE } from './site.js';
import { tempDir, writeTree } from './helpers.js';

let root: string;
let cacheDir: string;
let cleanup: () => void;
beforeEach(() => {
  const t = tempDir();
  cleanup = t.cleanup;
  root = path.join(t.dir, 'site');
  cacheDir = path.join(t.dir, 'cache');
  writeTree(root, SITE);
});
afterEach(() => cleanup());

function optionsOf(config: Config = CONFIG): ResolvedOptions {
  return resolveOptions(config, root);
}

/** One parse stage through the cache; also counts the files actually handed to the parser. */
async function run(options: ResolvedOptions, version = '1.0.0'): Promise<{ facts: PageFacts[]; stats: CacheStats; parsedPaths: string[] }> {
  const { files } = await collectSources(options);
  const parsedPaths: string[] = [];
  const { facts, stats } = await parseWithCache(files, options, {
    dir: cacheDir,
    version,
    parseMisses: async (misses, onParsed) => {
      parsedPaths.push(...misses.map((f) => f.path));
      onParsed(misses.length);
      return misses.map((f) => parseSource(f, options));
    },
  });
  return { facts, stats, parsedPaths };
}

/** Facts of every file parsed directly, without any cache. */
async function fresh(options: ResolvedOptions): Promise<string> {
  const { files } = await collectSources(options);
  return JSON.stringify(files.map((f) => parseSource(f, options)));
}

const FILES = Object.keys(SITE).length;

describe('cold, warm and partly changed runs', () => {
  it('give the facts of a fresh parse, parsing only what changed', async () => {
    const options = optionsOf();
    const cold = await run(options);
    expect(cold.stats).toMatchObject({ enabled: true, files: FILES, hits: 0, parsed: FILES, rejected: 0, warning: null });
    expect(cold.stats.written).toBeGreaterThan(0);
    expect(JSON.stringify(cold.facts)).toBe(await fresh(options));

    const warm = await run(options);
    expect(warm.stats).toMatchObject({ hits: FILES, parsed: 0, written: 0, ignored: [] });
    expect(JSON.stringify(warm.facts)).toBe(JSON.stringify(cold.facts));

    // One Markdown page edited, one HTML page edited, one page added, one removed.
    fs.appendFileSync(path.join(root, 'guide/wicks.md'), '\nA new closing paragraph about [oil](oil.md).\n');
    fs.writeFileSync(path.join(root, 'reference/glass.html'), SITE['reference/glass.html']!.replace('amber', 'smoked'));
    fs.writeFileSync(path.join(root, 'guide/chimney.md'), '# Chimneys\n\nSee the [glass shades](../reference/glass.html).\n');
    fs.rmSync(path.join(root, 'guide/oil.md'));
    const partial = await run(options);
    expect(partial.parsedPaths).toEqual(['guide/chimney.md', 'guide/wicks.md', 'reference/glass.html']);
    expect(partial.stats).toMatchObject({ files: FILES, hits: FILES - 3, parsed: 3 });
    expect(JSON.stringify(partial.facts)).toBe(await fresh(options));

    // And the cache written by the partial run answers everything.
    const again = await run(options);
    expect(again.stats).toMatchObject({ hits: FILES, parsed: 0, written: 0 });
    expect(JSON.stringify(again.facts)).toBe(JSON.stringify(partial.facts));
  });

  it('stores the spans of the real parser packed (as numbers), not as a second copy of the text', async () => {
    await run(optionsOf());
    const entries = fs
      .readdirSync(cacheDir)
      .flatMap((name) => JSON.parse(fs.readFileSync(path.join(cacheDir, name), 'utf8').split('\n').slice(1).join('\n')) as { spans: unknown[] }[]);
    expect(entries.length).toBe(FILES);
    expect(entries.some((e) => e.spans.length > 0)).toBe(true);
    for (const e of entries) expect(e.spans.every((x) => typeof x === 'number')).toBe(true);
  });

  it('re-parses exactly the edited file, for each file kind', async () => {
    const options = optionsOf();
    await run(options);
    for (const file of ['guide/setup.md', 'reference/glass.html']) {
      fs.writeFileSync(path.join(root, file), `${SITE[file]}\n<!-- edited -->\n`);
      const r = await run(options);
      expect(r.parsedPaths, file).toEqual([file]);
      expect(JSON.stringify(r.facts), file).toBe(await fresh(options));
    }
  });
});

describe('invalidation by parse option', () => {
  // Every option of PARSE_OPTION_KEYS, each set to a value that changes what parsing yields.
  const variants: [string, Config][] = [
    ['routes.style', { ...CONFIG, routes: { style: 'html' } }],
    ['routes.basePath', { ...CONFIG, routes: { basePath: '/docs/' } }],
    ['routes.indexNames', { ...CONFIG, routes: { indexNames: ['index', 'START'] } }],
    ['linkPatterns', { linkPatterns: [] }],
    ['maxLinksPerPage', { ...CONFIG, maxLinksPerPage: 1 }],
  ];

  for (const [key, config] of variants) {
    it(`a change of ${key} re-parses every file`, async () => {
      const base = optionsOf();
      const baseFacts = JSON.stringify((await run(base)).facts);
      const options = optionsOf(config);
      const r = await run(options);
      expect(r.stats.hits).toBe(0);
      expect(r.stats.parsed).toBe(FILES);
      expect(r.stats.ignored.every((i) => i.reason === 'fingerprint')).toBe(true);
      const expected = await fresh(options);
      expect(JSON.stringify(r.facts)).toBe(expected);
      // The key really changes the facts (else it would not need to be part of the cache key).
      expect(expected).not.toBe(baseFacts);
    });
  }

  it('options applied after parsing do not invalidate', async () => {
    await run(optionsOf());
    const r = await run(optionsOf({ ...CONFIG, routes: { caseInsensitive: true }, entry: ['/guide/'], templateWeight: 0.5, maxDepth: 1, exclude: ['nothing/**'], checks: { 'dead-end': { level: 'none' } } }));
    expect(r.stats).toMatchObject({ hits: FILES, parsed: 0, written: 0 });
  });

  it('a file over maxFileBytes is parsed (never cached); the others still come from the cache', async () => {
    await run(optionsOf());
    const bytes = Buffer.byteLength(SITE['guide/setup.md']!);
    const options = optionsOf({ ...CONFIG, maxFileBytes: bytes - 1 });
    const r = await run(options);
    const big = Object.entries(SITE).filter(([, t]) => Buffer.byteLength(t) > bytes - 1).map(([p]) => p).sort();
    expect(big).toContain('guide/setup.md');
    expect(r.parsedPaths.sort()).toEqual(big);
    expect(r.stats).toMatchObject({ hits: FILES - big.length, uncacheable: big.length });
    expect(JSON.stringify(r.facts)).toBe(await fresh(options));
    // Back to the default limit: the file is read again and parsed, then cached.
    const back = await run(optionsOf());
    expect(back.parsedPaths.sort()).toEqual(big);
    expect((await run(optionsOf())).stats.hits).toBe(FILES);
  });
});

describe('invalidation by tool version', () => {
  it('another version ignores the whole cache and rewrites it', async () => {
    const options = optionsOf();
    await run(options, '1.0.0');
    const r = await run(options, '1.0.1');
    expect(r.stats.hits).toBe(0);
    expect(r.stats.ignored.length).toBeGreaterThan(0);
    expect(r.stats.ignored.every((i) => i.reason === 'version')).toBe(true);
    expect(JSON.stringify(r.facts)).toBe(await fresh(options));
    expect((await run(options, '1.0.1')).stats.hits).toBe(FILES);
    expect((await run(options, '1.0.0')).stats.hits).toBe(0);
  });
});

describe('a damaged cache folder', () => {
  it('every shard file overwritten with garbage: all re-parsed, same facts, cache rebuilt', async () => {
    const options = optionsOf();
    const cold = await run(options);
    for (const name of fs.readdirSync(cacheDir)) fs.writeFileSync(path.join(cacheDir, name), '{"schema":');
    const r = await run(options);
    expect(r.stats.hits).toBe(0);
    expect(r.stats.ignored.every((i) => i.reason === 'corrupt')).toBe(true);
    expect(JSON.stringify(r.facts)).toBe(JSON.stringify(cold.facts));
    expect((await run(options)).stats.hits).toBe(FILES);
  });

  it('a cache path that cannot be written: the facts are right and the stats carry one warning', async () => {
    fs.writeFileSync(cacheDir, 'not a folder');
    const options = optionsOf();
    const r = await run(options);
    expect(JSON.stringify(r.facts)).toBe(await fresh(options));
    expect(r.stats.warning).toMatch(/^cache not saved in ".*cache": /);
  });
});
