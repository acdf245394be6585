/**
 * Hugo (`hugo.toml|yaml|json`, `config.*`, `config/_default/`): content in `contentDir` (default
 * `content/`; a multilingual site's default language's own `contentDir` when it has one), pages
 * at `/a/b/` (`uglyURLs`: `/a/b.html`), `_index.md` and `index.md` stand for their folder, URLs
 * lower-cased, `baseURL`'s path is the base path, each section's `_index.md` lists its pages.
 * Relative links resolve against the page URL. Frontmatter `url` and `slug` and `[permalinks]`
 * patterns give routes by Hugo's rules (`routes.generator: 'hugo'`). Top-level folders without
 * `_index.md` still get a list page, and `staticDir` files are copied to the root: links to
 * either are to pages the generator makes (`generated.routes`). `module.mounts` whose source folder is absent
 * bring content in from elsewhere at build time: their targets are outside these sources.
 * Heading ids: `markup.goldmark.parser.autoHeadingIDType` (github, github-ascii, blackfriday).
 * Ids the page templates write: read from the layouts (`hugo-layouts.ts`).
 */
import type { HeadingIdStyle } from '../parse/heading-ids.js';
import { hugoLayoutDirs, readHugoLayoutIds } from './hugo-layouts.js';
import type { PresetReader } from './types.js';
import { basePathOf, cleanFolder, count, dig, isRecord, parseConfigText, shownFolder, str } from './util.js';

/** Static files known by their routes, at most. */
const MAX_STATIC_FILES = 20000;

const ID_TYPES: Readonly<Record<string, HeadingIdStyle>> = {
  github: 'hugo-github',
  'github-ascii': 'hugo-github-ascii',
  blackfriday: 'hugo-blackfriday',
};

/** Hugo's `ref`/`relref` shortcodes name a page file: read as file links. */
const REF_PATTERN = '\\{\\{[<%]\\s*(?:rel)?ref\\s+"([^"#]+\\.md)(?:#[^"]*)?"\\s*[>%]\\}\\}';

