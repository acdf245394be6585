import { missingEntry } from '../../src/rules/index.js';
import { ruleTable } from './table.js';

ruleTable(missingEntry, {
  valid: [
    { name: 'the doc example: the default entry / exists', site: { pages: [{ route: '/' }] } },
    { name: 'several entries that all exist', site: { pages: [{ route: '/' }, { route: '/api/' }], options: { entry: ['/', '/api/'] } } },
  ],
  invalid: [
    {
      name: 'the doc example: /start/ on a site with /stars/',
      site: { pages: [{ route: '/' }, { route: '/stars/' }], options: { entry: ['/', '/start/'] } },
      findings: [
        {
          file: '',
          line: 1,
          column: 1,
          route: '/start/',
          target: '/start/',
          message: 'No page has the entry route /start/; correct "entry" in the configuration (did you mean /stars/?)',
        },
      ],
    },
    {
      name: 'no close route: no hint',
      site: { pages: [{ route: '/getting-started/' }] },
      findings: [{ file: '', line: 1, column: 1, message: 'No page has the entry route /; correct "entry" in the configuration' }],
    },
  ],
});
