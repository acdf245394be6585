/**
 * Jekyll (`_config.yml`): content in `source` (default the site folder), `baseurl` is the base
 * path. Routes follow Jekyll's permalink rules (`routes.generator: 'jekyll'`): the site's
 * `permalink` (a built-in style such as `date` or `pretty`, or a pattern) for posts
 * (`[folder/]_posts/YYYY-MM-DD-name.md`, each linked from the previous and next one), its suffix
 * for pages (`name.html`, or `/name/` when it ends in `/`), frontmatter `permalink` patterns, and
 * collections with `output: true` (`_name/`, `/:collection/:path:output_ext` unless the
 * collection says otherwise). Other folders starting with `_` are no pages (`_layouts/`,
 * `_data/`, `_site/`...; files in `_includes/` are part of the pages that include them).
 * `defaults:` that set a permalink by folder or by type apply. `exclude:` is honoured. Heading
 * ids: kramdown's GFM input (GitHub-like) unless `kramdown.input` says otherwise.
 */
import type { PresetReader } from './types.js';
import { basePathOf, cleanFolder, count, dig, isRecord, parseConfigText, shownFolder, str } from './util.js';

const NOT_PAGES = ['_site/**', '_layouts/**', '_sass/**', '_data/**', '_drafts/**', 'vendor/**', '.jekyll-cache/**'];

export const readJekyll: PresetReader = (configFile, files) => {
  const notes: string[] = [];
  const parsed = parseConfigText(configFile, files.read(configFile) ?? '');
  const conf = parsed.ok ? parsed.value : {};
  if (!parsed.ok) notes.push(`${configFile} does not parse (${parsed.error}); Jekyll's defaults used`);
  const source = cleanFolder(str(conf.source) ?? '.');
  const basePath = basePathOf(str(conf.baseurl));
  const sitePermalink = str(conf.permalink) ?? 'date';
  const exclude = Array.isArray(conf.exclude) ? conf.exclude.filter((e): e is string => typeof e === 'string') : [];
  const input = str(dig(conf, 'kramdown', 'input'));
  const inSource = (p: string): string => (source === '' ? p : `${source}/${p}`);
  const hasPosts = files.exists(inSource('_posts'));
  const permalinks: Record<string, string> = { '*': sitePermalink };
  const collections: string[] = [];
  if (isRecord(conf.collections)) {
    for (const [name, value] of Object.entries(conf.collections)) {
      if (name === 'posts' || !isRecord(value) || value.output !== true) continue;
      collections.push(name);
      permalinks[name] = str(value.permalink) ?? '/:collection/:path:output_ext';
    }
  }
  // Frontmatter defaults that set a permalink, scoped by a folder or by a type alone.
  if (Array.isArray(conf.defaults)) {
    for (const d of conf.defaults) {
      const permalink = str(dig(d, 'values', 'permalink'));
      if (permalink === undefined) continue;
      const path = str(dig(d, 'scope', 'path'));
      const type = str(dig(d, 'scope', 'type'));
      if (path !== undefined && path !== '' && type === undefined) permalinks[`path:${path}`] = permalink;
      else if (type !== undefined && (path === undefined || path === '')) permalinks[`type:${type}`] = permalink;
      else if (path === '' || path === undefined) permalinks['path:'] = permalink;
      else notes.push(`a defaults permalink scoped by both path and type is not applied (${path}, ${type})`);
    }
  }
  // Every other `_folder` is no page (a collection without `output: true` too).
  const underscored = new Set<string>();
  for (const f of files.markdownFiles(source)) {
    const top = f.slice(source === '' ? 0 : source.length + 1).split('/');
    const name = top[0];
    // `_includes/` stays: its files are part of the pages that include them, never pages.
    if (top.length > 1 && name.startsWith('_') && name !== '_posts' && name !== '_includes' && !collections.includes(name.slice(1))) underscored.add(`${name}/**`);
  }
  const parts = [shownFolder(source)];
  if (hasPosts) parts.push('_posts/');
  if (collections.length > 0) parts.push(count(collections.length, 'collection'));
  if (str(conf.permalink) !== undefined) parts.push(`permalink ${sitePermalink}`);
  return {
    name: 'jekyll',
    configFile,
    contentDir: source,
    config: {
      exclude: [
        ...new Set([...NOT_PAGES, ...[...underscored].sort()]),
        ...exclude.map((e) => (/[*?]/.test(e) || /\.\w+$/.test(e) ? e : `${e.replace(/\/+$/, '')}/**`)),
      ],
      routes: {
        style: sitePermalink === 'pretty' || sitePermalink.endsWith('/') ? 'directory' : 'html',
        indexNames: ['index'],
        headingIdsDefault: input !== undefined && input.toLowerCase() !== 'gfm' ? 'kramdown' : 'github',
        generator: 'jekyll',
        permalinks,
        ...(hasPosts ? { folders: { _posts: '/' }, dated: ['_posts'] } : {}),
        ...(basePath === null ? {} : { basePath }),
      },
      ...(hasPosts ? { generated: { postFolders: ['_posts'] } } : {}),
    },
    navigation: null,
    redirects: [],
    parts,
    notes,
  };
};
