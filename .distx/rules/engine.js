/**
 * The rule engine: applies the configured severity and options to each rule, runs it and
 * stamps its findings (as unified-lint-rule does for lint messages).
 */
import { expectedGot } from '../config-issues.js';
import { EngineError } from '../errors.js';
import { rules as builtinRules } from './registry.js';
import { compareText } from './structure.js';
/**
 * Check `options.rules` against the known rules: every key a rule id, every rule's options
 * valid for that rule. Returns the setting of every rule (in id order).
 * @param origin where the configuration came from, named in error messages
 * @throws EngineError `E_CONFIG_INVALID` naming the key (`rules.<id>` or `rules.<id>.<option>`)
 *   and listing what is accepted
 */
export function validateRuleConfig(options, origin = 'configuration', known = builtinRules) {
    const byId = new Map(known.map((r) => [r.id, r]));
    for (const id of Object.keys(options.rules).sort(compareText)) {
        if (!byId.has(id)) {
            const ids = known.map((r) => `"${r.id}"`).join(', ');
            throw new EngineError('E_CONFIG_INVALID', `${origin}: key "rules.${id}": unknown rule, expected one of ${ids}`);
        }
    }
    return known.map((rule) => settingOf(rule, options.rules[rule.id], origin));
}
function settingOf(rule, configured, origin) {
    if (configured === undefined)
        return { rule, severity: null, options: rule.defaultOptions };
    if (typeof configured === 'string')
        return { rule, severity: configured, options: rule.defaultOptions };
    const [severity, given] = configured;
    const merged = { ...rule.defaultOptions, ...given };
    if (rule.optionsSchema === undefined) {
        const keys = Object.keys(given);
        if (keys.length > 0) {
            throw new EngineError('E_CONFIG_INVALID', `${origin}: key "rules.${rule.id}.${keys.sort(compareText)[0]}": the rule takes no options, expected "${severity}" alone`);
        }
        return { rule, severity, options: merged };
    }
    const parsed = rule.optionsSchema.safeParse(merged, { reportInput: true });
    if (!parsed.success) {
        const issue = parsed.error.issues[0];
        const path = [rule.id, ...issue.path.map(String)];
        if (issue.code === 'unrecognized_keys')
            path.push(issue.keys[0]);
        const accepted = Object.keys(rule.defaultOptions).map((k) => `"${k}"`).join(', ');
        const problem = issue.code === 'unrecognized_keys' ? `unknown option, expected one of ${accepted}` : expectedGot(rule.optionsSchema, issue);
        throw new EngineError('E_CONFIG_INVALID', `${origin}: key "rules.${path.join('.')}": ${problem}`);
    }
    return { rule, severity, options: parsed.data };
}
/**
 * Run every rule that is not off and return their findings with rule id and severity,
 * sorted by file, line, column, rule and message. Findings on pages marked
 * `linkweave.exclude` are dropped.
 * @throws EngineError `E_CONFIG_INVALID` for a bad `rules` configuration (see `validateRuleConfig`)
 */
export function runRules(ctx, known = builtinRules) {
    const settings = validateRuleConfig(ctx.options, 'configuration', known);
    const excluded = new Set(ctx.facts.filter((f) => f.meta.exclude).map((f) => f.file));
    const findings = [];
    for (const { rule, severity, options } of settings) {
        if (severity === 'off')
            continue;
        for (const found of rule.check(ctx, options)) {
            if (excluded.has(found.file))
                continue;
            findings.push(stamp(rule.id, severity ?? found.severity ?? rule.defaultSeverity, found));
        }
    }
    return findings.sort(compareFindings);
}
function stamp(rule, severity, found) {
    const finding = {
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
/** Order of findings everywhere in the output: file, line, column, rule, message. */
export function compareFindings(a, b) {
    return (compareText(a.file, b.file) ||
        a.line - b.line ||
        a.column - b.column ||
        compareText(a.rule, b.rule) ||
        compareText(a.message, b.message) ||
        compareText(a.target ?? '', b.target ?? ''));
}
