/**
 * The plan of a synthetic site: folders (nested sections), topics with invented vocabularies,
 * and the pages with their files, routes, titles and headings. Rendering (render.ts) turns one
 * planned page into Markdown; the plan is what makes links between pages possible (a link
 * needs its target's file, route and headings).
 */
import type { Random } from './prng.js';
import { intBetween, mixSeed, mulberry32, pick, shuffle } from './prng.js';
import { COMMON_WORDS, TITLE_VERBS, capitalize, inventWord } from './words.js';

/** A topic cluster: its label (the ground truth of relatedness) and its own words. */
export interface Topic {
  readonly id: number;
  readonly label: string;
  /** Invented words; the first few are the topic's key words (titles, folder names). */
  readonly words: readonly string[];
}

/** A folder of the site (a section). Folder 0 is the site root. */
export interface FolderPlan {
  readonly id: number;
  /** Posix path relative to the site root, '' for the root. */
  readonly path: string;
  readonly parent: number;
  readonly depth: number;
  readonly topic: number;
  readonly children: number[];
  /** Page ids; the first is the folder's index page. */
  readonly pages: number[];
}

/** A planned page. */
export interface PagePlan {
  readonly id: number;
  readonly folder: number;
  /** Posix path of the Markdown file relative to the site root. */
  readonly file: string;
  /** Route under the default `directory` style. */
  readonly route: string;
  readonly title: string;
  /** Heading texts (level 2), unique within the page; their slugs are `slugOf(text)`. */
  readonly headings: readonly string[];
  readonly topic: number;
  readonly isIndex: boolean;
  /** Listed on its folder's index page. */
  readonly featured: boolean;
}

/** The whole plan. */
export interface SitePlan {
  readonly seed: number;
  readonly topics: readonly Topic[];
  readonly folders: readonly FolderPlan[];
  readonly pages: readonly PagePlan[];
  /** Page ids per topic. */
  readonly topicPages: readonly (readonly number[])[];
  /** A permutation of page ids: the head is the most linked-to (popular) pages. */
  readonly popularity: readonly number[];
  /** Ids of the root's special pages that the shared footer links to. */
  readonly footerPages: readonly number[];
  /**
   * The site-wide vocabulary every page draws from whatever its topic, most common first (empty
   * for the `topical` kind); see {@link Vocabulary}.
   */
  readonly shared: readonly string[];
}

/**
 * How pages choose their words.
 * - `topical`: a small common vocabulary (most of it in more than half the pages, so it relates
 *   nothing) and each topic's own invented words: related pages share rare terms.
 * - `shared`: the same, plus a large site-wide vocabulary drawn with a Zipf-like popularity, as
 *   in real prose: thousands of terms sit in 1-50% of the pages, so most pairs of pages share
 *   some relating terms and an inverted index reads long postings.
 */
export type Vocabulary = 'topical' | 'shared';

/** Knobs of the plan (defaults in `generate.ts`). */
export interface PlanOptions {
  readonly pages: number;
  readonly seed: number;
  readonly minFolderPages: number;
  readonly maxFolderPages: number;
  /** Share of a folder's pages that belong to the folder's own topic. */
  readonly topicLoyalty: number;
  /** Share of pages listed on their folder's index. */
  readonly featuredShare: number;
  readonly vocabulary: Vocabulary;
}

const ROOT_PAGES: readonly { name: string; title: string }[] = [
  { name: 'index', title: 'Documentation home' },
  { name: 'getting-started', title: 'Getting started' },
  { name: 'glossary', title: 'Glossary' },
  { name: 'faq', title: 'Frequently asked questions' },
  { name: 'release-notes', title: 'Release notes' },
];

const WORDS_PER_TOPIC = 32;
/** Words of the site-wide vocabulary of a `shared` site. */
const SHARED_WORDS = 6000;

/** GitHub-style slug of a heading made of plain lower-case words and spaces. */
export function slugOf(text: string): string {
  return text.toLowerCase().replace(/[^a-z0-9 -]/g, '').replace(/ /g, '-');
}

/** Route of a Markdown file under the `directory` style with index pages. */
export function routeOf(file: string): string {
  const noExt = file.replace(/\.md$/, '');
  if (noExt === 'index') return '/';
  if (noExt.endsWith('/index')) return `/${noExt.slice(0, -'/index'.length)}/`;
  return `/${noExt}/`;
}

