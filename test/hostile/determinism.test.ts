/**
 * Issue 7, "determinism": the same input gives byte-identical reports (JSON, Markdown, SARIF,
 * and the HTML and text writers too) across runs, across the order the file system lists
 * files in (every listing reordered, see listing-order.ts), and across the order the collector
 * hands them on. The site is the example site (navigation, redirects, link patterns, traffic,
 * suggestions) plus files that make order matter: two files with one route, a bad file, a
 * symlink out of the root.
 */
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { collectInputs, finishAnalysis } from '../../src/pipeline/index.js';
import type { AnalyzeInput } from '../../src/analyze.js';
import { resolveOptions } from '../../src/config/options.js';
import { parseSource } from '../../src/parse/index.js';
import type { Report } from '../../src/types.js';
import { allFormats, cleanupAll, run, scratch } from './helpers.js';
import { reversed, shuffled, withListingOrder } from './listing-order.js';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const example = path.join(repo, 'examples', 'docs-site');
const config = JSON.parse(fs.readFileSync(path.join(example, 'linkweave.config.json'), 'utf8')) as Omit<AnalyzeInput, 'root'>;

/** Every file of the example site plus the order-sensitive extras, as path -> bytes. */
function siteFiles(): [string, Buffer][] {
  const files: [string, Buffer][] = [];
  const walk = (dir: string): void => {
    for (const name of fs.readdirSync(dir).sort()) {
      const abs = path.join(dir, name);
      if (fs.statSync(abs).isDirectory()) walk(abs);
      else files.push([path.relative(example, abs).split(path.sep).join('/'), fs.readFileSync(abs)]);
    }
  };
  walk(example);
  files.push(
    // Both have the route /guides/twin/: the first by path is kept, whatever the order.
    ['guides/twin.md', Buffer.from('# Twin one\n\nSee [the start](../index.md).\n')],
    ['guides/twin/index.md', Buffer.from('# Twin two\n\nSee [the start](../../index.md).\n')],
    ['guides/bad.md', Buffer.concat([Buffer.from('# Bad\n\nbyte '), Buffer.from([0xff]), Buffer.from(' [x](twin.md)\n')])],
  );
  return files;
}

/** Write the files in the given order under `root` (created), plus a symlink out of the root. */
function writeSite(root: string, files: readonly [string, Buffer][]): void {
  for (const [rel, bytes] of files) {
    const abs = path.join(root, ...rel.split('/'));
    fs.mkdirSync(path.dirname(abs), { recursive: true });
    fs.writeFileSync(abs, bytes);
  }
  fs.symlinkSync('..', path.join(root, 'outside'));
}

const FORMATS = ['json', 'markdown', 'sarif', 'html', 'text'];
const outputs = (report: Report) => allFormats(report);

let root: string;
let reference: Record<string, string>;
beforeAll(async () => {
  root = path.join(scratch(), 'site');
  writeSite(root, siteFiles());
  reference = outputs(await run(root, { ...config, command: 'suggest' }));
});
afterAll(cleanupAll);

describe('byte-identical reports', () => {
  it('the reference run has what makes order matter', () => {
    const report = JSON.parse(reference.json!) as Report;
    expect(report.suggestions.length).toBeGreaterThan(5);
    expect(report.findings.map((f) => f.rule)).toEqual(expect.arrayContaining(['duplicate-route', 'source-problem', 'broken-link']));
    expect(report.pages.find((p) => p.route === '/guides/twin/')!.file).toBe('guides/twin.md');
    expect(Object.keys(reference).sort()).toEqual([...FORMATS].sort());
  });

  it('across runs', async () => {
    expect(outputs(await run(root, { ...config, command: 'suggest' }))).toEqual(reference);
  });

  for (const [name, reorder] of [['reversed', reversed], ['shuffled (seed 7)', shuffled(7)], ['shuffled (seed 8)', shuffled(8)]] as const) {
    it(`across file-system listing orders: every directory listed ${name}`, async () => {
      const { value, listings } = await withListingOrder(reorder, () => run(root, { ...config, command: 'suggest' }));
      // The listing really came in another order: the content root and its guides/ folder were
      // listed, and in each the names handed on differ in order from what the disk returned.
      const under = (dir: string) => listings.find((l) => path.resolve(l.dir) === path.resolve(root, dir));
      for (const dir of ['.', 'guides']) {
        const l = under(dir);
        expect(l, dir).toBeDefined();
        expect(l!.disk.length).toBeGreaterThan(3);
        expect([...l!.given].sort()).toEqual([...l!.disk].sort());
        expect(l!.given).not.toEqual(l!.disk);
      }
      expect(outputs(value)).toEqual(reference);
    });
  }

  it('across the collector\'s order: the stages fed shuffled files, facts, assets and warnings (fast-check)', async () => {
    const options = resolveOptions({ ...config, workers: 1, cache: { enabled: false } }, root);
    const collected = await collectInputs(options);
    const { files, assets, warnings } = collected.sources;
    expect(warnings.length).toBeGreaterThan(0);
    const perm = (n: number) => fc.shuffledSubarray([...Array(n).keys()], { minLength: n, maxLength: n });
    await fc.assert(
      fc.asyncProperty(perm(files.length), perm(assets.length), perm(warnings.length), async (fo, ao, wo) => {
        const shuffled = fo.map((i) => files[i]!);
        const sources = { files: shuffled, assets: ao.map((i) => assets[i]!), warnings: wo.map((i) => warnings[i]!) };
        const facts = shuffled.map((f) => parseSource(f, options));
        const report = await finishAnalysis({ options, command: 'suggest', facts, collected: { ...collected, sources }, hooks: {} });
        expect(outputs(report)).toEqual(reference);
      }),
      { numRuns: 6, seed: 20240611 },
    );
  });
});
