import { describe, expect, it } from 'vitest';
import { resolveOptions } from '../../src/options.js';
import type { Config } from '../../src/options.js';
import { evaluateGate } from '../../src/report/index.js';
import type { GateStats } from '../../src/report/index.js';
import type { Finding } from '../../src/types.js';
import { fixtureReport } from './fixture.js';

const finding = (rule: string, severity: Finding['severity']): Finding => ({
  rule,
  severity,
  file: 'a.md',
  line: 1,
  column: 1,
  route: '/a/',
  message: 'm',
});

const calm: GateStats = { maxDepth: 2, orphans: 0, brokenLinks: 0, brokenFragments: 0, unreachable: 0, fewestImportantInlinks: null };
const gate = (config: Config) => resolveOptions(config, '/site');

describe('evaluateGate: severity', () => {
  const findings = [finding('orphan-page', 'warning'), finding('broken-link', 'error'), finding('broken-link', 'error'), finding('dead-end', 'warning')];

  it('failOn error: fails per rule with errors, actual = that rule\'s errors', () => {
    expect(evaluateGate(findings, calm, gate({}))).toEqual({
      passed: false,
      failOn: 'error',
      failures: [{ rule: 'broken-link', limit: 0, actual: 2 }],
    });
  });

  it('failOn warning: warnings fail too, sorted by rule', () => {
    expect(evaluateGate(findings, calm, gate({ failOn: 'warning' })).failures).toEqual([
      { rule: 'broken-link', limit: 0, actual: 2 },
      { rule: 'dead-end', limit: 0, actual: 1 },
      { rule: 'orphan-page', limit: 0, actual: 1 },
    ]);
  });

  it('only warnings and failOn error: passes', () => {
    expect(evaluateGate([finding('dead-end', 'warning')], calm, gate({}))).toEqual({ passed: true, failOn: 'error', failures: [] });
  });
});

describe('evaluateGate: limits (a count above its limit fails; at the limit passes)', () => {
  const cases: [keyof NonNullable<Config['gate']>, Partial<GateStats>, number, number][] = [
    ['maxDepth', { maxDepth: 5 }, 3, 5],
    ['maxOrphans', { orphans: 2 }, 1, 2],
    ['maxBrokenLinks', { brokenLinks: 4 }, 0, 4],
    ['maxBrokenFragments', { brokenFragments: 3 }, 2, 3],
    ['maxUnreachable', { unreachable: 1 }, 0, 1],
  ];
  for (const [key, stats, limit, actual] of cases) {
    it(`gate.${key}`, () => {
      const crossed = evaluateGate([], { ...calm, ...stats }, gate({ gate: { [key]: limit } }));
      expect(crossed).toEqual({ passed: false, failOn: 'error', failures: [{ rule: `gate.${key}`, limit, actual }] });
      expect(evaluateGate([], { ...calm, ...stats }, gate({ gate: { [key]: actual } })).passed).toBe(true);
      expect(evaluateGate([], { ...calm, ...stats }, gate({})).passed).toBe(true);
    });
  }

  it('gate.maxWarnings counts warning findings only', () => {
    const findings = [finding('dead-end', 'warning'), finding('orphan-page', 'warning'), finding('dead-end', 'warning')];
    expect(evaluateGate(findings, calm, gate({ gate: { maxWarnings: 2 } })).failures).toEqual([{ rule: 'gate.maxWarnings', limit: 2, actual: 3 }]);
    expect(evaluateGate(findings, calm, gate({ gate: { maxWarnings: 3 } })).passed).toBe(true);
  });

  it('gate.minInlinksForImportant fails below the limit, with the fewest as actual; no important page: passes', () => {
    const config = gate({ gate: { minInlinksForImportant: 2 } });
    expect(evaluateGate([], { ...calm, fewestImportantInlinks: 1 }, config).failures).toEqual([
      { rule: 'gate.minInlinksForImportant', limit: 2, actual: 1 },
    ]);
    expect(evaluateGate([], { ...calm, fewestImportantInlinks: 2 }, config).passed).toBe(true);
    expect(evaluateGate([], { ...calm, fewestImportantInlinks: null }, config).passed).toBe(true);
  });

  it('maxDepth with no reachable page does not fail (unreachable pages have their own limit)', () => {
    expect(evaluateGate([], { ...calm, maxDepth: null }, gate({ gate: { maxDepth: 0 } })).passed).toBe(true);
  });

  it('severity and limit failures together, sorted by rule', () => {
    const result = evaluateGate([finding('unreachable-page', 'error')], { ...calm, orphans: 3, maxDepth: 6 }, gate({ gate: { maxOrphans: 0, maxDepth: 3 } }));
    expect(result.failures.map((f) => f.rule)).toEqual(['gate.maxDepth', 'gate.maxOrphans', 'unreachable-page']);
  });
});

describe('the gate in a built report reads the report\'s own counts', () => {
  it('fixture: deepest page 5 over maxDepth 4; the tuning page (high importance) has 1 content inlink', () => {
    const report = fixtureReport({
      spec: { options: { rules: { 'broken-link': 'warning', 'broken-fragment': 'off', 'orphan-page': 'off' }, gate: { maxDepth: 4, minInlinksForImportant: 2 } } },
    });
    expect(report.gate.failures).toEqual([
      { rule: 'gate.maxDepth', limit: 4, actual: 5 },
      { rule: 'gate.minInlinksForImportant', limit: 2, actual: 1 },
    ]);
  });
});
