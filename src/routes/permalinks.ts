/**
 * Routes by a generator's own rules (`routes.generator`): frontmatter `permalink`, `slug` and
 * `url`, the config's permalink patterns (`routes.permalinks`) and file-name prefixes, read as
 * Jekyll, Hugo or Docusaurus read them. Pure; `routeOfFile` (routes.ts) calls it and falls back
 * to the folder route when it gives null.
 *
 * - Jekyll: posts (`[folders/]_posts/YYYY-MM-DD-name.md`) by the site's `permalink` (a built-in
 *   style or a pattern, `permalinks['*']`), pages at `/:path/:basename:output_ext` with the style's
 *   suffix, collection documents (`_name/...`, `permalinks[name]`) at `/:collection/:path:output_ext`;
 *   a frontmatter `permalink` is a pattern with the same placeholders. The base path is prefixed.
 * - Hugo: `url` is the whole path below the base path; else the section's pattern
 *   (`permalinks[section]`); else `slug` replaces the file's (or the bundle folder's) name.
 * - Docusaurus: number prefixes (`01-intro.md` -> `intro`, in folder names too) are dropped;
 *   `slug` is relative to the doc's folder route, or to the docs route when it starts with `/`.
 */
import type { RouteOptions } from './types.js';

/** The frontmatter values a generator's route rules read. */
export interface RouteMeta {
  readonly slug?: string | undefined;
  readonly permalink?: string | undefined;
  readonly url?: string | undefined;
  /** As written (`2019-11-15`, `2019-11-15T10:00:00+01:00`). */
  readonly date?: string | undefined;
  readonly categories?: readonly string[] | undefined;
  /** The frontmatter title. */
  readonly title?: string | undefined;
}

const MARKDOWN_EXT = /\.(?:md|markdown|mdx|html?)$/i;

/** Jekyll's built-in permalink styles (Jekyll docs, "Permalinks", built-in formats). */
export const JEKYLL_STYLES: Readonly<Record<string, string>> = {
  date: '/:categories/:year/:month/:day/:title:output_ext',
  pretty: '/:categories/:year/:month/:day/:title/',
  ordinal: '/:categories/:year/:y_day/:title:output_ext',
  weekdate: '/:categories/:year/W:week/:short_day/:title:output_ext',
  none: '/:categories/:title:output_ext',
};

/**
 * The path a generator's rules give the file, below the base path and without it (starting with
 * `/`), or null when its rules leave the folder route as it is.
 * @param path file path relative to the content root
 * @param generator `routes.generator`
 * @param permalinks `routes.permalinks`
 */
export function generatorPath(path: string, meta: RouteMeta, generator: RouteOptions['generator'], permalinks: RouteOptions['permalinks']): string | null {
  switch (generator) {
    case 'jekyll':
      return jekyllPath(path, meta, permalinks);
    case 'hugo':
      return hugoPath(path, meta, permalinks);
    default:
      return null;
  }
}

// ---------------------------------------------------------------- Jekyll

interface DateParts {
  readonly year: number;
  readonly month: number;
  readonly day: number;
  readonly hour: number;
  readonly minute: number;
  readonly second: number;
}

function parseDate(text: string | undefined, toUtc = false): DateParts | null {
  if (text === undefined) return null;
  const m = /^(\d{4})-(\d{1,2})-(\d{1,2})(?:[T ](\d{1,2}):(\d{2})(?::(\d{2}))?(?:\.\d+)?\s*(Z|[+-]\d{2}:?\d{2})?)?/.exec(text.trim());
  if (m === null) return null;
  const parts = { year: +m[1], month: +m[2], day: +m[3], hour: +(m[4] ?? 0), minute: +(m[5] ?? 0), second: +(m[6] ?? 0) };
  const zone = m[7];
  if (!toUtc || zone === undefined || zone === 'Z') return parts;
  // The time as the build machine's clock reads it, taken as UTC (Jekyll converts a date with
  // an offset to local time; checked with jekyll 4.3 under TZ=UTC: 2013-09-06 22:02:41 -0400 is
  // written under 2013/09/07).
  const sign = zone.startsWith('-') ? -1 : 1;
  const digits = zone.slice(1).replace(':', '');
  const offset = sign * (+digits.slice(0, 2) * 60 + +digits.slice(2));
  const t = new Date(Date.UTC(parts.year, parts.month - 1, parts.day, parts.hour, parts.minute - offset, parts.second));
  return { year: t.getUTCFullYear(), month: t.getUTCMonth() + 1, day: t.getUTCDate(), hour: t.getUTCHours(), minute: t.getUTCMinutes(), second: t.getUTCSeconds() };
}

