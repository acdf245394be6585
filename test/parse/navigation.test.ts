/** The navigation file (DESIGN section 4) and the redirects file (DESIGN section 3). */
import { describe, expect, it } from 'vitest';
import { isEngineError } from '../../src/errors.js';
import { parseNavigation, parseRedirects } from '../../src/parse/index.js';

describe('parseNavigation', () => {
  it('Markdown: every link, template context, navigation origin, positions in the file', () => {
    const text = '# Docs\r\n\r\n- [Start](index.md)\r\n  - [Install][i]\r\n- <a href="/api/">API</a>\r\n\r\n[i]: guide/install.md\r\n';
    expect(parseNavigation('SUMMARY.md', text)).toEqual([
      { href: 'index.md', text: 'Start', line: 3, column: 3, context: 'template', nofollow: false, origin: 'navigation' },
      { href: 'guide/install.md', text: 'Install', line: 4, column: 5, context: 'template', nofollow: false, origin: 'navigation' },
      { href: '/api/', text: 'API', line: 5, column: 3, context: 'template', nofollow: false, origin: 'navigation' },
    ]);
  });

  it('YAML: nested lists of {title, link|href|path}, strings, and "Title: link" items', () => {
    const text = [
      '- title: Start',
      '  link: index.md',
      '- title: Guides',
      '  children:',
      '    - title: Install',
      '      href: guide/install.md',
      '    - guide/upgrade.md',
      '- Reference:',
      '    - API: api/index.md',
      '- path: faq.md',
    ].join('\n');
    const links = parseNavigation('nav.yml', text);
    expect(links.map((l) => [l.href, l.text, l.line, l.column])).toEqual([
      ['index.md', 'Start', 2, 9],
      ['guide/install.md', 'Install', 6, 13],
      ['guide/upgrade.md', '', 7, 7],
      ['api/index.md', 'API', 9, 12],
      ['faq.md', '', 10, 9],
    ]);
    expect(links.every((l) => l.context === 'template' && l.origin === 'navigation')).toBe(true);
  });

  it('invalid YAML: an E_CONFIG_INVALID error naming the file and line', () => {
    let error: unknown;
    try {
      parseNavigation('nav.yaml', '- a\n- [b\n- c\n');
    } catch (e) {
      error = e;
    }
    expect(isEngineError(error)).toBe(true);
    expect((error as { code: string }).code).toBe('E_CONFIG_INVALID');
    expect((error as Error).message).toMatch(/^nav\.yaml:\d+:\d+: navigation file is not valid YAML/);
  });
});

describe('parseRedirects', () => {
  it('from to per line; comments, blank lines and a status field ignored; bad lines reported by line', () => {
    const text = '# moved pages\r\n/old/ /new/\r\n\r\n/a  /b/  301\r\n/c /d # note\r\nonly-one\r\n/x /y /z\r\n';
    expect(parseRedirects('_redirects', text)).toEqual({
      redirects: [
        { from: '/old/', to: '/new/', line: 2 },
        { from: '/a', to: '/b/', line: 4 },
        { from: '/c', to: '/d', line: 5 },
      ],
      problems: [
        { line: 6, message: '1 field where a redirect needs "from to" (and an optional status code); the line is skipped' },
        { line: 7, message: '3 fields where a redirect needs "from to" (and an optional status code); the line is skipped' },
      ],
    });
  });
});
