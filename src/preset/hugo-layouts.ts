/**
 * The ids a Hugo site's layouts write into its single pages, read from the template files as
 * text (never run). A page of type T is rendered by the first `single.html` found in
 * `layouts/T/` then `layouts/_default/`, in the site's `layouts/` and then in each theme's or
 * imported module's; that template pulls in `baseof.html` (when it defines blocks), partials
 * (`partial "x.html"`, `partialCached`) and content views (`.Render "name"`, looked up the same
 * way as `single`). Of the `id="..."` attributes in those files:
 * - a literal id (`id="readout"`) is an id of every page the chain renders;
 * - an id computed by the template (`id="{{ $id }}"`) cannot be known without running it. When
 *   the file that computes it is the page type's own (under `layouts/T/`), fragment links to
 *   pages of that type are unknown, never broken. Computed ids in `_default/` templates and
 *   partials are on every page (menus, widgets): they are counted and said, not made unknown,
 *   so fragment checks are not silenced site-wide.
 * Pure: the site's files come in through `SiteFiles`.
 */
import type { LayoutIdsConfig } from '../config/config.js';
import type { SiteFiles } from './types.js';
import { dig, isRecord, str } from './util.js';

/** Layout folders that hold no page type's templates. */
const NOT_TYPES = new Set(['_default', 'partials', 'shortcodes', '_markup', '_internal']);
/** Template files followed from one page type's `single.html`, at most. */
const MAX_CHAIN = 200;
const LITERAL_ID = /(?<=[\s}])id\s*=\s*"([^"{}<>\s]+)"/g;
const COMPUTED_ID = /(?<=[\s}])id\s*=\s*"?[^"\s>]*\{\{/g;
const PARTIAL = /\bpartial(?:Cached)?\s+"([^"]+)"/g;
const RENDER = /\.Render\s+"([\w-]+)"/g;

/** What the layouts say about page ids. */
export interface HugoLayoutIds {
  /** One entry per page type with a folder, then `*` for the rest; empty when no layout was found. */
  readonly entries: LayoutIdsConfig[];
  /** Layout files (site-relative) under a type's folder that compute ids: their pages' fragments are unknown. */
  readonly computedFiles: readonly string[];
  /** Computed ids in shared templates (`_default/`, partials), not made unknown. */
  readonly sharedComputed: number;
}

/**
 * The layout folders Hugo reads, in lookup order: `layouts/`, then each theme (`theme`) and
 * imported module (`module.imports[].path`, from `_vendor/` when vendored, else `themes/`).
 */
export function hugoLayoutDirs(conf: Record<string, unknown>, files: SiteFiles): string[] {
  const dirs = ['layouts'];
  const themes = Array.isArray(conf.theme) ? conf.theme.filter((t): t is string => typeof t === 'string') : [str(conf.theme)].filter((t): t is string => t !== undefined);
  const imports = dig(conf, 'module', 'imports');
  const paths = Array.isArray(imports) ? imports.map((i) => (isRecord(i) ? str(i.path) : undefined)).filter((p): p is string => p !== undefined) : [];
  for (const name of [...themes, ...paths]) {
    for (const base of [`_vendor/${name}`, `themes/${name}`]) {
      if (files.exists(`${base}/layouts`)) {
        dirs.push(`${base}/layouts`);
        break;
      }
    }
  }
  return dirs.filter((d) => files.exists(d));
}

/**
 * Read the ids the layouts write.
 * @param dirs the layout folders, in lookup order (`hugoLayoutDirs`)
 * @param files the site's files
 */
export function readHugoLayoutIds(dirs: readonly string[], files: SiteFiles): HugoLayoutIds {
  const texts = new Map<string, string | null>();
  const read = (path: string): string | null => {
    let t = texts.get(path);
    if (t === undefined) {
      const raw = files.read(path);
      t = raw === null ? null : stripComments(raw);
      texts.set(path, t);
    }
    return t;
  };
  const template = (type: string | null, name: string): string | null => {
    for (const folder of type === null ? ['_default'] : [type, '_default']) {
      for (const dir of dirs) {
        const path = `${dir}/${folder}/${name}.html`;
        if (read(path) !== null) return path;
      }
    }
    return null;
  };
  const partial = (name: string): string | null => {
    const file = /\.[a-z]+$/.test(name) ? name : `${name}.html`;
    for (const dir of dirs) if (read(`${dir}/partials/${file}`) !== null) return `${dir}/partials/${file}`;
    return null;
  };
  const chain = (type: string | null): string[] => {
    const single = template(type, 'single');
    if (single === null) return [];
    const out: string[] = [];
    const queue = [single];
    const seen = new Set<string>();
    while (queue.length > 0 && out.length < MAX_CHAIN) {
      const path = queue.shift() as string;
      if (seen.has(path)) continue;
      seen.add(path);
      out.push(path);
      const text = read(path) ?? '';
      if (path === single && /\{\{-?\s*define\s+"/.test(text)) {
        const base = template(type, 'baseof');
        if (base !== null) queue.push(base);
      }
      for (const m of text.matchAll(PARTIAL)) {
        const p = partial(m[1]);
        if (p !== null) queue.push(p);
      }
      for (const m of text.matchAll(RENDER)) {
        const v = template(type, m[1]);
        if (v !== null) queue.push(v);
      }
    }
    return out;
  };

  const types = new Set<string>();
  for (const dir of dirs) {
    for (const f of files.files(dir, 5000)) {
      const rest = f.slice(dir.length + 1);
      const cut = rest.indexOf('/');
      if (cut > 0 && !NOT_TYPES.has(rest.slice(0, cut))) types.add(rest.slice(0, cut));
    }
  }
  const entries: LayoutIdsConfig[] = [];
  const computedFiles = new Set<string>();
  let sharedComputed = 0;
  const entryOf = (type: string | null): LayoutIdsConfig | null => {
    const files = chain(type);
    if (files.length === 0) return null;
    const ids = new Set<string>();
    let computed = false;
    for (const path of files) {
      const text = read(path) ?? '';
      for (const m of text.matchAll(LITERAL_ID)) ids.add(m[1]);
      const n = [...text.matchAll(COMPUTED_ID)].length;
      if (n === 0) continue;
      if (type !== null && `/${path}`.includes(`/layouts/${type}/`)) {
        computed = true;
        computedFiles.add(path);
      } else if (type === null) sharedComputed += n;
    }
    return { type: type ?? '*', ids: [...ids].sort(), computed };
  };
  const fallback = entryOf(null);
  for (const type of [...types].sort()) {
    const e = entryOf(type);
    if (e !== null && (fallback === null || e.computed || e.ids.join('\n') !== fallback.ids.join('\n'))) entries.push(e);
  }
  if (fallback !== null && (fallback.ids.length > 0 || entries.length > 0)) entries.push(fallback);
  return { entries, computedFiles: [...computedFiles].sort(), sharedComputed };
}

/** Template text without HTML comments and template comments (ids there are not written). */
function stripComments(text: string): string {
  return text.replace(/<!--[\s\S]*?-->/g, '').replace(/\{\{-?\s*\/\*[\s\S]*?\*\/\s*-?\}\}/g, '');
}
