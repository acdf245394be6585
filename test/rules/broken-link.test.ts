import { brokenLink } from '../../src/rules/index.js';
import { ruleTable } from './table.js';

ruleTable(brokenLink, {
  valid: [
    { name: 'link to an existing page', site: { pages: [{ route: '/', links: ['/guide/'] }, { route: '/guide/' }] } },
    { name: 'external links are never broken links', site: { pages: [{ route: '/', links: ['https://example.org/missing/'] }] } },
    { name: 'a link to the page itself', site: { pages: [{ route: '/', links: ['/'] }] } },
    {
      name: 'a link whose fragment is missing is left to broken-fragment',
      site: { pages: [{ route: '/', links: ['/guide/#nowhere'] }, { route: '/guide/' }] },
    },
  ],
  invalid: [
    {
      name: 'the doc example: a typo in a file link and in a route link, with the nearest file or route offered',
      site: {
        pages: [
          {
            route: '/guide/',
            file: 'guide/index.md',
            links: [
              { to: 'guide/instal.md', href: 'instal.md', line: 1, column: 6 },
              { to: '/guide/instal/', line: 1, column: 42 },
            ],
          },
          { route: '/guide/install/', file: 'guide/install.md' },
        ],
      },
      findings: [
        {
          file: 'guide/index.md',
          line: 1,
          column: 6,
          route: '/guide/',
          target: 'guide/instal.md',
          message:
            'Broken link: no source file guide/instal.md (written "instal.md"); did you mean guide/install.md?',
        },
        {
          file: 'guide/index.md',
          line: 1,
          column: 42,
          route: '/guide/',
          target: '/guide/instal/',
          message: 'Broken link: no page /guide/instal/; did you mean /guide/install/?',
        },
      ],
    },
    {
      name: 'a relative link from Markdown written without the extension of a Markdown file gets the link to that file',
      site: {
        pages: [
          {
            route: '/guide/intro/',
            file: 'guide/intro.md',
            links: [
              { to: '/guide/intro/setup', href: 'setup#wiring', line: 27, column: 5 },
              { to: '/guide/intro/My Notes', href: 'My%20Notes', line: 28, column: 1 },
              { to: '/guide/reference/cli', href: '../reference/cli?v=2', line: 29, column: 1 },
              { to: '/guide/intro/nowhere', href: 'nowhere', line: 30, column: 1 },
            ],
          },
          { route: '/guide/setup/', file: 'guide/setup.md' },
          { route: '/guide/my-notes/', file: 'guide/My Notes.md' },
          { route: '/reference/cli/', file: 'reference/cli.md' },
          { route: '/legacy/old/', file: 'legacy/old.html', links: [{ to: '/legacy/guide/setup', href: '../guide/setup', line: 3, column: 1 }] },
        ],
      },
      findings: [
        {
          file: 'guide/intro.md',
          line: 27,
          column: 5,
          route: '/guide/intro/',
          target: '/guide/intro/setup',
          message: 'Broken link: no page /guide/intro/setup (written "setup#wiring"); did you mean setup.md#wiring?',
        },
        {
          file: 'guide/intro.md',
          line: 28,
          column: 1,
          route: '/guide/intro/',
          target: '/guide/intro/My Notes',
          message: 'Broken link: no page /guide/intro/My Notes (written "My%20Notes"); did you mean My%20Notes.md?',
        },
        {
          file: 'guide/intro.md',
          line: 29,
          column: 1,
          route: '/guide/intro/',
          target: '/guide/reference/cli',
          message: 'Broken link: no page /guide/reference/cli (written "../reference/cli?v=2"); did you mean ../reference/cli.md?v=2?',
        },
        { file: 'guide/intro.md', line: 30, column: 1, route: '/guide/intro/', target: '/guide/intro/nowhere', message: 'Broken link: no page /guide/intro/nowhere (written "nowhere"); fix or remove the link' },
        { file: 'legacy/old.html', line: 3, column: 1, route: '/legacy/old/', target: '/legacy/guide/setup', message: 'Broken link: no page /legacy/guide/setup (written "../guide/setup"); fix or remove the link' },
      ],
    },
    {
      name: 'no hint when no route is close; the written form is left out when it equals the target',
      site: { pages: [{ route: '/', links: [{ to: '/reference/cli/', line: 7, column: 3 }] }, { route: '/guide/' }] },
      findings: [
        { file: 'index.md', line: 7, column: 3, message: 'Broken link: no page /reference/cli/; fix or remove the link' },
      ],
    },
    {
      name: 'a missing file (an image, a PDF) is named as a file, with no guess',
      site: { pages: [{ route: '/', links: [{ to: '/files/manual.pdf', line: 2, column: 1 }] }] },
      findings: [
        {
          file: 'index.md',
          line: 2,
          column: 1,
          message: 'Broken link: no file /files/manual.pdf; add the file or fix the link',
        },
      ],
    },
    {
      name: 'each broken link at its own position, sorted by file, line and column',
      site: {
        pages: [
          { route: '/b/', links: [{ to: '/nope/', line: 3, column: 9 }, { to: '/nope/', line: 3, column: 2 }] },
          { route: '/a/', links: [{ to: '/gone/', line: 10, column: 1 }] },
        ],
      },
      findings: [
        { file: 'a.md', line: 10, column: 1, message: 'Broken link: no page /gone/; fix or remove the link' },
        { file: 'b.md', line: 3, column: 2, message: 'Broken link: no page /nope/; fix or remove the link' },
        { file: 'b.md', line: 3, column: 9, message: 'Broken link: no page /nope/; fix or remove the link' },
      ],
    },
    {
      name: 'a broken navigation link belongs to the navigation file, with no route',
      site: {
        pages: [{ route: '/' }, { route: '/setup/' }],
        navigation: [{ to: 'set-up.md', line: 4, column: 3 }],
      },
      findings: [
        {
          file: '_nav.md',
          line: 4,
          column: 3,
          route: '',
          message: 'Broken link: no source file set-up.md; did you mean setup.md?',
        },
      ],
    },
    {
      name: 'links on excluded pages are not reported; links from other pages are',
      site: {
        pages: [
          { route: '/', links: [{ to: '/gone/', line: 5, column: 1 }] },
          { route: '/draft-notes/', exclude: true, links: [{ to: '/gone/', line: 2, column: 1 }] },
        ],
      },
      findings: [{ file: 'index.md', line: 5, column: 1, message: 'Broken link: no page /gone/; fix or remove the link' }],
    },
  ],
});
