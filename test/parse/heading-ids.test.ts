import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { headingIds } from '../../src/parse/heading-ids.js';

describe('github style', () => {
  it('github-slugger README examples (read from the installed package)', () => {
    // The package ships no test fixtures, only its README: read the examples from it.
    const require = createRequire(import.meta.url);
    const readme = readFileSync(join(dirname(require.resolve('github-slugger')), 'README.md'), 'utf8');
    const block = readme.slice(readme.indexOf('const slugger = new GithubSlugger()'), readme.indexOf('slugger.reset()'));
    const pairs = [...block.matchAll(/slugger\.slug\('([^']*)'\)\n\/\/ returns '([^']*)'/g)].map((m) => [m[1]!, m[2]!] as const);
    expect(pairs.length).toBe(6);
    expect(headingIds('github', pairs.map((p) => p[0]))).toEqual(pairs.map((p) => p[1]));
  });
});

describe('github-underscore style', () => {
  it("the ids of the Node.js API docs' built HTML (Debian nodejs-doc 18.20.4+dfsg-1~deb12u2, api/fs.html and api/process.html)", () => {
    // fs.md's four "Event: `'close'`" headings (with others between them), and process.md's
    // "`process.exit([code])`" then "`process.exitCode`"; the ids as the package's HTML has them.
    expect(headingIds('github-underscore', ["Event: 'close'", 'filehandle.close()', "Event: 'close'", "Event: 'close'", "Event: 'close'"])).toEqual([
      'event-close',
      'filehandleclose',
      'event-close_1',
      'event-close_2',
      'event-close_3',
    ]);
    expect(headingIds('github-underscore', ['process.exit([code])', 'process.exitCode'])).toEqual(['processexitcode', 'processexitcode_1']);
  });
});

describe('kramdown style', () => {
  it('the header id examples of the kramdown syntax documentation ("Automatic generation of header IDs", from memory)', () => {
    expect(headingIds('kramdown', ['This is a header', '12. Another one 1.2.3', 'Do ^& it now', 'Hallo', 'Not now', 'Hallo', '123456789'])).toEqual([
      'this-is-a-header',
      'another-one-123',
      'do--it-now',
      'hallo',
      'not-now',
      'hallo-1',
      'section',
    ]);
  });
});

describe('python-markdown style', () => {
  it('toc slugify and unique (Python-Markdown toc extension: slugify, unique; from memory)', () => {
    // slugify: NFKD, ASCII only, [^\w\s-] removed, stripped, lower case, [-\s]+ -> '-'
    expect(headingIds('python-markdown', ['Header 1', 'Some Header', 'žlutý kůň', 'Header 1', 'Header 1', 'What?!  Now -- then'])).toEqual([
      'header-1',
      'some-header',
      'zluty-kun',
      'header-1_1',
      'header-1_2',
      'what-now-then',
    ]);
    // unique(): an id ending in _N that repeats counts on from N.
    expect(headingIds('python-markdown', ['item_1', 'item_1'])).toEqual(['item_1', 'item_2']);
  });
});

describe('Hugo autoHeadingIDType styles', () => {
  // Hugo documentation, configuration markup, autoHeadingIDType: "github" (GitHub-compatible),
  // "github-ascii" (drops non-ASCII after NFD, so accents go), "blackfriday" (the old
  // Blackfriday anchors). Examples from memory.
  it('github', () => {
    expect(headingIds('hugo-github', ['Hello World', 'Café Tables', 'A -- B', 'Wait, what?'])).toEqual(['hello-world', 'café-tables', 'a----b', 'wait-what']);
  });
  it('github-ascii', () => {
    expect(headingIds('hugo-github-ascii', ['Café Tables', 'Über uns', 'Hello World'])).toEqual(['cafe-tables', 'uber-uns', 'hello-world']);
  });
  it('blackfriday (Blackfriday SanitizedAnchorName: "This is a header" -> "this-is-a-header")', () => {
    expect(headingIds('hugo-blackfriday', ['This is a header', 'A -- B', '  Leading space', 'Hello World', 'Hello World'])).toEqual([
      'this-is-a-header',
      'a-b',
      'leading-space',
      'hello-world',
      'hello-world-1',
    ]);
  });
});

describe('mdBook style', () => {
  it("normalize_id and unique ids (mdBook's utils, from memory): ASCII lower-cased, whitespace to '-', the rest dropped", () => {
    expect(headingIds('mdbook', ['Hello World', 'Über uns', 'C++ & Rust', 'Hello World', 'snake_case-ok'])).toEqual([
      'hello-world',
      'Über-uns',
      'c--rust',
      'hello-world-1',
      'snake_case-ok',
    ]);
  });
});

describe('VitePress style', () => {
  it('the issue\'s example "## build.target" -> "#build-target", and @mdit-vue slugify rules (from memory)', () => {
    expect(headingIds('vitepress', ['build.target', 'Café & Co.', '2nd step', 'build.target'])).toEqual(['build-target', 'cafe-co', '_2nd-step', 'build-target-1']);
  });
});

describe('underscore style', () => {
  it('lower case, spaces to underscores (from memory)', () => {
    expect(headingIds('underscore', ['Browser compatibility', 'See also', 'Syntax'])).toEqual(['browser_compatibility', 'see_also', 'syntax']);
  });
});
