import { maxClickDepth } from '../../src/rules/index.js';
import type { PageSpec } from './helpers.js';
import { ruleTable } from './table.js';

/** `/` -> `/a/` -> `/a/b/` ... a chain of `n` steps. */
function chain(n: number): PageSpec[] {
  const routes = ['/'];
  for (let i = 0; i < n; i++) routes.push(`${routes[i]!}${'abcdefgh'[i]}/`);
  return routes.map((route, i) => ({ route, ...(i + 1 < routes.length ? { links: [routes[i + 1]!] } : {}) }));
}

ruleTable(maxClickDepth, {
  valid: [
    { name: 'the doc example: depth 3 with the default limit 3', site: { pages: chain(3) } },
    { name: 'unreachable pages are left to unreachable-page', site: { pages: [{ route: '/' }, { route: '/far/' }] } },
    { name: 'the top-level maxDepth raises the limit', site: { pages: chain(5), options: { maxDepth: 5 } } },
  ],
  invalid: [
    {
      name: 'the doc example: depth 4 over the default limit 3',
      site: { pages: chain(4) },
      findings: [
        {
          file: 'a/b/c/d.md',
          line: 1,
          column: 1,
          route: '/a/b/c/d/',
          message: 'Unexpected click depth 4 for /a/b/c/d/, expected at most 3 clicks from an entry page',
        },
      ],
    },
    {
      name: 'the rule option max wins over the top-level maxDepth',
      site: { pages: chain(2), options: { maxDepth: 5, rules: { 'max-click-depth': ['error', { max: 1 }] } } },
      findings: [
        { file: 'a/b.md', line: 1, column: 1, severity: 'error', message: 'Unexpected click depth 2 for /a/b/, expected at most 1 click from an entry page' },
      ],
    },
    {
      name: 'the top-level maxDepth lowers the limit',
      site: { pages: chain(2), options: { maxDepth: 0 } },
      findings: [
        { file: 'a.md', line: 1, column: 1, message: 'Unexpected click depth 1 for /a/, expected at most 0 clicks from an entry page' },
        { file: 'a/b.md', line: 1, column: 1, message: 'Unexpected click depth 2 for /a/b/, expected at most 0 clicks from an entry page' },
      ],
    },
  ],
});
