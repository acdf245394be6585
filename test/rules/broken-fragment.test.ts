import { brokenFragment } from '../../src/rules/index.js';
import { ruleTable } from './table.js';

ruleTable(brokenFragment, {
  valid: [
    {
      name: 'the fragment is a heading slug of the target page',
      site: { pages: [{ route: '/', links: ['/guide/#set-up'] }, { route: '/guide/', ids: ['set-up'] }] },
    },
    { name: 'a link without a fragment', site: { pages: [{ route: '/', links: ['/guide/'] }, { route: '/guide/' }] } },
    { name: 'a missing page is left to broken-link', site: { pages: [{ route: '/', links: ['/gone/#x'] }] } },
  ],
  invalid: [
    {
      name: 'the doc example: a near miss of an existing slug',
      site: {
        pages: [
          { route: '/guide/', file: 'guide/index.md', links: [{ to: '/guide/install/#setup', href: 'install.md#setup', column: 5 }] },
          { route: '/guide/install/', file: 'guide/install.md', ids: ['requirements', 'set-up'] },
        ],
      },
      findings: [
        {
          file: 'guide/index.md',
          line: 1,
          column: 5,
          route: '/guide/',
          target: '/guide/install/#setup',
          message: 'Broken fragment: /guide/install/ has no heading or id "setup"; did you mean #set-up?',
        },
      ],
    },
    {
      name: 'a same-page fragment with nothing close',
      site: { pages: [{ route: '/', ids: ['intro'], links: [{ to: '/#configuration-reference', line: 12, column: 4 }] }] },
      findings: [
        {
          file: 'index.md',
          line: 12,
          column: 4,
          message: 'Broken fragment: / has no heading or id "configuration-reference"; fix the fragment or add the heading',
        },
      ],
    },
  ],
});
