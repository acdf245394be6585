/** Markdown pages: links of every kind, headings and ids, titles, text and spans (DESIGN sections 3, 4, 6). */
import { describe, expect, it } from 'vitest';
import { md } from './helpers.js';

describe('Markdown links', () => {
  it('inline, reference (definition after use, inside a quote), autolink, GFM literal autolink', () => {
    const f = md('A [one](one.md "T") and [two][Two] and [three] and <https://ex.org/a> and www.ex.org.\n\n> [two]: /two/\n\n[three]: ./three.md#part\n');
    expect(f.links.map((l) => [l.href, l.text, l.origin, l.context])).toEqual([
      ['one.md', 'one', 'markdown', 'content'],
      ['/two/', 'two', 'markdown', 'content'],
      ['./three.md#part', 'three', 'markdown', 'content'],
      ['https://ex.org/a', 'https://ex.org/a', 'markdown', 'content'],
      ['http://www.ex.org', 'www.ex.org', 'markdown', 'content'],
    ]);
  });

  it('the first definition of a label wins (CommonMark spec 0.31.2, section 4.7)', () => {
    expect(md('[x]\n\n[x]: /first/\n[X]: /second/\n').links.map((l) => l.href)).toEqual(['/first/']);
  });

  it('an undefined reference is text, not a link', () => {
    const f = md('See [nothing] and [this][nowhere].\n');
    expect(f.links).toEqual([]);
    expect(f.spans.map((s) => s.text)).toEqual(['See [nothing] and [this][nowhere].']);
  });

  it('images are not links; a linked image is a link with the alt text', () => {
    const f = md('![alt](pic.png) and ![ref][p] and [![logo](logo.png)](/home/)\n\n[p]: p.png\n');
    expect(f.links.map((l) => [l.href, l.text])).toEqual([['/home/', 'logo']]);
  });

  it('no links inside code spans, fenced or indented code', () => {
    const f = md('Use `[a](/a/)` here.\n\n```md\n[b](/b/) <a href="/c/">c</a>\n```\n\n    [d](/d/)\n\n~~~\n<https://e.example>\n~~~\n');
    expect(f.links).toEqual([]);
    expect(f.text.body).not.toMatch(/\/a\/|\[b\]/);
  });

  it('raw HTML links: inline with text from the siblings, block, nofollow, nav as template', () => {
    const f = md(
      [
        'Inline <a href="/in/" rel="nofollow noopener">the *inline* one</a> here.',
        '',
        '<div>',
        '<a href="/block/">block</a> <a name="old-anchor"></a>',
        '</div>',
        '',
        '<nav>',
        '',
        '[menu](/menu/)',
        '',
        '</nav>',
        '',
        '<nav><a href="/nav/">nav</a></nav>',
        '',
        '<img src="x.png"> <span id="marker">m</span>',
      ].join('\n'),
    );
    expect(f.links.map((l) => [l.href, l.text, l.origin, l.context, l.nofollow, l.line, l.column])).toEqual([
      ['/in/', 'the inline one', 'html', 'content', true, 1, 8],
      ['/block/', 'block', 'html', 'content', false, 4, 1],
      ['/menu/', 'menu', 'markdown', 'template', false, 9, 1],
      ['/nav/', 'nav', 'html', 'template', false, 13, 6],
    ]);
    expect(f.ids).toEqual(['marker', 'old-anchor']);
    expect(f.spans.map((s) => s.text)).toEqual(['Inline', 'here.', 'm']);
  });

  it('links in headings and tables are links', () => {
    const f = md('## See [a](/a/)\n\n| h [b](/b/) |\n|---|\n| [c](/c/) |\n');
    expect(f.links.map((l) => l.href)).toEqual(['/a/', '/b/', '/c/']);
  });

  it('link text is plain text with white space collapsed', () => {
    expect(md('[some *em*\n`code` text](/x/)').links[0]!.text).toBe('some em code text');
  });
});

