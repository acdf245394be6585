/**
 * The rule engine: applies the configured level and options to each rule, runs it and
 * stamps its findings (as unified-lint-rule does for lint messages).
 */
import { expectedGot } from '../config/issues.js';
import { EngineError } from '../errors.js';
import type { ResolvedOptions } from '../config/options.js';
import type { Level } from '../config/config.js';
import type { Finding, Severity } from '../types.js';
import type { Rule, RuleContext, RuleFinding } from './types.js';
import { rules as builtinRules } from './registry.js';
import { compareFindings, compareText } from '../util/index.js';

/** A rule with its level and options from the configuration. */
export interface RuleSetting {
  readonly rule: Rule;
  /** The configured level, or `null` when the configuration does not set one. */
  readonly level: Level | null;
  readonly options: object;
}

/**
 * Check `options.checks` against the known rules: every key a check id, every check's options
 * valid for that check. Returns the setting of every rule (in id order).
 * @param origin where the configuration came from, named in error messages
 * @throws EngineError `E_CONFIG_INVALID` naming the key (`checks.<id>` or `checks.<id>.<option>`)
 *   and listing what is accepted
 */
export function validateRuleConfig(
  options: Pick<ResolvedOptions, 'checks'>,
  origin = 'configuration',
  known: readonly Rule[] = builtinRules,
): RuleSetting[] {
  const byId = new Map(known.map((r) => [r.id, r]));
  for (const id of Object.keys(options.checks).sort(compareText)) {
    if (!byId.has(id)) {
      const ids = known.map((r) => r.id).join(', ');
      throw new EngineError('E_CONFIG_INVALID', `${origin}: key "checks.${id}": no check has this id; the checks are ${ids}`);
    }
  }
  return known.map((rule) => settingOf(rule, options.checks[rule.id], origin));
}

function settingOf(
  rule: Rule,
  configured: ResolvedOptions['checks'][string] | undefined,
  origin: string,
): RuleSetting {
  if (configured === undefined) return { rule, level: null, options: rule.defaultOptions };
  const { level = null, ...given } = configured;
  const merged = { ...rule.defaultOptions, ...given };
  const keys = Object.keys(given).sort(compareText);
  if (rule.optionsSchema === undefined) {
    if (keys.length > 0) {
      throw new EngineError('E_CONFIG_INVALID', `${origin}: key "checks.${rule.id}.${keys[0]}": this check takes only "level"`);
    }
    return { rule, level, options: merged };
  }
  const parsed = rule.optionsSchema.safeParse(merged, { reportInput: true });
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const path = [rule.id, ...issue.path.map(String)];
    if (issue.code === 'unrecognized_keys') path.push(issue.keys[0]);
    const accepted = ['level', ...Object.keys(rule.defaultOptions)].map((k) => `"${k}"`).join(', ');
    const problem = issue.code === 'unrecognized_keys' ? `unknown option; this check takes ${accepted}` : expectedGot(rule.optionsSchema, issue);
    throw new EngineError('E_CONFIG_INVALID', `${origin}: key "checks.${path.join('.')}": ${problem}`);
  }
  return { rule, level, options: parsed.data as object };
}

/**
 * Run every rule whose level is not `none` and return their findings with rule id and severity,
 * sorted by file, line, column, rule and message, each distinct finding once. Findings on pages
 * marked `linkweave.exclude` are dropped.
 * @param settings the settings `validateRuleConfig` gave for `known` (the pipeline validates once, in its prepare stage)
 * @throws EngineError `E_CONFIG_INVALID` for a bad `checks` configuration (see `validateRuleConfig`)
 */
export function runRules(
  ctx: RuleContext,
  known: readonly Rule[] = builtinRules,
  settings: readonly RuleSetting[] = validateRuleConfig(ctx.options, 'configuration', known),
): Finding[] {
  const excluded = new Set(ctx.facts.filter((f) => f.meta.exclude).map((f) => f.file));
  const findings: Finding[] = [];
  for (const { rule, level, options } of settings) {
    if (level === 'none') continue;
    for (const found of rule.check(ctx, options) as RuleFinding[]) {
      if (excluded.has(found.file)) continue;
      findings.push(stamp(rule.id, level ?? found.severity ?? rule.defaultSeverity, found));
    }
  }
  findings.sort(compareFindings);
  // The same words at the same place once: a file pulled into several pages (an include, an
  // MkDocs snippet that is also a page) gives each page the same link, fixed in one place.
  return findings.filter((f, i) => i === 0 || !sameFinding(findings[i - 1], f));
}

function sameFinding(a: Finding, b: Finding): boolean {
  return a.rule === b.rule && a.file === b.file && a.line === b.line && a.column === b.column && a.message === b.message && a.target === b.target && a.severity === b.severity;
}

function stamp(rule: string, severity: Exclude<Severity, 'off'>, found: RuleFinding): Finding {
  const finding: Finding = {
    rule,
    severity,
    file: found.file,
    line: found.line,
    column: found.column,
    route: found.route,
    message: found.message,
  };
  return found.target === undefined ? finding : { ...finding, target: found.target };
}
