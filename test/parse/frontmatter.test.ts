/** Frontmatter keys linkweave reads (DESIGN section 3), their types, and the problems they give. */
import { describe, expect, it } from 'vitest';
import { md, html } from './helpers.js';

describe('frontmatter', () => {
  it('reads title, slug, draft, noindex, aliases and the linkweave key', () => {
    const f = md(
      [
        '---',
        'title: Install on a laptop',
        'slug: install',
        'draft: true',
        'noindex: true',
        'aliases: [/old/install/, setup]',
        'linkweave:',
        '  importance: high',
        '  exclude: true',
        'layout: page',
        '---',
        '# Other heading',
      ].join('\n'),
    );
    expect(f.title).toBe('Install on a laptop');
    expect(f.route).toBe('/install/');
    expect(f.meta).toEqual({ slug: 'install', draft: true, noindex: true, aliases: ['/old/install/', 'setup'], importance: 'high', exclude: true });
    expect(f.problems).toEqual([]);
    expect(f.text.body).not.toContain('layout');
  });

  it('a number written as a title is taken as its text', () => {
    expect(md('---\ntitle: 1984\n---\n').title).toBe('1984');
  });

  it('invalid YAML: one problem at the line of the error, the page is read without frontmatter', () => {
    const f = md('---\ntitle: ok\nslug: [unclosed\nfoo: bar\n---\n# Heading\n\nA [link](/x/).\n');
    expect(f.problems).toHaveLength(1);
    expect(f.problems[0]).toMatchObject({ code: 'frontmatter', line: 4 });
    expect(f.problems[0]!.message).toMatch(/Invalid YAML frontmatter/);
    expect(f.title).toBe('Heading');
    expect(f.route).toBe('/page/');
    expect(f.links.map((l) => l.href)).toEqual(['/x/']);
  });

  it('a key of the wrong type: a problem naming the key at its line, the key ignored, the rest kept', () => {
    const f = md('---\ntitle: Kept\ndraft: "yes"\naliases: 3\nlinkweave:\n  importance: top\n  colour: red\n---\n');
    expect(f.title).toBe('Kept');
    expect(f.meta).toEqual({ draft: false, noindex: false, aliases: [], exclude: false });
    const byLine = f.problems.map((p) => [p.code, p.line, p.message.match(/"([^"]+)"/)?.[1]]);
    expect(byLine).toEqual([
      ['frontmatter', 3, 'draft'],
      ['frontmatter', 4, 'aliases'],
      ['frontmatter', 6, 'linkweave.importance'],
      ['frontmatter', 7, 'linkweave.colour'],
    ]);
    expect(f.problems[0]!.message).toBe('Frontmatter key "draft": unexpected text, expected true or false; the key is ignored');
  });

  it('frontmatter that is not a mapping is a problem', () => {
    const f = md('---\n- a\n- b\n---\ntext\n');
    expect(f.problems.map((p) => p.code)).toEqual(['frontmatter']);
    expect(f.meta.aliases).toEqual([]);
  });

  it('empty frontmatter is fine', () => {
    expect(md('---\n---\n# T\n').problems).toEqual([]);
  });

  it('CRLF frontmatter is read and its problems are placed right', () => {
    const f = md('---\r\ntitle: Win\r\ndraft: maybe\r\n---\r\nBody.\r\n');
    expect(f.title).toBe('Win');
    expect(f.problems[0]).toMatchObject({ code: 'frontmatter', line: 3, column: 1 });
  });

  it('HTML files may carry frontmatter too (some generators allow it); offsets stay those of the file', () => {
    const text = '---\ntitle: From frontmatter\n---\n<p>Words <a href="/a/">a</a></p>\n';
    const f = html(text);
    expect(f.title).toBe('From frontmatter');
    expect(f.links[0]).toMatchObject({ href: '/a/', line: 4, column: 10 });
    expect(f.text.body).not.toContain('title');
  });
});
