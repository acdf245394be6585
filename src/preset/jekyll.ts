/**
 * Jekyll (`_config.yml`): content in `source` (default the site folder), `baseurl` is the base
 * path. Routes follow Jekyll's permalink rules (`routes.generator: 'jekyll'`): the site's
 * `permalink` (a built-in style such as `date` or `pretty`, or a pattern) for posts
 * (`[folder/]_posts/YYYY-MM-DD-name.md`, each linked from the previous and next one), its suffix
 * for pages (`name.html`, or `/name/` when it ends in `/`), frontmatter `permalink` patterns, and
 * collections with `output: true` (`_name/`, `/:collection/:path:output_ext` unless the
 * collection says otherwise). Other folders starting with `_` are no pages (`_layouts/`,
 * `_data/`, `_site/`...; files in `_includes/` are part of the pages that include them).
 * `defaults:` that set a permalink by folder or by type apply. `exclude:` is honoured. Files
 * with no front matter are copied, not rendered: no pages. The literal site-absolute links of the
 * layouts (and the includes they pull in) are on every page, as navigation. So are the links
 * a layout writes from a data file by one Liquid shape, read as text: a loop over
 * `site.data.NAME` that includes a file with `items=VAR.KEY`, where that file loops over
 * `include.items` and makes each item a URL with `prepend:`/`append:` strings that reaches an
 * `href` (Jekyll's docs sidebar: `_data/docs.yml` -> `/docs/<item>/`). Heading ids: kramdown's
 * GFM input (GitHub-like) unless `kramdown.input` says otherwise.
 */
import { parse as parseYaml } from 'yaml';
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
  // Files with no front matter are copied as they are, not rendered (Jekyll reads a page or a
  // document only when it starts with `---`), unless a plugin makes front matter optional.
  const plugins = [...(Array.isArray(conf.plugins) ? conf.plugins : []), ...(Array.isArray(conf.gems) ? conf.gems : [])];
  const copied: string[] = [];
  if (!plugins.includes('jekyll-optional-front-matter')) {
    for (const f of files.files(source, MAX_FILES)) {
      const rel = source === '' ? f : f.slice(source.length + 1);
      if (!/\.(?:md|markdown|mdx|html?)$/i.test(rel) || /^_(?:site|layouts|includes|sass|data|drafts)\//.test(rel) || rel.startsWith('vendor/')) continue;
      if (exclude.some((e) => rel === e.replace(/\/+$/, '') || rel.startsWith(`${e.replace(/\/+$/, '')}/`))) continue;
      const text = files.read(f);
      if (text !== null && !/^\uFEFF?---[ \t]*\r?\n/.test(text)) copied.push(rel);
    }
  }
  if (copied.length > 0) notes.push(`${count(copied.length, 'file')} with no front matter copied as ${copied.length === 1 ? 'it is' : 'they are'}, not pages (${copied.slice(0, 3).join(', ')}${copied.length > 3 ? ', ...' : ''})`);
  // The layouts and the includes they pull in are around every page: their literal site-absolute
  // links are template links (Liquid is not run: links it computes are not known).
  const chrome = layoutLinks(files, inSource);
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
        ...copied.map(escapeGlob),
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
    navigation: chrome.links.length === 0 ? null : { file: '_layouts', text: chrome.links.map((l) => `- ${JSON.stringify(l)}`).join('\n'), format: 'yaml' },
    redirects: [],
    parts: [
      ...parts,
      ...(chrome.literal === 0 ? [] : [`${count(chrome.literal, 'link')} in ${count(chrome.files, 'layout file')}`]),
      ...chrome.data.map((d) => `${count(d.links, 'link')} from ${d.file} (looped by ${d.by})`),
    ],
    notes,
  };
};

/** Files looked at for front matter, at most. */
const MAX_FILES = 20000;

/** A path as a glob that matches only itself. */
function escapeGlob(path: string): string {
  return path.replace(/[*?[\]{}()!@+\\]/g, (c) => `\\${c}`);
}

/** Links a layout writes from a data file: how many, the data file, the include that writes them. */
interface DataLinks {
  readonly file: string;
  readonly by: string;
  readonly links: number;
}

/**
 * The literal site-absolute links of `<a>` elements (`href="/news/"`, with `{{ site.baseurl }}` in front read as
 * nothing) of `_layouts/*.html` and of the `_includes/` files they include, recursively, and
 * the links they write from data files (see the module comment).
 */
