/**
 * Matchers for the syntax that protected regions cover, each reading at one offset of the source
 * and returning where the construct ends (or -1 when there is none at that offset). Pure string
 * scanning, no parser: a generator reads this syntax before or beside Markdown, so it must be
 * found in the source as written, whatever a Markdown parser makes of it.
 */

/**
 * CommonMark raw HTML (spec 0.31, section 6.6): open tag, closing tag, comment, processing
 * instruction, declaration, CDATA section. Whitespace may hold line endings.
 */
const ATTRIBUTE = String.raw`(?:\s+[A-Za-z_:][A-Za-z0-9_.:-]*(?:\s*=\s*(?:[^\s"'=<>\x60]+|'[^']*'|"[^"]*"))?)`;
const MARKDOWN_TAG = new RegExp(
  String.raw`<(?:[A-Za-z][A-Za-z0-9-]*${ATTRIBUTE}*\s*\/?>|\/[A-Za-z][A-Za-z0-9-]*\s*>|\?[\s\S]*?\?>|![A-Za-z][^>]*>|!\[CDATA\[[\s\S]*?\]\]>)`,
  'y',
);

/** An HTML comment `<!-- ... -->` at `at`: its end, or the end of its line when it is not closed. */
export function matchComment(src: string, at: number, lineEnd: number): number {
  if (!src.startsWith('<!--', at)) return -1;
  if (src.startsWith('<!-->', at)) return at + 5;
  if (src.startsWith('<!--->', at)) return at + 6;
  const close = src.indexOf('-->', at + 4);
  return close === -1 ? lineEnd : close + 3;
}

/** A raw HTML tag at `at` as CommonMark reads one in Markdown. */
export function matchMarkdownTag(src: string, at: number): number {
  MARKDOWN_TAG.lastIndex = at;
  return MARKDOWN_TAG.test(src) ? MARKDOWN_TAG.lastIndex : -1;
}

/**
 * A tag at `at` as an HTML parser reads one (lenient): `<` then a letter, `/`, `!` or `?`, up to
 * the first `>` outside quoted attribute values. -1 when it is not closed before `limit`.
 */
export function matchHtmlTag(src: string, at: number, limit: number): number {
  const next = src.charCodeAt(at + 1);
  const letter = (c: number) => (c >= 65 && c <= 90) || (c >= 97 && c <= 122);
  if (!(letter(next) || next === 33 || next === 63 || (next === 47 && letter(src.charCodeAt(at + 2))))) return -1;
  let quote = 0;
  let afterEquals = false;
  for (let i = at + 2; i < limit; i++) {
    const c = src.charCodeAt(i);
    if (quote !== 0) {
      if (c === quote) quote = 0;
    } else if ((c === 34 || c === 39) && afterEquals) quote = c;
    else if (c === 62) return i + 1;
    if (c === 61) afterEquals = true;
    else if (c !== 32 && c !== 9 && c !== 10 && c !== 13) afterEquals = false;
  }
  return -1;
}

/**
 * A JSX tag at `at` (MDX): `<Name ...>`, `</Name>`, `<>`, `</>`, attributes with string values
 * and `{...}` expressions. -1 when it is not closed before `limit`.
 */
export function matchJsxTag(src: string, at: number, limit: number): number {
  let i = at + 1;
  if (src.charCodeAt(i) === 47) i++;
  if (src.charCodeAt(i) === 62) return i + 1;
  if (!/[A-Za-z_$]/.test(src.charAt(i))) return -1;
  for (; i < limit; i++) {
    const c = src.charCodeAt(i);
    if (c === 34 || c === 39) {
      const close = src.indexOf(src.charAt(i), i + 1);
      if (close === -1 || close >= limit) return -1;
      i = close;
    } else if (c === 123) {
      const end = matchBraces(src, i, limit, true);
      if (end === -1) return -1;
      i = end - 1;
    } else if (c === 62) return i + 1;
    else if (c === 60) return -1;
  }
  return -1;
}

/**
 * A balanced `{...}` group at `at`; with `js`, quoted strings (`'`, `"`, backquote) inside are
 * skipped whole. -1 when it does not close before `limit`.
 */
export function matchBraces(src: string, at: number, limit: number, js: boolean): number {
  let depth = 0;
  for (let i = at; i < limit; i++) {
    const c = src.charCodeAt(i);
    if (c === 92) {
      i++;
    } else if (c === 123) depth++;
    else if (c === 125) {
      depth--;
      if (depth === 0) return i + 1;
    } else if (js && (c === 34 || c === 39 || c === 96)) {
      const close = src.indexOf(src.charAt(i), i + 1);
      if (close === -1 || close >= limit) return -1;
      i = close;
    }
  }
  return -1;
}

