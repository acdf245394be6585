/**
 * MkDocs (`mkdocs.yml`): content in `docs_dir` (default `docs/`), `use_directory_urls` (default
 * true) picks `/a/b/` or `/a/b.html`, `site_url`'s path is the base path, `nav:` (or its old
 * name `pages:`) is the sidebar of every page, the redirects plugin's `redirect_maps` (old page -> new page or URL) are
 * redirects. Heading ids: Python-Markdown's toc. Every file in `docs_dir` is a page, the ones
 * pymdownx.snippets pastes into others too (mkdocs 1.4 builds them); snippets are also read from
 * its `base_path` folders.
 */
import type { PresetReader, PresetRedirect } from './types.js';
import { basePathOf, cleanFolder, count, dig, isRecord, parseConfigText, shownFolder, str, yamlBlock } from './util.js';

export const readMkdocs: PresetReader = (configFile, files) => {
  const notes: string[] = [];
  const text = files.read(configFile) ?? '';
  const parsed = parseConfigText(configFile, text);
  const conf = parsed.ok ? parsed.value : {};
  if (!parsed.ok) notes.push(`${configFile} does not parse (${parsed.error}); MkDocs's defaults used`);
  const docs = cleanFolder(str(conf.docs_dir) ?? 'docs');
  const directory = conf.use_directory_urls !== false;
  const basePath = basePathOf(str(conf.site_url));
  const redirects: PresetRedirect[] = [];
  const plugins = Array.isArray(conf.plugins) ? conf.plugins : [];
  for (const p of plugins) {
    const maps = dig(p, 'redirects', 'redirect_maps');
    if (!isRecord(maps)) continue;
    for (const [from, to] of Object.entries(maps)) {
      if (typeof to !== 'string') continue;
      redirects.push({ from: pageRoute(from, directory), to: /^[a-z][a-z0-9+.-]*:/i.test(to) ? to : pageRoute(to, directory) });
    }
  }
  // `pages:` is the name `nav:` had before MkDocs 1.0; sites written then still carry it.
  const navKey = Array.isArray(conf.nav) ? 'nav' : Array.isArray(conf.pages) ? 'pages' : null;
  const nav = navKey === null ? null : yamlBlock(text, navKey);
  if (navKey === 'pages') notes.push('pages: (the name nav: had before MkDocs 1.0) read as the navigation');
  // pymdownx.snippets reads `base_path` (default `.`, the project folder) relative to the folder
  // mkdocs runs in; every file in docs_dir is still built as a page of its own (mkdocs 1.4).
  const includeFolders: string[] = [];
  for (const ext of Array.isArray(conf.markdown_extensions) ? conf.markdown_extensions : []) {
    const base = dig(ext, 'pymdownx.snippets', 'base_path');
    const list = Array.isArray(base) ? base : [base];
    for (const b of list) {
      const folder = str(b);
      if (folder !== undefined) includeFolders.push(relativeFolder(docs, cleanFolder(folder)));
    }
  }
  const parts = [shownFolder(docs)];
  if (nav !== null) parts.push(navKey!);
  if (redirects.length > 0) parts.push(count(redirects.length, 'redirect'));
  return {
    name: 'mkdocs',
    configFile,
    contentDir: docs,
    config: {
      routes: {
        style: directory ? 'directory' : 'html',
        indexNames: ['index', 'README'],
        headingIdsDefault: 'python-markdown',
        ...(basePath === null ? {} : { basePath }),
      },
      generated: { includedPages: true, ...(includeFolders.length === 0 ? {} : { includeFolders }) },
    },
    // Nav entries are paths relative to docs_dir: the list resolves from the content root.
    navigation: nav === null ? null : { file: configFile.replace(/^.*\//, ''), text: nav, format: 'yaml' },
    redirects,
    parts,
    notes,
  };
};

/** The route MkDocs gives a page path (`a/b.md` -> `/a/b/`, `a/index.md` -> `/a/`). */
function pageRoute(page: string, directory: boolean): string {
  const clean = page.replace(/^\/+/, '').replace(/#.*$/, '');
  const stem = clean.replace(/\.(?:md|markdown)$/i, '');
  if (/(^|\/)(?:index|README)$/i.test(stem)) return `/${stem.replace(/(?:^|\/)?(?:index|README)$/i, '')}/`.replace(/\/+/g, '/');
  return directory ? `/${stem}/` : `/${stem}.html`;
}

/** `to` (a folder relative to the project folder) as seen from `from` (the docs folder): `docs`, `docs/snippets` -> `snippets`; `docs`, `parts` -> `../parts`. */
function relativeFolder(from: string, to: string): string {
  const a = from === '' ? [] : from.split('/');
  const b = to === '' ? [] : to.split('/');
  let common = 0;
  while (common < a.length && common < b.length && a[common] === b[common]) common++;
  const out = [...a.slice(common).map(() => '..'), ...b.slice(common)].join('/');
  return out === '' ? '.' : out;
}
