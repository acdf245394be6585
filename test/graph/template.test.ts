import { describe, it, expect } from 'vitest';
import { buildGraph } from '../../src/graph/index.js';
import type { Config } from '../../src/config/options.js';
import { link, options, page } from './facts.js';

/** n pages; the first `withFooter` of them carry a footer link to /f/ with `text`. */
function site(n: number, withFooter: number, text = 'Footer', config: Config = {}) {
  const pages = Array.from({ length: n }, (_, i) =>
    page(`p${i}.md`, `/p${i}/`, { links: i < withFooter ? [link('/f/', 9, { text: i === 1 ? ` ${text}\n` : text })] : [] }),
  );
  pages.push(page('f.md', '/f/'));
  const g = buildGraph({ pages, assets: [], navigation: null, redirects: [] }, options(config));
  return g.links.filter((l) => l.target === '/f/').map((l) => l.context);
}

describe('template links (DESIGN section 4: repeating on templateShare of pages)', () => {
  it('at the share: template; below it: content (n = 7 pages incl. /f/, share 0.5 -> 4 pages)', () => {
    expect(site(6, 4)).toEqual(Array(4).fill('template'));
    expect(site(6, 3)).toEqual(Array(3).fill('content'));
  });
  it('text is compared with whitespace collapsed; different text does not repeat', () => {
    expect(site(6, 4, 'Read  more')).toEqual(Array(4).fill('template'));
  });
  it('fewer than 4 pages: never template', () => {
    expect(site(2, 2)).toEqual(['content', 'content']);
  });
  it('templateShare is configurable', () => {
    expect(site(9, 5, 'x', { templateShare: 0.75 })).toEqual(Array(5).fill('content'));
    expect(site(9, 8, 'x', { templateShare: 0.75 })).toEqual(Array(8).fill('template'));
  });
  it('different texts to one target are different links', () => {
    const pages = Array.from({ length: 6 }, (_, i) => page(`p${i}.md`, `/p${i}/`, { links: [link('/p0/', 1, { text: `text ${i}` })] }));
    const g = buildGraph({ pages, assets: [], navigation: null, redirects: [] }, options());
    expect(g.links.every((l) => l.context === 'content')).toBe(true);
  });
});
