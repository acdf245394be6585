/**
 * The worker path gives exactly what the main thread gives (issue 9), and the report is
 * byte-identical with one or more worker threads (issue 7). Worker threads run the compiled
 * worker in dist/, built afresh from the sources by the vitest global setup (checked below).
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import type { AnalyzeHooks } from '../../src/analyze.js';
import { collectSources } from '../../src/collect/index.js';
import { resolveOptions } from '../../src/config/options.js';
import { parseFiles, parseInPool, workerUrl } from '../../src/parallel/index.js';
import type { ParseHooks, ParseStats } from '../../src/parallel/index.js';
import { formatReport } from '../../src/report/index.js';
import type { SourceFile } from '../../src/types.js';
import { tempDir } from '../cache/helpers.js';
import { writeSmallSite } from './site.js';

const PAGES = 3000;
let root: string;
let cleanup: () => void;
let files: SourceFile[];
beforeAll(async () => {
  expect(fs.existsSync(workerUrl()), 'dist/parallel/worker.js is missing: run `npm run build`').toBe(true);
  const t = tempDir('linkweave-parallel-');
  cleanup = t.cleanup;
  root = path.join(t.dir, 'site');
  writeSmallSite(root, PAGES);
  files = (await collectSources(resolveOptions({}, root))).files;
});
afterAll(() => cleanup());

describe('parseFiles', () => {
  it('worker threads (automatic choice, as on three cores) give the facts of the main thread, in the same order', async () => {
    expect(files.length).toBe(PAGES);
    const config = { linkPatterns: [{ pattern: 'page (\\d+):', route: '/part-0/page-$1/' }] };
    const main = await parseFiles(files, resolveOptions({ ...config, workers: 1 }, root), { cores: 2 });
    expect(main.stats).toEqual({ threads: 1, batches: 0, fallback: null });
    let progressed = 0;
    const pooled = await parseFiles(files, resolveOptions({ ...config, workers: 0 }, root), { cores: 3, onParsed: (n) => (progressed += n) });
    expect(pooled.stats.fallback).toBeNull();
    expect(pooled.stats.threads).toBe(2);
    expect(pooled.stats.batches).toBeGreaterThan(2);
    expect(progressed).toBe(PAGES);
    expect(pooled.facts.map((f) => f.file)).toEqual(files.map((f) => f.path));
    expect(pooled.facts.some((f) => f.links.some((l) => l.origin === 'pattern'))).toBe(true);
    expect(JSON.stringify(pooled.facts)).toBe(JSON.stringify(main.facts));
  }, 300_000);
});

describe('analyze with worker threads', () => {
  it('reports are byte-identical (JSON, Markdown, SARIF) with 1, 2 and 3 worker threads', async () => {
    const outputs: string[][] = [];
    const small = path.join(root, '..', 'small');
    writeSmallSite(small, 500);
    for (const workers of [1, 2, 3]) {
      let stats: ParseStats | undefined;
      const hooks: AnalyzeHooks & ParseHooks = { onParseStats: (s) => (stats = s) };
      const report = await analyze({ root: small, workers, cache: { enabled: false } }, hooks);
      expect(stats!.workers.threads).toBe(workers);
      expect(stats!.workers.fallback).toBeNull();
      outputs.push(['json', 'markdown', 'sarif'].map((id) => formatReport(report, id as 'json' | 'markdown' | 'sarif')));
    }
    expect(outputs[0]![0]!.length).toBeGreaterThan(10_000);
    expect(outputs[1]).toEqual(outputs[0]);
    expect(outputs[2]).toEqual(outputs[0]);
  }, 300_000);
});

describe('parseInPool', () => {
  it('a worker that cannot start: every batch is parsed on the main thread, same facts, the error named', async () => {
    const some = files.slice(0, 300);
    const options = resolveOptions({}, root);
    const main = await parseFiles(some, resolveOptions({ workers: 1 }, root), { cores: 2 });
    const r = await parseInPool(some, options, 2, () => undefined, new URL('./no-such-worker.js', workerUrl()));
    expect(r.stats.fallback).not.toBeNull();
    expect(JSON.stringify(r.facts)).toBe(JSON.stringify(main.facts));
  }, 120_000);
});

describe('workerUrl', () => {
  it('uses the compiled worker next to the module, or in dist/ when running from the sources', () => {
    expect(workerUrl('file:///x/dist/parallel/pool.js').href).toBe('file:///x/dist/parallel/worker.js');
    expect(workerUrl('file:///x/src/parallel/pool.ts').href).toBe('file:///x/dist/parallel/worker.js');
  });

  it('the compiled code the workers load was built from these sources: one built file per source, none older', () => {
    // The global setup removes dist/ and builds it again (type errors stop the run), so the
    // worker threads run the same code as the test files. A dist/ left from other sources fails here.
    // The HTML report's script modules (report/html/client/) are not compiled one by one: their
    // bundle is report/html/client.generated.ts.
    const src = path.resolve(import.meta.dirname, '../../src');
    const dist = path.resolve(import.meta.dirname, '../../dist');
    const client = path.join('report', 'html', 'client') + path.sep;
    const sources = fs.readdirSync(src, { recursive: true, encoding: 'utf8' }).filter((f) => f.endsWith('.ts') && !f.endsWith('.d.ts') && !f.startsWith(client));
    const built = fs.readdirSync(dist, { recursive: true, encoding: 'utf8' }).filter((f) => f.endsWith('.js'));
    expect(built.sort()).toEqual(sources.map((f) => f.replace(/\.ts$/, '.js')).sort());
    for (const f of sources) {
      expect(fs.statSync(path.join(dist, f.replace(/\.ts$/, '.js'))).mtimeMs, f).toBeGreaterThanOrEqual(fs.statSync(path.join(src, f)).mtimeMs);
    }
  });
});
