/**
 * The one place that holds defaults and validates configuration (STYLE section 2.5).
 * Every entry point (CLI, Node API, plugins) goes through `resolveOptions` (once per run, in the
 * pipeline's prepare stage); later code gets `ResolvedOptions` with nothing optional.
 *
 * Each key is documented once, for users, on the `Config` type (config.ts), which a type test
 * keeps equal to this schema's input; each default is written once, here, and
 * `test/config/defaults.test.ts` checks every `@default` written in config.ts against it.
 */
import { z } from 'zod';
import { describeIssue, oldFormProblem } from './issues.js';
import { EngineError } from '../errors.js';
import { HEADING_ID_STYLES } from '../parse/heading-ids.js';
import { PRESET_NAMES } from '../preset/names.js';
import { SOURCE_GLOB } from '../routes/index.js';

/** How much a check's findings weigh: SARIF's levels (`none` = the check does not run). */
export const LEVELS = ['error', 'warning', 'none'] as const;

/** A check's setting: its `level` and its own named options (checked against the check by the rules engine). */
const checkSetting = z
  .looseObject({ level: z.enum(LEVELS).optional() })
  .describe('an object: { "level": "error", "warning" or "none", and the check\'s own options }');

const linkPattern = z.strictObject({
  pattern: z.string().min(1),
  route: z.string().min(1),
});

const schema = z.strictObject({
  include: z.array(z.string().min(1)).default([SOURCE_GLOB]),
  exclude: z.array(z.string().min(1)).default([]),
  routes: z
    .strictObject({
      style: z.enum(['directory', 'html']).default('directory'),
      basePath: z.string().default('/'),
      indexNames: z.array(z.string().min(1)).default(['index', 'README', '_index']),
      caseInsensitive: z.boolean().default(false),
      folders: z.record(z.string().min(1), z.string().startsWith('/')).default({}),
      dated: z.array(z.string().min(1)).default([]),
      absoluteLinksUnderBase: z.boolean().default(false),
      generator: z.enum(['none', 'jekyll', 'hugo', 'docusaurus']).default('none'),
      permalinks: z.record(z.string().min(1), z.string().min(1)).default({}),
      headingIds: z.enum(['auto', ...HEADING_ID_STYLES]).default('auto'),
      headingIdsDefault: z.enum(HEADING_ID_STYLES).default('github'),
    })
    .prefault({}),
  entry: z.array(z.string().min(1)).min(1).default(['/']),
  navigation: z.string().min(1).nullable().default(null),
  redirects: z.string().min(1).nullable().default(null),
  linkPatterns: z.array(linkPattern).default([]),
  templateWeight: z.number().min(0).max(1).default(0.2),
  templateShare: z.number().gt(0).max(1).default(0.5),
  depthCountsTemplate: z.boolean().default(true),
  teleport: z.enum(['uniform', 'entry']).default('uniform'),
  damping: z.number().gt(0).lt(1).default(0.85),
  pagerankIterations: z.number().int().min(1).default(200),
  pagerankTolerance: z.number().gt(0).default(1e-10),
  maxDepth: z.number().int().min(0).default(3),
  maxFileBytes: z.number().int().positive().default(10 * 1024 * 1024),
  maxLinksPerPage: z.number().int().positive().default(20000),
  checks: z.record(z.string(), checkSetting).default({}),
  failOn: z.enum(['error', 'warning']).default('error'),
  important: z.array(z.string().min(1)).default([]),
  traffic: z.string().min(1).nullable().default(null),
  suggest: z
    .strictObject({
      targets: z.enum(['underlinked', 'all']).default('underlinked'),
      perTarget: z.number().int().positive().default(5),
      perSource: z.number().int().min(0).default(3),
      minScore: z.number().min(0).max(1).default(0.05),
      minSimilarity: z.number().min(0).max(1).default(0.1),
      relatedK: z.number().int().positive().default(10),
      minInlinks: z.number().int().min(0).default(2),
      rankGap: z.number().min(0).max(1).default(0.5),
      // Why a budget: PageRank after one added link is the fixed point of the whole changed graph
      // (the link changes the share of every out-link of its source, and the change flows around
      // every cycle through it), so each exact prediction is a power iteration over every edge. No
      // exact shortcut stays local: even the rank-one update formula needs entries of the inverse
      // of the whole graph's matrix, one whole-graph solve per page involved.
      impactLimit: z.number().int().min(0).default(200),
    })
    .prefault({}),
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
      enabled: z.boolean().default(true),
      dir: z.string().min(1).default('node_modules/.cache/linkweave'),
    })
    .prefault({}),
  workers: z.number().int().min(0).default(0),
  preset: z.enum(['auto', 'none', ...PRESET_NAMES]).default('auto'),
  outside: z.array(z.string().min(1)).default([]),
  generated: z
    .strictObject({
      sectionLists: z.boolean().default(false),
      postFolders: z.array(z.string().min(1)).default([]),
      routes: z.array(z.string().startsWith('/')).default([]),
      includedPages: z.boolean().default(false),
      includeFolders: z.array(z.string().min(1)).default([]),
      layoutIds: z.array(z.strictObject({ type: z.string().min(1), ids: z.array(z.string().min(1)), computed: z.boolean() })).default([]),
    })
    .prefault({}),
});

/** Configuration as a user writes it (every key optional), documented key by key in config.ts. */
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
    throw new EngineError('E_CONFIG_INVALID', `${origin}: ${describeIssue(schema, result.error.issues[0])}`);
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
