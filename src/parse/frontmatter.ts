/**
 * YAML frontmatter (DESIGN section 3): the keys linkweave reads, each checked for its type.
 * TOML frontmatter between `+++` fences (Hugo's) is read the same way.
 *
 * Invalid YAML gives one `frontmatter` problem at the line of the YAML error and the page is read
 * without frontmatter; a key of the wrong type gives a problem naming the key at its line and is
 * ignored; other keys are left alone (they belong to the site generator).
 */
import { parse as parseToml } from 'smol-toml';
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
  /** The YAML (or TOML) between the fences. */
  readonly value: string;
  /** `toml` for a `+++` block; absent for YAML. */
  readonly format?: 'toml';
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
  const open = /^(---|\+\+\+)[ \t]*(?:\r\n|\r|\n)/.exec(text);
  if (open === null) return null;
  const toml = open[1] === '+++';
  const fence = toml ? /^\+\+\+[ \t]*$/gm : /^---[ \t]*$/gm;
  fence.lastIndex = open[0].length;
  // `^`/`$` with the m flag know \n and \r line ends.
  for (let m = fence.exec(text); m !== null; m = fence.exec(text)) {
    const before = text.charCodeAt(m.index - 1);
    if (m.index !== open[0].length && before !== 10 && before !== 13) continue;
    const contentStart = open[0].length;
    let valueEnd = m.index;
    if (valueEnd > contentStart && text.charCodeAt(valueEnd - 1) === 10) valueEnd--;
    if (valueEnd > contentStart && text.charCodeAt(valueEnd - 1) === 13) valueEnd--;
    const value = text.slice(contentStart, Math.max(contentStart, valueEnd));
    return toml ? { value, contentStart, end: m.index + m[0].length, format: 'toml' } : { value, contentStart, end: m.index + m[0].length };
  }
  return null;
}

/**
 * Read frontmatter YAML into page metadata.
 * @param value the YAML text between the fences
 * @param contentStart offset of the YAML's first character in the source (problem positions)
 */
export function readFrontmatter(value: string, contentStart: number, format: 'yaml' | 'toml' = 'yaml'): FrontmatterResult {
  const problems: ProblemDraft[] = [];
  const fail = (offset: number, message: string): FrontmatterResult => {
    problems.push({ code: 'frontmatter', message, offset: contentStart + offset });
    return { meta: EMPTY_META, problems };
  };
  if (format === 'toml') {
    let data: Record<string, unknown>;
    try {
      data = parseToml(value) as Record<string, unknown>;
    } catch (error) {
      const e = error as Error & { line?: number; column?: number };
      const offset = e.line === undefined ? 0 : lineOffset(value, e.line) + Math.max(0, (e.column ?? 1) - 1);
      return fail(offset, `Invalid TOML frontmatter: ${e.message.split('\n')[0]}; the page is read without its frontmatter`);
    }
    return readRecord(data, contentStart, problems, tomlKeyOffsets(value), () => 0);
  }
  const doc = parseDocument(value, { prettyErrors: false });
  if (doc.errors.length > 0) {
    const e = doc.errors[0];
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
  return readRecord(data as Record<string, unknown>, contentStart, problems, keyOffsets(doc.contents), (key) => nestedOffset(doc.contents, key));
}

/** The keys linkweave reads from a parsed frontmatter mapping, YAML's or TOML's. */
function readRecord(
  record: Record<string, unknown>,
  contentStart: number,
  problems: ProblemDraft[],
  offsets: ReadonlyMap<string, number>,
  nested: (dotted: string) => number,
): FrontmatterResult {
  const at = (key: string): number => contentStart + (offsets.get(key) ?? 0);
  const wrong = (key: string, got: unknown, expected: string): void => {
    problems.push({
      code: 'frontmatter',
      message: `Frontmatter key "${key}": unexpected ${describe(got)}, expected ${expected}; the key is ignored`,
      offset: at(key.split('.')[0]) + (key.includes('.') ? nested(key) : 0),
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
  // The page type picks the generator's page template (Hugo's `type`); one that does not read is left out.
  if (typeof record.type === 'string' && record.type.trim() !== '') meta.type = record.type.trim();
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

/** Offset of the start of a 1-based line. */
function lineOffset(text: string, line: number): number {
  let at = 0;
  for (let l = 1; l < line; l++) {
    const next = text.indexOf('\n', at);
    if (next < 0) return at;
    at = next + 1;
  }
  return at;
}

/** Offsets (within the TOML) of the top-level keys: `key =` lines before the first table header. */
function tomlKeyOffsets(value: string): Map<string, number> {
  const map = new Map<string, number>();
  const re = /^[ \t]*(?:"([^"\n]*)"|'([^'\n]*)'|([A-Za-z0-9_-]+))[ \t]*=|^[ \t]*\[/gm;
  for (let m = re.exec(value); m !== null; m = re.exec(value)) {
    if (m[0].trimStart().startsWith('[')) break;
    const key = m[1] ?? m[2] ?? m[3];
    if (!map.has(key)) map.set(key, m.index + m[0].length - m[0].trimStart().length);
  }
  return map;
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
export function applyFrontmatter(draft: PageDraft, block: { readonly value: string; readonly contentStart: number; readonly format?: 'toml' | undefined } | null): Read {
  if (block === null) return { draft, meta: EMPTY_META };
  const result = readFrontmatter(block.value, block.contentStart, block.format ?? 'yaml');
  draft.problems.push(...result.problems);
  return result.title === undefined ? { draft, meta: result.meta } : { draft, meta: result.meta, title: result.title };
}
