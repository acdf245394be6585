/**
 * Issue 7 property tests (fast-check) that the stage tests do not already make. Already made
 * elsewhere and not repeated here: random Markdown/HTML never throw out of parseSource
 * (test/parse/fuzz.test.ts), any href resolves without throwing to a consistent result
 * (test/graph/resolve.test.ts), random sites give PageRank summing to 1 and depths equal to a
 * reference BFS (test/rank/rank.test.ts). Added here:
 * - hostile hrefs never resolve outside the site: a resolved internal target is a page route
 *   under the base path, and no resolved target has a `..` segment;
 * - random sites of hostile documents go through every stage after collect without a throw,
 *   give a well-formed report, and the same report whatever the order of the files.
 */
import { createHash } from 'node:crypto';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { finishAnalysis } from '../../src/analyze.js';
import type { CollectedInputs } from '../../src/analyze.js';
import { buildGraph } from '../../src/graph/index.js';
import { resolveOptions } from '../../src/config/options.js';
import { parseSource } from '../../src/parse/index.js';
import { formatReport } from '../../src/report/index.js';
import type { SourceFile } from '../../src/types.js';
import { link, page } from '../graph/facts.js';

const PIECES = [
  '..', '../', '../../', '/..', '%2e%2e', '%2E%2e/', '.%2e/', '%2f', '%5c', '\\', '//', '/', '.', './', '%00', '\u0000', '%', '%c0%ae',
  '%252e', '#', '#..', '?', '?../', ';', ':', 'file:', 'file:///', 'C:', 'c|', '~', 'etc', 'passwd', 'canary.md', 'a', 'a.md', 'b.html',
  'index.html', 'x.png', 'docs', ' ', '\t', '\n', 'é', '%C3%A9', '\uFFFD', '..;', '....//', '%0a', '@', 'http:', 'https://linkweave.invalid/../',
];
const href = fc.oneof(
  fc.array(fc.constantFrom(...PIECES), { maxLength: 10 }).map((p) => p.join('')),
  fc.string({ maxLength: 30 }),
  fc.webUrl(),
);

describe('hostile hrefs never leave the site (fast-check)', () => {
  it.each(['/', '/docs/'])('basePath %s: targets of page links are page routes under it, no target has a ".." segment', (basePath) => {
    const opts = resolveOptions({ routes: { basePath } }, '/site');
    const r = (p: string) => `${basePath}${p}`;
    const others = [
      page('index.md', r('')),
      page('a.md', r('a/'), { ids: ['x'] }),
      page('d/e/deep.md', r('d/e/deep/')),
      page('d/b.html', r('d/b.html'), { kind: 'html' }),
    ];
    fc.assert(
      fc.property(fc.array(href, { minLength: 1, maxLength: 12 }), fc.constantFrom(0, 2, 3), fc.boolean(), (hrefs, on, withBase) => {
        const from = others[on]!;
        const links = hrefs.map((h, i) => link(h, i + 1, i % 3 === 2 ? { origin: 'pattern', fileRelative: /\.md$/.test(h) } : {}));
        const base = withBase && from.kind === 'html' ? { baseHref: '../../../' } : {};
        const pages = others.map((p, i) => (i === on ? page(p.file, p.route, { kind: p.kind, links, ...base }) : p));
        const graph = buildGraph({ pages, assets: ['x.png', 'd/x.png'], navigation: null, redirects: [] }, opts);
        const routes = new Set(graph.pages.map((p) => p.route));
        expect(graph.links).toHaveLength(hrefs.length);
        for (const l of graph.links) {
          if (l.to >= 0) {
            expect(routes.has(l.target)).toBe(true);
            expect(l.target.startsWith(basePath)).toBe(true);
          }
          // "As written" targets are the broken ones that did not resolve at all.
          if (l.target === l.raw.href && l.status === 'broken') continue;
          if (l.kind === 'internal' || l.kind === 'asset') expect(l.target.split(/[/\\]/)).not.toContain('..');
        }
      }),
      { numRuns: 300, seed: 7071 },
    );
  });
});

