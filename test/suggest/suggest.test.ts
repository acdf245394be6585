import { describe, it, expect } from 'vitest';
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { suggestLinks } from '../../src/suggest/index.js';
import type { PageFacts } from '../../src/types.js';
import { markdownPage, siteInput, testOptions } from './helpers.js';

const root = join(import.meta.dirname, '..', 'fixtures', 'suggest-related');
const expected = JSON.parse(readFileSync(join(root, 'expected.json'), 'utf8')) as {
  underlinked: string[];
  suggested: [string, string][];
  anchors: Record<string, string>;
  unrelated: [string, string][];
};

function files(dir: string): string[] {
  return readdirSync(dir)
    .flatMap((name) => {
      const path = join(dir, name);
      return statSync(path).isDirectory() ? files(path) : [path];
    })
    .filter((p) => p.endsWith('.md'))
    .sort();
}

function loadFixture(): PageFacts[] {
  return files(root).map((path) => markdownPage(relative(root, path).split('\\').join('/'), readFileSync(path, 'utf8')));
}

describe('suggestLinks on the suggest-related fixture', () => {
  const options = testOptions();
  const input = siteInput(loadFixture(), options);
  const result = suggestLinks(input, options);
  const routeOf = (id: number): string => input.graph.pages[id]!.route;
  const unrelated = (a: string, b: string): boolean => expected.unrelated.some(([x, y]) => (x === a && y === b) || (x === b && y === a));

  it('finds the orphan page of each topic under-linked', () => {
    const found = result.underlinked.map((u) => [routeOf(u.page), u.reasons]);
    expect(found).toEqual(expected.underlinked.map((r) => [r, ['orphan', 'unreachable']]));
  });

  it('proposes the related, unlinked pairs known by hand as the best suggestion for their target', () => {
    for (const [source, target] of expected.suggested) {
      const forTarget = result.suggestions.filter((s) => s.target === target).sort((a, b) => b.score - a.score);
      expect(forTarget[0]?.source).toBe(source);
      expect(forTarget[0]?.anchor).toBe(expected.anchors[`${source} -> ${target}`]);
    }
  });

  it('never proposes a link between unrelated pages', () => {
    expect(result.suggestions.length).toBeGreaterThan(0);
    for (const s of result.suggestions) expect(unrelated(s.source, s.target)).toBe(false);
  });

  it('gives each suggestion an exact position and a computed impact', () => {
    for (const s of result.suggestions) {
      const facts = input.facts.find((f) => f.file === s.file)!;
      const source = readFileSync(join(root, s.file), 'utf8');
      if (s.anchor !== null) {
        expect(source.slice(s.offset, s.endOffset)).toBe(s.anchor);
        const lines = source.split('\n');
        expect(lines[s.line - 1]!.slice(s.column - 1, s.column - 1 + s.anchor.length)).toBe(s.anchor);
      }
      expect(s.sourceHash).toBe(facts.hash);
      expect(s.id).toMatch(/^[0-9a-f]{12}$/);
      expect(s.targetRankAfter).toBeGreaterThan(s.targetRankBefore);
      expect(s.depthBefore).toBeNull(); // both targets are unreachable orphans
      expect(s.reason).toMatch(/^orphan page \(no inlinks\), unreachable from the entry pages; /);
    }
    const warming = result.suggestions.find((s) => s.source === '/cache/eviction/' && s.target === '/cache/warming/')!;
    // /cache/eviction/ is 2 clicks from the home page, so the new link puts warming at depth 3.
    expect(warming.depthAfter).toBe(3);
  });

  it('plans the links that bring both orphans within maxDepth', () => {
    expect(result.plan.maxDepth).toBe(3);
    expect(result.plan.tooDeepBefore).toBe(2);
    expect(result.plan.tooDeepAfter).toBe(0);
    expect(result.plan.suggestionIds).toHaveLength(2);
    for (const id of result.plan.suggestionIds) expect(result.suggestions.some((s) => s.id === id)).toBe(true);
  });

  it('is sorted by file, line, column, target and the same on every run', () => {
    const keys = result.suggestions.map((s) => [s.file, s.line, s.column, s.target]);
    const sorted = [...keys].sort((a, b) => (a[0]! < b[0]! ? -1 : a[0]! > b[0]! ? 1 : 0) || (a[1] as number) - (b[1] as number) || (a[2] as number) - (b[2] as number));
    expect(keys).toEqual(sorted);
    expect(suggestLinks(siteInput(loadFixture(), options), options)).toEqual(result);
  });

  it("with suggest.targets 'all', proposes links to well-linked pages too, never between unrelated pages", () => {
    const all = testOptions({ suggest: { targets: 'all' } });
    const wide = suggestLinks(siteInput(loadFixture(), all), all);
    const targets = new Set(wide.suggestions.map((s) => s.target));
    expect(targets.size).toBeGreaterThan(2);
    for (const s of wide.suggestions) expect(unrelated(s.source, s.target)).toBe(false);
    expect(wide.suggestions.filter((s) => !expected.underlinked.includes(s.target)).every((s) => s.reason.startsWith('related page; '))).toBe(true);
  });
});
