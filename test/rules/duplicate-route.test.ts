import { duplicateRoute } from '../../src/rules/index.js';
import { ruleTable } from './table.js';

ruleTable(duplicateRoute, {
  valid: [{ name: 'one file per route', site: { pages: [{ route: '/' }, { route: '/guide/' }] } }],
  invalid: [
    {
      name: 'the doc example: guide.md and guide/index.md',
      site: {
        // Both files give the route /guide/; the graph keeps the first by path.
        pages: [{ route: '/' }, { route: '/guide/', file: 'guide/index.md' }, { route: '/guide/', file: 'guide.md' }],
      },
      findings: [
        {
          file: 'guide/index.md',
          line: 1,
          column: 1,
          route: '/guide/',
          target: 'guide/index.md',
          message: 'Route /guide/ already belongs to guide.md; give this file another route (a slug) or remove it',
        },
      ],
    },
  ],
});
