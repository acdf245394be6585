/**
 * The link model on real parsed pages: features computed as if the pair's own link were
 * absent, and the same model and suggestions whatever order the files come in.
 */
import { describe, expect, it } from 'vitest';
import { createStemCache } from '../../src/text/index.js';
import { buildMentionIndex, stopMask } from '../../src/suggest/mentions.js';
import { contentOutlinks, F, pairFeatures } from '../../src/suggest/features.js';
import { contentNeighbours, routeFolders } from '../../src/suggest/proximity.js';
import { pagerankPercentiles, suggestLinks } from '../../src/suggest/index.js';
import { factsByPage } from '../../src/suggest/facts-of.js';
import type { SuggestInput } from '../../src/suggest/index.js';
import { markdownPage, mentionsOf, siteInput, testOptions } from './helpers.js';

function features(input: SuggestInput, from: string, to: string): number[] {
  const { graph, ranking, index } = input;
  const id = (route: string) => graph.pages.findIndex((p) => p.route === route);
  const mentions = buildMentionIndex(graph, factsByPage(input), createStemCache());
  const isEntry = new Uint8Array(graph.pages.length);
  for (const e of graph.entries) isEntry[e] = 1;
  const ctx = { graph, ranking, index, mentions, neighbours: contentNeighbours(graph), rankPct: pagerankPercentiles(graph, ranking), isEntry, outlinks: contentOutlinks(graph), folders: graph.pages.map((p) => routeFolders(p.route)) };
  return pairFeatures(ctx, id(from), id(to));
}

describe('features as if the pair link were absent', () => {
  const options = testOptions();
  const pages = [
    markdownPage('index.md', '# Home\n\nStart with [the guide](guide.md).\n'),
    markdownPage('guide.md', '# Guide\n\nRead about [zebra quokka](other.md) before you begin.\n'),
    markdownPage('other.md', '# Other page\n\nNothing here links back.\n'),
    markdownPage('prose.md', '# Prose\n\nA zebra quokka is mentioned here in plain words.\n'),
  ];
  const input = siteInput(pages, options);

  it('does not count the pair own link text as an anchor text of the target when only that pair uses it', () => {
    // "zebra quokka" names /other/ only through the link guide -> other. For that pair it is
    // the pair's own evidence: no anchor-text mention, no link counts of its own.
    const x = features(input, '/guide/', '/other/');
    expect(x[F['anchor-text-mention']]).toBe(0);
    expect(x[F.mentions]).toBe(0);
    expect(x[F['link-probability']]).toBe(0);
    expect(x[F.commonness]).toBe(0);
    expect(x[F['target-inlinks']]).toBe(0); // the one content inlink is the pair's own
    expect(x[F['source-outlinks']]).toBe(0);
    // Without the link, /other/ is unreachable: the depth feature says so.
    expect(x[F['target-depth']]).toBe(10);
  });

  it('counts it for another page that mentions the phrase (the site own word for the target)', () => {
    const x = features(input, '/prose/', '/other/');
    expect(x[F['anchor-text-mention']]).toBe(1);
    expect(x[F.mentions]).toBeCloseTo(Math.log1p(1), 12);
    // "zebra quokka" occurs twice on the site, once as a link to /other/.
    expect(x[F['link-probability']]).toBeCloseTo(1 / 2, 12);
    expect(x[F.commonness]).toBe(1);
    expect(x[F['target-inlinks']]).toBeCloseTo(Math.log1p(1), 12);
  });

  it('counts it for the pair too once another page links the target with the same words', () => {
    const more = siteInput([...pages, markdownPage('more.md', '# More\n\nSee [zebra quokka](other.md).\n')], options);
    const x = features(more, '/guide/', '/other/');
    expect(x[F['anchor-text-mention']]).toBe(1);
    expect(x[F.mentions]).toBeCloseTo(Math.log1p(1), 12);
    // Three occurrences of the phrase; the pair's own link counts as prose: 1 of 3 is a link.
    expect(x[F['link-probability']]).toBeCloseTo(1 / 3, 12);
    expect(x[F['target-inlinks']]).toBeCloseTo(Math.log1p(1), 12);
  });
});

