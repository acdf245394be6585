/**
 * The route style a site with no generator config is written for, read from its own links. A
 * site whose build turns `fs.md` into `fs.html` (a hand-made build, as many API references
 * have) links `[fs](fs.html)` from Markdown; read as folder routes (`/fs/`), every such link is
 * broken. When most relative `.html` links of the Markdown sources name a Markdown source beside
 * the `.html` path, the site is read with `.html` routes. Common practice, no source.
 */
import { MARKDOWN_EXTENSIONS } from './extensions.js';

/** At least this many links must name a source for the evidence to count. */
export const STYLE_EVIDENCE_LINKS = 5;

/** What the links said. */
export interface StyleFromLinks {
  /** Relative links to `.html` paths in Markdown sources. */
  readonly htmlLinks: number;
  /** Of those, links whose path with a Markdown extension is a source. */
  readonly naming: number;
  /** The style the links are written for, or null (no evidence: keep the configured default). */
  readonly style: 'html' | null;
}

/** Inline link destinations and reference definitions that end in `.html` (before a fragment or query). */
const HTML_LINK = /\]\(\s*<?([^)\s>#?]+?\.html)(?:[#?][^)\s>]*)?>?(?:\s[^)]*)?\)|^[ \t]{0,3}\[[^\]\n]+\]:[ \t]*<?([^\s>#?]+?\.html)(?:[#?]\S*)?/gim;
const SCHEME = /^[a-z][a-z0-9+.-]*:/i;
/** What every match of `HTML_LINK` contains. */
const HTML_WORD = /\.html/i;

/**
 * Read the style from the Markdown sources' links.
 * @param sources paths relative to the content root with `/` separators, and their texts
 */
export function styleFromLinks(sources: readonly { readonly path: string; readonly kind: string; readonly text: string }[]): StyleFromLinks {
  const paths = new Set(sources.map((s) => s.path));
  let htmlLinks = 0;
  let naming = 0;
  for (const s of sources) {
    // Most sources name no `.html` path at all: a plain search first (about a third of the
    // pattern's time on a 10,000-page site with no such link).
    if (s.kind !== 'markdown' || !HTML_WORD.test(s.text)) continue;
    const folder = s.path.includes('/') ? s.path.slice(0, s.path.lastIndexOf('/') + 1) : '';
    HTML_LINK.lastIndex = 0;
    let m: RegExpExecArray | null;
    while ((m = HTML_LINK.exec(s.text)) !== null) {
      const href = m[1] ?? m[2];
      if (href.startsWith('/') || SCHEME.test(href)) continue;
      htmlLinks++;
      const stem = relative(folder, href.slice(0, -'.html'.length));
      if (stem !== null && MARKDOWN_EXTENSIONS.some((ext) => paths.has(stem + ext))) naming++;
    }
  }
  const style = naming >= STYLE_EVIDENCE_LINKS && naming * 2 >= htmlLinks ? 'html' : null;
  return { htmlLinks, naming, style };
}

/** `href` resolved against `folder` (both relative to the root), or null when it climbs above it. */
function relative(folder: string, href: string): string | null {
  const parts = folder === '' ? [] : folder.slice(0, -1).split('/');
  for (const seg of href.split('/')) {
    if (seg === '' || seg === '.') continue;
    if (seg === '..') {
      if (parts.length === 0) return null;
      parts.pop();
    } else parts.push(seg);
  }
  return parts.join('/');
}
