/**
 * YAML frontmatter (DESIGN section 3): the keys linkweave reads, each checked for its type.
 *
 * Invalid YAML gives one `frontmatter` problem at the line of the YAML error and the page is read
 * without frontmatter; a key of the wrong type gives a problem naming the key at its line and is
 * ignored; other keys are left alone (they belong to the site generator).
 */
import { isMap, isScalar, parseDocument } from 'yaml';
import type { PageMeta } from '../types.js';
import type { PageDraft, ProblemDraft, Read } from './types.js';

/** Frontmatter of a page that has none. */
export const EMPTY_META: PageMeta = { draft: false, noindex: false, aliases: [], exclude: false };

/** What the frontmatter says. */
export interface FrontmatterResult {
  readonly meta: PageMeta;
  readonly title?: string;
  readonly problems: ProblemDraft[];
}

/** A frontmatter block found at the start of a text. */
export interface FrontmatterBlock {
  /** The YAML between the fences. */
  readonly value: string;
  /** Offset of the YAML's first character. */
  readonly contentStart: number;
  /** Offset just past the closing fence line (its line ending excluded). */
  readonly end: number;
}

const IMPORTANCE = ['high', 'normal', 'low'] as const;
const LINKWEAVE_KEYS = new Set(['importance', 'exclude']);

/**
 * Find a `---` fenced YAML block at the very start of a text (the rule remark-frontmatter applies
 * to Markdown; used here for HTML files, which some generators also give frontmatter, and for the
 * simple fallback reader).
 * @param text the source text (BOM removed)
 */
export function findFrontmatter(text: string): FrontmatterBlock | null {
  const open = /^---[ \t]*(?:\r\n|\r|\n)/.exec(text);
  if (open === null) return null;
  const fence = /^---[ \t]*$/gm;
  fence.lastIndex = open[0].length;
  // `^`/`$` with the m flag know \n and \r line ends.
  for (let m = fence.exec(text); m !== null; m = fence.exec(text)) {
    const before = text.charCodeAt(m.index - 1);
    if (m.index !== open[0].length && before !== 10 && before !== 13) continue;
    const contentStart = open[0].length;
    let valueEnd = m.index;
    if (valueEnd > contentStart && text.charCodeAt(valueEnd - 1) === 10) valueEnd--;
    if (valueEnd > contentStart && text.charCodeAt(valueEnd - 1) === 13) valueEnd--;
    return { value: text.slice(contentStart, Math.max(contentStart, valueEnd)), contentStart, end: m.index + m[0].length };
  }
  return null;
}

/**
 * Read frontmatter YAML into page metadata.
 * @param value the YAML text between the fences
 * @param contentStart offset of the YAML's first character in the source (problem positions)
 */
export function readFrontmatter(value: string, contentStart: number): FrontmatterResult {
  const problems: ProblemDraft[] = [];
  const fail = (offset: number, message: string): FrontmatterResult => {
    problems.push({ code: 'frontmatter', message, offset: contentStart + offset });
    return { meta: EMPTY_META, problems };
  };
  const doc = parseDocument(value, { prettyErrors: false });
  if (doc.errors.length > 0) {
    const e = doc.errors[0]!;
    return fail(e.pos[0], `Invalid YAML frontmatter: ${e.message}; the page is read without its frontmatter`);
  }
  let data: unknown;
  try {
    data = doc.toJS({ maxAliasCount: 100 });
  } catch (error) {
    return fail(0, `Invalid YAML frontmatter: ${(error as Error).message}; the page is read without its frontmatter`);
  }
  if (data === null || data === undefined) return { meta: EMPTY_META, problems };
  if (typeof data !== 'object' || Array.isArray(data)) {
    return fail(0, `The frontmatter is not a mapping of keys (found: ${describe(data)}); the page is read without it`);
  }
  const record = data as Record<string, unknown>;
  const offsets = keyOffsets(doc.contents);
  const at = (key: string): number => contentStart + (offsets.get(key) ?? 0);
  const wrong = (key: string, got: unknown, expected: string): void => {
    problems.push({
      code: 'frontmatter',
      message: `Frontmatter key "${key}": unexpected ${describe(got)}, expected ${expected}; the key is ignored`,
      offset: at(key.split('.')[0]!) + (key.includes('.') ? nestedOffset(doc.contents, key) : 0),
    });
  };

  const meta: { -readonly [K in keyof PageMeta]: PageMeta[K] } = { draft: false, noindex: false, aliases: [], exclude: false };
  let title: string | undefined;
  if ('title' in record) {
    const t = textValue(record.title);
    if (t === undefined) wrong('title', record.title, 'a text');
    else title = t;
  }
  for (const key of ['slug', 'permalink'] as const) {
    if (!(key in record)) continue;
    const t = textValue(record[key]);
    if (t === undefined || t.trim() === '') wrong(key, record[key], 'a non-empty route text');
    else meta[key] = t;
  }
  if ('url' in record) {
    const t = textValue(record.url);
    if (t === undefined || t.trim() === '') wrong('url', record.url, 'a non-empty route text');
    else meta.url = t;
  }
  // Dates only feed permalink patterns: one that does not read is left out without a word.
  const date = record.date instanceof Date ? record.date.toISOString() : textValue(record.date);
  if (date !== undefined && /^\d{4}-\d{1,2}-\d{1,2}/.test(date.trim())) meta.date = date.trim();
  const cats = record.categories ?? record.category;
  if (typeof cats === 'string' && cats.trim() !== '') meta.categories = cats.trim().split(/\s+/);
  else if (Array.isArray(cats)) meta.categories = cats.filter((c): c is string | number => typeof c === 'string' || typeof c === 'number').map(String);
  for (const key of ['draft', 'noindex'] as const) {
    if (!(key in record)) continue;
    if (typeof record[key] === 'boolean') meta[key] = record[key];
    else wrong(key, record[key], 'true or false');
  }
  // Pages the generator reads but does not render (Hugo's `headless`, `build.render: never`,
  // `_build.render: false`) are left out like drafts.
  const build = (record.build ?? record._build) as unknown;
  const render = typeof build === 'object' && build !== null ? (build as Record<string, unknown>).render : undefined;
  if (record.headless === true || render === 'never' || render === false) meta.draft = true;
  if ('aliases' in record) {
    const a = record.aliases;
    if (typeof a === 'string' && a.trim() !== '') meta.aliases = [a.trim()];
    else if (Array.isArray(a) && a.every((x) => typeof x === 'string' && x.trim() !== '')) meta.aliases = (a as string[]).map((x) => x.trim());
    else wrong('aliases', a, 'a list of routes');
  }
  if ('linkweave' in record) readLinkweave(record.linkweave, meta, wrong);
  return title === undefined ? { meta, problems } : { meta, title, problems };
}

