/** The whole-report cache through `analyze`: an unchanged site gives the last report without parsing. */
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import type { AnalyzeHooks, StageName } from '../../src/analyze.js';
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

/** A run: the report as JSON and the stages that ran. */
async function run(extra: Record<string, unknown> = {}): Promise<{ json: string; stages: StageName[] }> {
  const stages: StageName[] = [];
  const hooks: AnalyzeHooks = { onStage: (stage, phase) => (phase === 'start' ? stages.push(stage) : undefined) };
  const report = await analyze({ ...CONFIG, command: 'suggest', cache: { dir: path.join(base, 'cache') }, ...extra, root }, hooks);
  return { json: JSON.stringify(report), stages };
}

describe('the whole-report cache', () => {
  it('an unchanged site gives a byte-identical report without parsing; any change runs the pipeline again', async () => {
    const uncached = await analyze({ ...CONFIG, command: 'suggest', cache: { enabled: false }, root });
    const cold = await run();
    expect(cold.stages).toContain('parse');
    expect(cold.json).toBe(JSON.stringify(uncached));
    expect(fs.existsSync(path.join(base, 'cache', 'report-suggest.json'))).toBe(true);

    const warm = await run();
    expect(warm.stages).toEqual(['collect']);
    expect(warm.json).toBe(cold.json);

    // A changed source, a changed option and another command each miss.
    const [first] = Object.keys(SITE).sort();
    fs.appendFileSync(path.join(root, first!), '\nOne more sentence about nothing in particular.\n');
    const changed = await run();
    expect(changed.stages).toContain('parse');
    expect(changed.json).toBe(JSON.stringify(await analyze({ ...CONFIG, command: 'suggest', cache: { enabled: false }, root })));
    expect((await run({ maxDepth: 1 })).stages).toContain('rank');
    expect((await run({ command: 'check' })).stages).toContain('rank');
  });

  it('a damaged or foreign cached report is ignored and replaced', async () => {
    const cold = await run();
    const file = path.join(base, 'cache', 'report-suggest.json');
    for (const junk of ['{"schema":"linkweave/report-cache@1"', '[]', JSON.stringify({ schema: 'linkweave/report-cache@1', key: 'other', report: {} })]) {
      fs.writeFileSync(file, junk);
      const again = await run();
      expect(again.stages).toContain('parse');
      expect(again.json).toBe(cold.json);
    }
  });
});

