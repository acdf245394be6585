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
            problems: [{ code: 'frontmatter', message: 'Unexpected front matter that is not valid YAML (flow sequence not closed), expected a YAML mapping', line: 2, column: 8 }],
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
          message: 'Unexpected front matter that is not valid YAML (flow sequence not closed), expected a YAML mapping',
        },
      ],
    },
    {
      name: 'a file that failed to parse is an error at 1:1; files that are not pages (drafts) are checked too',
      site: {
        pages: [{ route: '/' }],
        extraFacts: [factsOf({ route: '/broken/', file: 'broken.html' }, [{ code: 'parse-failed', message: 'Unexpected HTML that could not be parsed' }])],
      },
      findings: [{ file: 'broken.html', line: 1, column: 1, severity: 'error', target: 'parse-failed', message: 'Unexpected HTML that could not be parsed' }],
    },
    {
      name: 'collect warnings: unreadable is an error, a symlink leaving the root a warning; aux-file problems at their line',
      site: {
        pages: [{ route: '/' }],
        warnings: [
          { file: 'shared/outside.md', code: 'symlink-outside', message: 'Unexpected symlink leaving the content root, expected a file inside it' },
          { file: 'locked.md', code: 'unreadable', message: 'Unexpected unreadable file (EACCES), expected a readable file' },
        ],
      },
      findings: [
        { file: 'locked.md', line: 1, column: 1, severity: 'error', route: '', message: 'Unexpected unreadable file (EACCES), expected a readable file' },
        {
          file: 'shared/outside.md',
          line: 1,
          column: 1,
          severity: 'warning',
          route: '',
          message: 'Unexpected symlink leaving the content root, expected a file inside it',
        },
      ],
    },
    {
      name: 'a severity in the configuration applies to every finding of the rule',
      site: {
        pages: [{ route: '/', problems: [{ code: 'binary', message: 'Unexpected binary content, expected text' }, { code: 'invalid-utf8', message: 'Unexpected invalid UTF-8 at byte 12, expected UTF-8 text', line: 3 }] }],
        options: { rules: { 'source-problem': 'warning' } },
      },
      findings: [
        { file: 'index.md', line: 1, column: 1, severity: 'warning', message: 'Unexpected binary content, expected text' },
        { file: 'index.md', line: 3, column: 1, severity: 'warning', message: 'Unexpected invalid UTF-8 at byte 12, expected UTF-8 text' },
      ],
    },
  ],
});
