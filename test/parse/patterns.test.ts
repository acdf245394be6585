/** Link patterns (DESIGN section 3): shortcodes and macros that produce links with positions. */
import { describe, expect, it } from 'vitest';
import { html, md } from './helpers.js';

const REF = { pattern: '\\{\\{<?\\s*ref "([^"]+)"\\s*>?\\}\\}', route: '$1' };
const API = { pattern: '\\{\\{apiref\\("(?<name>[A-Za-z]+)"\\)\\}\\}', route: '/api/$1/' };

describe('link patterns', () => {
  it('each match is a link at the match position, route template filled from the groups', () => {
    const text = 'See {{ref "guide/setup.md"}} and\nthe {{apiref("Widget")}} call, or {{< ref "a.html#x" >}}.\n';
    const f = md(text, { linkPatterns: [REF, API] });
    expect(f.links.map((l) => [l.href, l.text, l.line, l.column, l.origin, l.fileRelative])).toEqual([
      ['guide/setup.md', '{{ref "guide/setup.md"}}', 1, 5, 'pattern', true],
      ['/api/Widget/', 'Widget', 2, 5, 'pattern', false],
      ['a.html#x', '{{< ref "a.html#x" >}}', 2, 35, 'pattern', true],
    ]);
    for (const l of f.links) expect(text.split('\n')[l.line - 1]!.slice(l.column - 1)).toMatch(/^\{\{/);
  });

  it('not inside code: inline code, fenced code, frontmatter', () => {
    const text = '---\nsee: {{ref "fm.md"}}\n---\n`{{ref "inline.md"}}`\n\n```\n{{ref "fenced.md"}}\n```\n\n{{ref "real.md"}}\n';
    const f = md(text, { linkPatterns: [REF] });
    expect(f.links.map((l) => [l.href, l.line])).toEqual([['real.md', 10]]);
  });

  it('in HTML pages, not inside <code>, <pre> or <script>', () => {
    const f = html('<p>{{ref "yes.md"}}</p><pre>{{ref "no.md"}}</pre><code>{{ref "no2.md"}}</code><script>{{ref "no3.md"}}</script>', {
      linkPatterns: [REF],
    });
    expect(f.links.map((l) => l.href)).toEqual(['yes.md']);
  });

  it('a pattern that can match the empty string does not loop', () => {
    const f = md('abc', { linkPatterns: [{ pattern: 'x*', route: '/x/' }] });
    expect(f.links).toEqual([]);
  });

  it('pattern links sort with the other links by position', () => {
    const f = md('[a](/a/) {{ref "b.md"}} [c](/c/)', { linkPatterns: [REF] });
    expect(f.links.map((l) => l.href)).toEqual(['/a/', 'b.md', '/c/']);
  });
});