describe('the whole-report cache file', () => {
  it('keeps a report with more rows than fit on one line, field order and all', async () => {
    const { readResult, writeResult } = await import('../../src/cache/result.js');
    const row = (i: number): Record<string, unknown> => ({ from: `/p${i}/`, to: '/b/', line: i, text: 'é ✓ "quoted"' });
    const report = { schema: 'linkweave/report@1', stats: { pages: 2 }, links: Array.from({ length: 12_001 }, (_, i) => row(i)), pages: [] };
    const dir = path.join(base, 'lines');
    writeResult(dir, 'check', 'k1', report as never);
    const lines = fs.readFileSync(path.join(dir, 'report-check.json'), 'utf8').trimEnd().split('\n');
    expect(lines.length).toBe(1 + 2 + 3 + 1 + 1); // header, schema and stats, links in 3 lines, pages, the sizes
    expect(JSON.stringify(readResult(dir, 'check', 'k1'))).toBe(JSON.stringify(report));
    expect(readResult(dir, 'check', 'other')).toBeNull();
  });

  it('decodes a large field when it is first read, and gives the same report as decoding it all at once', async () => {
    const { readResult, writeResult } = await import('../../src/cache/result.js');
    const link = (i: number): Record<string, unknown> => ({ from: `/guide/${i}/`, to: `/ref/${i % 97}/`, line: i, text: `step ${i} ✓ "quoted"` });
    const report = {
      schema: 'linkweave/report@1',
      stats: { pages: 3, links: 7000 },
      links: Array.from({ length: 7000 }, (_, i) => link(i)),
      findings: [{ rule: 'broken-link', route: '/a/' }],
      gate: { passed: true },
    };
    const dir = path.join(base, 'lazy');
    writeResult(dir, 'suggest', 'k2', report as never);
    const read = readResult(dir, 'suggest', 'k2') as unknown as Record<string, unknown>;
    // The links (about 500 KB) wait to be read; the small fields are plain values.
    expect(typeof Object.getOwnPropertyDescriptor(read, 'links')?.get).toBe('function');
    expect(Object.getOwnPropertyDescriptor(read, 'stats')).toHaveProperty('value', { pages: 3, links: 7000 });
    expect(Object.keys(read)).toEqual(Object.keys(report));
    expect(JSON.stringify(read)).toBe(JSON.stringify(report));
    // Once read, the field is a plain value that stays the same array.
    const links = read.links as unknown[];
    expect(links).toHaveLength(7000);
    expect(links[6999]).toEqual(link(6999));
    expect(read.links).toBe(links);
    expect({ ...read }).toEqual(report);
    // Set before it was read, a field takes the new value.
    const again = readResult(dir, 'suggest', 'k2') as unknown as Record<string, unknown>;
    again.links = [];
    expect(again.links).toEqual([]);
  });

  it('reads a field of a report whose file a later run replaced, and closes the file once every field was read', async () => {
    const { readResult, writeResult } = await import('../../src/cache/result.js');
    const rows = (tag: string): Record<string, unknown>[] => Array.from({ length: 6000 }, (_, i) => ({ route: `/${tag}/${i}/`, line: i }));
    const first = { schema: 'linkweave/report@1', pages: rows('first'), links: rows('link') };
    const dir = path.join(base, 'replaced');
    writeResult(dir, 'check', 'k-first', first as never);
    const openFiles = (): number => fs.readdirSync('/proc/self/fd').length;
    const before = process.platform === 'linux' ? openFiles() : 0;
    const read = readResult(dir, 'check', 'k-first') as unknown as Record<string, unknown>;
    writeResult(dir, 'check', 'k-second', { schema: 'linkweave/report@1', pages: rows('second'), links: [] } as never);
    expect(readResult(dir, 'check', 'k-first')).toBeNull();
    expect(read.pages).toEqual(first.pages);
    if (process.platform === 'linux') expect(openFiles()).toBe(before + 1);
    expect(read.links).toEqual(first.links);
    if (process.platform === 'linux') expect(openFiles()).toBe(before);
    expect(JSON.stringify(read)).toBe(JSON.stringify(first));
  });

  it('ignores a file cut short', async () => {
    const { readResult, writeResult } = await import('../../src/cache/result.js');
    const report = { schema: 'linkweave/report@1', stats: { pages: 1 }, links: Array.from({ length: 12_000 }, (_, i) => ({ line: i })), pages: [] };
    const dir = path.join(base, 'cut');
    writeResult(dir, 'check', 'k3', report as never);
    const file = path.join(dir, 'report-check.json');
    const text = fs.readFileSync(file, 'utf8');
    expect(JSON.stringify(readResult(dir, 'check', 'k3'))).toBe(JSON.stringify(report));
    const lines = text.trimEnd().split('\n');
    fs.writeFileSync(file, `${lines.slice(0, -2).join('\n')}\n`);
    expect(readResult(dir, 'check', 'k3')).toBeNull();
    fs.writeFileSync(file, text.slice(0, -1));
    expect(readResult(dir, 'check', 'k3')).toBeNull();
  });

  it('a large field damaged on disk (same length) fails when read, naming the cache file and what to do', async () => {
    const { readResult, writeResult } = await import('../../src/cache/result.js');
    const report = { schema: 'linkweave/report@1', stats: { pages: 1 }, links: Array.from({ length: 12_000 }, (_, i) => ({ line: i })) };
    const dir = path.join(base, 'damaged');
    writeResult(dir, 'check', 'k4', report as never);
    const file = path.join(dir, 'report-check.json');
    const text = fs.readFileSync(file, 'utf8');
    // One byte of the links changed to another of the same length: the sizes still add up.
    const at = text.indexOf('{"line":5000}');
    expect(at).toBeGreaterThan(0);
    fs.writeFileSync(file, `${text.slice(0, at)}[${text.slice(at + 1)}`);
    const read = readResult(dir, 'check', 'k4') as unknown as Record<string, unknown>;
    expect(read).not.toBeNull();
    expect(read.stats).toEqual({ pages: 1 });
    let error: unknown;
    try {
      void read.links;
    } catch (e) {
      error = e;
    }
    expect(error).toMatchObject({ name: 'EngineError', code: 'E_IO' });
    expect((error as Error).message).toContain(file);
    expect((error as Error).message).toContain('"links"');
    expect((error as Error).message).toContain('delete the cache folder');
  });
});
