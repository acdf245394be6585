/**
 * HTML pages. Sources: the WHATWG HTML standard for `<base href>` (the first `base` element with
 * an `href` counts), `rel="nofollow"` (a link type), and fragment targets (`id` of any element,
 * `name` of an `a` element); template regions nav/header/footer/aside are DESIGN section 4.
 */
import { describe, expect, it } from 'vitest';
import { html } from './helpers.js';

const PAGE = `<!doctype html>
<html>
<head>
  <title>Release notes</title>
  <base target="_blank">
  <base href="/docs/v2/">
  <base href="/ignored/">
</head>
<body>
  <header><a href="/">Home</a></header>
  <nav><ul><li><a href="/guide/">Guide</a></li></ul></nav>
  <main>
    <h1 id="notes">Version 2 notes</h1>
    <p>The <a href="install.html" rel="NoFollow">install page</a> moved.</p>
    <h2>Changes</h2>
    <ul><li>Faster <code>sync</code> runs</li><li><a href="#notes">Back up</a></li></ul>
    <map name="m"><area href="/map-target/" alt="region"></map>
    <a name="legacy"></a><section id="s1"><p>Section text</p></section>
    <pre><a href="/in-pre/">pre link</a> [md](/not-a-link/)</pre>
    <script>var a = '<a href="/script/">';</script>
    <table><tr><th>Head cell</th><td>Data cell</td></tr></table>
  </main>
  <aside><a href="/related/">Related</a></aside>
  <footer><a href="/legal/">Legal</a></footer>
</body>
</html>`;

describe('HTML pages', () => {
  const f = html(PAGE, {}, 'notes.html');

  it('links with context, nofollow and text; area links; none from scripts or Markdown syntax', () => {
    expect(f.links.map((l) => [l.href, l.text, l.context, l.nofollow])).toEqual([
      ['/', 'Home', 'template', false],
      ['/guide/', 'Guide', 'template', false],
      ['install.html', 'install page', 'content', true],
      ['#notes', 'Back up', 'content', false],
      ['/map-target/', 'region', 'content', false],
      ['/in-pre/', 'pre link', 'content', false],
      ['/related/', 'Related', 'template', false],
      ['/legal/', 'Legal', 'template', false],
    ]);
    expect(f.links.every((l) => l.origin === 'html')).toBe(true);
  });

  it('the first <base> with an href', () => {
    expect(f.baseHref).toBe('/docs/v2/');
  });

  it('ids from id attributes and a[name], not from map[name]', () => {
    expect(f.ids).toEqual(['legacy', 'notes', 's1']);
  });

  it('title: the first h1 (the <title> only when there is no h1); headings with their id as slug', () => {
    expect(f.title).toBe('Version 2 notes');
    expect(html('<title> Only   title </title><h2>x</h2>').title).toBe('Only title');
    expect(html('<p>nothing</p>', {}, 'a/b.html').title).toBe('b');
    expect(f.headings.map((h) => [h.depth, h.text, h.slug])).toEqual([
      [1, 'Version 2 notes', 'notes'],
      [2, 'Changes', ''],
    ]);
    expect(f.route).toBe('/notes.html');
  });

  it('text: body from content, not from templates, code, scripts or headings', () => {
    const words = f.text.body.split(/\s+/).filter(Boolean);
    expect(words).toEqual(['The', 'install', 'page', 'moved.', 'Faster', 'runs', 'Back', 'up', 'Section', 'text', 'Head', 'cell', 'Data', 'cell']);
    expect(f.text.headings).toBe('Version 2 notes\nChanges');
  });

  it('spans: text in p, li, td outside links, code and templates', () => {
    expect(f.spans.map((s) => s.text)).toEqual(['The', 'moved.', 'Faster', 'runs', 'Section text', 'Data cell']);
    for (const s of f.spans) expect(PAGE.slice(s.offset, s.offset + s.text.length)).toBe(s.text);
  });
});

describe('HTML page titles and headings', () => {
  it('a heading inside a template region (the site name in a header) is not the page title', () => {
    const f = html('<header><h1>Site name</h1></header><main><h1>Real page</h1></main>');
    expect(f.title).toBe('Real page');
    expect(f.headings.map((h) => h.text)).toEqual(['Real page']);
  });

  it('an SVG <title> is not the document title', () => {
    expect(html('<p><svg><title>icon</title></svg> text</p>', {}, 'x/icon-page.html').title).toBe('icon-page');
  });
});
