import { orphanPage } from '../../src/rules/index.js';
import { ruleTable } from './table.js';

const orphanMessage = (route: string, from = '/', which = 'No page links'): string => `${which} to ${route}; link it from ${from}`;

ruleTable(orphanPage, {
  valid: [
    { name: 'the doc example: index links to about', site: { pages: [{ route: '/', links: ['/about/'] }, { route: '/about/' }] } },
    { name: 'an entry page nobody links to is no orphan', site: { pages: [{ route: '/' }] } },
    {
      name: 'a page linked only by the navigation file counts as linked by default',
      site: { pages: [{ route: '/' }, { route: '/guide/' }], navigation: ['/guide/'] },
    },
    {
      name: 'an excluded page gets no finding',
      site: { pages: [{ route: '/' }, { route: '/old/', exclude: true }] },
    },
  ],
  invalid: [
    {
      name: 'the doc example: nothing links to old/notes.md',
      site: { pages: [{ route: '/', links: ['/guide/'] }, { route: '/guide/' }, { route: '/old/notes/' }] },
      findings: [{ file: 'old/notes.md', line: 1, column: 1, route: '/old/notes/', message: orphanMessage('/old/notes/') }],
    },
    {
      name: 'a link from the page to itself does not count',
      site: { pages: [{ route: '/' }, { route: '/loop/', links: ['/loop/'] }] },
      findings: [{ file: 'loop.md', line: 1, column: 1, message: orphanMessage('/loop/') }],
    },
    {
      name: 'countTemplateLinks false: sidebar-only pages are orphans',
      site: {
        pages: [{ route: '/', links: ['/a/'] }, { route: '/a/' }, { route: '/b/' }],
        navigation: ['/a/', '/b/'],
        options: { checks: { 'orphan-page': { level: 'warning', countTemplateLinks: false } } },
      },
      findings: [{ file: 'b.md', line: 1, column: 1, severity: 'warning', message: orphanMessage('/b/', '/', 'No content link leads') }],
    },
    {
      name: 'the configured level replaces the default',
      site: { pages: [{ route: '/' }, { route: '/lost/' }], options: { checks: { 'orphan-page': { level: 'warning' } } } },
      findings: [{ file: 'lost.md', line: 1, column: 1, severity: 'warning', message: orphanMessage('/lost/') }],
    },
    {
      name: 'the message names the nearest reachable page up the route; none reachable: a related page',
      site: { pages: [{ route: '/', links: ['/guide/'] }, { route: '/guide/' }, { route: '/guide/old/tips/' }, { route: '/lone/', links: ['/lone/x/'] }, { route: '/lone/x/' }] },
      findings: [
        { file: 'guide/old/tips.md', line: 1, column: 1, message: orphanMessage('/guide/old/tips/', '/guide/') },
        { file: 'lone.md', line: 1, column: 1, message: orphanMessage('/lone/') },
      ],
    },
  ],
});