function layoutLinks(files: Parameters<PresetReader>[1], inSource: (p: string) => string): { links: string[]; files: number; literal: number; data: DataLinks[] } {
  const layouts = files.exists(inSource('_layouts')) ? files.files(inSource('_layouts'), 500).filter((f) => /\.html?$/i.test(f)) : [];
  const queue = [...layouts];
  const seen = new Set<string>();
  const links = new Set<string>();
  const dataLinks = new Set<string>();
  const data = new Map<string, DataLinks>();
  const liquid = (path: string): string =>
    (files.read(path) ?? '').replace(/\{%-?\s*comment\s*-?%\}[\s\S]*?\{%-?\s*endcomment\s*-?%\}/g, '').replace(/<!--[\s\S]*?-->/g, '');
  while (queue.length > 0) {
    const path = queue.shift() as string;
    if (seen.has(path)) continue;
    seen.add(path);
    const text = liquid(path);
    for (const m of text.matchAll(/\{%-?\s*include\s+([\w./-]+)/g)) queue.push(inSource(`_includes/${m[1]}`));
    for (const m of text.matchAll(/<a\s[^>]*?\bhref\s*=\s*"([^"]*)"/gi)) {
      const href = m[1].replace(/^\{\{-?\s*site\.baseurl\s*-?\}\}/, '');
      if (href.startsWith('/') && !href.startsWith('//') && !/\{[{%]/.test(href)) links.add(href);
    }
    // `{% for section in site.data.docs %} ... {% include docs_ul.html items=section.docs %}`
    for (const loop of text.matchAll(/\{%-?\s*for\s+(\w+)\s+in\s+site\.data\.([\w-]+)\s*-?%\}/g)) {
      const include = new RegExp(`\\{%-?\\s*include\\s+([\\w./-]+)\\s+items\\s*=\\s*${loop[1]}\\.(\\w+)\\s*-?%\\}`, 'g');
      for (const inc of text.matchAll(include)) {
        const incPath = inSource(`_includes/${inc[1]}`);
        const url = itemUrl(liquid(incPath));
        if (url === null) continue;
        const dataFile = ['yml', 'yaml', 'json'].map((ext) => inSource(`_data/${loop[2]}.${ext}`)).find((f) => files.read(f) !== null);
        if (dataFile === undefined) continue;
        let value: unknown;
        try {
          value = parseYaml(files.read(dataFile) ?? '', { logLevel: 'silent' });
        } catch {
          continue;
        }
        if (!Array.isArray(value)) continue;
        let n = 0;
        for (const entry of value) {
          const items = isRecord(entry) ? entry[inc[2]] : undefined;
          if (!Array.isArray(items)) continue;
          for (const item of items) {
            if (typeof item !== 'string' && typeof item !== 'number') continue;
            const href = `${url.prepend}${item}${url.append}`;
            if (!href.startsWith('/') || href.startsWith('//')) continue;
            n++;
            dataLinks.add(href);
          }
        }
        const key = `${dataFile}\0${incPath}`;
        if (n > 0 && !data.has(key)) data.set(key, { file: dataFile, by: incPath, links: n });
      }
    }
  }
  return {
    links: [...new Set([...links, ...dataLinks])].sort(),
    files: [...seen].filter((p) => files.read(p) !== null).length,
    literal: links.size,
    data: [...data.values()],
  };
}

/**
 * How an included file makes a URL of each of `include.items`:
 * `{% for item in include.items %}` (or `assign items = include.items` then `for item in items`),
 * `{% assign item_url = item | prepend:"/docs/" | append:"/" %}`, and `item_url` reaching an
 * `href` (written there, or compared with a page's url that is written there). Null otherwise.
 */
function itemUrl(text: string): { prepend: string; append: string } | null {
  const alias = /\{%-?\s*assign\s+(\w+)\s*=\s*include\.items\s*-?%\}/.exec(text)?.[1];
  const loop = new RegExp(`\\{%-?\\s*for\\s+(\\w+)\\s+in\\s+(?:include\\.items${alias === undefined ? '' : `|${alias}`})\\s*-?%\\}`).exec(text);
  if (loop === null) return null;
  const assign = new RegExp(
    `\\{%-?\\s*assign\\s+(\\w+)\\s*=\\s*${loop[1]}\\s*\\|\\s*prepend\\s*:\\s*(?:"([^"]*)"|'([^']*)')\\s*(?:\\|\\s*append\\s*:\\s*(?:"([^"]*)"|'([^']*)')\\s*)?-?%\\}`,
  ).exec(text);
  if (assign === null) return null;
  const v = assign[1];
  const after = text.slice(assign.index + assign[0].length);
  const written = new RegExp(`href\\s*=\\s*"[^"]*\\{\\{-?\\s*${v}\\s*-?\\}\\}`).test(after);
  const compared = new RegExp(`\\{%-?\\s*if\\s+(\\w+)\\.url\\s*==\\s*${v}\\s*-?%\\}`).exec(after);
  const comparedWritten = compared !== null && new RegExp(`href\\s*=\\s*"[^"]*\\{\\{-?\\s*${compared[1]}\\.url\\s*-?\\}\\}`).test(after);
  if (!written && !comparedWritten) return null;
  return { prepend: assign[2] ?? assign[3] ?? '', append: assign[4] ?? assign[5] ?? '' };
}
