/**
 * Deterministic synthetic documentation sites for the benchmark and for tests.
 *
 * A site has nested section folders (20-200 pages each, an index page per folder), Markdown
 * pages of about 3-6 KB (front matter, headings, paragraphs, lists, code blocks, sometimes a
 * table), a heavy-tailed out-degree (most pages 5-30 links, a few hubs with hundreds; relative
 * `.md` links and site-absolute routes; a few broken links and fragments), a `nav.yml` table of
 * contents and a shared "See also" footer on most pages (template links), and topic clusters
 * with invented vocabularies: the cluster of each page is returned as the ground truth of
 * relatedness. Everything is drawn from a seeded generator: the same options give the same bytes.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { SitePlan, Vocabulary } from './site/plan.js';
import { planSite } from './site/plan.js';
import { extraParagraph, renderPage } from './site/render.js';

/** Options of the generator. */
export interface GenerateOptions {
  /** Number of pages (Markdown files), index pages included. */
  readonly pages: number;
  /** @default 1 */
  readonly seed?: number;
  /** @default 20 */
  readonly minFolderPages?: number;
  /** @default 200 */
  readonly maxFolderPages?: number;
  /** Share of a folder's pages on the folder's own topic. @default 0.85 */
  readonly topicLoyalty?: number;
  /** Share of pages listed on their folder's index page. @default 0.75 */
  readonly featuredShare?: number;
  /** How pages choose their words (see {@link Vocabulary}). @default 'topical' */
  readonly vocabulary?: Vocabulary;
}

/** What the generator made. */
export interface GeneratedSite {
  /** Files written (pages, `nav.yml`, `linkweave.config.json`). */
  readonly files: number;
  /** Bytes of all files written. */
  readonly bytes: number;
  /** Bytes of the Markdown pages alone. */
  readonly markdownBytes: number;
  /** route -> topic cluster label (ground truth of relatedness). */
  readonly clusters: Record<string, string>;
  /** The plan the files were rendered from (folders, topics, pages). */
  readonly plan: SitePlan;
}

/** A generated site held in memory: path (posix, relative) -> file content. */
export interface InMemorySite extends GeneratedSite {
  readonly contents: Map<string, string>;
}

/** Name of the navigation file the generator writes. */
export const NAV_FILE = 'nav.yml';
/** Name of the configuration file the generator writes. */
export const CONFIG_FILE = 'linkweave.config.json';

function planOf(options: GenerateOptions): SitePlan {
  if (!Number.isInteger(options.pages) || options.pages < 1) {
    throw new Error(`generateSite: "pages" must be a positive integer, got ${String(options.pages)}`);
  }
  return planSite({
    pages: options.pages,
    seed: options.seed ?? 1,
    minFolderPages: options.minFolderPages ?? 20,
    maxFolderPages: options.maxFolderPages ?? 200,
    topicLoyalty: options.topicLoyalty ?? 0.85,
    featuredShare: options.featuredShare ?? 0.75,
    vocabulary: options.vocabulary ?? 'topical',
  });
}

/** The `nav.yml` table of contents: home, the root's pages and every top-level section. */
export function navigationText(plan: SitePlan): string {
  const lines: string[] = [];
  const entry = (id: number): void => {
    const p = plan.pages[id]!;
    lines.push(`- title: "${p.title}"`, `  link: ${p.route}`);
  };
  for (const id of plan.folders[0]!.pages) entry(id);
  for (const child of plan.folders[0]!.children) entry(plan.folders[child]!.pages[0]!);
  return `${lines.join('\n')}\n`;
}

/** The site's `linkweave.config.json`. */
export function configText(): string {
  return `${JSON.stringify({ entry: ['/'], navigation: NAV_FILE }, null, 2)}\n`;
}

/** Render every file of the site, in a fixed order, handing each to `emit`. */
function emitSite(plan: SitePlan, emit: (path: string, text: string) => void): { files: number; bytes: number; markdownBytes: number } {
  let bytes = 0;
  let markdownBytes = 0;
  for (const page of plan.pages) {
    const text = renderPage(plan, page.id);
    markdownBytes += Buffer.byteLength(text);
    emit(page.file, text);
  }
  bytes += markdownBytes;
  const nav = navigationText(plan);
  const config = configText();
  emit(NAV_FILE, nav);
  emit(CONFIG_FILE, config);
  bytes += Buffer.byteLength(nav) + Buffer.byteLength(config);
  return { files: plan.pages.length + 2, bytes, markdownBytes };
}

function clustersOf(plan: SitePlan): Record<string, string> {
  const clusters: Record<string, string> = {};
  for (const p of plan.pages) clusters[p.route] = plan.topics[p.topic]!.label;
  return clusters;
}

/**
 * Write a synthetic site into `dir` (created if missing; existing files with the same names are
 * overwritten).
 */
export function generateSite(dir: string, options: GenerateOptions): GeneratedSite {
  const plan = planOf(options);
  mkdirSync(dir, { recursive: true });
  for (const folder of plan.folders) if (folder.path !== '') mkdirSync(join(dir, folder.path), { recursive: true });
  const totals = emitSite(plan, (path, text) => writeFileSync(join(dir, path), text));
  return { ...totals, clusters: clustersOf(plan), plan };
}

/** The same site as `generateSite`, kept in memory. */
export function generateSiteInMemory(options: GenerateOptions): InMemorySite {
  const plan = planOf(options);
  const contents = new Map<string, string>();
  const totals = emitSite(plan, (path, text) => contents.set(path, text));
  return { ...totals, clusters: clustersOf(plan), plan, contents };
}

/**
 * Text to append to page `id` to make a small edit (for the bench's "one file changed" run);
 * a different `salt` gives a different edit.
 */
export function editForPage(plan: SitePlan, id: number, salt = 1): string {
  return extraParagraph(plan, id, salt);
}

/**
 * `text` with its first relative `.md` link that does not point at `index.md` pointed at
 * `index.md` instead, fragment dropped, link text unchanged (for the bench's "one link target
 * changed" run), or null when it has none.
 */
export function relinkOne(text: string): string | null {
  const link = /\]\((?!index\.md[)#])([^)\s#:]+\.md)(#[^)\s]*)?\)/.exec(text);
  if (link === null) return null;
  return `${text.slice(0, link.index)}](index.md)${text.slice(link.index + link[0].length)}`;
}
