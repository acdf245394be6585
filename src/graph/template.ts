/**
 * Template-link detection (DESIGN section 4): a link that repeats on at least `templateShare`
 * of the pages, with the same resolved target and the same text, is part of the site's
 * template (a sidebar, header or footer written into every source), not of the page's content.
 */
import type { ResolvedLink } from '../types.js';

/** Fewest pages for which repetition means anything. */
export const TEMPLATE_MIN_PAGES = 4;

/**
 * Mark repeated links as template links. Links must be grouped by page (`from` ascending, as
 * `buildGraph` produces them); links with `from` < 0 (navigation) are left as they are and not
 * counted. Returns a new array; unchanged links are the same objects.
 * @param pageCount number of pages in the site
 * @param share the share of pages at or above which a link is a template link (0 < share <= 1)
 */
export function markTemplateLinks(links: readonly ResolvedLink[], pageCount: number, share: number): ResolvedLink[] {
  if (pageCount < TEMPLATE_MIN_PAGES) return links.slice();
  // A link on a single page does not repeat, whatever the share.
  const threshold = Math.max(2, Math.ceil(share * pageCount - 1e-9));
  const seen = new Map<string, { pages: number; last: number }>();
  const keys: string[] = new Array(links.length);
  for (let i = 0; i < links.length; i++) {
    const link = links[i]!;
    if (link.from < 0) continue;
    const key = templateKey(link);
    keys[i] = key;
    const entry = seen.get(key);
    if (entry === undefined) seen.set(key, { pages: 1, last: link.from });
    else if (entry.last !== link.from) {
      entry.pages++;
      entry.last = link.from;
    }
  }
  const out: ResolvedLink[] = new Array(links.length);
  for (let i = 0; i < links.length; i++) {
    const link = links[i]!;
    const key = keys[i];
    const repeated = key !== undefined && link.context !== 'template' && seen.get(key)!.pages >= threshold;
    out[i] = repeated ? { ...link, context: 'template' } : link;
  }
  return out;
}

/** Same target (kind and resolved target, fragment aside) and same text, whitespace collapsed. */
function templateKey(link: ResolvedLink): string {
  const text = link.raw.text.trim().replace(/\s+/g, ' ');
  return link.kind + '\u0000' + link.target + '\u0000' + text;
}
