/**
 * The configuration as a user writes it, documented key by key. One type for every entry
 * point: the CLI's `linkweave.config.json`, `analyze()`, the unified collector and the
 * Vite/Rollup plugin. The defaults are applied by `resolveOptions` (options.ts in this folder, the only
 * place that holds them); `test/types/config.test-d.ts` checks that this interface is exactly
 * the schema's input type, so the two cannot drift apart.
 */

import type { HeadingIdStyle } from '../parse/heading-ids.js';
import type { PresetName } from '../preset/names.js';

/** How much a check's findings weigh (SARIF's levels); `none`: the check does not run. */
export type Level = 'error' | 'warning' | 'none';

/**
 * One check's setting: its level and its own named options, e.g.
 * `{ "level": "warning", "countTemplateLinks": false }` for `orphan-page`. Each check's options
 * are listed in the README; an unknown option is an error naming the key.
 */
export interface CheckConfig {
  /** @default the check's own level (README, "Checks") */
  level?: Level | undefined;
  [option: string]: unknown;
}

/** A shortcode or macro that produces a link. */
export interface LinkPatternConfig {
  /** A regular expression (JavaScript syntax, `g` flag implied) matched against the page's raw text outside code. */
  pattern: string;
  /** Route template; `$1`..`$9` are the capture groups. Ends in a source extension (`.md`, `.html`...): resolves like a file link. */
  route: string;
}

/** How file paths become routes (URL paths). */
export interface RoutesConfig {
  /**
   * `directory`: `a/b.md` -> `/a/b/`; `html`: `a/b.md` -> `/a/b.html`. HTML files keep their own
   * path. Unset and with no generator preset, `html` is chosen when most relative `.html` links
   * of the Markdown sources name a Markdown source (at least 5 do), and the run says so.
   * @default 'directory'
   */
  style?: 'directory' | 'html' | undefined;
  /** URL prefix of the site; starts with `/`. @default '/' */
  basePath?: string | undefined;
  /** File names (without extension) that stand for their folder. @default ['index', 'README', '_index'] */
  indexNames?: string[] | undefined;
  /** Match routes without regard to case. @default false */
  caseInsensitive?: boolean | undefined;
  /** Folder (relative to the content root) -> route prefix its files are served under, e.g. `{ "src/pages": "/" }`. @default {} */
  folders?: Record<string, string> | undefined;
  /** Folders of dated posts: `YYYY-MM-DD-name.md` is routed `YYYY/MM/DD/name`. @default [] */
  dated?: string[] | undefined;
  /**
   * Site-absolute links are written below the base path (the generator prepends it, as
   * VitePress and Docusaurus do): an unresolved one is broken. When false, an unresolved
   * site-absolute link outside the base path is "outside the content". @default false
   */
  absoluteLinksUnderBase?: boolean | undefined;
  /**
   * Whose rules turn frontmatter `permalink`/`slug`/`url`, `permalinks` and file names into
   * routes; a preset sets its generator's. `none`: `permalink` is site-absolute, `slug` is below
   * the base path. @default 'none'
   */
  generator?: 'none' | 'jekyll' | 'hugo' | 'docusaurus' | undefined;
  /**
   * Permalink patterns: Hugo section -> pattern (`/:year/:month/:title/`); Jekyll `*` (the
   * site's `permalink`), a collection, `path:FOLDER` or `type:TYPE` (frontmatter defaults) ->
   * pattern. @default {}
   */
  permalinks?: Record<string, string> | undefined;
  /**
   * How headings get their fragment ids. `auto` picks the style under which the most of the
   * site's own fragment links resolve (`headingIdsDefault` breaks a tie). @default 'auto'
   */
  headingIds?: 'auto' | HeadingIdStyle | undefined;
  /** The style `auto` keeps when styles tie; a preset sets its generator's. @default 'github' */
  headingIdsDefault?: HeadingIdStyle | undefined;
}

