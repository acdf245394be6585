/**
 * The architecture test: dependency-cruiser checks every import under src/ against the stage
 * order recorded once in `.dependency-cruiser.cjs` (no import from a later stage, no cycle, no
 * module outside a stage), and the same rules are shown to fail on a small tree that breaks them.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import { cruise } from 'dependency-cruiser';
import type { ICruiseResult, IConfiguration } from 'dependency-cruiser';
import { afterAll, describe, expect, it } from 'vitest';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const config = createRequire(import.meta.url)(path.join(repo, '.dependency-cruiser.cjs')) as IConfiguration;

/** The rule violations of a cruise over `src/` below `baseDir`, as `rule: from -> to` lines, sorted. */
async function violations(baseDir: string): Promise<string[]> {
  const { output } = await cruise(['src'], { ...config.options, baseDir, validate: true, ruleSet: { forbidden: config.forbidden ?? [] } });
  const result = output as ICruiseResult;
  return result.summary.violations.map((v) => `${v.rule.name}: ${v.from} -> ${v.to}`).sort();
}

describe('the import rules of the stages', () => {
  it('the sources import nothing from a later stage and form no cycle', async () => {
    expect(await violations(repo)).toEqual([]);
  });

  describe('on a tree that breaks them', () => {
    const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'linkweave-arch-'));
    afterAll(() => fs.rmSync(tmp, { recursive: true, force: true }));
    const write = (file: string, text: string): void => {
      fs.mkdirSync(path.dirname(path.join(tmp, file)), { recursive: true });
      fs.writeFileSync(path.join(tmp, file), text);
    };
    // parse (earlier) imports graph (later): backwards.
    write('src/parse/links.ts', "import { edges } from '../graph/edges.js';\nexport const links = edges + 1;\n");
    write('src/graph/edges.ts', "import type { Page } from '../types.js';\nexport const edges = 1;\nexport type P = Page;\n");
    // graph imports the ground floor and a types file of a later stage: allowed.
    write('src/graph/uses.ts', "import { sortKey } from '../util/compare.js';\nimport type { Row } from '../report/types.js';\nexport const u = sortKey;\nexport type R = Row;\n");
    write('src/util/compare.ts', 'export const sortKey = 0;\n');
    write('src/report/types.ts', 'export interface Row { readonly id: number }\n');
    write('src/types.ts', 'export interface Page { readonly id: number }\n');
    // A cycle inside one stage, closed by a type import (reported once, at its first edge).
    write('src/text/a.ts', "import { b } from './b.js';\nexport const a = b;\n");
    write('src/text/b.ts', "import type { A } from './c.js';\nexport const b = 2;\nexport type B = A;\n");
    write('src/text/c.ts', "import { a } from './a.js';\nexport type A = typeof a;\n");
    // A named exception lets exactly its own import through.
    write('src/config/options.ts', "import { STYLES } from '../parse/heading-ids.js';\nimport { links } from '../parse/links.js';\nexport const o = [STYLES, links];\n");
    write('src/parse/heading-ids.ts', 'export const STYLES = [];\n');
    // A pure stage that imports the atomic file write (the ground floor, but only writers may),
    // and a writer that may.
    write('src/util/write-file.ts', 'export const writeFileAtomic = 0;\n');
    write('src/rules/save.ts', "import { writeFileAtomic } from '../util/write-file.js';\nexport const s = writeFileAtomic;\n");
    write('src/cli/out.ts', "import { writeFileAtomic } from '../util/write-file.js';\nexport const o = writeFileAtomic;\n");
    // A folder that is no stage.
    write('src/extra/thing.ts', "import { sortKey } from '../util/compare.js';\nexport const t = sortKey;\n");

    it('reports the backwards imports, the cycle, the unknown folder and the pure stage that writes files, and nothing else', async () => {
      expect(await violations(tmp)).toEqual([
        'file-writes: src/rules/save.ts -> src/util/write-file.ts',
        'no-cycle: src/text/a.ts -> src/text/b.ts',
        'stage-known: src/extra/thing.ts -> src/util/compare.ts',
        'stage-order: config (except options-heading-ids, options-preset-names): src/config/options.ts -> src/parse/links.ts',
        'stage-order: parse: src/parse/links.ts -> src/graph/edges.ts',
      ]);
    });
  });
});
