/**
 * The batched PageRank of the impact predictions on two threads (`pagerank-threads.ts`): the
 * same results to the bit as on one, with the real worker thread (the compiled module in dist/,
 * built by the vitest global setup), and the main thread doing the worker's half when the worker
 * cannot start.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import type { ExtraEdge } from '../../src/rank/pagerank.js';
import { pagerank } from '../../src/rank/pagerank.js';
import { pagerankScenarios } from '../../src/rank/pagerank-batch.js';
import { MIN_SPLIT_WORK, pagerankScenariosOnThreads } from '../../src/rank/pagerank-threads.js';
import { csrOf, prng, randomGraph } from './graphs.js';

const OPTIONS = { damping: 0.85, maxIterations: 200, tolerance: 1e-10 };

function bigCase() {
  const n = 3000;
  const edges = randomGraph(n, 11, 12);
  const { forward, reverse } = csrOf(n, edges);
  const start = pagerank(forward, reverse, n, OPTIONS).scores;
  const rnd = prng(5);
  const scenarios: ExtraEdge[][] = [];
  const at: number[][] = [];
  for (let k = 0; k < 80; k++) {
    const from = Math.floor(rnd() * n);
    const to = Math.floor(rnd() * n);
    scenarios.push([{ from, to, weight: 1 }]);
    // Reported nodes of different counts per scenario, so the shared buffer's layout is tested.
    at.push(k % 3 === 0 ? [to] : [to, from, (to + 1) % n]);
  }
  return { n, forward, reverse, start, scenarios, at };
}

describe('pagerankScenariosOnThreads', () => {
  const c = bigCase();
  const one = pagerankScenarios(c.forward, c.reverse, c.n, OPTIONS, c.scenarios, c.start, c.at);

  it('gives the values, iterations and convergence of one thread, on a graph big enough to split', () => {
    const small = pagerankScenariosOnThreads(c.forward, c.reverse, c.n, OPTIONS, c.scenarios.slice(0, 2), c.start, c.at.slice(0, 2), 2);
    expect(small.threads).toBe(1);
    expect(c.scenarios.length * c.forward.targets.length).toBeGreaterThan(MIN_SPLIT_WORK);
    const two = pagerankScenariosOnThreads(c.forward, c.reverse, c.n, OPTIONS, c.scenarios, c.start, c.at, 2);
    expect(two.threads).toBe(2);
    expect(two.values.map((v) => [...v])).toEqual(one.values.map((v) => [...v]));
    expect([...two.iterations]).toEqual([...one.iterations]);
    expect([...two.converged]).toEqual([...one.converged]);
    // The scenarios did work: each changed its target's rank, after some iterations.
    expect(one.iterations.every((i) => i > 1)).toBe(true);
  }, 60_000);

  it('solves the worker half on the main thread when the worker module is missing', () => {
    const missing = new URL('./no-such-worker.js', import.meta.url);
    const two = pagerankScenariosOnThreads(c.forward, c.reverse, c.n, OPTIONS, c.scenarios, c.start, c.at, 2, missing);
    expect(two.threads).toBe(1);
    expect(two.values.map((v) => [...v])).toEqual(one.values.map((v) => [...v]));
  }, 60_000);

  function withWorker(source: string, run: (url: URL) => void): void {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'linkweave-threads-'));
    try {
      const file = path.join(dir, 'worker.mjs');
      fs.writeFileSync(file, source);
      run(pathToFileURL(file));
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  }

  it('solves the worker half on the main thread when the worker fails', () => {
    // A worker whose work throws, reported through the real reporting code (compiled in dist/).
    const beside = pathToFileURL(path.resolve('dist/parallel/beside.js')).href;
    const source = `import { workerData } from 'node:worker_threads';\nimport { reportBeside } from '${beside}';\nawait reportBeside(workerData.status, async () => { throw new Error('no'); });\n`;
    withWorker(source, (url) => {
      const two = pagerankScenariosOnThreads(c.forward, c.reverse, c.n, OPTIONS, c.scenarios, c.start, c.at, 2, url);
      expect(two.threads).toBe(1);
      expect(two.values.map((v) => [...v])).toEqual(one.values.map((v) => [...v]));
      expect([...two.iterations]).toEqual([...one.iterations]);
    });
  }, 60_000);

  it('solves it on the main thread when the worker dies before it can report (its module throws while loading)', () => {
    withWorker("throw new Error('cannot load');\n", (url) => {
      const two = pagerankScenariosOnThreads(c.forward, c.reverse, c.n, OPTIONS, c.scenarios, c.start, c.at, 2, url);
      expect(two.threads).toBe(1);
      expect(two.values.map((v) => [...v])).toEqual(one.values.map((v) => [...v]));
    });
  }, 60_000);
});
