/**
 * mdBook (`book.toml`): content in `[book] src` (default `src/`), pages at `name.html`,
 * `README.md` is its folder's index, `SUMMARY.md` is the sidebar of every page (and no page),
 * `[output.html] site-url` is the base path, `[output.html.redirect]` maps old pages to new ones
 * (a relative target is read against the old page's folder). Chapters SUMMARY.md names that do
 * not exist are made by mdBook (`build.create-missing`): generated routes. A SUMMARY.md made at
 * build time from `SUMMARY.md.in` is read from the template. Only the chapters it names are
 * pages: other Markdown files are left out (unless another file includes them). When that
 * template has a placeholder line (`@manpages@`) that the build replaces with chapters it makes,
 * a folder under `src` that the build files name (`local.mk`: `src/command-ref/new-cli`), that
 * has no Markdown source and that no chapter lives in, is made at build: links into it are
 * "outside the content" (a link into a folder with sources stays checked). Heading ids: mdBook's.
 */
import type { PresetReader, PresetRedirect, SiteFiles } from './types.js';
import { basePathOf, cleanFolder, count, dig, isRecord, parseConfigText, shownFolder, str } from './util.js';

export const readMdbook: PresetReader = (configFile, files) => {
  const notes: string[] = [];
  const parsed = parseConfigText(configFile, files.read(configFile) ?? '');
  const conf = parsed.ok ? parsed.value : {};
  if (!parsed.ok) notes.push(`${configFile} does not parse (${parsed.error}); mdBook's defaults used`);
  const src = cleanFolder(str(dig(conf, 'book', 'src')) ?? 'src');
  const basePath = basePathOf(str(dig(conf, 'output', 'html', 'site-url')));
  const redirects: PresetRedirect[] = [];
  const table = dig(conf, 'output', 'html', 'redirect');
  if (isRecord(table)) {
    for (const [from, to] of Object.entries(table)) {
      if (typeof to !== 'string') continue;
      const source = from.startsWith('/') ? from : `/${from}`;
      const folder = source.slice(0, source.lastIndexOf('/') + 1);
      redirects.push({ from: source, to: /^[a-z][a-z0-9+.-]*:|^\//i.test(to) ? to : folder + to });
    }
  }
  const inSrc = (p: string): string => (src === '' ? p : `${src}/${p}`);
  let summary = files.read(inSrc('SUMMARY.md'));
  let summaryName = 'SUMMARY.md';
  // A project that makes SUMMARY.md at build time from a template (`SUMMARY.md.in`) keeps its
  // chapters there; the template's placeholders stay unread.
  if (summary === null) {
    const template = files.read(inSrc('SUMMARY.md.in'));
    if (template !== null) {
      summary = template;
      summaryName = 'SUMMARY.md.in';
      notes.push('SUMMARY.md is made at build time; SUMMARY.md.in read in its place');
    }
  }
  // A template whose placeholder line the build replaces (`@manpages@`): the folders the build
  // files name under `src` that hold no source and no chapter are made at build time.
  const madeFolders = summaryName === 'SUMMARY.md.in' && summary !== null && /^[ \t]*@[A-Za-z_][\w-]*@[ \t]*$/m.test(summary)
    ? buildMadeFolders(configFile, src, summary, files)
    : [];
  for (const f of madeFolders) notes.push(`${src === '' ? '' : `${src}/`}${f}/ is made at build time (named by the build files, no source in it): links into it are outside the content`);
  // mdBook creates the chapters SUMMARY.md names that do not exist (`build.create-missing`,
  // default true): they are pages with no source here.
  const createMissing = dig(conf, 'build', 'create-missing') !== false;
  const missing: string[] = [];
  if (summary !== null && createMissing) {
    for (const m of summary.matchAll(/\]\(\s*<?([^)\s>#]+\.md)>?\s*\)/g)) {
      const file = m[1].replace(/^\.\//, '');
      if (/^[a-z][a-z0-9+.-]*:/i.test(file) || files.exists(inSrc(file))) continue;
      const route = `/${file.replace(/\.md$/, '.html')}`;
      // The route, and the file path for links that name the chapter's source file.
      for (const r of [route, `/${file}`]) if (!missing.includes(r)) missing.push(r);
    }
  }
  // Only the chapters SUMMARY.md names are built: another Markdown file is no page (a file
  // another one includes is still read, as part of the page that includes it).
  const unlisted = summary === null ? [] : unlistedFiles(summary, src, files);
  const parts = [shownFolder(src)];
  if (summary !== null) parts.push(summaryName);
  if (unlisted.length > 0) parts.push(`${count(unlisted.length, 'file')} not in ${summaryName} left out`);
  if (missing.length > 0) parts.push(`${count(missing.length / 2, 'chapter')} made at build time`);
  if (madeFolders.length > 0) parts.push(`${count(madeFolders.length, 'folder')} made at build time`);
  if (redirects.length > 0) parts.push(count(redirects.length, 'redirect'));
  // The book opens on the first chapter of SUMMARY.md when there is no index page.
  const first = summary === null ? null : /\]\(\s*<?([^)\s>#]+\.md)/.exec(summary)?.[1] ?? null;
  const hasIndex = ['index.md', 'README.md'].some((f) => files.exists(inSrc(f)) && !unlisted.includes(f));
  return {
    name: 'mdbook',
    configFile,
    contentDir: src,
    config: {
      routes: { style: 'html', indexNames: ['index', 'README'], headingIdsDefault: 'mdbook', ...(basePath === null ? {} : { basePath }) },
      exclude: ['SUMMARY.md', 'SUMMARY.md.in', ...unlisted],
      ...(hasIndex || first === null ? {} : { entry: [first.replace(/^\.\//, '')] }),
      ...(missing.length === 0 ? {} : { generated: { routes: missing } }),
      ...(madeFolders.length === 0 ? {} : { outside: madeFolders.map((f) => `/${f}/`) }),
    },
    navigation: summary === null ? null : { file: summaryName, text: summary, format: 'markdown' },
    redirects,
    parts,
    notes,
  };
};

/** Build files beside book.toml that may name the folders the build writes into `src`. */
const BUILD_FILES = /^(?:GNUmakefile|[Mm]akefile|.*\.mk|meson\.build|CMakeLists\.txt|justfile|Justfile)$/;

/**
 * The folders under `src` (relative to it, sorted) that the build files beside the config name
 * (`$(d)/src/command-ref/new-cli`, `doc/manual/src/command-ref/new-cli/*.md`), that have no
 * Markdown source and that no chapter of the summary lives in.
 */
function buildMadeFolders(configFile: string, src: string, summary: string, files: SiteFiles): string[] {
  const site = configFile.includes('/') ? configFile.slice(0, configFile.lastIndexOf('/')) : '';
  const inSite = (p: string): string => (site === '' ? p : `${site}/${p}`);
  const chapterFolders = new Set<string>();
  for (const m of summary.matchAll(/\]\(\s*<?([^)>#\s]+?\.md)/g)) {
    const parts = joinPath('', safeDecode(m[1])).split('/');
    for (let i = 1; i < parts.length; i++) chapterFolders.add(parts.slice(0, i).join('/'));
  }
  const srcPath = src === '' ? '' : `${src}/`;
  const named = new Set<string>();
  for (const name of files.names(site).filter((f) => BUILD_FILES.test(f))) {
    const text = files.read(inSite(name)) ?? '';
    const escaped = srcPath.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
    // A path under `src`, up to the first glob or variable; only folder names (no extension).
    for (const m of text.matchAll(new RegExp(`(?:^|[\\s/)"'=:])${escaped}([A-Za-z0-9_][\\w./-]*)`, 'g'))) {
      let folder = m[1].replace(/\/+$/, '');
      const last = folder.slice(folder.lastIndexOf('/') + 1);
      if (/\./.test(last)) folder = folder.includes('/') ? folder.slice(0, folder.lastIndexOf('/')) : '';
      if (folder === '' || folder.split('/').some((s) => s === '.' || s === '..')) continue;
      named.add(folder);
    }
  }
  return [...named]
    .filter((f) => !chapterFolders.has(f) && files.markdownFiles(inSite(srcPath + f)).length === 0)
    .filter((f, _, all) => !all.some((o) => o !== f && f.startsWith(`${o}/`)))
    .sort();
}

/** A glob character: such a file name cannot be left out by an exact-path glob. */
const GLOB_CHARS = /[*?[\]{}()!]/;

/**
 * The Markdown files under `src` that SUMMARY.md does not name and no other file includes
 * (`{{#include}}`, `{{#rustdoc_include}}`, `{{#playground}}`), relative to `src`, sorted.
 */
function unlistedFiles(summary: string, src: string, files: SiteFiles): string[] {
  const chapters = new Set<string>();
  for (const m of summary.matchAll(/\]\(\s*<?([^)>#\s]+?\.md)(?:#[^)>]*)?>?\s*\)/g)) {
    chapters.add(joinPath('', safeDecode(m[1])));
  }
  const all = files.markdownFiles(src).map((f) => (src === '' ? f : f.slice(src.length + 1)));
  const included = new Set<string>();
  for (const f of all) {
    const text = files.read(src === '' ? f : `${src}/${f}`) ?? '';
    if (!text.includes('{{#')) continue;
    const folder = f.includes('/') ? f.slice(0, f.lastIndexOf('/')) : '';
    for (const m of text.matchAll(/\{\{#(?:include|rustdoc_include|playground)\s+([^\s}:]+)/g)) included.add(joinPath(folder, m[1]));
  }
  return all.filter((f) => f !== 'SUMMARY.md' && !chapters.has(f) && !included.has(f) && !GLOB_CHARS.test(f)).sort();
}

/** `folder` joined with a relative path, dot segments removed ('' when it climbs above). */
function joinPath(folder: string, rel: string): string {
  const out: string[] = folder === '' ? [] : folder.split('/');
  for (const seg of rel.replace(/^\/+/, '').split('/')) {
    if (seg === '' || seg === '.') continue;
    if (seg === '..') out.pop();
    else out.push(seg);
  }
  return out.join('/');
}

function safeDecode(path: string): string {
  try {
    return decodeURI(path);
  } catch {
    return path;
  }
}