/** A template opener at `at`, with the text that closes it. */
export interface TemplateOpen {
  readonly kind: 'shortcode' | 'template-tag';
  readonly close: string;
  /** Length of the opener (`{{<` is 3). */
  readonly length: number;
}

/**
 * The template syntax opening at `at`: Hugo shortcodes `{{<`/`{{%`, `{{` (Liquid, Nunjucks,
 * Vue, mdBook, macros), `{%` tags and `{#` comments (a space or `-` after `{#`, so a heading id
 * `{#id}` is not one). Null when none opens there.
 */
export function templateOpen(src: string, at: number): TemplateOpen | null {
  const second = src.charCodeAt(at + 1);
  if (second === 123) {
    const third = src.charCodeAt(at + 2);
    if (third === 60) return { kind: 'shortcode', close: '>}}', length: 3 };
    if (third === 37) return { kind: 'shortcode', close: '%}}', length: 3 };
    return { kind: 'template-tag', close: '}}', length: 2 };
  }
  if (second === 37) return { kind: 'template-tag', close: '%}', length: 2 };
  if (second === 35 && /[\s-]/.test(src.charAt(at + 2))) return { kind: 'template-tag', close: '#}', length: 2 };
  return null;
}

/** Liquid/Nunjucks block tags whose body is not prose. */
const TEMPLATE_BLOCKS = new Set(['raw', 'verbatim', 'comment', 'highlight']);
/** Of those, the ones whose body is not rendered as Markdown at all (shown as code, or dropped). */
const TEMPLATE_CODE_BLOCKS = new Set(['comment', 'highlight']);
/**
 * Hugo shortcodes whose body is shown as code: Hugo's own `highlight`, and the code-display
 * shortcodes of Hugo's documentation (`code`, `code-toggle`, `output`, `nohighlight`; their
 * templates put `.Inner` in `<pre><code>` or through `highlight`/`transform.Remarshal`), a
 * common set of names for the same job. `code` with `nocode="true"` renders its body as HTML.
 */
const SHORTCODE_CODE_BLOCKS = new Set(['highlight', 'code', 'code-toggle', 'output', 'nohighlight']);

/** The closing tag of a block whose body is not prose, and whether that body is code (no links, no headings). */
export interface BlockCloser {
  readonly closer: RegExp;
  readonly code: boolean;
}

/**
 * When the template tag `tag` (its full text) opens a block whose body is not prose, the
 * pattern of its closing tag; null otherwise.
 */
export function blockCloser(tag: string): BlockCloser | null {
  const liquid = /^\{%-?\s*([a-z]+)/.exec(tag);
  if (liquid !== null && TEMPLATE_BLOCKS.has(liquid[1])) {
    return { closer: new RegExp(String.raw`\{%-?\s*end${liquid[1]}\s*-?%\}`, 'g'), code: TEMPLATE_CODE_BLOCKS.has(liquid[1]) };
  }
  const hugo = /^\{\{[<%]\s*([\w-]+)/.exec(tag);
  if (hugo !== null && SHORTCODE_CODE_BLOCKS.has(hugo[1]) && !/\bnocode\s*=\s*"?true\b/.test(tag) && !/\/\s*[>%]\}\}$/.test(tag)) {
    return { closer: new RegExp(String.raw`\{\{[<%]\s*\/\s*${hugo[1]}\s*[>%]\}\}`, 'g'), code: true };
  }
  return null;
}

/**
 * A container or admonition marker line at `at` (the line's start): optional indentation, then
 * `:::` (or more colons), `!!!` or `???` (`???+`), then the end of the line, white space, a
 * letter or `{`. Returns where the marker starts, or -1.
 */
export function matchContainerMarker(src: string, at: number): number {
  CONTAINER.lastIndex = at;
  const m = CONTAINER.exec(src);
  return m === null ? -1 : at + m[1].length;
}

const CONTAINER = /([ \t]*)(?::{3,}|!!!|\?\?\?\+?)(?=[\s{A-Za-z]|$)/y;

/** True when the `{...}` text is an attribute list or heading id: `{#id}`, `{: ...}`, `{.class}`. */
export function isAttributeList(group: string): boolean {
  return /^\{:|^\{\s*[#.][A-Za-z_][\w\-:.]*(?:\s|\})/.test(group);
}