describe('mention counts', () => {
  it('counts one mention once, though the phrase names the target three ways (title, route, link text)', () => {
    const { input, index: mentions, id } = mentionsOf([
      markdownPage('index.md', '# Home\n\nStart with [the guide](guide.md).\n'),
      markdownPage('tile-cache.md', '# Tile cache\n\nKeeps tiles.\n'),
      markdownPage('guide.md', '# Guide\n\nSet up the [tile cache](tile-cache.md) first.\n'),
      markdownPage('notes.md', '# Notes\n\nThe tile cache fills up.\n'),
    ]);
    const hit = mentions.bySource[id('/notes/')]!.get(id('/tile-cache/'));
    const phrase = mentions.phrases[hit!.phrases[0]];
    expect(phrase.names.filter((r) => r.target === id('/tile-cache/')).map((r) => r.kind).sort()).toEqual(['alias', 'anchor-text', 'title']);
    expect(hit!.count).toBe(1);
    expect(features(input, '/notes/', '/tile-cache/')[F.mentions]).toBeCloseTo(Math.log1p(1), 12);
  });
});

describe('stop words inside a name', () => {
  it.each([
    ['tile storage', 0],
    ['Storage of tiles', 1],
    ['the storage of the tiles', 1],
    ['getting started with the API', 0b10],
    ['npm install', 0],
    ['', 0],
  ])('%j has stop words after its kept words %i', (text, mask) => {
    expect(stopMask(text, createStemCache())).toBe(mask);
  });

  it('prose matches a name only with stop words where the name has them', () => {
    const { index: mentions, id } = mentionsOf([
      markdownPage('index.md', '# Home\n\n- [Package install](package-install.md)\n- [Storage of tiles](depot.md)\n'),
      markdownPage('package-install.md', '# Package install\n\nInstalls a package.\n'),
      markdownPage('depot.md', '# Storage of tiles\n\nWhere tiles live.\n'),
      markdownPage('notes.md', '# Notes\n\nA lock keeps the package from installing twice.\nThe storage for tiles is a folder.\n'),
      markdownPage('more.md', '# More\n\nRun the package install first.\nTile storage is a folder.\n'),
    ]);
    const anchors = (from: string, to: string) => mentions.bySource[id(from)]!.get(id(to))?.anchors.map((a) => a.text);
    expect(anchors('/notes/', '/package-install/')).toBeUndefined();
    expect(anchors('/more/', '/package-install/')).toEqual(['package install']);
    // Any stop words will do where the name has some; none where it has none.
    expect(anchors('/notes/', '/depot/')).toEqual(['storage for tiles']);
    expect(anchors('/more/', '/depot/')).toBeUndefined();
  });
});

describe('determinism', () => {
  it('gives the same model and suggestions whatever order the files are listed in', () => {
    const options = testOptions({ suggest: { targets: 'all' } });
    const topics = ['cache', 'tiles', 'render', 'export', 'import', 'layers', 'styles', 'fonts'];
    const pages = topics.map((t, i) =>
      markdownPage(
        `${t}.md`,
        `# ${t} setup\n\nThe ${t} setup uses ${topics[(i + 1) % topics.length]} setup and ${topics[(i + 3) % topics.length]} setup.\n\n` +
          `See [${topics[(i + 2) % topics.length]} setup](${topics[(i + 2) % topics.length]}.md) for more about ${t}.\n`,
      ),
    );
    const a = suggestLinks(siteInput(pages, options), options);
    const b = suggestLinks(siteInput([...pages].reverse(), options), options);
    expect(a.suggestions.length).toBeGreaterThan(0);
    expect(JSON.stringify(b.suggestions)).toBe(JSON.stringify(a.suggestions));
    expect(JSON.stringify(b.model)).toBe(JSON.stringify(a.model));
  });
});
