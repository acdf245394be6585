/**
 * Heading-id styles: how each site generator turns a heading's text into its fragment id, and
 * how it numbers repeats on one page. Pure functions over the heading's plain text (the text of
 * the heading with its Markdown marks removed, as `PageFacts.headings[].raw` holds it).
 *
 * Explicit ids (`## Title {#id}`, `<a id>`, `<span id>`) are the same in every style; they are
 * not made here.
 */
import GithubSlugger, { slug as githubSlug } from 'github-slugger';

/** The heading-id styles linkweave knows, by the generator or library that uses them. */
export const HEADING_ID_STYLES = [
  'github',
  'underscore',
  'mdbook',
  'hugo-github',
  'hugo-github-ascii',
  'hugo-blackfriday',
  'kramdown',
  'python-markdown',
  'vitepress',
  'github-underscore',
] as const;

/** One heading-id style. */
export type HeadingIdStyle = (typeof HEADING_ID_STYLES)[number];

/** Makes the ids of one page's headings, in order: repeats get the style's suffix. */
export interface HeadingIdMaker {
  /** The id of the next heading with this text. */
  id(text: string): string;
}

/**
 * A fresh id maker for one page in `style`.
 * @param style the heading-id style
 */
export function headingIdMaker(style: HeadingIdStyle): HeadingIdMaker {
  if (style === 'github') {
    const slugger = new GithubSlugger();
    return { id: (text) => slugger.slug(text) };
  }
  if (style === 'python-markdown') return pythonMarkdownMaker();
  const base = BASES[style];
  const mark = style === 'github-underscore' ? '_' : '-';
  const counts = new Map<string, number>();
  return {
    id(text) {
      const slug = base(text);
      const seen = counts.get(slug);
      if (seen === undefined) {
        counts.set(slug, 1);
        return slug;
      }
      // mdBook, Hugo, kramdown and markdown-it-anchor (VitePress) number repeats -1, -2, ...;
      // the Node.js API docs _1, _2, ...
      let n = seen;
      let candidate = `${slug}${mark}${n}`;
      while (counts.has(candidate)) candidate = `${slug}${mark}${++n}`;
      counts.set(slug, n + 1);
      counts.set(candidate, 1);
      return candidate;
    },
  };
}

/**
 * The ids of a page's headings in `style`, in order.
 * @param texts the headings' plain texts, in document order
 */
export function headingIds(style: HeadingIdStyle, texts: readonly string[]): string[] {
  const maker = headingIdMaker(style);
  return texts.map((t) => maker.id(t));
}

const LETTER_OR_DIGIT = /[\p{L}\p{N}]/u;

const BASES: Record<Exclude<HeadingIdStyle, 'github' | 'python-markdown'>, (text: string) => string> = {
  /**
   * GitHub's slug of each heading, repeats numbered `_1`, `_2`, ...: the ids of the Node.js API
   * documentation's HTML (Debian nodejs-doc 18.20.4: `process.exit([code])` is `processexitcode`
   * and `process.exitCode` after it `processexitcode_1`).
   */
  'github-underscore': (text) => githubSlug(text),
  /** Lower case, each space an underscore; characters that cannot stand in an id dropped. */
  underscore: (text) =>
    text
      .trim()
      .toLowerCase()
      .replace(/\s/g, '_')
      .replace(/["#%&'()*+,/:;<=>?@[\\\]^`{|}~]/g, ''),
  /**
   * mdBook's `normalize_id`: letters, digits, `_` and `-` kept (ASCII lower-cased), whitespace
   * becomes `-`, the rest dropped.
   */
  mdbook: (text) => {
    let out = '';
    for (const ch of text.trim()) {
      if (ch === '_' || ch === '-' || /[\p{Alphabetic}\p{N}]/u.test(ch)) out += /[A-Z]/.test(ch) ? ch.toLowerCase() : ch;
      else if (/\s/.test(ch)) out += '-';
    }
    return out;
  },
  /** Hugo `autoHeadingIDType = "github"`: `-` and space become `-`, letters/digits/`_` lower-cased, the rest dropped. */
  'hugo-github': (text) => hugoGithub(text.trim(), false),
  /** Hugo `autoHeadingIDType = "github-ascii"`: the same after NFD, every non-ASCII character dropped. */
  'hugo-github-ascii': (text) => hugoGithub(text.normalize('NFD').trim(), true),
  /**
   * Hugo `autoHeadingIDType = "blackfriday"` (Blackfriday's `SanitizedAnchorName`): runs of
   * letters and digits, lower-cased, joined by single dashes.
   */
  'hugo-blackfriday': (text) => {
    let out = '';
    let dash = false;
    for (const ch of text) {
      if (LETTER_OR_DIGIT.test(ch)) {
        if (dash && out !== '') out += '-';
        dash = false;
        out += ch.toLowerCase();
      } else dash = true;
    }
    return out;
  },
  /**
   * kramdown's automatic header ids: everything but ASCII letters, digits, spaces and dashes
   * removed; everything before the first letter removed; spaces (and other non-alphanumerics
   * left) become dashes; lower case; `section` when nothing is left.
   */
  kramdown: (text) => {
    const kept = text.replace(/[^a-zA-Z0-9 -]/g, '').replace(/^[^a-zA-Z]+/, '');
    const id = kept.replace(/[^a-zA-Z0-9]/g, '-').toLowerCase();
    return id === '' ? 'section' : id;
  },
  /**
   * VitePress (`@mdit-vue/shared` slugify): NFKD without combining marks and control characters,
   * runs of spaces and ASCII punctuation become one dash, dashes trimmed, a leading digit gets
   * `_`, lower case.
   */
  vitepress: (text) =>
    text
      .normalize('NFKD')
      .replace(/[\u0300-\u036f]/g, '')
      .replace(/[\u0000-\u001f]/g, '')
      .replace(/[\s~`!@#$%^&*()\-_+=[\]{}|\\;:"'“”‘’<>,.?/]+/g, '-')
      .replace(/-{2,}/g, '-')
      .replace(/^-+|-+$/g, '')
      .replace(/^(\d)/, '_$1')
      .toLowerCase(),
};

function hugoGithub(text: string, asciiOnly: boolean): string {
  let out = '';
  for (const ch of text) {
    if (asciiOnly && ch.charCodeAt(0) > 0x7f) continue;
    if (ch === '-' || ch === ' ') out += '-';
    else if (ch === '_' || /[\p{L}\p{Nd}]/u.test(ch)) out += ch.toLowerCase();
  }
  return out;
}

/**
 * Python-Markdown's `toc` extension: `slugify` (NFKD, non-ASCII dropped, characters other than
 * word characters, spaces and dashes removed, trimmed, lower case, runs of spaces and dashes
 * one dash), and `unique` (a repeat, or an empty id, gets `_1`, `_2`, ...).
 */
function pythonMarkdownMaker(): HeadingIdMaker {
  const used = new Set<string>();
  return {
    id(text) {
      let id = text
        .normalize('NFKD')
        .replace(/[^\x00-\x7f]/g, '')
        .replace(/[^\w\s-]/g, '')
        .trim()
        .toLowerCase()
        .replace(/[-\s]+/g, '-');
      while (used.has(id) || id === '') {
        const m = /^(.*)_([0-9]+)$/.exec(id);
        id = m === null ? `${id}_1` : `${m[1]}_${Number(m[2]) + 1}`;
      }
      used.add(id);
      return id;
    },
  };
}
