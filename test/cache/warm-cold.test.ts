/**
 * Property: whatever files change between two runs, the report of a run with the caches of the
 * previous one (page facts, fitted link model, whole report) is byte-identical to the report of
 * a run without any cache. A generated site (bench/generate.ts, both site kinds) gets rounds of
 * seeded random edits: a paragraph appended, a link to another page added, a link turned into
 * plain text, a line removed.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { CONFIG_FILE, editForPage, generateSite } from '../../bench/generate.js';
import type { SitePlan } from '../../bench/site/plan.js';
import { analyze } from '../../src/analyze.js';
import { mulberry32 } from '../../src/util/prng.js';
import type { Random } from '../../src/util/prng.js';
import { tempDir } from './helpers.js';

const temps: (() => void)[] = [];
afterAll(() => temps.forEach((cleanup) => cleanup()));

/** One random edit of page `id`; returns what was done (for the failure message). */
function editPage(root: string, plan: SitePlan, id: number, rnd: Random, salt: number): string {
  const page = plan.pages[id]!;
  const file = path.join(root, page.file);
  const text = fs.readFileSync(file, 'utf8');
  const kind = Math.floor(rnd() * 4);
  if (kind === 0) {
    fs.appendFileSync(file, editForPage(plan, id, salt));
    return `${page.file}: paragraph appended`;
  }
  if (kind === 1) {
    const other = plan.pages[Math.floor(rnd() * plan.pages.length)]!;
    fs.appendFileSync(file, `\nThe [${other.title}](${other.route}) page says more on this.\n`);
    return `${page.file}: link to ${other.route} added`;
  }
  if (kind === 2) {
    const linked = /\[([^\]\n]+)\]\([^)\s]+\)/.exec(text.slice(text.indexOf('\n# ')));
    if (linked !== null) {
      fs.writeFileSync(file, text.replace(linked[0], linked[1]!));
      return `${page.file}: link "${linked[0]}" made plain text`;
    }
  }
  const lines = text.split('\n');
  const body = lines.findIndex((l, i) => i > 0 && l.startsWith('# ')) + 1;
  const at = body + Math.floor(rnd() * (lines.length - body));
  lines.splice(at, 1);
  fs.writeFileSync(file, lines.join('\n'));
  return `${page.file}: line ${at + 1} removed`;
}

describe.each(['topical', 'shared'] as const)('a warm run after random edits (%s site)', (vocabulary) => {
  it('gives the report of a cold run, byte for byte', async () => {
    const { dir, cleanup } = tempDir('linkweave-warm-');
    temps.push(cleanup);
    const root = path.join(dir, 'site');
    const cacheDir = path.join(dir, 'cache');
    const { plan } = generateSite(root, { pages: 90, seed: vocabulary === 'topical' ? 3 : 4, vocabulary, minFolderPages: 10, maxFolderPages: 30 });
    const config = JSON.parse(fs.readFileSync(path.join(root, CONFIG_FILE), 'utf8')) as Record<string, unknown>;
    const run = async (cache: boolean): Promise<string> =>
      JSON.stringify(await analyze({ ...config, root, command: 'suggest', cache: cache ? { dir: cacheDir } : { enabled: false } }));

    expect(await run(true)).toBe(await run(false));
    const rnd = mulberry32(vocabulary === 'topical' ? 16 : 61);
    let suggestionsSeen = 0;
    for (let round = 1; round <= 4; round++) {
      const edits: string[] = [];
      const count = 1 + Math.floor(rnd() * 3);
      for (let e = 0; e < count; e++) edits.push(editPage(root, plan, Math.floor(rnd() * plan.pages.length), rnd, round * 10 + e));
      const warm = await run(true);
      const cold = await run(false);
      expect(warm, `round ${round}: ${edits.join('; ')}`).toBe(cold);
      suggestionsSeen += (JSON.parse(cold) as { suggestions: unknown[] }).suggestions.length;
    }
    // Nothing changed since the last warm run: the report comes from the whole-report cache
    // (its large fields decoded when read) and is still the cold one.
    const stages: string[] = [];
    const hit = JSON.stringify(
      await analyze({ ...config, root, command: 'suggest', cache: { dir: cacheDir } }, { onStage: (stage, phase) => (phase === 'start' ? stages.push(stage) : undefined) }),
    );
    expect(stages).toEqual(['collect']);
    expect(hit).toBe(await run(false));
    // The comparison is worth something only if the reports carry suggestions and a fitted model.
    expect(suggestionsSeen).toBeGreaterThan(0);
    expect(fs.existsSync(path.join(cacheDir, 'link-model.json'))).toBe(true);
  }, 240_000);
});