/** Build the plan of a site with `options.pages` pages (index pages included). */
export function planSite(options: PlanOptions): SitePlan {
  const rnd = mulberry32(options.seed);
  const taken = new Set<string>();
  const sizes = folderSizes(rnd, options);
  const topics: Topic[] = [];
  const folders: FolderPlan[] = [];
  const newTopic = (): number => {
    const words: string[] = [];
    for (let i = 0; i < WORDS_PER_TOPIC; i++) words.push(inventWord(rnd, taken));
    topics.push({ id: topics.length, label: topics.length === 0 ? 'general' : words[0]!, words });
    return topics.length - 1;
  };

  // Folder 0 is the root; its topic is the site's general one.
  folders.push({ id: 0, path: '', parent: -1, depth: 0, topic: newTopic(), children: [], pages: [] });
  const sections = Math.max(1, Math.min(sizes.length, 14, Math.round(1.2 * Math.sqrt(sizes.length))));
  const canParent: number[] = [];
  for (let f = 0; f < sizes.length; f++) {
    const parent = f < sections ? 0 : canParent[Math.floor(rnd() * canParent.length)]!;
    const topic = newTopic();
    const depth = folders[parent]!.depth + 1;
    const name = topics[topic]!.words[0]!;
    const path = parent === 0 ? name : `${folders[parent]!.path}/${name}`;
    const id = folders.length;
    folders.push({ id, path, parent, depth, topic, children: [], pages: [] });
    folders[parent]!.children.push(id);
    if (depth <= 3) canParent.push(id);
  }

  const pages: PagePlan[] = [];
  const rootCount = Math.min(ROOT_PAGES.length, options.pages);
  for (let i = 0; i < rootCount; i++) {
    const r = ROOT_PAGES[i]!;
    const file = `${r.name}.md`;
    pages.push({
      id: pages.length, folder: 0, file, route: routeOf(file), title: r.title,
      headings: headingsFor(rnd, topics[0]!), topic: 0, isIndex: i === 0, featured: true,
    });
    folders[0]!.pages.push(pages.length - 1);
  }
  for (let f = 0; f < sizes.length; f++) {
    const folder = folders[f + 1]!;
    const used = new Set<string>();
    for (let i = 0; i < sizes[f]!; i++) {
      const isIndex = i === 0;
      const topicId = isIndex || rnd() < options.topicLoyalty ? folder.topic : 1 + Math.floor(rnd() * (topics.length - 1));
      const topic = topics[topicId]!;
      const title = isIndex ? indexTitle(rnd, topic) : pageTitle(rnd, topic);
      let name = isIndex ? 'index' : slugOf(title);
      if (used.has(name) || (!isIndex && name === 'index')) {
        let k = 2;
        while (used.has(`${name}-${k}`)) k++;
        name = `${name}-${k}`;
      }
      used.add(name);
      const file = `${folder.path}/${name}.md`;
      pages.push({
        id: pages.length, folder: folder.id, file, route: routeOf(file), title,
        headings: headingsFor(rnd, topic), topic: topicId, isIndex,
        featured: isIndex || rnd() < options.featuredShare,
      });
      folder.pages.push(pages.length - 1);
    }
  }

  const topicPages: number[][] = topics.map(() => []);
  for (const p of pages) topicPages[p.topic]!.push(p.id);
  const popularity = shuffle(rnd, pages.map((p) => p.id));
  const footerPages = pages.filter((p) => p.folder === 0 && !p.isIndex).map((p) => p.id).slice(0, 3);
  return { seed: options.seed, topics, folders, pages, topicPages, popularity, footerPages, shared: sharedWords(options, taken) };
}

/** The site-wide vocabulary, from a stream of its own (the `topical` plan's draws are unchanged). */
function sharedWords(options: PlanOptions, taken: Set<string>): string[] {
  if (options.vocabulary === 'topical') return [];
  const rnd = mulberry32(mixSeed(options.seed, 0x5eed));
  const words: string[] = [];
  for (let i = 0; i < SHARED_WORDS; i++) words.push(inventWord(rnd, taken));
  return words;
}

/** Sizes of the non-root folders: between min and max pages, more small ones than large ones. */
function folderSizes(rnd: Random, options: PlanOptions): number[] {
  const sizes: number[] = [];
  let remaining = options.pages - Math.min(ROOT_PAGES.length, options.pages);
  const { minFolderPages: lo, maxFolderPages: hi } = options;
  while (remaining > 0) {
    let s = lo + Math.floor((hi - lo) * rnd() * rnd());
    if (remaining - s < lo) s = remaining <= hi ? remaining : Math.min(hi, remaining - lo);
    sizes.push(s);
    remaining -= s;
  }
  return sizes;
}

function indexTitle(rnd: Random, topic: Topic): string {
  return `${capitalize(topic.words[0]!)} ${topic.words[1]!} ${pick(rnd, ['overview', 'guide', 'handbook', 'reference'])}`;
}

function pageTitle(rnd: Random, topic: Topic): string {
  const key = (): string => topic.words[Math.floor(rnd() * 10)]!;
  const c = pick(rnd, COMMON_WORDS);
  switch (intBetween(rnd, 0, 3)) {
    case 0:
      return `${pick(rnd, TITLE_VERBS)} the ${key()} ${c}`;
    case 1:
      return `${capitalize(key())} ${key()} ${c}`;
    case 2:
      return `${capitalize(key())} ${c} ${pick(rnd, COMMON_WORDS)}`;
    default:
      return `${pick(rnd, TITLE_VERBS)} ${key()} ${c}`;
  }
}

function headingsFor(rnd: Random, topic: Topic): string[] {
  const count = intBetween(rnd, 4, 7);
  const seen = new Set<string>();
  const out: string[] = [];
  while (out.length < count) {
    const w = topic.words[Math.floor(rnd() * topic.words.length)]!;
    const c = pick(rnd, COMMON_WORDS);
    const h = rnd() < 0.5 ? `${capitalize(c)} ${w}` : `${capitalize(w)} ${c}`;
    if (!seen.has(h) && h !== 'See also') {
      seen.add(h);
      out.push(h);
    }
  }
  return out;
}
