import { unreachablePage } from '../../src/rules/index.js';
import { ruleTable } from './table.js';

ruleTable(unreachablePage, {
  valid: [
    {
      name: 'the doc example: a chain from the entry page',
      site: { pages: [{ route: '/', links: ['/guide/'] }, { route: '/guide/', links: ['/guide/install/'] }, { route: '/guide/install/' }] },
    },
    {
      name: 'template links count for depth by default',
      site: { pages: [{ route: '/' }, { route: '/guide/' }], navigation: ['/guide/'] },
    },
    {
      name: 'an orphan page is left to orphan-page',
      site: { pages: [{ route: '/' }, { route: '/lost/', links: ['/'] }] },
    },
    {
      name: 'no entry page at all: silent (missing-entry reports the cause)',
      site: { pages: [{ route: '/a/' }, { route: '/b/' }] },
    },
  ],
  invalid: [
    {
      name: 'the doc example: two archive pages link to each other only',
      site: {
        pages: [
          { route: '/', links: ['/guide/'] },
          { route: '/guide/' },
          { route: '/archive/', file: 'archive/index.md', links: ['/archive/2019/'] },
          { route: '/archive/2019/', links: ['/archive/'] },
        ],
      },
      findings: [
        {
          file: 'archive/2019.md',
          line: 1,
          column: 1,
          route: '/archive/2019/',
          message: '/archive/2019/ cannot be reached from /: only /archive/ links to it; link it from a reachable page',
        },
        {
          file: 'archive/index.md',
          line: 1,
          column: 1,
          route: '/archive/',
          message: '/archive/ cannot be reached from /: only /archive/2019/ links to it; link it from a reachable page',
        },
      ],
    },
    {
      name: 'depthCountsTemplate false: a page only the navigation reaches is unreachable',
      site: {
        pages: [{ route: '/' }, { route: '/guide/' }],
        navigation: ['/guide/'],
        options: { depthCountsTemplate: false, entry: ['/', '/missing/'] },
      },
      findings: [
        { file: 'guide.md', line: 1, column: 1, message: '/guide/ cannot be reached from /: only / links to it; link it from a reachable page' },
      ],
    },
  ],
});
