/**
 * VitePress (`.vitepress/config.{js,ts,mjs,mts}`): the site folder is the one holding
 * `.vitepress/`, pages in `srcDir` (default the site folder) at `name.html` (`cleanUrls: true`:
 * `/name`, found by the same lookup), `base` is the base path and site-absolute links are
 * written below it; `README.md` is a page, only `index.md`
 * stands for its folder. Heading ids: VitePress's. The config file is never run: values are
 * read when they are literals.
 */
import { staticValue } from './static-js.js';
import type { PresetReader } from './types.js';
import { cleanFolder, shownFolder } from './util.js';

export const readVitepress: PresetReader = (configFile, files) => {
  const notes: string[] = [];
  const text = files.read(configFile) ?? '';
  const literal = <T>(key: string, type: 'string' | 'boolean', fallback: T): T => {
    const v = staticValue(text, key);
    if (v === null) return fallback;
    if (v.kind === 'literal' && typeof v.value === type) return v.value as T;
    notes.push(`${key} is not a literal in ${configFile} (${v.kind === 'dynamic' ? v.text : 'another type'}); ${JSON.stringify(fallback)} used`);
    return fallback;
  };
  const srcDir = cleanFolder(literal('srcDir', 'string', '.'));
  const base = literal('base', 'string', '/');
  const clean = literal('cleanUrls', 'boolean', false);
  const parts = [shownFolder(srcDir)];
  if (clean) parts.push('clean URLs');
  return {
    name: 'vitepress',
    configFile,
    contentDir: srcDir,
    config: {
      exclude: ['**/node_modules/**'],
      routes: {
        // Clean URLs drop `.html` but keep the folder: `./b` from `/a/x` is `/a/b`, as with `.html` routes.
        style: 'html',
        absoluteLinksUnderBase: true,
        indexNames: ['index'],
        headingIdsDefault: 'vitepress',
        basePath: base.endsWith('/') ? base : `${base}/`,
      },
    },
    navigation: null,
    redirects: [],
    parts,
    notes,
  };
};
