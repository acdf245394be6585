/**
 * Random documents that mix prose with the syntax site generators read (fast-check
 * arbitraries), each piece marked as prose or protected, so a test knows the true extent of
 * every protected region without asking the code under test. The target phrases of three pages
 * occur both in prose and inside the syntax.
 *
 * Syntax written as the generators document it (from memory of their docs): Hugo shortcodes
 * `{{< name args >}}` / `{{% name %}}` and the `highlight` shortcode; Liquid/Jekyll `{% tag %}`,
 * `{{ expr | filter }}`, `{% raw %}` and `{% highlight %}` blocks; Nunjucks/Eleventy
 * `{# comment #}`; mdBook `{{#include file}}`; MDN-style macros `{{jsxref("X")}}`; VitePress/Vue
 * `{{ expr }}`; MDX JSX tags and `{expressions}`; HTML tags, attributes and comments; YAML and
 * TOML front matter; link reference definitions; VitePress/Docusaurus `:::` containers and
 * MkDocs `!!!` / `???` admonitions; heading ids `{#id}` and kramdown attribute lists `{: ...}`.
 */
import fc from 'fast-check';

/** One piece of a document. */
export interface Piece {
  readonly text: string;
  readonly protected: boolean;
}

/** The target pages: phrase (as written in prose), route, file, title. */
export const TARGETS = [
  { phrase: 'release notes', route: '/notes/', file: 'notes.md', title: 'Release Notes' },
  { phrase: 'service status', route: '/status/', file: 'status.md', title: 'Service Status' },
  { phrase: 'docs search', route: '/search/', file: 'search.md', title: 'Docs Search' },
] as const;

const phrase = fc.constantFrom(...TARGETS.map((t) => t.phrase));
const filler = fc.constantFrom('the', 'read', 'before', 'upgrading', 'and', 'check', 'daily', 'here');
const P = (text: string): Piece => ({ text, protected: false });
const X = (text: string): Piece => ({ text, protected: true });

/** A sentence of prose holding a phrase or not. */
const prose = fc
  .tuple(fc.array(filler, { minLength: 1, maxLength: 3 }), fc.option(phrase, { nil: undefined }), fc.array(filler, { maxLength: 3 }))
  .map(([a, p, b]) => P([...a, ...(p === undefined ? [] : [p]), ...b].join(' ')));

const slug = (p: string) => p.replace(/ /g, '-');

/** Inline syntax (inside a paragraph of Markdown). */
const mdInlineSyntax = fc.oneof(
  phrase.map((p) => X(`{{< badge ${p} >}}`)),
  phrase.map((p) => X(`{{< feature url="/${p}/" >}}`)),
  phrase.map((p) => X(`{{< search placeholder="Search the ${p}..." >}}`)),
  phrase.map((p) => X(`{{% notice title="${p}" %}}`)),
  phrase.map((p) => X(`{% include card.html title="${p}" %}`)),
  phrase.map((p) => X(`{{ "${p}" | upcase }}`)),
  phrase.map((p) => X(`{# ${p} #}`)),
  phrase.map((p) => X(`{{#include ${slug(p)}.md}}`)),
  phrase.map((p) => X(`{{jsxref("${p}")}}`)),
  phrase.map((p) => X(`{{ site.${slug(p).replace('-', '_')} }}`)),
  phrase.map((p) => X(`<span title="${p}">`)),
  fc.constant(X('</span>')),
  phrase.map((p) => X(`<!-- ${p} -->`)),
  phrase.map((p) => X(`{: title="${p}"}`)),
);

/** Block syntax (its own block of Markdown), with prose inside where the generator has prose. */
const mdBlockSyntax = fc.oneof(
  phrase.map((p) => [X(`[${p}]: /elsewhere/ "${p}"`)]),
  fc.tuple(phrase, prose).map(([p, s]) => [X(`::: tip ${p}`), P('\n'), s, P('\n'), X(':::')]),
  fc.tuple(phrase, prose).map(([p, s]) => [X(`!!! note "${p}"`), P('\n    '), s]),
  fc.tuple(phrase, prose).map(([p, s]) => [X(`???+ info "${p}"`), P('\n    '), s]),
  fc.tuple(phrase, prose).map(([p, s]) => [P('## '), s, P(' '), X(`{#${slug(p)}}`)]),
  phrase.map((p) => [X(`{% raw %}\nthe ${p} {{ here }}\n{% endraw %}`)]),
  phrase.map((p) => [X(`{% highlight text %}\nthe ${p}\n{% endhighlight %}`)]),
  phrase.map((p) => [X(`{{< highlight text >}}\nthe ${p}\n{{< /highlight >}}`)]),
  fc.tuple(phrase, prose).map(([p, s]) => [X(`<div class="${slug(p)}" title="${p}">`), P('\n\n'), s, P('\n\n'), X('</div>')]),
  phrase.map((p) => [X(`<!--\n${p}\n\n${p}\n-->`)]),
);

