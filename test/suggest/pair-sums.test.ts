/**
 * The target-major pair sums (`pair-sums.ts`) against the pairwise forms they replace on the hot
 * path, on the example site's real pages: every ordered pair, in target order and in a shuffled
 * order (so the target's rows are reloaded between calls), equal to the bit.
 */
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { cosine } from '../../src/text/tfidf.js';
import { TargetRows } from '../../src/suggest/pair-sums.js';
import { adamicAdar, contentNeighbours, twoStepPaths } from '../../src/suggest/proximity.js';
import { markdownPage, random, siteInput, testOptions } from './helpers.js';

const root = path.resolve('examples/docs-site');

function examplePages() {
  const files = fs.readdirSync(root, { recursive: true, encoding: 'utf8' }).filter((f) => /\.(md|html)$/.test(f) && !f.startsWith('README')).sort();
  return files.map((f) => markdownPage(f, fs.readFileSync(path.join(root, f), 'utf8')));
}

describe('pair sums with the target rows kept', () => {
  const input = siteInput(examplePages(), testOptions());
  const { graph, index } = input;
  const n = graph.pages.length;
  const nb = contentNeighbours(graph);
  const pairs: [number, number][] = [];
  for (let t = 0; t < n; t++) for (let s = 0; s < n; s++) if (s !== t) pairs.push([s, t]);

  function check(order: readonly [number, number][]): { nonZero: number[] } {
    const rows = new TargetRows(graph, index, nb);
    const nonZero = [0, 0, 0];
    for (const [s, t] of order) {
      const got = rows.of(s, t);
      const want = { similarity: cosine(index, s, t), adamicAdar: adamicAdar(nb, s, t).adamicAdar, twoStep: twoStepPaths(graph, s, t) };
      if (got.similarity !== want.similarity || got.adamicAdar !== want.adamicAdar || got.twoStep !== want.twoStep) {
        throw new Error(`pair ${graph.pages[s].route} -> ${graph.pages[t].route}: ${JSON.stringify(got)} against ${JSON.stringify(want)}`);
      }
      if (want.similarity > 0) nonZero[0]++;
      if (want.adamicAdar > 0) nonZero[1]++;
      if (want.twoStep > 0) nonZero[2]++;
    }
    return { nonZero };
  }

  it('equals cosine, Adamic-Adar and two-step paths on every pair, in target order', () => {
    expect(n).toBeGreaterThan(40);
    const { nonZero } = check(pairs);
    // The comparison is not empty: each sum is non-zero on many pairs of this site.
    for (const count of nonZero) expect(count).toBeGreaterThan(50);
  });

  it('equals them in a shuffled order, where the target changes on almost every call', () => {
    const rnd = random(7);
    const shuffled = [...pairs];
    for (let i = shuffled.length - 1; i > 0; i--) {
      const j = Math.floor(rnd() * (i + 1));
      [shuffled[i], shuffled[j]] = [shuffled[j]!, shuffled[i]!];
    }
    check(shuffled);
  });
});