/** Links the site generator makes on the pages it builds. */
export interface GeneratedConfig {
  /** Each section index page (`_index`) lists the pages and sections of its folder (Hugo). @default false */
  sectionLists?: boolean | undefined;
  /** Folders (relative to the content root) of dated posts: each post links the previous and next one. @default [] */
  postFolders?: string[] | undefined;
  /** Routes the generator makes with no source file (a blog index): links there are "outside", never broken. @default [] */
  routes?: string[] | undefined;
  /** Files pulled into a page by an include are still pages of their own (MkDocs builds every file in `docs_dir`). @default false */
  includedPages?: boolean | undefined;
  /** Folders, relative to the content root (`../` climbs above it), that include directives also read from (pymdownx snippets' `base_path`). @default [] */
  includeFolders?: string[] | undefined;
  /**
   * Ids the generator's page templates write into pages (a Hugo preset reads them from the
   * layouts): one entry per page type, `*` for pages of any other type; index pages get none.
   * @default []
   */
  layoutIds?: LayoutIdsConfig[] | undefined;
}

/** The ids page templates write into the pages of one type. */
export interface LayoutIdsConfig {
  /** The page type (frontmatter `type`, else the page's top folder, `page` at the root), or `*` for any other. */
  type: string;
  /** Ids every page of the type has. */
  ids: string[];
  /** The type's template computes more ids: a fragment that is not a known id is unknown, never broken. */
  computed: boolean;
}

/** Link suggestions (`linkweave suggest`, `command: 'suggest'`). */
export interface SuggestConfig {
  /** Propose links to under-linked pages only, or to every page. @default 'underlinked' */
  targets?: 'underlinked' | 'all' | undefined;
  /** Suggestions per target page. @default 5 */
  perTarget?: number | undefined;
  /** New links proposed per source page; 0 = no cap. Applied after ranking. @default 3 */
  perSource?: number | undefined;
  /** Least score (0..1, the link model's probability that an author would write the link) a suggestion needs; a page no entry page reaches keeps its best suggestion under it. @default 0.05 */
  minScore?: number | undefined;
  /** Least cosine similarity (0..1) for a TF-IDF neighbour to be a candidate source. @default 0.1 */
  minSimilarity?: number | undefined;
  /** TF-IDF neighbours per page: related pages kept, and candidate sources of each target. @default 10 */
  relatedK?: number | undefined;
  /** Important pages with fewer content inlinks than this are under-linked. @default 2 */
  minInlinks?: number | undefined;
  /** Under-linked when importance percentile minus PageRank percentile exceeds this (0..1). @default 0.5 */
  rankGap?: number | undefined;
  /**
   * Suggestions whose PageRank after is computed: the best this many by score, plus the first
   * this many of the depth-repair plan; 0 = all. The others report `targetRankAfter: null`
   * (each prediction is a power iteration over the whole graph). @default 200
   */
  impactLimit?: number | undefined;
}

/**
 * Limits on the whole site: the run fails (exit 1) when a count goes over its limit. `null` = no
 * limit. The depth limit is `maxDepth` (set the `click-depth` check to `error` to fail on it).
 */
export interface LimitsConfig {
  /** Most broken links allowed. @default null */
  brokenLinks?: number | null | undefined;
  /** Most links to a fragment the target page does not have. @default null */
  brokenFragments?: number | null | undefined;
  /** Most orphan pages (no inlinks). @default null */
  orphans?: number | null | undefined;
  /** Most pages not reachable from the entry pages. @default null */
  unreachable?: number | null | undefined;
  /** Most findings of level `warning`. @default null */
  warnings?: number | null | undefined;
  /** Fewest content inlinks a page of high importance may have (a lower bound). @default null */
  importantPageInlinks?: number | null | undefined;
}

/** The page-facts cache. */
export interface CacheConfig {
  /** Keep parsed page facts between runs. @default true */
  enabled?: boolean | undefined;
  /** Cache folder, relative to the working folder. @default 'node_modules/.cache/linkweave' */
  dir?: string | undefined;
}

