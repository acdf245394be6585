/**
 * Valid/invalid tables for rule tests (STYLE sections 2.6, 2.12): each valid site gives no
 * finding of the rule, each invalid site exactly the findings listed, in order.
 */
import { describe, expect, it } from 'vitest';
import { runRules } from '../../src/rules/index.js';
import type { Rule } from '../../src/rules/index.js';
import type { Finding } from '../../src/types.js';
import { buildSite } from './helpers.js';
import type { SiteSpec } from './helpers.js';

/** A finding as a table lists it: severity defaults to the rule's default, route/target are checked when given. */
export type Expected = Pick<Finding, 'file' | 'line' | 'column' | 'message'> & Partial<Pick<Finding, 'severity' | 'route' | 'target'>>;

export interface RuleTable {
  readonly valid: readonly { readonly name: string; readonly site: SiteSpec }[];
  readonly invalid: readonly { readonly name: string; readonly site: SiteSpec; readonly findings: readonly Expected[] }[];
}

/** Register the table's tests for `rule`, run through the engine with only that rule known. */
export function ruleTable(rule: Rule, table: RuleTable): void {
  describe(`${rule.id}: valid`, () => {
    for (const { name, site } of table.valid) {
      it(name, () => {
        expect(runRules(buildSite(site), [rule])).toEqual([]);
      });
    }
  });
  describe(`${rule.id}: invalid`, () => {
    for (const { name, site, findings } of table.invalid) {
      it(name, () => {
        const got = runRules(buildSite(site), [rule]);
        const want = findings.map((f) => ({ rule: rule.id, severity: rule.defaultSeverity, ...f }));
        expect(got.map((g, i) => pick(g, want[i]))).toEqual(want);
        expect(got).toHaveLength(want.length);
      });
    }
  });
}

/** Keep the keys the expectation names (plus the always-checked ones). */
function pick(got: Finding, want: Record<string, unknown> | undefined): Record<string, unknown> {
  const keys = new Set(['rule', 'severity', 'file', 'line', 'column', 'message', ...Object.keys(want ?? {})]);
  return Object.fromEntries(Object.entries(got).filter(([k]) => keys.has(k)));
}
