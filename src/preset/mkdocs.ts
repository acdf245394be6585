/**
 * MkDocs (`mkdocs.yml`): content in `docs_dir` (default `docs/`), `use_directory_urls` (default
 * true) picks `/a/b/` or `/a/b.html`, `site_url`'s path is the base path, `nav:` (or its old
 * name `pages:`) is the sidebar of every page, the redirects plugin's `redirect_maps` (old page -> new page or URL) are
 * redirects. Heading ids: Python-Markdown's toc.
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