const pad = (n: number, width = 2): string => String(n).padStart(width, '0');

/** Day of the year, 1-based. */
function yearDay(d: DateParts): number {
  return Math.round((Date.UTC(d.year, d.month - 1, d.day) - Date.UTC(d.year, 0, 1)) / 86400000) + 1;
}

const WEEKDAYS = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'];
const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

function weekday(d: DateParts): number {
  return new Date(Date.UTC(d.year, d.month - 1, d.day)).getUTCDay();
}

/** ISO 8601 week number (Ruby's `%V`). */
function isoWeek(d: DateParts): number {
  const t = new Date(Date.UTC(d.year, d.month - 1, d.day));
  const day = (t.getUTCDay() + 6) % 7;
  t.setUTCDate(t.getUTCDate() - day + 3);
  const firstThursday = new Date(Date.UTC(t.getUTCFullYear(), 0, 4));
  return 1 + Math.round(((t.getTime() - firstThursday.getTime()) / 86400000 - 3 + ((firstThursday.getUTCDay() + 6) % 7)) / 7);
}

/**
 * Jekyll's `Utils.slugify`: `default` mode replaces every run of characters other than letters
 * and digits with `-`; `pretty` keeps `._~!$&'()+,;=@` too. Leading and trailing `-` are cut;
 * the result is lower-cased unless `cased`.
 */
