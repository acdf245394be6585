/**
 * Protected regions (src/parse/protect.ts): each syntax on its own, with the exact region and
 * kind; and on random documents (test/apply/syntax-docs.ts), the prose spans never overlap a
 * protected piece, while the prose around it keeps its spans.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEFAULT_OPTIONS } from '../../src/config/options.js';
import { parseSource } from '../../src/parse/index.js';
import type { FileKind, PageFacts } from '../../src/types.js';
import { htmlPieces, layout, markdownPieces, mdxPieces } from '../apply/syntax-docs.js';

const options = { ...DEFAULT_OPTIONS, root: '/site' };

function facts(text: string, path = 'page.md', kind: FileKind = path.endsWith('.html') ? 'html' : 'markdown'): PageFacts {
  return parseSource({ path, kind, bytes: text.length, hash: 'h', text, problems: [] }, options);
}

/** The regions as [kind, text] pairs. */
function regions(text: string, path?: string): [string, string][] {
  return facts(text, path).protected.map((r) => [r[2], text.slice(r[0], r[1])]);
}

const spansOf = (text: string, path?: string) => facts(text, path).spans.map((s) => s.text);

describe('protected regions, one syntax at a time', () => {
  const table: [string, string, [string, string][], string[]][] = [
    ['Hugo shortcode name', 'See {{< notes/badge >}} today.\n', [['shortcode', '{{< notes/badge >}}']], ['See', 'today.']],
    ['Hugo shortcode argument', 'A {{< feature url="/status/" >}} b.\n', [['shortcode', '{{< feature url="/status/" >}}']], ['A', 'b.']],
    ['Hugo % shortcode', 'A {{% notice title="Release notes" %}} b.\n', [['shortcode', '{{% notice title="Release notes" %}}']], ['A', 'b.']],
    [
      'Hugo highlight body',
      '{{< highlight go >}}\nrelease notes\n{{< /highlight >}}\n',
      [['shortcode', '{{< highlight go >}}'], ['template-block', '\nrelease notes\n'], ['shortcode', '{{< /highlight >}}']],
      [],
    ],
    ['Liquid tag and output', 'A {% include x.html %} and {{ page.title | upcase }}.\n', [['template-tag', '{% include x.html %}'], ['template-tag', '{{ page.title | upcase }}']], ['A', 'and']],
    [
      'Liquid raw block',
      'A\n\n{% raw %}\nrelease {{ notes }}\n{% endraw %}\n',
      [['template-tag', '{% raw %}'], ['template-block', '\nrelease {{ notes }}\n'], ['template-tag', '{% endraw %}']],
      ['A'],
    ],
    ['Nunjucks comment', 'A {# release notes #} b.\n', [['template-tag', '{# release notes #}']], ['A', 'b.']],
    ['mdBook include', 'A {{#include notes.md}} b.\n', [['template-tag', '{{#include notes.md}}']], ['A', 'b.']],
    ['MDN macro', 'The {{jsxref("Array")}} object.\n', [['template-tag', '{{jsxref("Array")}}']], ['The', 'object.']],
    ['Vue interpolation', 'Count: {{ count + 1 }} items.\n', [['template-tag', '{{ count + 1 }}']], ['Count:', 'items.']],
    ['an unclosed template opener protects the rest of its line', 'A {{ broken\nnext line\n', [['template-tag', '{{ broken']], ['A', 'next line']],
    ['HTML tag with attributes', 'A <span title="release notes">b</span> c.\n', [['html-tag', '<span title="release notes">'], ['html-tag', '</span>']], ['A', 'b', 'c.']],
    ['HTML comment', 'A <!-- release notes --> b.\n', [['html-comment', '<!-- release notes -->']], ['A', 'b.']],
    ['YAML front matter', '---\ntitle: Release notes\n---\n\nBody text.\n', [['front-matter', '---\ntitle: Release notes\n---']], ['Body text.']],
    ['TOML front matter', '+++\ntitle = "Release notes"\n+++\n\nBody text.\n', [['front-matter', '+++\ntitle = "Release notes"\n+++']], ['Body text.']],
    ['link reference definition', 'Body.\n\n[release notes]: /notes/ "Release notes"\n', [['link-definition', '[release notes]: /notes/ "Release notes"']], ['Body.']],
    ['container markers', '::: tip Release notes\nInside text.\n:::\n', [['container-marker', '::: tip Release notes'], ['container-marker', ':::']], ['Inside text.']],
    ['admonition marker', '!!! note "Release notes"\n    Inside text.\n', [['container-marker', '!!! note "Release notes"']], ['Inside text.']],
    ['collapsible admonition', '???+ info "Release notes"\n    Inside.\n', [['container-marker', '???+ info "Release notes"']], ['Inside.']],
    ['heading id', '## Release notes {#notes}\n\nText.\n', [['attribute-list', '{#notes}']], ['Text.']],
    ['attribute list', 'A paragraph.\n{: .note title="release notes"}\n', [['attribute-list', '{: .note title="release notes"}']], ['A paragraph.']],
    [
      'kramdown comment extension',
      'A\n\n{::comment}\nrelease notes\n{:/comment}\n\nB text.\n',
      [['attribute-list', '{::comment}'], ['template-block', '\nrelease notes\n'], ['attribute-list', '{:/comment}']],
      ['A', 'B text.'],
    ],
    ['a literal autolink is an existing link', 'Use https://registry.example.org/ now.\n', [['link', 'https://registry.example.org/']], ['Use', 'now.']],
    ['braces', 'Takes `x` {string} and more.\n', [['code', '`x`'], ['braces', '{string}']], ['Takes', 'and more.']],
    ['a backslash does not stop a template tag (Liquid and Hugo read it)', 'A \\{{ x }} b.\n', [['template-tag', '{{ x }}']], []],
    ['an escaped < is text in Markdown', 'A \\<span> b.\n', [], []],
    ['template syntax in code is code', 'Use `{{< x >}}` here.\n', [['code', '`{{< x >}}`']], ['Use', 'here.']],
  ];
  it.each(table)('%s', (_name, text, expected, spans) => {
    expect(regions(text)).toEqual(expected);
    expect(spansOf(text)).toEqual(spans);
  });

  it('MDX: JSX tags and expressions; the children of an element are prose', () => {
    const text = 'A <Badge text="notes" items={["a", 2]} /> and {props.release} b.\n\n<Tip title={`x > y`}>\n\nRelease notes here.\n\n</Tip>\n';
    expect(regions(text, 'page.mdx')).toEqual([
      ['mdx-jsx', '<Badge text="notes" items={["a", 2]} />'],
      ['mdx-expression', '{props.release}'],
      ['mdx-jsx', '<Tip title={`x > y`}>'],
      ['mdx-jsx', '</Tip>'],
    ]);
    expect(spansOf(text, 'page.mdx')).toEqual(['A', 'and', 'b.', 'Release notes here.']);
  });

  it('HTML page: tags, comments and Liquid in text', () => {
    const text = '<!DOCTYPE html>\n<html><body>\n<p class="x">Read {{ page.title }} now <!-- c --> please.</p>\n</body></html>\n';
    const got = regions(text, 'page.html');
    expect(got.filter(([k]) => k !== 'html-tag')).toEqual([['template-tag', '{{ page.title }}'], ['html-comment', '<!-- c -->']]);
    // Tags with only white space between them are one region.
    expect(got.filter(([k]) => k === 'html-tag').map(([, t]) => t)).toEqual(['<!DOCTYPE html>\n<html><body>\n<p class="x">', '</p>\n</body></html>']);
    expect(spansOf(text, 'page.html')).toEqual(['Read', 'now', 'please.']);
  });

  it('regions are sorted, none holds another, and offsets count a BOM', () => {
    const text = '\uFEFF---\na: 1\n---\n\nA {{< x >}} b.\n';
    const f = facts(text);
    expect(f.protected.map((r) => text.slice(r[0], r[1]))).toEqual(['---\na: 1\n---', '{{< x >}}']);
  });
});

