/**
 * Jekyll (`_config.yml`): content in `source` (default the site folder), pages at `name.html`
 * (`permalink: pretty`: `/name/`), `baseurl` is the base path, folders starting with `_` are no
 * pages (`_layouts/`, `_data/`, `_site/`...) except `_posts/` (files in `_includes/` are part of the pages that include them), whose
 * `YYYY-MM-DD-name.md` posts are served at `/YYYY/MM/DD/name.html`, each linked from the
 * previous and next one. `exclude:` is honoured. Heading ids: kramdown's GFM input (GitHub-like)
 * unless `kramdown.input` says otherwise.
 */
import type { PresetReader } from './types.js';
import { basePathOf, cleanFolder, dig, parseConfigText, shownFolder, str } from './util.js';

const NOT_PAGES = ['_site/**', '_layouts/**', '_sass/**', '_data/**', '_drafts/**', 'vendor/**', '.jekyll-cache/**'];

export const readJekyll: PresetReader = (configFile, files) => {
  const notes: string[] = [];
  const parsed = parseConfigText(configFile, files.read(configFile) ?? '');
  const conf = parsed.ok ? parsed.value : {};
  if (!parsed.ok) notes.push(`${configFile} does not parse (${parsed.error}); Jekyll's defaults used`);
  const source = cleanFolder(str(conf.source) ?? '.');
  const basePath = basePathOf(str(conf.baseurl));
  const pretty = str(conf.permalink) === 'pretty';
  const exclude = Array.isArray(conf.exclude) ? conf.exclude.filter((e): e is string => typeof e === 'string') : [];
  const input = str(dig(conf, 'kramdown', 'input'));
  const hasPosts = files.exists(source === '' ? '_posts' : `${source}/_posts`);
  if (str(conf.permalink) !== undefined && !pretty) notes.push(`permalink "${String(conf.permalink)}" is not applied to posts (the date style is used)`);
  const parts = [shownFolder(source)];
  if (hasPosts) parts.push('_posts/');
  return {
    name: 'jekyll',
    configFile,
    contentDir: source,
    config: {
      exclude: [...NOT_PAGES, ...exclude.map((e) => (/[*?]/.test(e) || /\.\w+$/.test(e) ? e : `${e.replace(/\/+$/, '')}/**`))],
      routes: {
        style: pretty ? 'directory' : 'html',
        indexNames: ['index'],
        headingIdsDefault: input !== undefined && input.toLowerCase() !== 'gfm' ? 'kramdown' : 'github',
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
