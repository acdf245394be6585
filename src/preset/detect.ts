/**
 * Which generator built a site, from the config files present (pure: the caller lists them).
 * The nearest folder with a config file wins; in one folder, the more specific file wins
 * (book.toml, mkdocs.yml, docusaurus.config.*, .vitepress/config.*, then Hugo's, then Jekyll's
 * `_config.yml`). Every other config seen is named, so the summary can say what was passed over.
 */
import type { PresetName } from './names.js';

/** The config files each generator is known by, in the order they are looked for. */
export const CONFIG_FILES: readonly { readonly name: PresetName; readonly files: readonly string[] }[] = [
  { name: 'mdbook', files: ['book.toml'] },
  { name: 'mkdocs', files: ['mkdocs.yml', 'mkdocs.yaml'] },
  { name: 'docusaurus', files: ['docusaurus.config.js', 'docusaurus.config.ts', 'docusaurus.config.mjs', 'docusaurus.config.cjs'] },
  {
    name: 'vitepress',
    files: ['.vitepress/config.js', '.vitepress/config.ts', '.vitepress/config.mjs', '.vitepress/config.mts', '.vitepress/config.cjs', '.vitepress/config.cts'],
  },
  {
    name: 'hugo',
    files: [
      'hugo.toml', 'hugo.yaml', 'hugo.yml', 'hugo.json',
      'config/_default/hugo.toml', 'config/_default/hugo.yaml', 'config/_default/hugo.json',
      'config/_default/config.toml', 'config/_default/config.yaml', 'config/_default/config.json',
      'config.toml', 'config.yaml', 'config.yml', 'config.json',
    ],
  },
  { name: 'jekyll', files: ['_config.yml', '_config.yaml'] },
];

/** A folder looked at, with the config files found in it. */
export interface FolderFiles {
  /** The folder relative to the run folder (`.`, `..`, `docs`). */
  readonly folder: string;
  /** Config files present (paths relative to the folder). */
  readonly present: readonly string[];
  /** True when the folder looks like a Hugo site (content/, layouts/, themes/ or archetypes/): `config.*` counts only then. */
  readonly hugoLike: boolean;
}

/** The generator chosen and the ones passed over. */
export interface Detection {
  readonly name: PresetName;
  readonly folder: string;
  readonly configFile: string;
  /** Other configs seen, as `folder/file` (nearest first). */
  readonly passedOver: readonly string[];
}

/**
 * Choose the site's generator.
 * @param folders the folders looked at, nearest first (the run folder, its parents, then the
 *   `docs/`/`website/` children)
 */
export function detectGenerator(folders: readonly FolderFiles[]): Detection | null {
  const found: { name: PresetName; folder: string; file: string }[] = [];
  for (const f of folders) {
    for (const { name, files } of CONFIG_FILES) {
      for (const file of files) {
        if (!f.present.includes(file)) continue;
        if (name === 'hugo' && file.startsWith('config.') && !f.hugoLike) continue;
        found.push({ name, folder: f.folder, file });
        break;
      }
    }
  }
  const first = found[0];
  if (first === undefined) return null;
  return {
    name: first.name,
    folder: first.folder,
    configFile: first.file,
    passedOver: found.slice(1).map((x) => (x.folder === '.' ? x.file : `${x.folder}/${x.file}`)),
  };
}

/** The first config file of a generator present in a folder (for `--preset NAME`). */
export function configFileOf(name: PresetName, folder: FolderFiles): string | null {
  const files = CONFIG_FILES.find((c) => c.name === name)!.files;
  return files.find((f) => folder.present.includes(f)) ?? null;
}