/** linkweave's configuration, every key optional. Unknown keys are an error (`E_CONFIG_INVALID`). */
export interface Config {
  /** Globs (relative to the content root) of the source files. @default ['**\/*.{md,markdown,mdx,html,htm}'] */
  include?: string[] | undefined;
  /** Extra globs to leave out (node_modules, dot-folders and the output file are always left out). @default [] */
  exclude?: string[] | undefined;
  /**
   * How file paths become routes.
   * @default { style: 'directory', basePath: '/', indexNames: ['index', 'README', '_index'], caseInsensitive: false, folders: {}, dated: [], absoluteLinksUnderBase: false, generator: 'none', permalinks: {}, headingIds: 'auto', headingIdsDefault: 'github' }
   */
  routes?: RoutesConfig | undefined;
  /**
   * Site generator whose own config files (book.toml, hugo.toml, mkdocs.yml, ...) set the content
   * folder, routes, navigation and redirects: `auto` detects one in the run folder and its
   * parents up to the repository root; `none` reads none. Keys written here win over the preset's. @default 'auto'
   */
  preset?: 'auto' | 'none' | PresetName | undefined;
  /** Route prefixes that belong to the site but not to these sources: links there are "outside the content", never broken. @default [] */
  outside?: string[] | undefined;
  /** Links and ids the generator makes on the pages it builds. @default { sectionLists: false, postFolders: [], routes: [], includedPages: false, includeFolders: [], layoutIds: [] } */
  generated?: GeneratedConfig | undefined;
  /** Entry pages (routes) for click depth and for `teleport: 'entry'`. @default ['/'] */
  entry?: string[] | undefined;
  /** A table-of-contents file (Markdown or YAML list of links), relative to the root, shown on every page. @default null */
  navigation?: string | null | undefined;
  /** A redirects file (`from to` per line), relative to the root. @default null */
  redirects?: string | null | undefined;
  /** Shortcodes or macros that produce links. @default [] */
  linkPatterns?: LinkPatternConfig[] | undefined;
  /** Weight of a template link relative to a content link (0..1). @default 0.2 */
  templateWeight?: number | undefined;
  /** A link repeated on at least this share of pages (0..1] is a template link. @default 0.5 */
  templateShare?: number | undefined;
  /** Click depth follows template links too. @default true */
  depthCountsTemplate?: boolean | undefined;
  /** PageRank teleport vector: every page alike, or the entry pages only. @default 'uniform' */
  teleport?: 'uniform' | 'entry' | undefined;
  /** PageRank damping factor, between 0 and 1. @default 0.85 */
  damping?: number | undefined;
  /** PageRank stops after this many power iterations (and reports it did not converge). @default 200 */
  pagerankIterations?: number | undefined;
  /** PageRank stops when the L1 change of one iteration falls below this. @default 1e-10 */
  pagerankTolerance?: number | undefined;
  /** Deepest click depth allowed: the one depth limit (the `click-depth` check, the depth-repair plan, the reports). @default 3 */
  maxDepth?: number | undefined;
  /** Files larger than this many bytes are skipped with a finding. @default 10485760 (10 MiB) */
  maxFileBytes?: number | undefined;
  /** Links kept per page; more are dropped with a finding. @default 20000 */
  maxLinksPerPage?: number | undefined;
  /** Level and options per check id, e.g. `{ "dead-end": { "level": "none" } }`. @default {} */
  checks?: Record<string, CheckConfig> | undefined;
  /** The run fails (exit 1) when any finding is at or above this level. @default 'error' */
  failOn?: 'error' | 'warning' | undefined;
  /** Globs (on file paths) or routes of the pages that matter most. @default [] */
  important?: string[] | undefined;
  /** A CSV of `route,views` (relative to the root) used as importance. @default null */
  traffic?: string | null | undefined;
  /** Link suggestions. @default { targets: 'underlinked', perTarget: 5, perSource: 3, minScore: 0.05, minSimilarity: 0.1, relatedK: 10, minInlinks: 2, rankGap: 0.5, impactLimit: 200 } */
  suggest?: SuggestConfig | undefined;
  /** Limits on the whole site. @default every limit null (none) */
  limits?: LimitsConfig | undefined;
  /** The page-facts cache. @default { enabled: true, dir: 'node_modules/.cache/linkweave' } */
  cache?: CacheConfig | undefined;
  /**
   * Worker threads: 0 = automatic (parsing: by file count and cores; the impact predictions'
   * PageRank: a second thread on a machine of two or more cores), 1 = the main thread only. The
   * report is the same either way. @default 0
   */
  workers?: number | undefined;
}