describe('Markdown headings and ids', () => {
  it('GitHub-style slugs (github-slugger), repeats numbered, one slugger per page', () => {
    const text = '# Intro\n\n## Set up `npm` & go!\n\n## Intro\n\nSetext\n======\n\n## Intro\n';
    const f = md(text);
    expect(f.headings.map((h) => [h.depth, h.text, h.slug])).toEqual([
      [1, 'Intro', 'intro'],
      [2, 'Set up npm & go!', 'set-up-npm--go'],
      [2, 'Intro', 'intro-1'],
      [1, 'Setext', 'setext'],
      [2, 'Intro', 'intro-2'],
    ]);
    // Another page starts counting afresh.
    expect(md(text).headings[2]!.slug).toBe('intro-1');
    expect(f.ids).toEqual(['intro', 'intro-1', 'intro-2', 'set-up-npm--go', 'setext']);
  });

  it('{#custom-id} at the end of a heading sets its id and leaves the text', () => {
    const f = md('## Install the tool {#install}\n\n## Install the tool\n');
    expect(f.headings.map((h) => [h.text, h.slug])).toEqual([
      ['Install the tool', 'install'],
      ['Install the tool', 'install-the-tool'],
    ]);
  });

  it('ids: heading slugs, raw HTML id and name, sorted and unique', () => {
    const f = md('# B\n\n<h2 id="a">A</h2>\n\n<p id="b">x</p>\n');
    expect(f.ids).toEqual(['a', 'b']);
  });
});

describe('Markdown title and text', () => {
  it('title: frontmatter, else the first h1, else the file name (folder name for index files)', () => {
    expect(md('---\ntitle: FM\n---\n# H1\n').title).toBe('FM');
    expect(md('## Two\n\n# One\n\n# Later\n').title).toBe('One');
    expect(md('no heading', {}, 'guide/install-steps.md').title).toBe('install-steps');
    expect(md('no heading', {}, 'guide/index.md').title).toBe('guide');
    expect(md('no heading', {}, 'guide/README.md').title).toBe('guide');
  });

  it('text: headings apart, body from paragraphs, lists, quotes and tables; no code, URLs or frontmatter', () => {
    const f = md(
      [
        '---',
        'title: Caching',
        'secret: frontmatter words',
        '---',
        '# Caching guide',
        '',
        'Paragraph with [link text](https://ex.org/x) and https://ex.org/bare.',
        '',
        '- list item',
        '',
        '> quoted words',
        '',
        '| cell one | cell two |',
        '|---|---|',
        '| cell three | `code cell` |',
        '',
        '```',
        'code block words',
        '```',
        '',
        '<div>html words</div>',
      ].join('\n'),
    );
    expect(f.text.title).toBe('Caching');
    expect(f.text.headings).toBe('Caching guide');
    expect(f.text.body.split('\n').map((l) => l.trim()).filter(Boolean)).toEqual([
      'Paragraph with link text and .',
      'list item',
      'quoted words',
      'cell one',
      'cell two',
      'cell three',
    ]);
  });
});

describe('Markdown spans', () => {
  it('prose runs outside links, headings, code, images and HTML; table body cells yes, header no', () => {
    const f = md(
      '# Heading words\n\nStart *middle* [link](/l/) `code` ![img](i.png) <b>bold</b> end.\n\n| head |\n|---|\n| body cell |\n\n~~struck~~ kept\n',
    );
    expect(f.spans.map((s) => s.text)).toEqual(['Start', 'middle', 'bold', 'end.', 'body cell', 'kept']);
  });

  it('text with escapes or character references is left out where it differs from the source', () => {
    const f = md('Plain line\nsecond \\* line &amp; more\n');
    expect(f.spans.map((s) => s.text)).toEqual(['Plain line']);
  });
});

describe('MDX files', () => {
  it('top-level import/export blocks are code: no spans, no text, no link patterns there', () => {
    const text = "import Tabs from './tabs.js'\nexport const meta = {\n  see: '{{ref \"x.md\"}}',\n}\n\n# Tabs\n\nUse the [tabs](/tabs/) widget.\n\n```js\nimport inCode from 'kept'\n```\n";
    const f = md(text, { linkPatterns: [{ pattern: '\\{\\{ref "([^"]+)"\\}\\}', route: '$1' }] }, 'guide/tabs.mdx');
    expect(f.route).toBe('/guide/tabs/');
    expect(f.links.map((l) => l.href)).toEqual(['/tabs/']);
    expect(f.spans.map((s) => s.text)).toEqual(['Use the', 'widget.']);
    expect(f.text.body).not.toMatch(/import|export|meta/);
    expect(f.headings.map((h) => [h.text, h.line])).toEqual([['Tabs', 6]]);
  });
});
