/**
 * Template text a generator shows as code (src/parse/protect-syntax.ts `blockCloser`,
 * src/parse/parse-file.ts): links and headings that the Markdown parser sees in the body of a
 * Hugo code-display shortcode or a Liquid `highlight`/`comment` block are not the page's. What
 * the generator renders as Markdown keeps its links. The Hugo cases were checked against a
 * hugo 0.111 build (test/fixtures/preset-hugo-layouts, test/preset/hugo-layouts.test.ts).
 */
import { describe, expect, it } from 'vitest';
import { md } from './helpers.js';

const hrefs = (text: string) => md(text).links.map((l) => l.href);
const headings = (text: string) => md(text).headings.map((h) => h.text);

describe('bodies shown as code have no links and no headings', () => {
  it('Hugo code-display shortcodes: code, output, code-toggle, nohighlight, highlight', () => {
    for (const name of ['code', 'output', 'code-toggle', 'nohighlight', 'highlight']) {
      const text = `Before [a](/a/).\n\n{{< ${name} file="x.html" >}}\n<a href="/example/">x</a>\n\n# Example heading\n[b](/b/)\n{{< /${name} >}}\n\nAfter [c](/c/).\n`;
      expect(hrefs(text), name).toEqual(['/a/', '/c/']);
      expect(headings(text), name).toEqual([]);
    }
  });

  it('the % form', () => {
    expect(hrefs('{{% code %}}\n[b](/b/)\n{{% /code %}}\n\n[c](/c/)\n')).toEqual(['/c/']);
    // White space after the slash of a closing tag, as Hugo's own docs write it (`{{%/ note %}}`).
    expect(hrefs('{{< code >}}\n[b](/b/)\n{{</ code >}}\n\n[c](/c/)\n')).toEqual(['/c/']);
  });

  it('Liquid highlight and comment blocks', () => {
    expect(hrefs('{% highlight html %}\n<a href="/example/">x</a>\n{% endhighlight %}\n\n[c](/c/)\n')).toEqual(['/c/']);
    expect(hrefs('{% comment %}\n[old](/old/)\n{% endcomment %}\n\n[c](/c/)\n')).toEqual(['/c/']);
  });
});

describe('template text rendered as Markdown keeps its links', () => {
  it('a Liquid raw block (only Liquid is off there)', () => {
    expect(hrefs('{% raw %}\n[b](/b/) {{ x }}\n{% endraw %}\n')).toEqual(['/b/']);
  });

  it('`code` with nocode="true" renders its body', () => {
    expect(hrefs('{{< code file="x" nocode="true" >}}\n[b](/b/)\n{{< /code >}}\n')).toEqual(['/b/']);
  });

  it('a code shortcode with no closing tag, or closed on itself, has no body', () => {
    expect(hrefs('{{< code file="x" >}}\n\n[b](/b/)\n')).toEqual(['/b/']);
    expect(hrefs('{{< output file="x" />}}\n\n[b](/b/)\n\n{{< /output >}}\n')).toEqual(['/b/']);
  });

  it('an escaped shortcode in prose: hugo writes it out as text and still links its URL', () => {
    expect(hrefs('Write {{</* figure link="https://example.org/photo/" */>}} here.\n').length).toBe(1);
  });

  it('other shortcodes: their bodies are Markdown', () => {
    expect(hrefs('{{< note >}}\n[b](/b/)\n{{< /note >}}\n')).toEqual(['/b/']);
  });
});
