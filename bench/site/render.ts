/**
 * Render one planned page as Markdown: front matter, a breadcrumb link to the folder's index,
 * the title, sections under the planned headings (paragraphs with links, lists, code, tables,
 * notes), a list for the links that did not fit in the prose (hubs), and the shared footer.
 * Each page draws from its own seeded stream, so pages come out the same in any order.
 */
import type { PlannedLink } from './links.js';
import { anchorFor, contentLinks, indexLinks, relativeFile } from './links.js';
import type { PagePlan, SitePlan } from './plan.js';
import type { Random } from './prng.js';
import { intBetween, mixSeed, mulberry32, pick } from './prng.js';
import type { Voice } from './prose.js';
import { codeBlock, focusWords, list, note, paragraph, table } from './prose.js';

/** Share of pages that carry the shared "See also" footer (a template block). */
const FOOTER_SHARE = 0.7;
/** Average bytes of a block of prose, to spread links over a page. */
const BLOCK_BYTES = 450;

/** The shared footer: the same links with the same text on most pages. */
export function footerBlock(site: SitePlan): string {
  if (site.footerPages.length === 0) return '';
  const items = site.footerPages.map((id) => {
    const to = site.pages[id]!;
    return `- [${to.title}](${to.route})`;
  });
  return `## See also\n\n${items.join('\n')}`;
}

/** Target size of a page in bytes: mostly 3-6 KB, a few larger. */
function targetBytes(rnd: Random): number {
  const base = 2000 + Math.floor(2800 * rnd());
  return rnd() < 0.02 ? base * intBetween(rnd, 2, 4) : base;
}

/** Markdown text of page `id`. */
export function renderPage(site: SitePlan, id: number): string {
  const page = site.pages[id]!;
  const rnd = mulberry32(mixSeed(site.seed, id));
  const topic = site.topics[page.topic]!;
  const v: Voice = { rnd, topic, focus: focusWords(rnd, topic), topics: site.topics, shared: site.shared };
  const target = targetBytes(rnd);
  const out: string[] = [`---\ntitle: "${page.title}"\n---`];
  const folder = site.folders[page.folder]!;

  if (page.folder !== 0 || !page.isIndex) {
    const upFolder = page.isIndex ? site.folders[Math.max(0, folder.parent)]! : folder;
    const up = site.pages[upFolder.pages[0]!]!;
    if (up.id !== page.id) out.push(`[${up.title}](${relativeFile(page, up)}) / ${page.title}`);
  }
  out.push(`# ${page.title}`);

  const listed = page.isIndex ? indexLinks(rnd, site, page) : [];
  const inline = contentLinks(rnd, site, page);
  const blocks = Math.max(1, Math.round(target / BLOCK_BYTES));
  const perBlock = Math.min(6, Math.ceil(inline.length / blocks));
  let next = 0;
  const take = (max: number): PlannedLink[] => {
    const got = inline.slice(next, next + max);
    next += got.length;
    return got;
  };
  const mentions = site.topicPages[page.topic]!;
  const mention = (): string | null => {
    if (rnd() >= 0.4 || mentions.length < 2) return null;
    const other = site.pages[pick(rnd, mentions)]!;
    return other.id === page.id ? null : other.title;
  };

  out.push(paragraph(v, take(perBlock), mention()));
  if (listed.length > 0) out.push(`## In this section\n\n${listed.map((l) => `- [${l.text}](${l.href})`).join('\n')}`);

  let bytes = out.reduce((s, b) => s + b.length + 2, 0);
  const budget = Math.max(300, (target - bytes) / page.headings.length);
  let tableDone = false;
  for (const heading of page.headings) {
    out.push(`## ${heading}`);
    let section = 0;
    do {
      let block: string;
      const r = rnd();
      if (section === 0 || r < 0.45) block = paragraph(v, take(perBlock), mention());
      else if (r < 0.65) block = list(v, take(Math.min(perBlock, 3)));
      else if (r < 0.85) block = codeBlock(v);
      else if (r < 0.93 && !tableDone) {
        block = table(v);
        tableDone = true;
      } else block = note(v);
      out.push(block);
      section += block.length + 2;
    } while (section < budget);
    bytes += section;
  }

  if (next < inline.length) {
    const rest = inline.slice(next).map((l) => `- [${l.text}](${l.href})`);
    out.push(`## Related pages\n\n${rest.join('\n')}`);
  }
  if (!(page.folder === 0 && page.isIndex) && rnd() < FOOTER_SHARE) {
    const footer = footerBlock(site);
    if (footer !== '') out.push(footer);
  }
  return `${out.join('\n\n')}\n`;
}

/** A paragraph to append to a page (the bench's "one file changed" run). */
export function extraParagraph(site: SitePlan, id: number, salt: number): string {
  const page = site.pages[id]!;
  const rnd = mulberry32(mixSeed(site.seed ^ 0x5bd1e995, id * 31 + salt));
  const topic = site.topics[page.topic]!;
  const v: Voice = { rnd, topic, focus: focusWords(rnd, topic), topics: site.topics, shared: site.shared };
  const to = site.pages[site.topicPages[page.topic]![0]!]!;
  return `\n${paragraph(v, to.id === id ? [] : [{ text: anchorFor(rnd, to), href: relativeFile(page, to) }], null)}\n`;
}