/** Pieces of hostile documents: fences, deep markers, bad frontmatter, links out, BOM, CR, NUL... */
const DOC_PIECES = [
  '---\ntitle: [bad\n---\n', '---\nslug: ../../x\naliases: ["../y", 3]\n---\n', '\uFEFF', '\r\n', '\r', '\n\n', '\u0000', '\uFFFD',
  '> > > > > > ', '- - - - ', '    code\n', '```\n', '<a href="', '">', '</a>', '<div>', '<nav><a href="p1.md">n</a></nav>',
  '[x](', ')', '[r]: ../p2.md\n', '[r]', '{{ref "../p1.md"}}', '{{ref "p2.md"}}', 'p0.md', 'p1.md', 'p2.html', '../', '#h', '# H\n',
  '*a **b ', '![i](x.png)', 'words here ', '%2e%2e/', 'file:///etc/passwd', '<base href="../../">', '&#0;', '<!--', '-->',
];
const doc = fc.array(fc.constantFrom(...DOC_PIECES), { maxLength: 40 }).map((p) => p.join(''));

function sourceOf(path: string, text: string): SourceFile {
  const bytes = Buffer.from(text, 'utf8');
  return { path, kind: path.endsWith('.html') ? 'html' : 'markdown', bytes: bytes.length, hash: createHash('sha256').update(bytes).digest('hex'), text, problems: [] };
}

function collected(files: SourceFile[]): CollectedInputs {
  return { sources: { files, assets: ['x.png'], warnings: [] }, navigation: null, redirects: [], traffic: null, auxProblems: [] };
}

describe('random hostile sites through every stage after collect (fast-check)', () => {
  const opts = resolveOptions({ linkPatterns: [{ pattern: '\\{\\{ref "([^"]+)"\\}\\}', route: '$1' }], maxLinksPerPage: 30, workers: 1 }, '/site');
  const names = ['index.md', 'p0.md', 'p1.md', 'p2.html', 'sub/p3.md', 'sub/index.html', 'sub/p4.htm', 'p5.mdx'];
  const site = fc.integer({ min: 1, max: names.length }).chain((n) => fc.tuple(fc.array(doc, { minLength: n, maxLength: n }), fc.array(fc.nat(), { minLength: n, maxLength: n })));

  it('no throw, a well-formed report, identical whatever the order of the files', async () => {
    await fc.assert(
      fc.asyncProperty(site, async ([texts, keys]) => {
        const files = texts.map((t, i) => sourceOf(names[i]!, t));
        const reports: string[] = [];
        // In path order, and in an order given by random keys.
        const orders = [files, files.map((f, i) => ({ f, k: keys[i]! })).sort((a, b) => a.k - b.k).map((x) => x.f)];
        for (const ordered of orders) {
          const facts = ordered.map((f) => parseSource(f, opts));
          const report = await finishAnalysis({ options: opts, command: 'suggest', facts, collected: collected(ordered), hooks: {} });
          const total = report.pages.reduce((s, p) => s + p.pagerank, 0);
          if (report.pages.length > 0) expect(Math.abs(total - 1)).toBeLessThan(1e-6 * report.pages.length + 1e-9);
          const routes = new Set(report.pages.map((p) => p.route));
          for (const p of report.pages) expect(p.route.split('/')).not.toContain('..');
          for (const l of report.links) if (l.status === 'ok') expect(routes.has(l.to.split('#')[0]!)).toBe(true);
          for (const f of report.findings) {
            expect(f.line).toBeGreaterThanOrEqual(1);
            expect(f.column).toBeGreaterThanOrEqual(1);
            expect(f.message).not.toBe('');
          }
          for (const s of report.suggestions) expect(routes.has(s.source) && routes.has(s.target)).toBe(true);
          reports.push(['json', 'markdown', 'sarif'].map((id) => formatReport(report, id as 'json')).join('\n'));
        }
        expect(reports[1]).toBe(reports[0]);
      }),
      { numRuns: 60, seed: 8088 },
    );
  });
});
