import { describe, it, expect } from 'vitest';
import { computeImportance } from '../../src/suggest/importance.js';
import { findUnderlinked, pagerankPercentiles } from '../../src/suggest/underlinked.js';
import { markdownPage, siteInput, testOptions } from './helpers.js';

describe('findUnderlinked', () => {
  // index -> a -> b -> c -> d (a chain: d is 4 clicks deep); orphan.md has no inlinks;
  // island.md is linked only from orphan.md (unreachable, not an orphan); hub.md is marked high
  // and linked once from the index; skip.md is excluded.
  const pages = [
    markdownPage('index.md', '# Home\n\n[a](a.md) [hub](hub.md)\n'),
    markdownPage('a.md', '# A\n\n[b](b.md)\n'),
    markdownPage('b.md', '# B\n\n[c](c.md)\n'),
    markdownPage('c.md', '# C\n\n[d](d.md)\n'),
    markdownPage('d.md', '# D\n\nEnd of the chain.\n'),
    markdownPage('orphan.md', '# Orphan\n\n[island](island.md)\n'),
    markdownPage('island.md', '# Island\n\nOnly the orphan links here.\n'),
    markdownPage('hub.md', '# Hub\n\n[a](a.md)\n', { importance: 'high' }),
    markdownPage('skip.md', '# Skip\n\nExcluded.\n', { exclude: true }),
  ];

  it('lists orphans, unreachable and too-deep pages and important pages with few content inlinks', () => {
    const options = testOptions({ suggest: { rankGap: 1 } });
    // every page but the hub explicitly normal, so that centrality makes no page important
    const pinned = pages.map((p) => (p.route === '/hub/' ? p : { ...p, meta: { ...p.meta, importance: 'normal' as const } }));
    const input = siteInput(pinned, options);
    const importance = computeImportance(input.graph, options, null, input.centrality);
    const found = findUnderlinked(input.graph, input.ranking, importance, pagerankPercentiles(input.graph, input.ranking), options);
    const byRoute = Object.fromEntries(found.map((u) => [input.graph.pages[u.page]!.route, u.reasons]));
    expect(byRoute).toEqual({
      '/d/': ['too-deep'],
      '/orphan/': ['orphan', 'unreachable'],
      '/island/': ['unreachable'],
      '/hub/': ['few-inlinks'],
    });
  });

  it('flags an important page whose PageRank percentile is far below its importance percentile', () => {
    const options = testOptions({ suggest: { rankGap: 0.5, minInlinks: 0 } });
    const input = siteInput(pages, options);
    const importance = computeImportance(input.graph, options, null, input.centrality);
    const rank = pagerankPercentiles(input.graph, input.ranking);
    const found = findUnderlinked(input.graph, input.ranking, importance, rank, options);
    for (let p = 0; p < input.graph.pages.length; p++) {
      const gap = importance.score[p]! - rank[p]!;
      const flagged = found.find((u) => u.page === p)?.reasons.includes('rank-below-importance') ?? false;
      const eligible = importance.level[p] === 'high' && p !== input.graph.entries[0] && !input.graph.pages[p]!.meta.exclude;
      expect(flagged).toBe(eligible && gap > 0.5);
    }
    const hub = input.graph.routeIndex.get('/hub/')!;
    // hub: importance 1 (frontmatter high); its PageRank percentile is below 0.5.
    expect(rank[hub]).toBeLessThan(0.5);
    expect(found.find((u) => u.page === hub)?.reasons).toEqual(['rank-below-importance']);
  });

  it('never lists entry pages or excluded pages', () => {
    const options = testOptions({ suggest: { rankGap: 0, minInlinks: 99 } });
    const input = siteInput(pages, options);
    const importance = computeImportance(input.graph, options, null, input.centrality);
    const found = findUnderlinked(input.graph, input.ranking, importance, pagerankPercentiles(input.graph, input.ranking), options);
    const routes = found.map((u) => input.graph.pages[u.page]!.route);
    expect(routes).not.toContain('/');
    expect(routes).not.toContain('/skip/');
  });
});
