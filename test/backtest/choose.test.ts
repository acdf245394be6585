/**
 * The backtest ranks with `chooseLikeSuggest` (the suggestion stage without its impact
 * prediction). It must choose exactly what `suggestLinks` chooses: same pairs, anchors, offsets
 * and scores, on a generated site parsed by the real parse stage.
 */
import { describe, expect, it } from 'vitest';
import { generateSiteInMemory } from '../../bench/generate.js';
import { backtestOptions, chooseLikeSuggest } from '../../src/backtest/index.js';
import { textOf } from '../../src/pipeline/index.js';
import { buildGraph } from '../../src/graph/index.js';
import { resolveOptions } from '../../src/config/options.js';
import { parseSource } from '../../src/parse/index.js';
import { rankGraph } from '../../src/rank/index.js';
import { suggestLinks } from '../../src/suggest/index.js';
import type { SourceFile } from '../../src/types.js';

describe('chooseLikeSuggest', () => {
  it('chooses the same suggestions as suggestLinks with every page a target', () => {
    const site = generateSiteInMemory({ pages: 100, seed: 5, minFolderPages: 10, maxFolderPages: 30 });
    const files: SourceFile[] = [...site.contents]
      .filter(([path]) => path.endsWith('.md'))
      .map(([path, text]) => ({ path, kind: 'markdown', bytes: text.length, hash: `h-${path}`, text, problems: [] }));
    const base = resolveOptions({}, '/site', 'test');
    const facts = files.map((f) => parseSource(f, base));
    const graph = buildGraph({ pages: facts, assets: [], navigation: null, redirects: [] }, base);
    const options = backtestOptions(base, graph.pages.length);
    const ranking = rankGraph(graph, options);
    const ordered = graph.pages.map((p) => facts[p.factsIndex]!);
    const input = { graph, facts: ordered, ranking, ...textOf(ordered, options), traffic: null };

    const ours = chooseLikeSuggest(input, options).chosen.map((c) => ({
      source: graph.pages[c.pair.source]!.route,
      target: graph.pages[c.pair.target]!.route,
      anchor: c.anchor?.text ?? null,
      offset: c.anchor?.offset ?? -1,
      score: c.score,
    }));
    const stage = suggestLinks(input, options).suggestions.map((s) => ({ source: s.source, target: s.target, anchor: s.anchor, offset: s.offset, score: s.score }));
    const key = (x: { source: string; target: string }) => `${x.target} ${x.source}`;
    const sort = <T extends { source: string; target: string }>(xs: T[]) => xs.sort((a, b) => (key(a) < key(b) ? -1 : key(a) > key(b) ? 1 : 0));
    expect(stage.length).toBeGreaterThan(300);
    expect(sort(ours)).toEqual(sort(stage));
  });
});
