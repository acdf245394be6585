/**
 * mdBook (`book.toml`): content in `[book] src` (default `src/`), pages at `name.html`,
 * `README.md` is its folder's index, `SUMMARY.md` is the sidebar of every page (and no page),
 * `[output.html] site-url` is the base path, `[output.html.redirect]` maps old pages to new ones
 * (a relative target is read against the old page's folder). Heading ids: mdBook's.
 */
import type { PresetReader, PresetRedirect } from './types.js';
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
  const summaryPath = src === '' ? 'SUMMARY.md' : `${src}/SUMMARY.md`;
  const summary = files.read(summaryPath);
  const parts = [shownFolder(src)];
  if (summary !== null) parts.push('SUMMARY.md');
  if (redirects.length > 0) parts.push(count(redirects.length, 'redirect'));
  // The book opens on the first chapter of SUMMARY.md when there is no index page.
  const first = summary === null ? null : /\]\(\s*<?([^)\s>#]+\.md)/.exec(summary)?.[1] ?? null;
  const hasIndex = files.exists(`${src === '' ? '' : `${src}/`}index.md`) || files.exists(`${src === '' ? '' : `${src}/`}README.md`);
  return {
    name: 'mdbook',
    configFile,
    contentDir: src,
    config: {
      routes: { style: 'html', indexNames: ['index', 'README'], headingIdsDefault: 'mdbook', ...(basePath === null ? {} : { basePath }) },
      exclude: ['SUMMARY.md'],
      ...(hasIndex || first === null ? {} : { entry: [first.replace(/^\.\//, '')] }),
    },
    navigation: summary === null ? null : { file: 'SUMMARY.md', text: summary, format: 'markdown' },
    redirects,
    parts,
    notes,
  };
};