describe('spans never overlap protected syntax (random documents)', () => {
  const cases = [
    ['Markdown', markdownPieces, 'page.md'],
    ['MDX', mdxPieces, 'page.mdx'],
    ['HTML', htmlPieces, 'page.html'],
  ] as const;
  for (const [name, pieces, path] of cases) {
    it(name, () => {
      let proseSpans = 0;
      fc.assert(
        fc.property(pieces, (doc) => {
          const { text, protectedRanges } = layout(doc);
          const f = facts(text, path);
          for (const s of f.spans) {
            const span = [s.offset, s.offset + s.text.length] as const;
            const hit = protectedRanges.find((p) => span[0] < p[1] && p[0] < span[1]);
            expect(hit, `span ${JSON.stringify(s.text)} overlaps ${JSON.stringify(hit && text.slice(hit[0], hit[1]))}`).toBeUndefined();
            if (/release notes|service status|docs search/.test(s.text)) proseSpans++;
          }
          // Every protected piece is covered by the regions found.
          for (const [a, b] of protectedRanges) {
            if (!/[\p{L}\p{N}]/u.test(text.slice(a, b))) continue;
            expect(f.protected.some((r) => r[0] < b && a < r[1]), JSON.stringify(text.slice(a, b))).toBe(true);
          }
        }),
        { numRuns: 150, seed: 1919 },
      );
      expect(proseSpans).toBeGreaterThan(50);
    });
  }
});
