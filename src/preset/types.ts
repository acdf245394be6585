/** Types of the preset stage: what a generator's config files say about the site. */
import type { Config } from '../config/config.js';
import type { PresetName } from './names.js';

/** A generator's site folder as the readers see it: paths relative to the folder holding the config file. */
export interface SiteFiles {
  /** Text of a file, or null when it is missing or unreadable. */
  read(path: string): string | null;
  /** True when the path is a file or folder. */
  exists(path: string): boolean;
  /** Markdown files (`.md`, `.mdx`) under a folder, recursively, relative to the site folder, sorted. */
  markdownFiles(folder: string): string[];
  /** Every file under a folder (dot-files and node_modules left out), relative to the site folder, sorted; at most `limit`. */
  files(folder: string, limit: number): string[];
  /** The names of the files directly in a folder (not below it; dot-files left out), sorted. */
  names(folder: string): string[];
}

/** One redirect the generator serves: `from` (a route) still leads to `to`. */
export interface PresetRedirect {
  readonly from: string;
  readonly to: string;
}

/** The navigation the generator builds from its config, as a file for the navigation reader. */
export interface PresetNavigation {
  /** Path relative to the content root the links resolve from (the file's name in findings). */
  readonly file: string;
  /** Text in the navigation reader's format (Markdown or YAML); line numbers are the config file's. */
  readonly text: string;
  /** `yaml` or `markdown`. */
  readonly format: 'yaml' | 'markdown';
}

/** What a preset read from a site's config files. */
export interface PresetSite {
  readonly name: PresetName;
  /** The config file, relative to the site folder (`book.toml`, `config/_default/hugo.toml`). */
  readonly configFile: string;
  /** Content folder relative to the site folder ('' = the site folder). */
  readonly contentDir: string;
  /** The plain config fragment (routes, include, exclude, outside, generated); the user's keys win. */
  readonly config: Config;
  readonly navigation: PresetNavigation | null;
  readonly redirects: readonly PresetRedirect[];
  /** What was read, for the one-line summary (`src/`, `SUMMARY.md`, `22 redirects`). */
  readonly parts: readonly string[];
  /** Values that could not be read statically (the default was used), and other things to say. */
  readonly notes: readonly string[];
}

/** A preset reader: the config file found and the site folder's files -> what the site is. */
export type PresetReader = (configFile: string, files: SiteFiles) => PresetSite;