/** The project's own key: `linkweave: { importance: high|normal|low, exclude: bool }`. */
function readLinkweave(
  value: unknown,
  meta: { importance?: PageMeta['importance']; exclude: boolean },
  wrong: (key: string, got: unknown, expected: string) => void,
): void {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) {
    wrong('linkweave', value, 'a mapping with "importance" and/or "exclude"');
    return;
  }
  const lw = value as Record<string, unknown>;
  for (const key of Object.keys(lw).sort()) {
    if (!LINKWEAVE_KEYS.has(key)) wrong(`linkweave.${key}`, 'unknown key', 'one of "importance", "exclude"');
  }
  if ('importance' in lw) {
    const v = lw.importance;
    if (typeof v === 'string' && (IMPORTANCE as readonly string[]).includes(v)) meta.importance = v as PageMeta['importance'] & string;
    else wrong('linkweave.importance', v, 'one of "high", "normal", "low"');
  }
  if ('exclude' in lw) {
    if (typeof lw.exclude === 'boolean') meta.exclude = lw.exclude;
    else wrong('linkweave.exclude', lw.exclude, 'true or false');
  }
}

/** Text values: strings, and finite numbers written without quotes (`title: 1984`). */
function textValue(v: unknown): string | undefined {
  if (typeof v === 'string') return v;
  if (typeof v === 'number' && Number.isFinite(v)) return String(v);
  return undefined;
}

function describe(v: unknown): string {
  if (v === 'unknown key') return 'key';
  if (v === null || v === undefined) return 'empty value';
  if (Array.isArray(v)) return 'list';
  if (typeof v === 'object') return 'mapping';
  if (typeof v === 'string') return v.trim() === '' ? 'empty text' : 'text';
  return typeof v;
}

/** Offsets (within the YAML) of the top-level keys. */
function keyOffsets(contents: unknown): Map<string, number> {
  const map = new Map<string, number>();
  if (!isMap(contents)) return map;
  for (const pair of contents.items) {
    if (isScalar(pair.key) && pair.key.range) map.set(String(pair.key.value), pair.key.range[0]);
  }
  return map;
}

/** For `parent.child`: offset of `child` relative to `parent`'s key. */
function nestedOffset(contents: unknown, dotted: string): number {
  const [parent, child] = dotted.split('.') as [string, string];
  if (!isMap(contents)) return 0;
  for (const pair of contents.items) {
    if (!isScalar(pair.key) || String(pair.key.value) !== parent || !pair.key.range) continue;
    if (!isMap(pair.value)) return 0;
    for (const inner of pair.value.items) {
      if (isScalar(inner.key) && String(inner.key.value) === child && inner.key.range) return inner.key.range[0] - pair.key.range[0];
    }
  }
  return 0;
}

/**
 * Read a page's frontmatter block (if any) and put its problems on the draft.
 * @param draft the page being collected
 * @param block the YAML and the offset of its first character, or null
 */
export function applyFrontmatter(draft: PageDraft, block: { readonly value: string; readonly contentStart: number } | null): Read {
  if (block === null) return { draft, meta: EMPTY_META };
  const result = readFrontmatter(block.value, block.contentStart);
  draft.problems.push(...result.problems);
  return result.title === undefined ? { draft, meta: result.meta } : { draft, meta: result.meta, title: result.title };
}
