/**
 * A small site with one problem of most kinds and two suggested links, turned into a report
 * through the real rules and report builder. Shared by the report and formatter tests.
 */
import { runRules } from '../../src/rules/index.js';
import { buildReport } from '../../src/report/index.js';
import type { Importance } from '../../src/report/index.js';
import type { Report, Suggestion } from '../../src/types.js';
import { buildSite } from '../rules/helpers.js';
import type { SiteSpec } from '../rules/helpers.js';

/** The fixture site: 8 pages, a 5-click chain, a broken link and fragment, an orphan. */
export const SITE: SiteSpec = {
  pages: [
    {
      route: '/',
      file: 'index.md',
      title: 'Lantern docs',
      links: [
        { to: '/guide/', line: 3, column: 1, text: 'Guide' },
        { to: '/reference/', line: 4, column: 1, text: 'Reference' },
        { to: 'guide/instal.md', line: 9, column: 3, text: 'install' },
        { to: 'https://example.org/lantern', line: 11, column: 5, text: 'project site' },
      ],
    },
    {
      route: '/guide/',
      file: 'guide/index.md',
      title: 'Guide',
      links: [
        { to: '/guide/install/', href: 'install.md', line: 5, column: 1, text: 'Install' },
        { to: '/guide/install/#setup', href: 'install.md#setup', line: 14, column: 10, text: 'setting up' },
      ],
    },
    { route: '/guide/install/', file: 'guide/install.md', title: 'Install', ids: ['requirements', 'set-up'], links: ['/guide/configure/'] },
    { route: '/guide/configure/', file: 'guide/configure/index.md', title: 'Configure', links: ['/guide/configure/advanced/'] },
    { route: '/guide/configure/advanced/', file: 'guide/configure/advanced.md', title: 'Advanced', links: ['/guide/configure/advanced/tuning/'] },
    { route: '/guide/configure/advanced/tuning/', file: 'guide/configure/advanced/tuning.md', title: 'Tuning', importance: 'high' },
    { route: '/reference/', file: 'reference/index.md', title: 'Reference', links: ['/'] },
    { route: '/notes/old/', file: 'notes/old.md', title: 'Old notes', links: ['/'] },
  ],
};

/** Two suggestions, in the order a suggest stage might produce them (by score). */
export const SUGGESTIONS: Suggestion[] = [
  {
    id: 'b7e1c2d4',
    source: '/reference/',
    target: '/guide/configure/advanced/tuning/',
    file: 'reference/index.md',
    line: 5,
    column: 12,
    offset: 80,
    endOffset: 94,
    anchor: 'tuning options',
    similarity: 0.42187,
    score: 0.0843741,
    targetRankBefore: 0.56,
    targetRankAfter: 1.32456,
    depthBefore: 5,
    depthAfter: 2,
    reason: 'too deep: 5 clicks, limit 3',
    sourceHash: 'abc',
  },
  {
    id: '0f3a9e71',
    source: '/',
    target: '/notes/old/',
    file: 'index.md',
    line: 3,
    column: 1,
    offset: -1,
    endOffset: -1,
    anchor: null,
    similarity: 0.2,
    score: 0.01,
    targetRankBefore: 0.3,
    targetRankAfter: 0.61,
    depthBefore: null,
    depthAfter: 1,
    reason: 'orphan',
    sourceHash: 'def',
  },
];

/** Build the fixture's report (root `/work/docs`), optionally with other options or inputs. */
export function fixtureReport(
  extra: { spec?: Partial<SiteSpec>; suggestions?: readonly Suggestion[]; importance?: readonly Importance[] } = {},
): Report {
  const ctx = buildSite({ ...SITE, ...extra.spec, options: { ...SITE.options, ...extra.spec?.options } });
  const options = { ...ctx.options, root: '/work/docs' };
  return buildReport({
    options,
    graph: ctx.graph,
    ranking: ctx.ranking,
    findings: runRules({ ...ctx, options }),
    suggestions: extra.suggestions ?? SUGGESTIONS,
    files: ctx.facts.length,
    version: '0.1.0',
    ...(extra.importance === undefined ? {} : { importance: extra.importance }),
  });
}
