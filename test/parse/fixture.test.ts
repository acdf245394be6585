/**
 * The fixture site `test/fixtures/parse-mixed` (Markdown and HTML, one purpose: what parse reads
 * from each kind of page), read from disk; `expected.json` beside it was written by hand.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { parseSource } from '../../src/parse/index.js';
import { options, sourceFile } from './helpers.js';

const root = fileURLToPath(new URL('../fixtures/parse-mixed/', import.meta.url));
const expected = JSON.parse(readFileSync(`${root}expected.json`, 'utf8')) as Record<
  string,
  { route: string; title: string; ids: string[]; links: [string, string, number, number, string, boolean][]; baseHref?: string; aliases?: string[] }
>;

describe('fixture site parse-mixed', () => {
  for (const [path, want] of Object.entries(expected)) {
    it(path, () => {
      const facts = parseSource(sourceFile(path, readFileSync(root + path, 'utf8')), options());
      expect(facts.route).toBe(want.route);
      expect(facts.title).toBe(want.title);
      expect(facts.ids).toEqual(want.ids);
      expect(facts.links.map((l) => [l.href, l.text, l.line, l.column, l.context, l.nofollow])).toEqual(want.links);
      expect(facts.baseHref).toBe(want.baseHref);
      expect(facts.meta.aliases).toEqual(want.aliases ?? []);
      expect(facts.problems).toEqual([]);
    });
  }
});
