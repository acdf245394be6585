/** The fingerprint lists exactly the options the parser reads. */
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseFingerprint, PARSE_OPTION_KEYS } from '../../src/cache/index.js';
import { collectSources } from '../../src/collect/index.js';
import { resolveOptions } from '../../src/config/options.js';
import type { ResolvedOptions } from '../../src/config/options.js';
import { parseSource } from '../../src/parse/index.js';
import type { SourceFile } from '../../src/types.js';
import { tempDir, writeTree } from './helpers.js';
import { CONFIG, SITE } from './site.js';

/** `options` behind a proxy that records every key path read (`routes.style`, `linkPatterns`...). */
function recording(options: ResolvedOptions, reads: Set<string>): ResolvedOptions {
  const wrap = (target: object, prefix: string): object =>
    new Proxy(target, {
      get(obj, key, receiver) {
        const value = Reflect.get(obj, key, receiver);
        if (typeof key !== 'string') return value;
        const name = prefix + key;
        reads.add(name);
        return typeof value === 'object' && value !== null && !Array.isArray(value) ? wrap(value, `${name}.`) : value;
      },
    });
  return wrap(options, '') as ResolvedOptions;
}

let files: SourceFile[];
let options: ResolvedOptions;
let cleanup: () => void;
beforeAll(async () => {
  const t = tempDir();
  cleanup = t.cleanup;
  const root = path.join(t.dir, 'site');
  writeTree(root, {
    ...SITE,
    'slugged.md': '---\nslug: elsewhere\n---\n# Slugged\n\n[a](index.md) [b](guide/index.md)\n',
    'perma.md': '---\npermalink: /fixed/place\n---\nNo heading, [one link](index.md).\n',
    'broken.md': '---\ntitle: [unclosed\n---\ntext\n',
    'empty.md': '',
  });
  options = resolveOptions({ ...CONFIG, maxLinksPerPage: 2 }, root);
  files = (await collectSources(options)).files;
});
afterAll(() => cleanup());

describe('PARSE_OPTION_KEYS', () => {
  it('holds every option parseSource reads (recorded on Markdown, HTML, front matter, too many links)', () => {
    const reads = new Set<string>();
    const proxied = recording(options, reads);
    for (const f of files) expect(JSON.stringify(parseSource(f, proxied))).toBe(JSON.stringify(parseSource(f, options)));
    // A read of `routes` itself is the way to `routes.style` etc.; the leaves are what count.
    const leaves = [...reads].filter((r) => ![...reads].some((o) => o.startsWith(`${r}.`))).sort();
    expect(leaves.filter((r) => !(PARSE_OPTION_KEYS as readonly string[]).includes(r))).toEqual([]);
    expect(leaves).toEqual([...PARSE_OPTION_KEYS].sort());
  });

  it('the fingerprint changes with each key and with nothing else', () => {
    const root = options.root;
    const base = parseFingerprint(resolveOptions({}, root));
    for (const config of [
      { routes: { style: 'html' as const } },
      { routes: { basePath: '/docs/' } },
      { routes: { indexNames: ['index'] } },
      { routes: { generator: 'hugo' as const } },
      { routes: { permalinks: { posts: '/:year/:title/' } } },
      { linkPatterns: [{ pattern: 'x', route: '/x/' }] },
      { maxLinksPerPage: 9 },
    ]) {
      expect(parseFingerprint(resolveOptions(config, root)), JSON.stringify(config)).not.toBe(base);
    }
    const unrelated = resolveOptions({ maxFileBytes: 5, entry: ['/a/'], routes: { caseInsensitive: true }, workers: 2, cache: { dir: 'x' } }, root);
    expect(parseFingerprint(unrelated)).toBe(base);
  });
});
