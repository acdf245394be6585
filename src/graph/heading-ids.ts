/**
 * The heading-id style of a site: the ids each page has under a style, and the choice of the
 * style under which the most of the site's own fragment links resolve. Pure.
 */
import { HEADING_ID_STYLES, headingIds } from '../parse/heading-ids.js';
import type { HeadingIdStyle } from '../parse/heading-ids.js';
import type { LinkStatus, PageFacts, ResolvedLink } from '../types.js';

/** The style used and what it resolves. */
export interface HeadingIdChoice {
  readonly style: HeadingIdStyle;
  /** `auto`: chosen by the fragment links; `set`: forced by `routes.headingIds`. */
  readonly how: 'auto' | 'set';
  /** Fragment links to pages (not `#` or `#top`) and how many of them resolve under `style`. */
  readonly fragmentLinks: number;
  readonly resolved: number;
}

/** Ids of pages under a style, computed once per page and style. */
export class PageIds {
  private readonly cache = new Map<string, Set<string> | null>();

  /**
   * @param facts facts of the graph's pages, by page id
   * @param included for each page id, the facts of the files it pulls in
   * @param unknown page ids whose ids are not all known (an include outside the sources, a
   *   page template that computes ids)
   * @param layout for each page id, the ids its page template writes (any style), if any
   */
  constructor(
    private readonly facts: readonly PageFacts[],
    private readonly included: readonly (readonly PageFacts[])[],
    private readonly unknown: ReadonlySet<number>,
    private readonly layout: readonly (readonly string[] | undefined)[] = [],
  ) {}

  /** True when page `page` has the id under `style` (always, when its ids are unknown). */
  has(page: number, id: string, style: HeadingIdStyle): boolean {
    if (this.unknown.has(page)) return true;
    const key = `${style}\u0000${page}`;
    let set = this.cache.get(key);
    if (set === undefined) {
      set = null;
      const own = idsUnder(this.facts[page], style);
      const extra = this.included[page] ?? [];
      const layout = this.layout[page] ?? [];
      if (style !== 'github' || extra.length > 0 || layout.length > 0 || own !== this.facts[page].ids) {
        set = new Set(own);
        for (const f of extra) for (const x of idsUnder(f, style)) set.add(x);
        for (const x of layout) set.add(x);
      }
      this.cache.set(key, set);
    }
    return set === null ? this.facts[page].ids.includes(id) : set.has(id);
  }
}

/** A page's own ids under a style (its `ids` as parsed for GitHub's or when nothing depends on the style). */
export function idsUnder(f: PageFacts, style: HeadingIdStyle): readonly string[] {
  if (style === 'github' || f.fixedIds === undefined) return f.ids;
  const texts = f.headings.filter((h) => h.explicit !== true).map((h) => h.raw ?? h.text);
  return [...f.fixedIds, ...headingIds(style, texts).filter((id) => id !== '')];
}

/**
 * Choose the heading-id style and give every fragment link its status under it.
 * @param links resolved links (statuses computed under GitHub's style)
 * @param ids the pages' ids
 * @param setting `routes.headingIds`
 * @param fallback `routes.headingIdsDefault`: kept when styles tie
 * @returns the links with fragment statuses under the chosen style, and the choice
 */
export function applyHeadingIdStyle(
  links: readonly ResolvedLink[],
  ids: PageIds,
  setting: 'auto' | HeadingIdStyle,
  fallback: HeadingIdStyle,
): { links: ResolvedLink[]; choice: HeadingIdChoice } {
  const fragmentLinks: number[] = [];
  for (let i = 0; i < links.length; i++) {
    const l = links[i];
    if (l.to < 0 || (l.status !== 'ok' && l.status !== 'self' && l.status !== 'broken-fragment')) continue;
    if (l.fragment === '' || l.fragment.toLowerCase() === 'top') continue;
    fragmentLinks.push(i);
  }
  const resolves = (l: ResolvedLink, style: HeadingIdStyle): boolean => {
    if (ids.has(l.to, l.fragment, style)) return true;
    const hash = l.raw.href.indexOf('#');
    return hash >= 0 && hash < l.raw.href.length - 1 && ids.has(l.to, l.raw.href.slice(hash + 1).trim(), style);
  };
  let style: HeadingIdStyle = setting === 'auto' ? fallback : setting;
  if (setting === 'auto' && fragmentLinks.length > 0) {
    let best = -1;
    const order = [fallback, ...HEADING_ID_STYLES.filter((s) => s !== fallback)];
    for (const s of order) {
      let n = 0;
      for (const i of fragmentLinks) if (resolves(links[i], s)) n++;
      if (n > best) {
        best = n;
        style = s;
      }
    }
  }
  const out = links.slice();
  let resolved = 0;
  for (const i of fragmentLinks) {
    const l = links[i];
    const ok = resolves(l, style);
    if (ok) resolved++;
    const status: LinkStatus = ok ? (l.to === l.from ? 'self' : 'ok') : 'broken-fragment';
    if (status !== l.status) out[i] = { ...l, status };
  }
  return { links: out, choice: { style, how: setting === 'auto' ? 'auto' : 'set', fragmentLinks: fragmentLinks.length, resolved } };
}
