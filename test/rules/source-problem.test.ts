import { sourceProblem } from '../../src/rules/index.js';
import { factsOf } from './helpers.js';
import { ruleTable } from './table.js';

ruleTable(sourceProblem, {
  valid: [{ name: 'files without problems', site: { pages: [{ route: '/' }, { route: '/a/' }] } }],
  invalid: [
    {
      name: 'the doc example: bad front matter is a warning at its position',
      site: {
        pages: [
          {
            route: '/guide/setup/',
            problems: [{ code: 'frontmatter', message: 'Front matter is not valid YAML (flow sequence not closed); the page is read without it', line: 2, column: 8 }],
          },
        ],
      },
      findings: [
        {
          file: 'guide/setup.md',
          line: 2,
          column: 8,
          severity: 'warning',
          route: '/guide/setup/',
          target: 'frontmatter',
          message: 'Front matter is not valid YAML (flow sequence not closed); the page is read without it',
        },
      ],
    },
    {
      name: 'a file that failed to parse is an error at 1:1; files that are not pages (drafts) are checked too',
      site: {
        pages: [{ route: '/' }],
        extraFacts: [factsOf({ route: '/broken/', file: 'broken.html' }, [{ code: 'parse-failed', message: 'The HTML could not be parsed; the page is kept without links' }])],
      },
      findings: [{ file: 'broken.html', line: 1, column: 1, severity: 'error', target: 'parse-failed', message: 'The HTML could not be parsed; the page is kept without links' }],
    },
    {
      name: 'collect warnings: unreadable is an error, a symlink leaving the root a warning; aux-file problems at their line',
      site: {
        pages: [{ route: '/' }],
        warnings: [
          { file: 'shared/outside.md', code: 'symlink-outside', message: 'Symlink leads out of the content root; it is skipped' },
          { file: 'locked.md', code: 'unreadable', message: 'File could not be read (EACCES); it is skipped' },
        ],
      },
      findings: [
        { file: 'locked.md', line: 1, column: 1, severity: 'error', route: '', message: 'File could not be read (EACCES); it is skipped' },
        {
          file: 'shared/outside.md',
          line: 1,
          column: 1,
          severity: 'warning',
          route: '',
          message: 'Symlink leads out of the content root; it is skipped',
        },
      ],
    },
    {
      name: 'a level in the configuration applies to every finding of the check',
      site: {
        pages: [{ route: '/', problems: [{ code: 'binary', message: 'Binary content; the file is skipped' }, { code: 'invalid-utf8', message: 'Invalid UTF-8 at byte 12; read with replacement characters', line: 3 }] }],
        options: { checks: { 'source-problem': { level: 'warning' } } },
      },
      findings: [
        { file: 'index.md', line: 1, column: 1, severity: 'warning', message: 'Binary content; the file is skipped' },
        { file: 'index.md', line: 3, column: 1, severity: 'warning', message: 'Invalid UTF-8 at byte 12; read with replacement characters' },
      ],
    },
  ],
});
