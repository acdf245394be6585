/**
 * The preset stage's shell: looks for generator config files in the run folder, its parents up
 * to the repository root (the first folder holding `.git`) and the run folder's `docs/` and
 * `website/` children, reads them (never runs them) and returns what the readers make of them.
 * Only this file touches the file system; the readers are pure over `SiteFiles`.
 */
import fs from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import type { Config } from '../config/config.js';
import { CONFIG_FILES, configFileOf, detectGenerator } from './detect.js';
import type { FolderFiles } from './detect.js';
import { readDocusaurus } from './docusaurus.js';
import { readHugo } from './hugo.js';
import { readJekyll } from './jekyll.js';
import { readMdbook } from './mdbook.js';
import { mergeConfig } from './merge.js';
import { readMkdocs } from './mkdocs.js';
import type { PresetName } from './names.js';
import type { PresetReader, PresetSite, SiteFiles } from './types.js';
import { readVitepress } from './vitepress.js';

const READERS: Readonly<Record<PresetName, PresetReader>> = {
  mdbook: readMdbook,
  hugo: readHugo,
  mkdocs: readMkdocs,
  docusaurus: readDocusaurus,
  jekyll: readJekyll,
  vitepress: readVitepress,
};

const LABELS: Readonly<Record<PresetName, string>> = {
  mdbook: 'an mdBook',
  hugo: 'a Hugo',
  mkdocs: 'an MkDocs',
  docusaurus: 'a Docusaurus',
  jekyll: 'a Jekyll',
  vitepress: 'a VitePress',
};

/** Config files are small; a larger one is not read. */
const MAX_CONFIG_BYTES = 4 * 1024 * 1024;

/** A site read through its generator's preset. */
export interface PresetRun {
  readonly site: PresetSite;
  /** Absolute folder holding the config file. */
  readonly folder: string;
  /** Absolute content folder: the run's content root. */
  readonly contentRoot: string;
  /** The one line that says what was read, e.g. `read as an mdBook site from book.toml: src/, SUMMARY.md, 22 redirects`. */
  readonly summary: string;
}

/**
 * Detect and read the site's generator config.
 * @param runFolder the folder the run was started on (absolute)
 * @param setting `auto`, `none` or a generator's name
 * @returns null when `none`, or when `auto` finds no config file
 */
export function readPreset(runFolder: string, setting: 'auto' | 'none' | PresetName): PresetRun | null {
  if (setting === 'none') return null;
  const folders = foldersToLook(runFolder);
  let name: PresetName;
  let folderRel: string;
  let configFile: string;
  let passedOver: readonly string[] = [];
  if (setting === 'auto') {
    const found = detectGenerator(folders);
    if (found === null) return null;
    ({ name, passedOver } = found);
    folderRel = found.folder;
    configFile = found.configFile;
  } else {
    name = setting;
    const at = folders.find((f) => configFileOf(setting, f) !== null);
    folderRel = at?.folder ?? '.';
    configFile = at === undefined ? '' : configFileOf(setting, at)!;
  }
  const folder = resolve(runFolder, folderRel);
  const site = READERS[name](configFile, siteFiles(folder));
  const contentRoot = resolve(folder, site.contentDir === '' ? '.' : site.contentDir);
  const shownConfig = configFile === '' ? 'no config file (defaults)' : folderRel === '.' ? configFile : `${folderRel}/${configFile}`;
  let summary = `read as ${LABELS[name]} site from ${shownConfig}: ${site.parts.join(', ')}`;
  if (passedOver.length > 0) summary += `; the nearer config wins over ${passedOver.join(', ')}`;
  for (const note of site.notes) summary += `\n  ${note}`;
  return { site, folder, contentRoot, summary };
}

/**
 * The configuration a run uses with a preset: the preset's fragment under the user's keys
 * (the user's win, key by key).
 */
export function configWithPreset(preset: PresetRun | null, user: Config): Config {
  return preset === null ? user : mergeConfig(preset.site.config, user);
}

/** The run folder, its parents up to the repository root, then its `docs/` and `website/` children. */
function foldersToLook(runFolder: string): FolderFiles[] {
  const out: FolderFiles[] = [];
  let dir = runFolder;
  for (;;) {
    out.push(folderFiles(dir, relative(runFolder, dir) || '.'));
    if (fs.existsSync(join(dir, '.git'))) break;
    const parent = dirname(dir);
    if (parent === dir) break;
    dir = parent;
  }
  for (const child of ['docs', 'website']) {
    const d = join(runFolder, child);
    if (isDir(d)) out.push(folderFiles(d, child));
  }
  return out;
}

function folderFiles(dir: string, rel: string): FolderFiles {
  const present: string[] = [];
  for (const { files } of CONFIG_FILES) for (const f of files) if (isFile(join(dir, f))) present.push(f);
  const hugoLike = ['content', 'layouts', 'themes', 'archetypes'].some((d) => isDir(join(dir, d)));
  return { folder: rel.split('\\').join('/'), present, hugoLike };
}

/** The site folder's files, read-only, never outside the folder's parent tree. */
function siteFiles(folder: string): SiteFiles {
  return {
    read(path) {
      if (path === '') return null;
      const full = resolve(folder, path);
      try {
        const stat = fs.statSync(full);
        if (!stat.isFile() || stat.size > MAX_CONFIG_BYTES) return null;
        return fs.readFileSync(full, 'utf8').replace(/^\uFEFF/, '');
      } catch {
        return null;
      }
    },
    exists: (path) => fs.existsSync(resolve(folder, path)),
    markdownFiles(sub) {
      return walkFiles(folder, sub, (name) => /\.mdx?$/i.test(name), Infinity);
    },
    files(sub, limit) {
      return walkFiles(folder, sub, () => true, limit);
    },
    names(sub) {
      try {
        return fs
          .readdirSync(resolve(folder, sub), { withFileTypes: true })
          .filter((e) => e.isFile() && !e.name.startsWith('.'))
          .map((e) => e.name)
          .sort();
      } catch {
        return [];
      }
    },
  };
}

/** Files under `sub` (relative to `folder`) whose names pass `keep`, relative to `folder`, sorted; at most `limit`. */
function walkFiles(folder: string, sub: string, keep: (name: string) => boolean, limit: number): string[] {
  const out: string[] = [];
  const walk = (rel: string): void => {
    let entries: fs.Dirent[];
    try {
      entries = fs.readdirSync(resolve(folder, rel), { withFileTypes: true });
    } catch {
      return;
    }
    for (const e of entries) {
      if (e.name.startsWith('.') || e.name === 'node_modules') continue;
      const p = rel === '' ? e.name : `${rel}/${e.name}`;
      if (out.length >= limit) return;
      if (e.isDirectory()) walk(p);
      else if (e.isFile() && keep(e.name)) out.push(p);
    }
  };
  walk(sub.replace(/\/+$/, ''));
  return out.sort();
}

function isFile(p: string): boolean {
  try {
    return fs.statSync(p).isFile();
  } catch {
    return false;
  }
}

function isDir(p: string): boolean {
  try {
    return fs.statSync(p).isDirectory();
  } catch {
    return false;
  }
}
