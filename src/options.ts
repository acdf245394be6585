/**
 * The one place that holds defaults and validates configuration (STYLE section 2.5).
 * Every entry point (CLI, Node API, plugins) goes through `resolveOptions`; later code gets
 * `ResolvedOptions` with nothing optional.
 */
import { z } from 'zod';
import { describeIssue, oldFormProblem } from './config-issues.js';
import { EngineError } from './errors.js';
import { HEADING_ID_STYLES } from './parse/heading-ids.js';
import { PRESET_NAMES } from './preset/names.js';

/** How much a check's findings weigh: SARIF's levels (`none` = the check does not run). */
export const LEVELS = ['error', 'warning', 'none'] as const;

/** A check's setting: its `level` and its own named options (checked against the check by the rules engine). */
const checkSetting = z
  .looseObject({ level: z.enum(LEVELS).optional() })
  .describe('an object: { "level": "error", "warning" or "none", and the check\'s own options }');

const linkPattern = z.strictObject({
  /** A regular expression (JavaScript syntax, `g` flag implied) matched against the page's raw text. */
  pattern: z.string().min(1),
  /** Route template; `$1`..`$9` are the capture groups. Ends in a source extension: resolves like a file link. */
  route: z.string().min(1),
});

const schema = z.strictObject({
  /** @default ['**\/*.{md,markdown,mdx,html,htm}'] */
  include: z.array(z.string().min(1)).default(['**/*.{md,markdown,mdx,html,htm}']),
  /** Extra globs to leave out (node_modules, dot-folders and the output file are always left out). @default [] */
  exclude: z.array(z.string().min(1)).default([]),
  routes: z
    .strictObject({
      /** `directory`: a/b.md -> /a/b/; `html`: a/b.md -> /a/b.html. @default 'directory' */
      style: z.enum(['directory', 'html']).default('directory'),
      /** URL prefix of the site. @default '/' */
      basePath: z.string().default('/'),
      /** File names (without extension) that stand for their folder. @default ['index','README','_index'] */
      indexNames: z.array(z.string().min(1)).default(['index', 'README', '_index']),
      /** Match routes without regard to case. @default false */
      caseInsensitive: z.boolean().default(false),
      /** Folder (relative to the content root) -> route prefix its files are served under. @default {} */
      folders: z.record(z.string().min(1), z.string().startsWith('/')).default({}),
      /** Folders of dated posts: `YYYY-MM-DD-name.md` is routed `YYYY/MM/DD/name`. @default [] */
      dated: z.array(z.string().min(1)).default([]),
      /** Site-absolute links are written below the base path (the generator prepends it): an unresolved one is broken, never "outside". @default false */
      absoluteLinksUnderBase: z.boolean().default(false),
      /** Whose rules turn frontmatter `permalink`/`slug`/`url`, `permalinks` and file names into routes ('none': permalink site-absolute, slug below basePath). @default 'none' */
      generator: z.enum(['none', 'jekyll', 'hugo', 'docusaurus']).default('none'),
      /** Permalink patterns of the generator: Hugo section -> pattern; Jekyll '*' (the site's permalink) or a collection -> pattern. @default {} */
      permalinks: z.record(z.string().min(1), z.string().min(1)).default({}),
      /** How headings get their fragment ids: 'auto' picks the style under which most of the site's fragment links resolve. @default 'auto' */
      headingIds: z.enum(['auto', ...HEADING_ID_STYLES]).default('auto'),
      /** The style 'auto' keeps when styles tie (a preset sets its generator's). @default 'github' */
      headingIdsDefault: z.enum(HEADING_ID_STYLES).default('github'),
    })
    .prefault({}),
  /** Entry pages for click depth (and for `teleport: 'entry'`). @default ['/'] */
  entry: z.array(z.string().min(1)).min(1).default(['/']),
  /** A table-of-contents file (Markdown or YAML list of links) shown on every page. @default null */
  navigation: z.string().min(1).nullable().default(null),
  /** A redirects file, `from to` per line. @default null */
  redirects: z.string().min(1).nullable().default(null),
  /** Shortcodes or macros that produce links. @default [] */
  linkPatterns: z.array(linkPattern).default([]),
  /** Weight of a template link relative to a content link. @default 0.2 */
  templateWeight: z.number().min(0).max(1).default(0.2),
  /** A link repeated on at least this share of pages is a template link. @default 0.5 */
  templateShare: z.number().gt(0).max(1).default(0.5),
  /** Click depth follows template links too. @default true */
  depthCountsTemplate: z.boolean().default(true),
  /** PageRank teleport vector. @default 'uniform' */
  teleport: z.enum(['uniform', 'entry']).default('uniform'),
  /** PageRank damping factor. @default 0.85 */
  damping: z.number().gt(0).lt(1).default(0.85),
  /** PageRank stops after this many power iterations (and reports it did not converge). @default 200 */
  pagerankIterations: z.number().int().min(1).default(200),
  /** PageRank stops when the L1 change of one iteration falls below this. @default 1e-10 */
  pagerankTolerance: z.number().gt(0).default(1e-10),
  /** Deepest click depth allowed: the `click-depth` check, the depth-repair plan and the reports read it. @default 3 */
  maxDepth: z.number().int().min(0).default(3),
  /** Files larger than this are skipped with a finding. @default 10485760 (10 MiB) */
  maxFileBytes: z.number().int().positive().default(10 * 1024 * 1024),
  /** Links kept per page; more are dropped with a finding. @default 20000 */
  maxLinksPerPage: z.number().int().positive().default(20000),
  /** Level and options per check id: `{ "dead-end": { "level": "none" } }`. @default {} */
  checks: z.record(z.string(), checkSetting).default({}),
  /** The run fails (exit 1) when any finding is at or above this level. @default 'error' */
  failOn: z.enum(['error', 'warning']).default('error'),
  /** Globs (on file paths) or routes of pages that matter most. @default [] */
  important: z.array(z.string().min(1)).default([]),
  /** A CSV of `route,views` used as importance. @default null */
  traffic: z.string().min(1).nullable().default(null),
  suggest: z
    .strictObject({
      /** Propose links to under-linked pages only, or to every page. @default 'underlinked' */
      targets: z.enum(['underlinked', 'all']).default('underlinked'),
      /** Suggestions per target page. @default 5 */
      perTarget: z.number().int().positive().default(5),
      /** New links proposed per source page; 0 = no cap. Applied after ranking. @default 3 */
      perSource: z.number().int().min(0).default(3),
      /**
       * Least score (the link model's probability that an author would write the link) a
       * suggestion needs; 0 = every candidate. @default 0.05
       */
      minScore: z.number().min(0).max(1).default(0.05),
      /** Least cosine similarity for a TF-IDF neighbour to be a candidate source. @default 0.1 */
      minSimilarity: z.number().min(0).max(1).default(0.1),
      /** TF-IDF neighbours per page: related pages kept, and candidate sources of each target. @default 10 */
      relatedK: z.number().int().positive().default(10),
      /** Important pages with fewer content inlinks than this are under-linked. @default 2 */
      minInlinks: z.number().int().min(0).default(2),
      /** Under-linked when importance percentile - PageRank percentile exceeds this. @default 0.5 */
      rankGap: z.number().min(0).max(1).default(0.5),
      /**
       * Suggestions whose PageRank after is computed: the best this many by score, plus the first
       * this many of the depth-repair plan (the links that fix the most pages); 0 = all. The
       * others report `targetRankAfter: null` ("not computed"); depth after is always computed.
       * Why a budget: PageRank after one added link is the fixed point of the whole changed graph
       * (the link changes the share of every out-link of its source, and the change flows around
       * every cycle through it), so each exact prediction is a power iteration over every edge.
       * No exact shortcut stays local: even the rank-one update formula needs entries of the
       * inverse of the whole graph's matrix, one whole-graph solve per page involved.
       * @default 200
       */
      impactLimit: z.number().int().min(0).default(200),
    })
    .prefault({}),
  /**
   * Limits on the whole site: the run fails (exit 1) when a count goes over its limit, or when a
   * page of high importance has fewer content inlinks than `importantPageInlinks`. null = no limit.
   * (The depth limit is `maxDepth`; set the `click-depth` check's level to `error` to fail on it.)
   */
  limits: z
    .strictObject({
      brokenLinks: z.number().int().min(0).nullable().default(null),
      brokenFragments: z.number().int().min(0).nullable().default(null),
      orphans: z.number().int().min(0).nullable().default(null),
      unreachable: z.number().int().min(0).nullable().default(null),
      warnings: z.number().int().min(0).nullable().default(null),
      importantPageInlinks: z.number().int().min(0).nullable().default(null),
    })
    .prefault({}),
  cache: z
    .strictObject({
      /** @default true */
      enabled: z.boolean().default(true),
      /** Relative to the working folder. @default 'node_modules/.cache/linkweave' */
      dir: z.string().min(1).default('node_modules/.cache/linkweave'),
    })
    .prefault({}),
  /** Worker threads for parsing: 0 = automatic (by file count and cores), 1 = main thread only. @default 0 */
  workers: z.number().int().min(0).default(0),
  /** Site generator whose config files set defaults: 'auto' detects one from the files present, 'none' reads none. @default 'auto' */
  preset: z.enum(['auto', 'none', ...PRESET_NAMES]).default('auto'),
  /** Route prefixes that are part of the site but not of these sources (links there are "outside", never broken). @default [] */
  outside: z.array(z.string().min(1)).default([]),
  /** Links the generator makes on pages it builds. */
  generated: z
    .strictObject({
      /** Each section index page (`_index`) lists the pages and sections of its folder. @default false */
      sectionLists: z.boolean().default(false),
      /** Folders of dated posts: each post links the previous and next one. @default [] */
      postFolders: z.array(z.string().min(1)).default([]),
      /** Routes the generator makes with no source file (a blog index): links there are "outside", never broken. @default [] */
      routes: z.array(z.string().startsWith('/')).default([]),
    })
    .prefault({}),
});

