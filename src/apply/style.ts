/**
 * The site's prevailing link style: counted from the internal links written in a source file
 * (`PageFacts.links` of origin `markdown` or `html`), falling back to the whole site's when the
 * file has none or a tie, and to `relative` when the site has none either (or a tie).
 *
 * A link counts as `absolute` when it starts with one `/`; as `relative` when it is relative and
 * names a source file (`.md`, `.markdown`, `.mdx`, `.html`, `.htm`); as `route-relative` when it
 * is relative without an extension (`../calibration/`). Fragments alone, external URLs (a
 * scheme or `//`), and links to assets (any other extension) do not count. In HTML sources,
 * `relative` and `route-relative` are one style (a relative URL), counted as `relative`.
 */
import { extensionOf, isSourceExtension } from '../routes/index.js';
import type { FileKind, RawLink } from '../types.js';
import type { LinkStyle, StyleCounts } from './types.js';

const SCHEME = /^[a-zA-Z][a-zA-Z0-9+.-]*:/;

/** The style of one href, or null when it is not a link to a page of the site. */
export function classifyHref(href: string): LinkStyle | null {
  const h = href.trim();
  if (h === '' || h.startsWith('#') || h.startsWith('?') || SCHEME.test(h) || /^[\\/]{2}/.test(h)) return null;
  const path = h.replace(/[?#].*$/s, '');
  const ext = extensionOf(path);
  if (ext !== '' && !isSourceExtension(ext)) return null;
  if (path.startsWith('/') || path.startsWith('\\')) return 'absolute';
  return ext === '' ? 'route-relative' : 'relative';
}

/** Count the styles of the links written in one page (navigation and pattern links left out). */
export function countStyles(links: readonly RawLink[], kind: FileKind): StyleCounts {
  const counts = { relative: 0, absolute: 0, 'route-relative': 0 };
  for (const link of links) {
    if (link.origin !== 'markdown' && link.origin !== 'html') continue;
    const style = classifyHref(link.href);
    if (style === null) continue;
    counts[kind === 'html' && style === 'route-relative' ? 'relative' : style]++;
  }
  return counts;
}

/** Sum of counts. */
export function addCounts(a: StyleCounts, b: StyleCounts): StyleCounts {
  return { relative: a.relative + b.relative, absolute: a.absolute + b.absolute, 'route-relative': a['route-relative'] + b['route-relative'] };
}

/** The style with the most links, or null when there are none or the top is a tie. */
export function majority(counts: StyleCounts): LinkStyle | null {
  const ranked = (Object.entries(counts) as [LinkStyle, number][]).sort((a, b) => b[1] - a[1]);
  const [first, second] = ranked;
  return first![1] === 0 || first![1] === second![1] ? null : first![0];
}

/** Where a style came from, for the summary. */
export type StyleOrigin = 'flag' | 'file' | 'site' | 'default';

/**
 * The style for new links in one source file.
 * @param fileCounts the file's own links
 * @param siteCounts all links of the site, asked for only when the file decides nothing
 * @param forced `--link-style`, when given
 */
export function chooseStyle(
  fileCounts: StyleCounts,
  siteCounts: () => StyleCounts,
  forced: LinkStyle | null,
): { style: LinkStyle; origin: StyleOrigin } {
  if (forced !== null) return { style: forced, origin: 'flag' };
  const own = majority(fileCounts);
  if (own !== null) return { style: own, origin: 'file' };
  const site = majority(siteCounts());
  return site === null ? { style: 'relative', origin: 'default' } : { style: site, origin: 'site' };
}
