import type { ResolvedOptions } from '../options.js';
import type { Finding, Severity } from '../types.js';
import type { Rule, RuleContext } from './types.js';
/** A rule with its severity and options from the configuration. */
export interface RuleSetting {
    readonly rule: Rule;
    /** The configured severity, or `null` when the configuration does not set one. */
    readonly severity: Severity | null;
    readonly options: object;
}
/**
 * Check `options.rules` against the known rules: every key a rule id, every rule's options
 * valid for that rule. Returns the setting of every rule (in id order).
 * @param origin where the configuration came from, named in error messages
 * @throws EngineError `E_CONFIG_INVALID` naming the key (`rules.<id>` or `rules.<id>.<option>`)
 *   and listing what is accepted
 */
export declare function validateRuleConfig(options: Pick<ResolvedOptions, 'rules'>, origin?: string, known?: readonly Rule[]): RuleSetting[];
/**
 * Run every rule that is not off and return their findings with rule id and severity,
 * sorted by file, line, column, rule and message. Findings on pages marked
 * `linkweave.exclude` are dropped.
 * @throws EngineError `E_CONFIG_INVALID` for a bad `rules` configuration (see `validateRuleConfig`)
 */
export declare function runRules(ctx: RuleContext, known?: readonly Rule[]): Finding[];
/** Order of findings everywhere in the output: file, line, column, rule, message. */
export declare function compareFindings(a: Finding, b: Finding): number;
