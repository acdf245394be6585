/**
 * The fitted link model kept in the cache folder (`src/cache/model.ts`): a run whose training
 * rows are the same takes the stored fit instead of fitting again, with the same report; a
 * stored fit is never trusted when its key, schema or numbers are wrong.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import { linkModelStore } from '../../src/cache/model.js';
import { fitKey, fitLinkModel, trainingPairs } from '../../src/suggest/model.js';
import type { FitMemo } from '../../src/suggest/model.js';
import type { LogisticModel } from '../../src/suggest/logistic.js';
import { FEATURES } from '../../src/suggest/features.js';
import { VERSION } from '../../src/version.js';
import { generateSite, CONFIG_FILE } from '../../bench/generate.js';
import { tempDir } from './helpers.js';

let base: string;
let cleanup: () => void;
beforeEach(() => {
  ({ dir: base, cleanup } = tempDir());
});
afterEach(() => cleanup());

/** A small linked site with enough links for a fitted (not fixed) model. */
function site(): { root: string; config: Record<string, unknown> } {
  const root = path.join(base, 'site');
  generateSite(root, { pages: 60, seed: 5, minFolderPages: 10, maxFolderPages: 20 });
  return { root, config: JSON.parse(fs.readFileSync(path.join(root, CONFIG_FILE), 'utf8')) as Record<string, unknown> };
}

describe('the link model in the cache folder', () => {
  it('is reused by a run whose training rows are unchanged, and that run reports what a cold run does', async () => {
    const { root, config } = site();
    const cacheDir = path.join(base, 'cache');
    const run = async (extra: Record<string, unknown>, cache: boolean): Promise<string> =>
      JSON.stringify(await analyze({ ...config, ...extra, root, command: 'suggest', cache: cache ? { dir: cacheDir } : { enabled: false } }));
    const cold = await run({}, true);
    expect(cold).toBe(await run({}, false));
    const file = path.join(cacheDir, 'link-model.json');
    const stored = JSON.parse(fs.readFileSync(file, 'utf8')) as { key: string; model: LogisticModel };
    expect((JSON.parse(cold) as { model: { source: string } }).model.source).toBe('fitted');

    // Another minimum score changes the report (so the whole-report cache misses) but not the
    // training rows: the stored fit is taken. Marking its first weight shows it was read.
    const marked = { ...stored, model: { ...stored.model, weights: [1234.5, ...stored.model.weights.slice(1)] } };
    fs.writeFileSync(file, JSON.stringify(marked));
    const reused = JSON.parse(await run({ suggest: { minScore: 0.01 } }, true)) as { model: { weights: number[] } };
    expect(reused.model.weights[0]).toBe(1234.5);

    // With the true fit back, that run equals a run without any cache, byte for byte.
    fs.writeFileSync(file, JSON.stringify(stored));
    fs.rmSync(path.join(cacheDir, 'report-suggest.json'));
    expect(await run({ suggest: { minScore: 0.01 } }, true)).toBe(await run({ suggest: { minScore: 0.01 } }, false));

    // A changed link changes the training rows: the model is fitted again and stored under a new key.
    const page = fs.readdirSync(root).find((f) => f.endsWith('.md') && f !== 'index.md')!;
    fs.appendFileSync(path.join(root, page), '\nSee [the home page](/) for more.\n');
    expect(await run({}, true)).toBe(await run({}, false));
    expect((JSON.parse(fs.readFileSync(file, 'utf8')) as { key: string }).key).not.toBe(stored.key);
  }, 120_000);

  it('keeps a fit to the bit and refuses a foreign key, another schema, non-finite numbers and junk', () => {
    const dir = path.join(base, 'store');
    const store = linkModelStore(dir, VERSION);
    const model: LogisticModel = {
      intercept: -2.718281828459045,
      weights: FEATURES.map((_, j) => Math.PI / (j + 3) - 0.1 ** (j + 1)),
      means: FEATURES.map((_, j) => 1 / (j + 7)),
      scales: FEATURES.map((_, j) => Math.sqrt(j + 2)),
      iterations: 9,
      converged: true,
    };
    expect(store.get('k')).toBeNull();
    store.set('k', model);
    const back = store.get('k')!;
    expect(back.intercept).toBe(model.intercept);
    back.weights.forEach((w, j) => expect(Object.is(w, model.weights[j])).toBe(true));
    expect(back).toEqual(model);
    expect(store.get('other')).toBeNull();
    expect(linkModelStore(dir, `${VERSION}-other`).get('k')).toBeNull();

    const file = path.join(dir, 'link-model.json');
    const good = JSON.parse(fs.readFileSync(file, 'utf8')) as Record<string, unknown>;
    for (const junk of [
      '{"schema":"linkweave/model-cache@1"',
      JSON.stringify({ ...good, schema: 'linkweave/model-cache@0' }),
      JSON.stringify({ ...good, model: { ...model, weights: [null, ...model.weights.slice(1)] } }),
      JSON.stringify({ ...good, model: { ...model, scales: model.scales.slice(1) } }),
      JSON.stringify({ ...good, model: { ...model, converged: 'yes' } }),
    ]) {
      fs.writeFileSync(file, junk);
      expect(store.get('k')).toBeNull();
    }
    // A model with a non-finite number is not stored (JSON would bring it back as null).
    fs.rmSync(file);
    store.set('k', { ...model, intercept: Number.NaN });
    expect(fs.existsSync(file)).toBe(false);
  });

  it('a fit memo is asked once per fit and its model used as is; the key follows every bit of the rows', () => {
    const rows = Array.from({ length: 200 }, (_, i) => FEATURES.map((_, j) => ((i * 31 + j * 17) % 23) / 23 + (i % 2) * (j === 0 ? 0.5 : 0)));
    const labels = rows.map((_, i) => i % 2);
    const sample = trainingPairs(Array.from({ length: 100 }, (_, t) => t), (t) => [100 + t, 200 + t], (s, t) => s === 100 + t);
    const featuresOf = (s: number, t: number): number[] => rows[(s >= 200 ? 100 : 0) + t]!.slice();
    const kept = new Map<string, LogisticModel>();
    let asked = 0;
    const memo: FitMemo = {
      get: (key) => {
        asked += 1;
        return kept.get(key) ?? null;
      },
      set: (key, model) => void kept.set(key, model),
    };
    const plain = fitLinkModel(sample, featuresOf);
    const first = fitLinkModel(sample, featuresOf, memo);
    const second = fitLinkModel(sample, featuresOf, memo);
    expect(asked).toBe(2);
    expect(kept.size).toBe(1);
    expect(first).toEqual(plain);
    expect(second).toEqual(plain);
    expect(plain.report.source).toBe('fitted');

    const changed = rows.map((r) => r.slice());
    changed[7]![3] = changed[7]![3]! + Number.EPSILON;
    expect(fitKey(changed, labels)).not.toBe(fitKey(rows, labels));
    expect(fitKey(rows, labels.map((l, i) => (i === 0 ? 1 - l : l)))).not.toBe(fitKey(rows, labels));
    expect(fitKey(rows.map((r) => r.slice()), labels.slice())).toBe(fitKey(rows, labels));
  });
});
