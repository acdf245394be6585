/**
 * The architecture of linkweave, checked by `test/arch/layers.test.ts` (dependency-cruiser).
 *
 * STAGES is the one record of the pipeline's order: a module may import from its own stage and
 * from any earlier one, never from a later one. The ground floor comes first: any stage may use
 * it, it uses none. Type files (`types.ts`, `report/schema.ts`) hold only types and may be
 * imported from any stage. Any import cycle fails too.
 *
 * EXCEPTIONS are imports that run backwards today in files whose move is planned (the pipeline
 * module of issue 17); each is named, and the lead removes it when its import is gone.
 */

/** The pipeline stages, earliest first: [name, paths below the repository root]. */
const STAGES = [
  ['ground floor', ['src/util/', 'src/routes/', 'src/errors.ts', 'src/version.ts', 'src/types.ts']],
  ['config', ['src/config.ts', 'src/config-issues.ts', 'src/options.ts']],
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
  ['backtest', ['src/backtest/']],
  ['pipeline', ['src/pipeline/', 'src/analyze.ts']],
  ['plugins', ['src/plugins/']],
  ['cli', ['src/cli/']],
  ['api', ['src/index.ts']],
];

/** Files of types only: importable from every stage. */
const TYPE_FILES = '(^|/)types\\.ts$|^src/report/schema\\.ts$';

/** Imports against the order that stay until the pipeline branch moves them. */
const EXCEPTIONS = [
  // The config schema takes the heading-id styles and preset names from their stages.
  { name: 'options-heading-ids', from: 'src/options.ts', to: 'src/parse/heading-ids.ts' },
  { name: 'options-preset-names', from: 'src/options.ts', to: 'src/preset/names.ts' },
  { name: 'config-heading-ids', from: 'src/config.ts', to: 'src/parse/heading-ids.ts' },
  { name: 'config-preset-names', from: 'src/config.ts', to: 'src/preset/names.ts' },
  { name: 'hugo-heading-ids', from: 'src/preset/hugo.ts', to: 'src/parse/heading-ids.ts' },
  // The backtest runs analyze's internals and the CLI's helpers.
  { name: 'backtest-analyze', from: 'src/backtest/', to: 'src/analyze.ts' },
  { name: 'backtest-cli', from: 'src/backtest/', to: 'src/cli/' },
  // The build plugin finds the configuration file as the CLI does.
  { name: 'plugins-cli-config', from: 'src/plugins/build.ts', to: 'src/cli/config.ts' },
];

/**
 * Import cycles that stay until their branches land; all through type imports only. The cycle
 * rule skips these files (every file of each cycle), so the lead removes an entry with its cycle.
 */
const CYCLE_EXCEPTIONS = [
  // HtmlData's types live in data.ts, which imports selectSummary from summary.ts (the HTML branch).
  { name: 'html-data-summary', files: ['src/report/html/data.ts', 'src/report/html/summary.ts'] },
  // CommandContext lives in cli/commands.ts, which imports the apply and backtest commands (the pipeline branch).
  { name: 'cli-command-context', files: ['src/cli/commands.ts', 'src/cli/apply.ts', 'src/backtest/command.ts', 'src/backtest/index.ts'] },
];

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
      from: { pathNot: pathsOf(CYCLE_EXCEPTIONS.flatMap((e) => e.files)) },
      to: { circular: true },
    },
    {
      name: 'stage-known',
      comment: 'every module under src/ belongs to a stage of STAGES',
      severity: 'error',
      from: { path: '^src/', pathNot: pathsOf(STAGES.flatMap(([, p]) => p)) },
      to: {},
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
