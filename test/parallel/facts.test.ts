/**
 * What crosses the thread boundary and what stays in memory is the facts alone: no syntax-tree
 * node (`type`, `children`, `position`...) is kept once a page's facts are extracted (issue 9,
 * "the AST of a page is dropped"). Checked key by key on real parser output.
 */
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { collectSources } from '../../src/collect/index.js';
import { resolveOptions } from '../../src/config/options.js';
import { parseSource } from '../../src/parse/index.js';
import type { PageFacts } from '../../src/types.js';
import { tempDir, writeTree } from '../cache/helpers.js';
import { SITE } from '../cache/site.js';
import { writeSmallSite } from './site.js';

/** The keys each kind of object in `PageFacts` may have (src/types.ts). */
const ALLOWED: Record<string, readonly string[]> = {
  facts: ['file', 'kind', 'hash', 'route', 'title', 'meta', 'headings', 'ids', 'fixedIds', 'includes', 'links', 'baseHref', 'text', 'spans', 'protected', 'problems'],
  'facts.meta': ['slug', 'permalink', 'draft', 'noindex', 'aliases', 'importance', 'exclude'],
  'facts.headings[]': ['depth', 'text', 'slug', 'line', 'column', 'explicit', 'raw'],
  'facts.includes[]': ['written', 'paths', 'line', 'column'],
  'facts.links[]': ['href', 'text', 'line', 'column', 'context', 'nofollow', 'origin', 'fileRelative'],
  'facts.text': ['title', 'headings', 'body'],
  'facts.spans[]': ['text', 'offset', 'line', 'column'],
  'facts.problems[]': ['code', 'message', 'line', 'column'],
};

/** Every object path and key found in `value` that `ALLOWED` does not list. */
function strayKeys(value: unknown, at: string, out: string[]): void {
  if (Array.isArray(value)) {
    for (const v of value) strayKeys(v, `${at}[]`, out);
    return;
  }
  if (typeof value !== 'object' || value === null) return;
  const allowed = ALLOWED[at];
  for (const key of Object.keys(value)) {
    if (allowed === undefined || !allowed.includes(key)) out.push(`${at}.${key}`);
    else strayKeys((value as Record<string, unknown>)[key], `${at}.${key}`, out);
  }
}

let facts: PageFacts[];
let cleanup: () => void;
beforeAll(async () => {
  const t = tempDir('linkweave-facts-');
  cleanup = t.cleanup;
  const root = path.join(t.dir, 'site');
  writeSmallSite(root, 60);
  writeTree(root, SITE);
  const options = resolveOptions({ maxLinksPerPage: 2 }, root);
  facts = (await collectSources(options)).files.map((f) => parseSource(f, options));
});
afterAll(() => cleanup());

describe('parsed facts', () => {
  it('hold only the fields of PageFacts, down to every link, heading, span and problem', () => {
    expect(facts.length).toBeGreaterThan(60);
    const stray: string[] = [];
    for (const f of facts) strayKeys(f, 'facts', stray);
    expect([...new Set(stray)]).toEqual([]);
  });

  it('are plain data: a JSON round trip gives them back unchanged', () => {
    expect(JSON.parse(JSON.stringify(facts))).toEqual(facts);
  });
});
