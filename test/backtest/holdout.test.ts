/**
 * The held-out sampler on small random sites (fast-check): what it may and may not remove.
 * Facts are hand-made literals (test/graph/facts.ts); the graph and rank stages are the real ones.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { contentPairs, eligiblePairs, holdOut } from '../../src/backtest/index.js';
import { buildGraph } from '../../src/graph/index.js';
import { rankGraph } from '../../src/rank/index.js';
import { hasContentLink } from '../../src/suggest/index.js';
import type { PageFacts, RawLink, SiteGraph } from '../../src/types.js';
import { link, options, page } from '../graph/facts.js';

const opts = options();

/** A random site: pages p0..p(n-1), content and template links, a footer link, excluded pages, maybe a navigation file. */
interface Site {
  readonly n: number;
  readonly links: readonly { readonly from: number; readonly to: number; readonly template: boolean; readonly text: string }[];
  readonly footerShare: number;
  readonly excluded: readonly boolean[];
  readonly navigation: boolean;
  readonly share: number;
  readonly seed: number;
}

const siteArb: fc.Arbitrary<Site> = fc
  .integer({ min: 2, max: 14 })
  .chain((n) =>
    fc.record({
      n: fc.constant(n),
      links: fc.array(
        fc.record({ from: fc.nat(n - 1), to: fc.nat(n - 1), template: fc.boolean(), text: fc.constantFrom('guide', 'setup', 'more') }),
        { maxLength: 4 * n },
      ),
      footerShare: fc.double({ min: 0, max: 1, noNaN: true }),
      excluded: fc.array(fc.boolean(), { minLength: n, maxLength: n }),
      navigation: fc.boolean(),
      share: fc.double({ min: 0.01, max: 0.9, noNaN: true }),
      seed: fc.integer(),
    }),
  );

function factsOf(site: Site): PageFacts[] {
  return Array.from({ length: site.n }, (_, i) => {
    const links: RawLink[] = [];
    site.links.forEach((l, k) => {
      if (l.from !== i) return;
      links.push(link(`p${l.to}.md`, k + 1, { text: l.text, context: l.template ? 'template' : 'content' }));
    });
    // A footer link repeated on a share of the pages: template by repetition when the share is high.
    if (i / site.n < site.footerShare) links.push(link('p0.md', 1000, { text: 'Home' }));
    const facts = page(`p${i}.md`, `/p${i}/`, { links });
    return { ...facts, meta: { ...facts.meta, exclude: site.excluded[i]! } };
  });
}

function graphOf(facts: readonly PageFacts[], site: Site): SiteGraph {
  const navigation = site.navigation ? { file: 'nav.yml', links: [link('/p1/', 1, { context: 'template', origin: 'navigation', text: 'One' })] } : null;
  return buildGraph({ pages: facts, assets: [], navigation, redirects: [] }, opts);
}

const templateLinks = (g: SiteGraph) =>
  g.links.filter((l) => l.context === 'template').map((l) => `${l.from}>${l.to}:${l.raw.text}@${l.raw.line}`).sort();

describe('holdOut', () => {
  it('never removes the last content inlink of a page, never removes a template link, and removes whole pairs', () => {
    fc.assert(
      fc.property(siteArb, (site) => {
        const facts = factsOf(site);
        const graph = graphOf(facts, site);
        const { facts: reduced, heldOut } = holdOut({ graph, facts, sourceText: () => undefined }, site.share, site.seed);
        const after = graphOf(reduced, site);

        // Pages with content inlinks keep at least one (rank stage's own count, not the sampler's).
        const before = rankGraph(graph, opts).contentInlinks;
        const left = rankGraph(after, opts).contentInlinks;
        for (let p = 0; p < site.n; p++) if (before[p]! > 0) expect(left[p]).toBeGreaterThan(0);

        // Template links (HTML-like contexts, repetition, navigation) are all still there.
        expect(templateLinks(after)).toEqual(templateLinks(graph));

        // Each held-out pair was a content pair between two pages, neither excluded, and is gone entirely.
        const keys = heldOut.map((p) => `${p.source}>${p.target}`);
        expect(new Set(keys).size).toBe(keys.length);
        for (const p of heldOut) {
          expect(p.source).not.toBe(p.target);
          expect(hasContentLink(graph.forward, p.source, p.target)).toBe(true);
          expect(hasContentLink(after.forward, p.source, p.target)).toBe(false);
          expect(graph.pages[p.source]!.meta.exclude || graph.pages[p.target]!.meta.exclude).toBe(false);
        }
        // Nothing else was removed: every other content pair is still linked.
        const held = new Set(keys);
        for (const p of contentPairs(graph)) {
          if (!held.has(`${p.source}>${p.target}`)) expect(hasContentLink(after.forward, p.source, p.target)).toBe(true);
        }
        // Pages without held-out links keep their facts object.
        const touched = new Set(heldOut.map((p) => graph.pages[p.source]!.factsIndex));
        reduced.forEach((f, i) => {
          if (!touched.has(i)) expect(f).toBe(facts[i]);
        });

        // Size: round(share x eligible), at least 1; fewer only when no further pair could go.
        const eligible = eligiblePairs(graph, contentPairs(graph));
        const want = eligible.length === 0 ? 0 : Math.max(1, Math.round(site.share * eligible.length));
        expect(heldOut.length).toBeLessThanOrEqual(want);
        if (heldOut.length < want) {
          for (const p of eligible) {
            if (!held.has(`${p.source}>${p.target}`)) expect(left[p.target]).toBe(1);
          }
        }
      }),
      { numRuns: 300 },
    );
  });

  it('gives the same sample for the same seed and another for another seed', () => {
    const site: Site = {
      n: 12,
      // Page i links to the five pages after it: every page has five content inlink sources.
      links: Array.from({ length: 60 }, (_, k) => ({ from: k % 12, to: (k % 12 + 1 + Math.floor(k / 12)) % 12, template: false, text: 'guide' })),
      footerShare: 0,
      excluded: new Array(12).fill(false),
      navigation: false,
      share: 0.3,
      seed: 0,
    };
    const facts = factsOf(site);
    const graph = graphOf(facts, site);
    const sample = (seed: number) => holdOut({ graph, facts, sourceText: () => undefined }, 0.3, seed).heldOut.map((p) => [p.source, p.target]);
    expect(sample(42)).toHaveLength(Math.round(0.3 * 60));
    expect(sample(42)).toEqual(sample(42));
    expect(sample(42)).not.toEqual(sample(43));
    // The input facts are not changed.
    expect(facts.map((f) => f.links.length)).toEqual(factsOf(site).map((f) => f.links.length));
  });

  it('holds nothing out when every page has a single content inlink source', () => {
    // A ring: each page's only content inlink is its predecessor's.
    const facts = Array.from({ length: 5 }, (_, i) => page(`p${i}.md`, `/p${i}/`, { links: [`p${(i + 1) % 5}.md`] }));
    const graph = buildGraph({ pages: facts, assets: [], navigation: null, redirects: [] }, opts);
    expect(holdOut({ graph, facts, sourceText: () => undefined }, 0.9, 1).heldOut).toEqual([]);
  });
});