/** Configuration as a user writes it (every key optional), documented key by key in src/config.ts. */
export type { Config } from './config.js';

/** The schema's input type; `test/types/config.test-d.ts` checks it equals `Config`. */
export type SchemaInput = z.input<typeof schema>;

/** Configuration after defaults and validation. */
export type ResolvedOptions = z.output<typeof schema> & {
  /** Absolute path of the content root. */
  readonly root: string;
};

/** The defaults, as a resolved object (root: the working folder). */
export const DEFAULT_OPTIONS: Omit<ResolvedOptions, 'root'> = schema.parse({});

/**
 * Validate a user configuration and fill in defaults.
 * @param input configuration as written (from a file, the API or flags merged over a file)
 * @param root absolute path of the content root
 * @param origin where the configuration came from, named in error messages
 * @throws EngineError `E_CONFIG_INVALID` naming the key, the problem and the accepted values
 */
export function resolveOptions(input: unknown, root: string, origin = 'configuration'): ResolvedOptions {
  const old = oldFormProblem(input);
  if (old !== null) throw new EngineError('E_CONFIG_INVALID', `${origin}: ${old}`);
  const result = schema.safeParse(input ?? {}, { reportInput: true });
  if (!result.success) {
    throw new EngineError('E_CONFIG_INVALID', `${origin}: ${describeIssue(schema, result.error.issues[0]!)}`);
  }
  const options = { ...result.data, root };
  for (const [i, p] of options.linkPatterns.entries()) {
    try {
      new RegExp(p.pattern, 'g');
    } catch (error) {
      throw new EngineError(
        'E_CONFIG_INVALID',
        `${origin}: key "linkPatterns.${i}.pattern": not a valid regular expression (${(error as Error).message})`,
      );
    }
  }
  for (const [i, prefix] of options.outside.entries()) {
    if (!prefix.startsWith('/')) throw new EngineError('E_CONFIG_INVALID', `${origin}: key "outside.${i}": must start with "/", got "${prefix}"`);
  }
  if (!options.routes.basePath.startsWith('/')) {
    throw new EngineError('E_CONFIG_INVALID', `${origin}: key "routes.basePath": must start with "/", got "${options.routes.basePath}"`);
  }
  return options;
}
