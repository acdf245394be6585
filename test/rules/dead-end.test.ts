import { deadEnd } from '../../src/rules/index.js';
import { ruleTable } from './table.js';

const message = (route: string, which = 'content links'): string =>
  `Dead end: ${route} has no ${which} to other pages; add a link onward`;

ruleTable(deadEnd, {
  valid: [
    { name: 'pages that link onward', site: { pages: [{ route: '/', links: ['/a/'] }, { route: '/a/', links: ['/'] }] } },
    { name: 'a one-page site has nowhere to link to', site: { pages: [{ route: '/' }] } },
    {
      name: 'a file that was never read (too large) is left to source-problem',
      site: {
        pages: [{ route: '/', links: ['/big/'] }, { route: '/big/', problems: [{ code: 'too-large', message: 'over maxFileBytes' }] }],
      },
    },
    {
      name: 'countTemplateLinks true: navigation links count as outlinks',
      site: {
        pages: [{ route: '/' }, { route: '/a/' }],
        navigation: ['/', '/a/'],
        options: { checks: { 'dead-end': { level: 'warning', countTemplateLinks: true } } },
      },
    },
  ],
  invalid: [
    {
      name: 'the doc example: a page with only an external link',
      site: {
        pages: [{ route: '/', links: ['/guide/faq/'] }, { route: '/guide/faq/', links: ['https://example.org/'] }],
      },
      findings: [{ file: 'guide/faq.md', line: 1, column: 1, route: '/guide/faq/', message: message('/guide/faq/') }],
    },
    {
      name: 'self-links and broken links do not count',
      site: { pages: [{ route: '/', links: ['/a/'] }, { route: '/a/', links: ['/a/', '/gone/'] }] },
      findings: [{ file: 'a.md', line: 1, column: 1, message: message('/a/') }],
    },
    {
      name: 'by default a page whose only links are the sidebar\'s is a dead end',
      site: {
        pages: [{ route: '/', links: ['/a/'] }, { route: '/a/' }],
        navigation: ['/', '/a/'],
      },
      findings: [{ file: 'a.md', line: 1, column: 1, message: message('/a/') }],
    },
  ],
});