export const readHugo: PresetReader = (configFile, files) => {
  const notes: string[] = [];
  const parsed = parseConfigText(configFile, files.read(configFile) ?? '');
  const conf: Record<string, unknown> = parsed.ok ? { ...parsed.value } : {};
  if (!parsed.ok) notes.push(`${configFile} does not parse (${parsed.error}); Hugo's defaults used`);
  // config/_default/ splits the config into one file per top-level key; Hugo reads it beside a
  // root config file too (its `configDir`), the root file's keys first.
  {
    for (const key of ['languages', 'markup', 'module', 'permalinks']) {
      for (const ext of ['toml', 'yaml', 'yml', 'json']) {
        const text = files.read(`config/_default/${key}.${ext}`);
        if (text === null) continue;
        const part = parseConfigText(`${key}.${ext}`, text);
        if (part.ok && conf[key] === undefined) conf[key] = part.value;
      }
    }
  }
  let content = cleanFolder(str(conf.contentDir) ?? str(conf.contentdir) ?? 'content');
  const languages = isRecord(conf.languages) ? conf.languages : {};
  const defaultLang = str(conf.defaultContentLanguage) ?? str(conf.defaultcontentlanguage) ?? 'en';
  const langDir = str(dig(languages, defaultLang, 'contentDir')) ?? str(dig(languages, defaultLang, 'contentdir'));
  if (langDir !== undefined) content = cleanFolder(langDir);
  let basePath = basePathOf(str(conf.baseURL) ?? str(conf.baseurl));
  if (conf.defaultContentLanguageInSubdir === true) basePath = `${basePath ?? '/'}${defaultLang}/`;
  const idType = str(dig(conf, 'markup', 'goldmark', 'parser', 'autoHeadingIDType'));
  const outside: string[] = [];
  const mounts = dig(conf, 'module', 'mounts');
  if (Array.isArray(mounts)) {
    for (const m of mounts) {
      const source = str(dig(m, 'source'));
      const target = str(dig(m, 'target'));
      if (source === undefined || target === undefined || !/^content(\/|$)/.test(target)) continue;
      if (files.exists(source)) continue;
      const route = target.replace(/^content\/?/, '');
      outside.push(`/${route}${route === '' || route.endsWith('/') ? '' : '/'}`);
    }
  }
  // `[permalinks]`: section -> pattern (Hugo 0.111), or the same under `page` (later versions).
  const permalinks: Record<string, string> = {};
  if (isRecord(conf.permalinks)) {
    const table = isRecord(conf.permalinks.page) ? conf.permalinks.page : conf.permalinks;
    for (const [section, pattern] of Object.entries(table)) if (typeof pattern === 'string') permalinks[section] = pattern;
  }
  // Every top-level folder is a section: Hugo makes its list page even without `_index.md`.
  const lists = new Set<string>();
  const withIndex = new Set<string>();
  const bundles = new Set<string>();
  for (const f of files.markdownFiles(content)) {
    const rel = content === '' ? f : f.slice(content.length + 1);
    const cut = rel.indexOf('/');
    if (cut < 0) continue;
    const top = rel.slice(0, cut);
    lists.add(top);
    if (/^_index\.[^/]+$/.test(rel.slice(cut + 1))) withIndex.add(top);
    // A folder with `index.md` is a leaf bundle, a page (or headless): no section, no list.
    if (/^index\.[^/]+$/.test(rel.slice(cut + 1))) bundles.add(top);
  }
  const lowerPaths = conf.disablePathToLower !== true;
  const listRoutes = [...lists].filter((t) => !withIndex.has(t) && !bundles.has(t)).map((t) => `/${lowerPaths ? t.toLowerCase() : t}/`).sort();
  // Files in `staticDir` (default `static/`) are copied to the site's root.
  const staticDirs = Array.isArray(conf.staticDir) ? conf.staticDir.filter((d): d is string => typeof d === 'string') : [str(conf.staticDir) ?? 'static'];
  const staticRoutes: string[] = [];
  for (const dir of staticDirs.map(cleanFolder)) {
    if (dir === '') continue;
    for (const f of files.files(dir, MAX_STATIC_FILES)) staticRoutes.push(`/${f.slice(dir.length + 1)}`);
  }
  if (staticRoutes.length >= MAX_STATIC_FILES) notes.push(`more than ${MAX_STATIC_FILES} static files; the first ${MAX_STATIC_FILES} are known`);
  const generatedRoutes = [...new Set([...listRoutes, ...staticRoutes])].sort();
  // Ids the page templates write (read from the layouts as text, never run).
  const layouts = readHugoLayoutIds(hugoLayoutDirs(conf, files), files);
  for (const file of layouts.computedFiles) {
    const type = /(?:^|\/)layouts\/([^/]+)\//.exec(file)?.[1] ?? '';
    notes.push(`${file} computes the ids it writes: fragment links to pages of type ${type} are unknown, never broken`);
  }
  if (layouts.sharedComputed > 0) notes.push(`${count(layouts.sharedComputed, 'id')} computed by shared templates (_default/, partials) not known`);
  const parts = [shownFolder(content)];
  if (outside.length > 0) parts.push(`${count(outside.length, 'mounted folder')} from elsewhere`);
  if (idType !== undefined) parts.push(`autoHeadingIDType ${idType}`);
  if (Object.keys(permalinks).length > 0) parts.push(count(Object.keys(permalinks).length, 'permalink pattern'));
  // The list pages of sections with no `_index.md` are built but have no source: no page here
  // (nothing to check or to write links into); the home page stands for them, and links to
  // them are "outside", never broken.
  if (listRoutes.length > 0) {
    const shown = listRoutes.slice(0, 3).join(', ') + (listRoutes.length > 3 ? ', ...' : '');
    parts.push(`${count(listRoutes.length, 'section list')} with no source (${shown})`);
  }
  return {
    name: 'hugo',
    configFile,
    contentDir: content,
    config: {
      routes: {
        style: conf.uglyURLs === true || conf.uglyurls === true ? 'html' : 'directory',
        indexNames: ['index', '_index'],
        caseInsensitive: lowerPaths,
        generator: 'hugo',
        ...(Object.keys(permalinks).length === 0 ? {} : { permalinks }),
        headingIdsDefault: (idType !== undefined ? ID_TYPES[idType] : undefined) ?? 'hugo-github',
        ...(basePath === null ? {} : { basePath }),
      },
      linkPatterns: [{ pattern: REF_PATTERN, route: '$1' }],
      generated: {
        sectionLists: true,
        ...(generatedRoutes.length === 0 ? {} : { routes: generatedRoutes }),
        ...(layouts.entries.length === 0 ? {} : { layoutIds: layouts.entries }),
      },
      ...(outside.length === 0 ? {} : { outside }),
    },
    navigation: null,
    redirects: [],
    parts,
    notes,
  };
};