const paragraph = (inline: fc.Arbitrary<Piece>) =>
  fc.array(fc.oneof({ weight: 2, arbitrary: prose }, inline), { minLength: 1, maxLength: 6 }).map((parts) => {
    const out: Piece[] = [];
    parts.forEach((p, i) => {
      if (i > 0) out.push(P(' '));
      out.push(p);
    });
    return out;
  });

const frontMatter = fc.oneof(
  phrase.map((p) => [X(`---\ntitle: ${p}\ntags: [${p}]\n---`), P('\n\n')]),
  phrase.map((p) => [X(`+++\ntitle = "${p}"\n+++`), P('\n\n')]),
  fc.constant([] as Piece[]),
);

function document(head: fc.Arbitrary<Piece[]>, block: fc.Arbitrary<Piece[]>): fc.Arbitrary<Piece[]> {
  return fc.tuple(head, fc.array(block, { minLength: 1, maxLength: 7 })).map(([top, blocks]) => {
    const out: Piece[] = [...top, P('# Page\n\n')];
    blocks.forEach((b, i) => {
      if (i > 0) out.push(P('\n\n'));
      out.push(...b);
    });
    out.push(P('\n'));
    return out;
  });
}

/** A Markdown document (`.md`) mixing prose with every syntax above but MDX. */
export const markdownPieces = document(frontMatter, fc.oneof({ weight: 3, arbitrary: paragraph(mdInlineSyntax) }, mdBlockSyntax));

const mdxInline = fc.oneof(
  phrase.map((p) => X(`{props.${slug(p).replace('-', '_')}}`)),
  phrase.map((p) => X(`{"${p}".toUpperCase()}`)),
  phrase.map((p) => X(`<Badge text="${p}" items={["${p}", 2]} />`)),
  phrase.map((p) => X(`<Tip title={\`${p}\`}>`)),
  fc.constant(X('</Tip>')),
);

/** An MDX document (`.mdx`): JSX tags and `{...}` expressions among prose. */
export const mdxPieces = document(
  frontMatter,
  fc.oneof(
    { weight: 3, arbitrary: paragraph(mdxInline) },
    phrase.map((p) => [X(`<Callout kind="note" label={"${p}"}>`), P('\n\n'), P(`Read the ${p} first.`), P('\n\n'), X('</Callout>')]),
  ),
);

const htmlInline = fc.oneof(
  phrase.map((p) => X(`<span title="${p}">`)),
  fc.constant(X('</span>')),
  phrase.map((p) => X(`<!-- ${p} -->`)),
  phrase.map((p) => X(`{% include card.html title="${p}" %}`)),
  phrase.map((p) => X(`{{ "${p}" | upcase }}`)),
);

/** An HTML page with Liquid tags and comments among the prose of its paragraphs. */
export const htmlPieces = fc
  .array(
    paragraph(htmlInline).map((parts) => [X('<p class="lead">'), ...parts, X('</p>')]),
    { minLength: 1, maxLength: 6 },
  )
  .map((paras) => {
    const out: Piece[] = [X('<!DOCTYPE html>'), P('\n'), X('<html>'), X('<head>'), X('<title>'), P('Page'), X('</title>'), X('</head>'), P('\n'), X('<body>'), P('\n')];
    for (const p of paras) out.push(...p, P('\n'));
    out.push(X('</body>'), X('</html>'), P('\n'));
    return out;
  });

/** The text of a document and the `[start, end)` range of each protected piece. */
export function layout(pieces: readonly Piece[]): { text: string; protectedRanges: [number, number][]; proseRanges: [number, number][] } {
  let text = '';
  const protectedRanges: [number, number][] = [];
  const proseRanges: [number, number][] = [];
  for (const p of pieces) {
    (p.protected ? protectedRanges : proseRanges).push([text.length, text.length + p.text.length]);
    text += p.text;
  }
  return { text, protectedRanges, proseRanges };
}
