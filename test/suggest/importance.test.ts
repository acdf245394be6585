import { describe, it, expect } from 'vitest';
import { computeImportance, viewsPerPage } from '../../src/suggest/importance.js';
import { percentiles } from '../../src/suggest/percentile.js';
import { markdownPage, siteInput, testOptions } from './helpers.js';

describe('percentiles', () => {
  it('gives mid-rank percentiles, equal values equal', () => {
    expect([...percentiles([5, 1, 3, 3])]).toEqual([1, 0, 0.5, 0.5]);
    expect([...percentiles([7])]).toEqual([0.5]);
    const some = percentiles([1, 2, 3], (i) => i !== 1);
    expect(some[0]).toBe(0);
    expect(some[2]).toBe(1);
    expect(some[1]).toBeNaN();
  });
});

describe('computeImportance', () => {
  const pages = [
    markdownPage('index.md', '# Home\n\nSee [guide](guide/setup.md).\n'),
    markdownPage('guide/setup.md', '# Setup\n\nInstall the tool.\n'),
    markdownPage('guide/tuning.md', '# Tuning\n\nTune the cache.\n', { importance: 'low' }),
    markdownPage('api/tokens.md', '# Tokens\n\nIssue tokens.\n'),
    markdownPage('api/limits.md', '# Limits\n\nRate limits.\n', { importance: 'high' }),
    markdownPage('notes.md', '# Notes\n\nRelease notes.\n'),
  ];

  it('takes frontmatter first, then config globs on file paths and routes', () => {
    const options = testOptions({ important: ['guide/**', '/notes'] });
    const input = siteInput(pages, options);
    const imp = computeImportance(input.graph, options, null, input.centrality);
    const byRoute = Object.fromEntries(input.graph.pages.map((p) => [p.route, [imp.level[p.id], imp.source[p.id], imp.score[p.id]]]));
    expect(byRoute['/guide/tuning/']).toEqual(['low', 'frontmatter', 0]); // frontmatter beats the glob
    expect(byRoute['/api/limits/']).toEqual(['high', 'frontmatter', 1]);
    expect(byRoute['/guide/setup/']).toEqual(['high', 'config', 1]);
    expect(byRoute['/notes/']).toEqual(['high', 'config', 1]); // route pattern without the trailing slash
    expect(imp.source[input.graph.routeIndex.get('/api/tokens/')!]).toBe('centrality');
  });

  it('uses traffic percentiles when a CSV is given: top 10% high, bottom 30% low', () => {
    const options = testOptions();
    const traffic = new Map([
      ['/', 1000],
      ['/guide/setup', 400], // no trailing slash: still the page
      ['/api/tokens/', 50],
      ['/notes/', 10],
      ['/not-a-page/', 99999],
    ]);
    const input = siteInput(pages, options, traffic);
    const views = viewsPerPage(input.graph, traffic, options.routes);
    const id = (r: string): number => input.graph.routeIndex.get(r)!;
    expect(views[id('/guide/setup/')]).toBe(400);
    expect(views[id('/guide/tuning/')]).toBe(0);
    const imp = computeImportance(input.graph, options, traffic, input.centrality);
    // views: / 1000, setup 400, tokens 50, notes 10, limits 0, tuning 0 -> percentiles 1, 0.8, 0.6, 0.4, 0.1, 0.1
    expect(imp.level[id('/')]).toBe('high');
    expect(imp.level[id('/guide/setup/')]).toBe('normal');
    expect(imp.level[id('/notes/')]).toBe('normal');
    expect(imp.score[id('/notes/')]).toBeCloseTo(0.4, 12);
    expect(imp.source[id('/notes/')]).toBe('traffic');
    expect(imp.level[id('/api/limits/')]).toBe('high'); // frontmatter still wins
  });

  it('falls back to content centrality', () => {
    const options = testOptions();
    const input = siteInput(pages, options);
    const imp = computeImportance(input.graph, options, null, input.centrality);
    const p = percentiles(input.centrality);
    const tokens = input.graph.routeIndex.get('/api/tokens/')!;
    expect(imp.score[tokens]).toBe(p[tokens]);
  });
});