export function jekyllSlugify(text: string, mode: 'default' | 'pretty', cased: boolean): string {
  const re = mode === 'pretty' ? /[^\p{L}\p{M}\p{Nd}._~!$&'()+,;=@]+/gu : /[^\p{L}\p{M}\p{Nd}]+/gu;
  const s = text.replace(re, '-').replace(/^-+|-+$/g, '');
  return cased ? s : s.toLowerCase();
}

/** Fill a Jekyll pattern; unknown placeholders are left as written. */
function fillJekyll(pattern: string, values: Readonly<Record<string, string>>): string {
  const names = Object.keys(values).sort((a, b) => b.length - a.length);
  const re = new RegExp(`:(${names.join('|')})`, 'g');
  // Jekyll drops empty segments and doubled slashes.
  return pattern.replace(re, (_, name: string) => values[name]).replace(/\/{2,}/g, '/');
}

/** The pattern of a permalink value: a built-in style name or the pattern itself. */
function jekyllPattern(value: string): string {
  return JEKYLL_STYLES[value] ?? value;
}

/** A page's suffix under the site's permalink style (Jekyll's `add_permalink_suffix`). */
function jekyllPageTemplate(sitePermalink: string): string {
  const style = JEKYLL_STYLES[sitePermalink];
  if (style !== undefined) return sitePermalink === 'pretty' ? '/:path/:basename/' : '/:path/:basename:output_ext';
  if (sitePermalink.endsWith('/')) return '/:path/:basename/';
  return '/:path/:basename:output_ext';
}

function jekyllPath(path: string, meta: RouteMeta, permalinks: Readonly<Record<string, string>>): string | null {
  const site = permalinks['*'] ?? 'date';
  const parts = path.replace(/^(?:\.?\/)+/, '').split('/');
  const file = parts.pop()!;
  const stem = file.replace(MARKDOWN_EXT, '');
  const postAt = parts.indexOf('_posts');
  if (postAt >= 0) {
    const m = /^(\d{4})-(\d{1,2})-(\d{1,2})-(.+)$/.exec(stem);
    if (m === null) return null;
    const date = parseDate(meta.date, true) ?? { year: +m[1], month: +m[2], day: +m[3], hour: 0, minute: 0, second: 0 };
    const name = m[4];
    const categories = [...parts.slice(0, postAt), ...(meta.categories ?? [])];
    const values: Record<string, string> = {
      year: String(date.year),
      month: pad(date.month),
      i_month: String(date.month),
      short_month: MONTHS[date.month - 1].slice(0, 3),
      long_month: MONTHS[date.month - 1],
      day: pad(date.day),
      i_day: String(date.day),
      y_day: pad(yearDay(date), 3),
      short_year: pad(date.year % 100),
      week: pad(isoWeek(date)),
      w_year: String(date.year),
      short_day: WEEKDAYS[weekday(date)].slice(0, 3),
      long_day: WEEKDAYS[weekday(date)],
      hour: pad(date.hour),
      minute: pad(date.minute),
      second: pad(date.second),
      title: jekyllSlugify(meta.slug ?? name, 'pretty', true),
      slug: jekyllSlugify(meta.slug ?? name, 'default', false),
      categories: categories.map((c) => c.toLowerCase()).join('/'),
      slugified_categories: categories.map((c) => jekyllSlugify(c, 'default', false)).join('/'),
      output_ext: '.html',
      path: parts.join('/'),
      basename: stem,
      name: jekyllSlugify(stem, 'default', false),
      collection: 'posts',
    };
    return fillJekyll(jekyllPattern(meta.permalink ?? scoped(permalinks, path, 'posts') ?? site), values);
  }
  const collection = parts.length > 0 && parts[0].startsWith('_') ? parts[0].slice(1) : null;
  const byDefault = scoped(permalinks, path, collection ?? 'pages');
  if (collection !== null && permalinks[collection] === undefined && meta.permalink === undefined && byDefault === undefined) return null;
  const folder = collection === null ? parts : parts.slice(1);
  const index = collection === null && stem.toLowerCase() === 'index';
  const values: Record<string, string> = {
    path: collection === null ? folder.join('/') : [...folder, stem].join('/'),
    basename: stem,
    name: jekyllSlugify(stem, 'default', false),
    title: jekyllSlugify(meta.slug ?? stem, 'pretty', true),
    slug: jekyllSlugify(meta.slug ?? stem, 'default', false),
    output_ext: '.html',
    collection: collection ?? '',
    categories: (meta.categories ?? []).map((c) => c.toLowerCase()).join('/'),
  };
  if (meta.permalink !== undefined) return fillJekyll(meta.permalink, values);
  if (byDefault !== undefined) return fillJekyll(byDefault, values);
  if (collection !== null) return fillJekyll(permalinks[collection], values);
  if (index) return fillJekyll('/:path/', values);
  return fillJekyll(jekyllPageTemplate(site), values);
}

/**
 * A permalink set by the site's frontmatter defaults (`defaults:` in `_config.yml`): the key
 * `path:FOLDER` (the longest folder holding the file wins) or `type:TYPE` (`posts`, `pages` or
 * a collection), the path first.
 */
function scoped(permalinks: Readonly<Record<string, string>>, path: string, type: string): string | undefined {
  let best: string | undefined;
  let length = -1;
  for (const [key, pattern] of Object.entries(permalinks)) {
    if (!key.startsWith('path:')) continue;
    const folder = key.slice(5).replace(/^\.?\/+|\/+$/g, '');
    if ((folder === '' || path.startsWith(`${folder}/`)) && folder.length > length) {
      best = pattern;
      length = folder.length;
    }
  }
  return best ?? permalinks[`type:${type}`];
}

// ---------------------------------------------------------------- Hugo

/**
 * Hugo's path sanitising as `:title` and `:slug` use it (its `UnicodeSanitize`, then lower case):
 * letters, digits and `._/~#+` are kept, a run of spaces and hyphens becomes one `-` (none at the
 * start or the end), every other character is dropped.
 */
export function hugoUrlize(text: string): string {
  let out = '';
  let hyphen = false;
  for (const ch of text) {
    if (/[\p{L}\p{M}\p{Nd}._/~#+]/u.test(ch)) {
      if (hyphen && out !== '') out += '-';
      hyphen = false;
      out += ch;
    } else if (ch === '-' || /\s/u.test(ch)) hyphen = true;
  }
  return out.toLowerCase();
}

function hugoPath(path: string, meta: RouteMeta, permalinks: Readonly<Record<string, string>>): string | null {
  const parts = path.replace(/^(?:\.?\/)+/, '').split('/');
  const file = parts.pop()!;
  const stem = file.replace(MARKDOWN_EXT, '');
  const lower = stem.toLowerCase();
  const list = lower === '_index';
  const bundle = lower === 'index';
  if (meta.url !== undefined) {
    const u = meta.url.trim();
    return u.startsWith('/') ? u : `/${u}`;
  }
  if (list) return null;
  // A leaf bundle (`a/b/index.md`) is named by its folder.
  const name = bundle ? parts[parts.length - 1] ?? '' : stem;
  const folders = bundle ? parts.slice(0, -1) : parts;
  const section = parts[0] !== undefined && (parts.length > 1 || !bundle) ? parts[0] : '';
  const pattern = section !== '' ? permalinks[section] : undefined;
  if (pattern !== undefined && !(bundle && parts.length === 0)) {
    const date = parseDate(meta.date) ?? { year: 1, month: 1, day: 1, hour: 0, minute: 0, second: 0 };
    const title = hugoUrlize(meta.title ?? name);
    const values: Record<string, string> = {
      year: pad(date.year, 4),
      month: pad(date.month),
      monthname: MONTHS[date.month - 1].toLowerCase(),
      day: pad(date.day),
      weekday: String(weekday(date)),
      weekdayname: WEEKDAYS[weekday(date)].toLowerCase(),
      yearday: String(yearDay(date)),
      section,
      sections: folders.join('/'),
      title,
      slug: meta.slug !== undefined ? hugoUrlize(meta.slug) : title,
      filename: name,
    };
    const names = Object.keys(values).sort((a, b) => b.length - a.length);
    const filled = pattern.replace(new RegExp(`:(${names.join('|')})`, 'g'), (_, n: string) => values[n]).replace(/\/{2,}/g, '/');
    return filled.startsWith('/') ? filled : `/${filled}`;
  }
  if (meta.slug !== undefined) {
    const prefix = folders.map((f) => `${f}/`).join('');
    return `/${prefix}${meta.slug.trim().replace(/^\/+/, '')}`;
  }
  return null;
}

// ---------------------------------------------------------------- Docusaurus

/**
 * A file or folder name without its number prefix, as Docusaurus's default number-prefix parser
 * reads it: digits, then `-`, `_` or `.` (spaces around allowed), then the name; names that
 * start like a date or a version (`2021-01-01`, `1.2.3`) keep their digits.
 */
export function stripNumberPrefix(name: string): string {
  if (/^\d+[-_.]\d+(?:[-_.]\d+)?(?:$|[-_.\s])/.test(name)) return name;
  const m = /^\d+\s*[-_.]+\s*([^-_.\s].*)$/.exec(name);
  return m === null ? name : m[1];
}

/**
 * The path of a Docusaurus doc below its folder's route: number prefixes dropped, `slug`
 * applied (relative to the doc's folder; from the docs route when it starts with `/`). Null
 * when neither changes the path.
 * @param rest the doc's path below its route folder (`guide/01-intro.md`)
 */
export function docusaurusRest(rest: string, meta: RouteMeta): { readonly rest: string; readonly slug: string | null } {
  const parts = rest.split('/');
  const stripped = parts.map((p, i) => {
    if (i < parts.length - 1) return stripNumberPrefix(p);
    const ext = MARKDOWN_EXT.exec(p)?.[0] ?? '';
    return stripNumberPrefix(p.slice(0, p.length - ext.length)) + ext;
  });
  if (meta.slug === undefined) return { rest: stripped.join('/'), slug: null };
  const slug = meta.slug.trim();
  if (slug.startsWith('/')) return { rest: stripped.join('/'), slug: slug.replace(/^\/+/, '') };
  return { rest: stripped.join('/'), slug: [...stripped.slice(0, -1), slug].join('/') };
}
