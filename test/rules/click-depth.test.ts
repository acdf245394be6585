import { clickDepth } from '../../src/rules/index.js';
import type { PageSpec } from './helpers.js';
import { ruleTable } from './table.js';

/** `/` -> `/a/` -> `/a/b/` ... a chain of `n` steps. */
function chain(n: number): PageSpec[] {
  const routes = ['/'];
  for (let i = 0; i < n; i++) routes.push(`${routes[i]!}${'abcdefgh'[i]}/`);
  return routes.map((route, i) => ({ route, ...(i + 1 < routes.length ? { links: [routes[i + 1]!] } : {}) }));
}

ruleTable(clickDepth, {
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
          message: '/a/b/c/d/ is 4 clicks from an entry page, over the limit of 3; link it from a page nearer the top',
        },
      ],
    },
    {
      name: 'the configured level applies; the limit is maxDepth',
      site: { pages: chain(2), options: { maxDepth: 1, checks: { 'click-depth': { level: 'error' } } } },
      findings: [
        { file: 'a/b.md', line: 1, column: 1, severity: 'error', message: '/a/b/ is 2 clicks from an entry page, over the limit of 1; link it from a page nearer the top' },
      ],
    },
    {
      name: 'the top-level maxDepth lowers the limit',
      site: { pages: chain(2), options: { maxDepth: 0 } },
      findings: [
        { file: 'a.md', line: 1, column: 1, message: '/a/ is 1 clicks from an entry page, over the limit of 0; link it from a page nearer the top' },
        { file: 'a/b.md', line: 1, column: 1, message: '/a/b/ is 2 clicks from an entry page, over the limit of 0; link it from a page nearer the top' },
      ],
    },
  ],
});
