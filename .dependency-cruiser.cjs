/**
 * The architecture of linkweave, checked by `test/arch/layers.test.ts` (dependency-cruiser).
 *
 * STAGES is the one record of the pipeline's order: a module may import from its own stage and
 * from any earlier one, never from a later one. The ground floor comes first: any stage may use
 * it, it uses none. Type files (`types.ts`, `report/schema.ts`) hold only types and may be
 * imported from any stage. Any import cycle fails too.
 *
 * EXCEPTIONS are the imports that run backwards, each named with its reason: the config schema
 * lists names that the parse and preset stages define.
 *
 * WRITERS are the only places that may import the atomic file write (`src/util/write-file.ts`,
 * on the ground floor so that the cache and the report share it, but not re-exported by
 * `util/index.ts`): the stages that touch the file system, as DEVELOPERS.md lists them.
 */

/** The pipeline stages, earliest first: [name, paths below the repository root]. */
const STAGES = [
  ['ground floor', ['src/util/', 'src/routes/', 'src/errors.ts', 'src/version.ts', 'src/types.ts']],
  ['config', ['src/config/']],
  ['preset', ['src/preset/']],
  ['collect', ['src/collect/']],
  ['cache', ['src/cache/']],
  ['parse', ['src/parse/']],
  ['parallel', ['src/parallel/']],
  ['graph', ['src/graph/']],
  ['rank', ['src/rank/']],
  ['text', ['src/text/']],
  ['suggest', ['src/suggest/']],
  ['rules', ['src/rules/']],
  ['baseline', ['src/baseline/']],
  ['report', ['src/report/']],
  ['compare', ['src/compare/']],
  ['apply', ['src/apply/']],
  ['pipeline', ['src/pipeline/', 'src/analyze.ts']],
  ['backtest', ['src/backtest/']],
  ['plugins', ['src/plugins/']],
  ['cli', ['src/cli/']],
  ['api', ['src/index.ts']],
];

/** Files of types only: importable from every stage. */
const TYPE_FILES = '(^|/)types\\.ts$|^src/report/schema\\.ts$';

/** Imports against the order, each named with its reason. */
const EXCEPTIONS = [
  // The config schema lists the heading-id styles and preset names, which their stages define.
  { name: 'options-heading-ids', from: 'src/config/options.ts', to: 'src/parse/heading-ids.ts' },
  { name: 'options-preset-names', from: 'src/config/options.ts', to: 'src/preset/names.ts' },
  { name: 'config-heading-ids', from: 'src/config/config.ts', to: 'src/parse/heading-ids.ts' },
  { name: 'config-preset-names', from: 'src/config/config.ts', to: 'src/preset/names.ts' },
  { name: 'hugo-heading-ids', from: 'src/preset/hugo.ts', to: 'src/parse/heading-ids.ts' },
];

/** The modules that may write files (import `src/util/write-file.ts`). */
const WRITERS = ['src/collect/', 'src/cache/', 'src/report/index.ts', 'src/apply/run.ts', 'src/pipeline/', 'src/plugins/', 'src/cli/', 'src/index.ts'];

/**
 * Import cycles let through, each named with its files (the cycle rule skips every file of each);
 * none today.
 */
const CYCLE_EXCEPTIONS = [];

const escape = (p) => p.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
/** A path regex matching any of the given folders (ending in `/`) or files. */
const pathsOf = (paths) => `^(?:${paths.map((p) => escape(p) + (p.endsWith('/') ? '' : '$')).join('|')})`;

function stageRules() {
  const rules = [];
  STAGES.forEach(([name, paths], i) => {
    const later = STAGES.slice(i + 1).flatMap(([, p]) => p);
    if (later.length === 0) return;
    const from = pathsOf(paths);
    const own = EXCEPTIONS.filter((e) => new RegExp(from).test(e.from.endsWith('/') ? e.from + 'x.ts' : e.from));
    const exceptFrom = [...new Set(own.map((e) => e.from))];
    rules.push({
      name: `stage-order: ${name}`,
      comment: `${name} imports nothing from a later stage`,
      severity: 'error',
      from: exceptFrom.length === 0 ? { path: from } : { path: from, pathNot: pathsOf(exceptFrom) },
      to: { path: pathsOf(later), pathNot: TYPE_FILES },
    });
    for (const file of exceptFrom) {
      const allowed = own.filter((e) => e.from === file);
      rules.push({
        name: `stage-order: ${name} (except ${allowed.map((e) => e.name).join(', ')})`,
        comment: `${file} imports nothing from a later stage but for its named exceptions`,
        severity: 'error',
        from: { path: pathsOf([file]) },
        to: { path: pathsOf(later), pathNot: `${TYPE_FILES}|${pathsOf(allowed.map((e) => e.to))}` },
      });
    }
  });
  return rules;
}

/** @type {import('dependency-cruiser').IConfiguration} */
module.exports = {
  forbidden: [
    {
      name: 'no-cycle',
      comment: 'no module reaches itself through its imports (type imports included), but for CYCLE_EXCEPTIONS',
      severity: 'error',
      from: CYCLE_EXCEPTIONS.length === 0 ? {} : { pathNot: pathsOf(CYCLE_EXCEPTIONS.flatMap((e) => e.files)) },
      to: { circular: true },
    },
    {
      name: 'stage-known',
      comment: 'every module under src/ belongs to a stage of STAGES',
      severity: 'error',
      from: { path: '^src/', pathNot: pathsOf(STAGES.flatMap(([, p]) => p)) },
      to: {},
    },
    {
      name: 'file-writes',
      comment: 'only the stages that touch the file system (WRITERS) import the atomic file write',
      severity: 'error',
      from: { path: '^src/', pathNot: pathsOf([...WRITERS, 'src/util/write-file.ts']) },
      to: { path: pathsOf(['src/util/write-file.ts']) },
    },
    ...stageRules(),
  ],
  options: {
    doNotFollow: { path: 'node_modules' },
    tsPreCompilationDeps: true,
    parser: 'swc',
    exclude: { path: '^src/.*\\.d\\.ts$' },
  },
};
