/**
 * The links of one synthetic page: how many (heavy-tailed out-degree), to which pages (own
 * folder, own topic, neighbouring sections, popular pages) and written how (relative `.md`
 * paths, site-absolute routes, fragments, and a few broken links and fragments).
 */
import { posix } from 'node:path';
import type { PagePlan, SitePlan } from './plan.js';
import { slugOf } from './plan.js';
import type { Random } from './prng.js';
import { pareto, pick, skewedIndex } from './prng.js';

/** A link as it will be written: Markdown text and destination. */
export interface PlannedLink {
  readonly text: string;
  readonly href: string;
}

/** Least content links of an ordinary page. */
const MIN_OUT = 5;
/** Tail exponent of the out-degree: most pages 5-30 links, a few hundreds. */
const ALPHA = 1.5;
const MAX_OUT = 600;

/** Destination of a link from `from` to `to`, in the style drawn by `rnd`. */
export function hrefTo(rnd: Random, from: PagePlan, to: PagePlan): string {
  const base = rnd() < 0.75 ? relativeFile(from, to) : to.route;
  const r = rnd();
  if (r < 0.05 && to.headings.length > 0) return `${base}#${slugOf(pick(rnd, to.headings))}`;
  return base;
}

/** Relative path from one page's file to another's (how authors link Markdown files). */
export function relativeFile(from: PagePlan, to: PagePlan): string {
  const rel = posix.relative(posix.dirname(from.file), to.file);
  return rel === '' ? posix.basename(to.file) : rel;
}

/** Link text for a link to `to`. */
export function anchorFor(rnd: Random, to: PagePlan): string {
  const r = rnd();
  if (r < 0.6) return to.title;
  const words = to.title.split(' ');
  if (r < 0.85 && words.length >= 2) return words.slice(-2).join(' ');
  if (r < 0.95) return `the ${to.title.toLowerCase()} page`;
  return 'this page';
}

/**
 * The content links of an ordinary (non-index) page, in reading order. Hubs arise from the
 * Pareto tail; a few links are broken on purpose.
 */
export function contentLinks(rnd: Random, site: SitePlan, page: PagePlan): PlannedLink[] {
  const n = site.pages.length;
  if (n < 2) return [];
  const count = pareto(rnd, MIN_OUT, ALPHA, Math.min(MAX_OUT, n - 1));
  const folder = site.folders[page.folder]!;
  const sameTopic = site.topicPages[page.topic]!;
  const links: PlannedLink[] = [];
  for (let i = 0; i < count; i++) {
    const r = rnd();
    let target: number;
    if (r < 0.5) target = pick(rnd, folder.pages);
    else if (r < 0.65) target = pick(rnd, sameTopic);
    else if (r < 0.75) target = neighbourIndex(rnd, site, page);
    else target = site.popularity[skewedIndex(rnd, n, 3)]!;
    if (target === page.id) continue;
    const to = site.pages[target]!;
    links.push({ text: anchorFor(rnd, to), href: damaged(rnd, page, to) });
  }
  return links;
}

/** The index page of the folder's parent or of a sibling folder. */
function neighbourIndex(rnd: Random, site: SitePlan, page: PagePlan): number {
  const folder = site.folders[page.folder]!;
  const parent = site.folders[Math.max(0, folder.parent)]!;
  const options = parent.children.length > 0 && rnd() < 0.6 ? parent.children : [parent.id];
  return site.folders[pick(rnd, options)]!.pages[0]!;
}

/** Mostly a good destination; rarely an external link, a broken link or a broken fragment. */
function damaged(rnd: Random, from: PagePlan, to: PagePlan): string {
  const r = rnd();
  if (r < 0.003) return relativeFile(from, to).replace(/\.md$/, '-removed.md');
  if (r < 0.006 && to.headings.length > 0) return `${relativeFile(from, to)}#${slugOf(to.headings[0]!)}-old`;
  if (r < 0.026) return `https://example.org/${slugOf(to.title)}/`;
  return hrefTo(rnd, from, to);
}

/** The links an index page lists: its folder's featured pages and its sub-folders. */
export function indexLinks(rnd: Random, site: SitePlan, page: PagePlan): PlannedLink[] {
  const folder = site.folders[page.folder]!;
  const links: PlannedLink[] = [];
  for (const child of folder.children) {
    const to = site.pages[site.folders[child]!.pages[0]!]!;
    links.push({ text: to.title, href: rnd() < 0.75 ? relativeFile(page, to) : to.route });
  }
  for (const id of folder.pages) {
    const to = site.pages[id]!;
    if (id === page.id || !to.featured) continue;
    links.push({ text: to.title, href: rnd() < 0.75 ? relativeFile(page, to) : to.route });
  }
  return links;
}
