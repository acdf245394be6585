/**
 * Related pages kept in the cache folder (`src/cache/related.ts`, keyed by `relatedKey`): a run
 * whose term index is unchanged (only link targets changed) takes the lists of the last run,
 * with the report of a run without cache; any text change searches again.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { CONFIG_FILE, generateSite } from '../../bench/generate.js';
import { analyze } from '../../src/analyze.js';
import { relatedStore } from '../../src/cache/related.js';
import { buildTermIndex, relatedKey, relatedPages, relatedPagesMemo } from '../../src/text/index.js';
import type { RelatedMemo } from '../../src/text/index.js';
import type { RelatedList } from '../../src/types.js';
import { VERSION } from '../../src/version.js';
import { tempDir } from './helpers.js';

let base: string;
let cleanup: () => void;
beforeEach(() => {
  ({ dir: base, cleanup } = tempDir());
});
afterEach(() => cleanup());

const texts = [
  { title: 'Install the tool', headings: 'Requirements', body: 'Install the tool with npm; the tool needs Node and npm.' },
  { title: 'Configure the tool', headings: 'Options', body: 'The configuration file sets options of the tool and of npm.' },
  { title: 'Deploy', headings: 'Servers', body: 'Deploy the site to servers; configure the servers first.' },
  { title: 'Nothing shared', headings: '', body: 'Zebra quokka.' },
];

describe('related pages in the cache folder', () => {
  it('keeps the lists to the bit and refuses another key, page count, code, and damaged files', () => {
    const index = buildTermIndex(texts);
    const lists = relatedPages(index, 2);
    expect(lists.some((l) => l.related.length > 0)).toBe(true);
    const dir = path.join(base, 'store');
    const store = relatedStore(dir, VERSION);
    const key = relatedKey(index, 2);
    expect(store.get(key, 4)).toBeNull();
    store.set(key, lists);
    const back = store.get(key, 4)!;
    expect(back).toEqual(lists);
    back.forEach((l, i) => l.related.forEach((r, j) => expect(Object.is(r.similarity, lists[i]!.related[j]!.similarity)).toBe(true)));
    expect(store.get(relatedKey(index, 3), 4)).toBeNull();
    expect(store.get(key, 5)).toBeNull();
    expect(relatedStore(dir, `${VERSION}-other`).get(key, 4)).toBeNull();

    const file = path.join(dir, 'related.bin');
    const good = fs.readFileSync(file);
    const head = good.indexOf(10) + 1;
    const idsAt = head + 4 * 5;
    const badId = Buffer.from(good);
    badId.writeInt32LE(7, idsAt); // a page id past the last page
    const badSim = Buffer.from(good);
    badSim.writeDoubleLE(Number.NaN, good.length - 8);
    for (const junk of [good.subarray(0, good.length - 1), Buffer.from('{"schema":"linkweave/related-cache@1"'), badId, badSim]) {
      fs.writeFileSync(file, junk);
      expect(store.get(key, 4)).toBeNull();
    }
  });

  it('a memo is asked once per search and its lists used; the key follows every weight', () => {
    const index = buildTermIndex(texts);
    const kept = new Map<string, RelatedList[]>();
    let asked = 0;
    const memo: RelatedMemo = {
      get: (key) => {
        asked += 1;
        return kept.get(key) ?? null;
      },
      set: (key, lists) => void kept.set(key, [...lists]),
    };
    const plain = relatedPages(index, 2);
    expect(relatedPagesMemo(index, 2, memo)).toEqual(plain);
    expect(relatedPagesMemo(index, 2, memo)).toBe(kept.get(relatedKey(index, 2)));
    expect(asked).toBe(2);
    const nudged = { ...index, docWeights: index.docWeights.slice() };
    nudged.docWeights[3] = Math.fround(nudged.docWeights[3]! * (1 + 2 ** -20));
    expect(relatedKey(nudged, 2)).not.toBe(relatedKey(index, 2));
  });

  it('a run where only link targets changed reuses the lists; its report equals a run without cache', async () => {
    const root = path.join(base, 'site');
    const { plan } = generateSite(root, { pages: 60, seed: 8, minFolderPages: 10, maxFolderPages: 20 });
    const config = JSON.parse(fs.readFileSync(path.join(root, CONFIG_FILE), 'utf8')) as Record<string, unknown>;
    const cacheDir = path.join(base, 'cache');
    const run = async (cache: boolean): Promise<string> =>
      JSON.stringify(await analyze({ ...config, root, command: 'suggest', cache: cache ? { dir: cacheDir } : { enabled: false } }));
    expect(await run(true)).toBe(await run(false));
    const file = path.join(cacheDir, 'related.bin');
    const inode = fs.statSync(file).ino;

    // Point one content link at another page: same words, another graph.
    const page = plan.pages.find((p) => /\]\((?!https?:)[^)\s#]+\)/.test(fs.readFileSync(path.join(root, p.file), 'utf8').split('\n').slice(8).join('\n')))!;
    const source = path.join(root, page.file);
    const text = fs.readFileSync(source, 'utf8');
    fs.writeFileSync(source, text.slice(0, 200) + text.slice(200).replace(/\]\((?!https?:)[^)\s#]+\)/, `](${plan.pages[0]!.route})`));
    expect(fs.readFileSync(source, 'utf8')).not.toBe(text);
    const warm = await run(true);
    expect(fs.statSync(file).ino).toBe(inode); // read, not written again
    expect(warm).toBe(await run(false));

    // A changed sentence changes the index: searched again and stored anew.
    fs.appendFileSync(source, '\nA new sentence about deployment servers.\n');
    const changed = await run(true);
    expect(fs.statSync(file).ino).not.toBe(inode);
    expect(changed).toBe(await run(false));
  }, 120_000);
});
