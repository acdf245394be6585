import { posix } from 'node:path';
import { MARKDOWN_EXTENSION_END, MARKDOWN_EXTENSIONS, SOURCE_EXTENSION_END } from '../routes/extensions.js';
import type { Rule, RuleFinding } from './types.js';
import { linkSource } from './place.js';
import { nearest } from './nearest.js';

/**
 * `broken-link`: every internal link leads to an existing page, alias, redirect or file.
 *
 * Reported at the link's own line and column, once per link (a broken link in a template
 * region is reported on every page that carries it). The message names the resolved target
 * (a route; for a link to a source file that does not exist, the file's path from the content
 * root; for a missing image or download, its path), the destination as written when it
 * differs, and a fix: a relative link written without the extension of a Markdown file beside
 * it (`install#requirements` next to `install.md`, which a generator that turns file links into
 * page links leaves as it is) gets the link to that file; otherwise the closest
 * existing route (or source file) by edit distance, when one is close.
 * `target` is the resolved target.
 *
 * Options: none. Default level: `error`.
 *
 * @example ok (`guide/index.md`, the site has `guide/install.md`, route `/guide/install/`)
 * ```md
 * Read [the install guide](install.md) or [the install page](/guide/install/).
 * ```
 * @example not ok
 * ```md
 * Read [the install guide](instal.md) or [the install page](/guide/instal/).
 * ```
 * `guide/index.md:1:6  error  Broken link: no source file guide/instal.md (written "instal.md");
 * did you mean guide/install.md?`
 * `guide/index.md:1:40  error  Broken link: no page /guide/instal/; did you mean /guide/install/?`
 * @example not ok (`guide/setup.md`, whose page is `/guide/setup/`: a relative link without the
 * file's extension resolves below it)
 * ```md
 * Read [the install guide](install#requirements) first.
 * ```
 * `guide/setup.md:1:6  error  Broken link: no page /guide/setup/install (written
 * "install#requirements"); did you mean install.md#requirements?`
 * @example not ok (an address that does not parse)
 * ```md
 * Open [the site](https://) to start.
 * ```
 * `guide/index.md:1:6  error  Broken link: "https://" is not a well-formed address; fix or remove
 * the link`
 */
export const brokenLink: Rule = {
  id: 'broken-link',
  description: 'Internal links lead to pages that exist.',
  defaultSeverity: 'error',
  defaultOptions: {},
  check(ctx) {
    const routes = ctx.graph.pages.map((p) => p.route);
    const files = ctx.graph.pages.map((p) => p.file);
    const fileSet = new Set(files);
    const guesses = new Map<string, string | null>();
    const findings: RuleFinding[] = [];
    for (const link of ctx.graph.links) {
      if (link.status !== 'broken') continue;
      const href = link.raw.href.trim();
      if (WITH_SCHEME.test(href)) {
        // An address with a scheme that does not parse (`https://`, `http://[bad`): no file or
        // page to name, and none to guess.
        findings.push({
          ...linkSource(ctx, link),
          line: link.raw.line,
          column: link.raw.column,
          message: `Broken link: "${href}" is not a well-formed address; fix or remove the link`,
          target: link.target,
        });
        continue;
      }
      // The graph gives a missing source file as its path from the root (no leading slash),
      // a missing asset or page as a route.
      const sourceFile = !link.target.startsWith('/');
      const what = sourceFile ? 'source file' : link.kind === 'asset' ? 'file' : 'page';
      let guess = sourceFile || link.kind === 'asset' ? null : fileWithoutExtension(link.raw.href, ctx.graph.pages[link.from]?.file ?? '', fileSet);
      if (guess === null) {
        guess = guesses.get(link.target) ?? null;
        if (!guesses.has(link.target)) {
          guess = link.kind === 'asset' ? null : nearest(link.target, sourceFile ? files : routes);
          guesses.set(link.target, guess);
        }
      }
      const written = link.raw.href !== link.target ? ` (written "${link.raw.href}")` : '';
      const todo = guess !== null ? `did you mean ${guess}?` : link.kind === 'asset' ? 'add the file or fix the link' : 'fix or remove the link';
      findings.push({
        ...linkSource(ctx, link),
        line: link.raw.line,
        column: link.raw.column,
        message: `Broken link: no ${what} ${link.target}${written}; ${todo}`,
        target: link.target,
      });
    }
    return findings;
  },
};

/** An address that starts with a scheme (`https:`) or with `//` (another host). */
const WITH_SCHEME = /^(?:[a-z][a-z0-9+.-]*:|\/\/)/i;

/**
 * The link to a Markdown file, as it would be written, when a Markdown source links that file
 * by a relative path without its extension (`setup#wiring` from `guide/intro.md`, with
 * `guide/setup.md` beside it); null otherwise. Only from Markdown: a generator turns a link to
 * a Markdown file into the page's address, while a link in an HTML page stays as written.
 */
function fileWithoutExtension(written: string, fromFile: string, files: ReadonlySet<string>): string | null {
  const href = written.trim();
  if (!MARKDOWN_EXTENSION_END.test(fromFile) || /^(?:[a-z][a-z0-9+.-]*:|\/|#)/i.test(href)) return null;
  const cut = href.search(/[?#]/);
  const path = cut < 0 ? href : href.slice(0, cut);
  if (path === '' || path.endsWith('/') || SOURCE_EXTENSION_END.test(path)) return null;
  let name = path;
  try {
    name = decodeURIComponent(path);
  } catch {
    // A malformed escape: the path as written.
  }
  for (const ext of MARKDOWN_EXTENSIONS) {
    const file = posix.normalize(posix.join(posix.dirname(fromFile), `${name}${ext}`));
    if (!file.startsWith('../') && files.has(file)) return `${path}${ext}${cut < 0 ? '' : href.slice(cut)}`;
  }
  return null;
}
