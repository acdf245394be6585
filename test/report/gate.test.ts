import { describe, expect, it } from 'vitest';
import { resolveOptions } from '../../src/config/options.js';
import type { Config } from '../../src/config/options.js';
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

const calm: GateStats = { deepest: 2, orphans: 0, brokenLinks: 0, brokenFragments: 0, unreachable: 0, fewestImportantInlinks: null };
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
  const cases: [Exclude<keyof NonNullable<Config['limits']>, 'importantPageInlinks' | 'warnings'>, Partial<GateStats>, number, number][] = [
    ['orphans', { orphans: 2 }, 1, 2],
    ['brokenLinks', { brokenLinks: 4 }, 0, 4],
    ['brokenFragments', { brokenFragments: 3 }, 2, 3],
    ['unreachable', { unreachable: 1 }, 0, 1],
  ];
  for (const [key, stats, limit, actual] of cases) {
    it(`limits.${key}`, () => {
      const crossed = evaluateGate([], { ...calm, ...stats }, gate({ limits: { [key]: limit } }));
      expect(crossed).toEqual({ passed: false, failOn: 'error', failures: [{ rule: `limits.${key}`, limit, actual }] });
      expect(evaluateGate([], { ...calm, ...stats }, gate({ limits: { [key]: actual } })).passed).toBe(true);
      expect(evaluateGate([], { ...calm, ...stats }, gate({})).passed).toBe(true);
    });
  }

  it('limits.warnings counts warning findings only', () => {
    const findings = [finding('dead-end', 'warning'), finding('orphan-page', 'warning'), finding('dead-end', 'warning')];
    expect(evaluateGate(findings, calm, gate({ limits: { warnings: 2 } })).failures).toEqual([{ rule: 'limits.warnings', limit: 2, actual: 3 }]);
    expect(evaluateGate(findings, calm, gate({ limits: { warnings: 3 } })).passed).toBe(true);
  });

  it('limits.importantPageInlinks fails below the limit, with the fewest as actual; no important page: passes', () => {
    const config = gate({ limits: { importantPageInlinks: 2 } });
    expect(evaluateGate([], { ...calm, fewestImportantInlinks: 1 }, config).failures).toEqual([
      { rule: 'limits.importantPageInlinks', limit: 2, actual: 1 },
    ]);
    expect(evaluateGate([], { ...calm, fewestImportantInlinks: 2 }, config).passed).toBe(true);
    expect(evaluateGate([], { ...calm, fewestImportantInlinks: null }, config).passed).toBe(true);
  });

  it('level and limit failures together, sorted by rule', () => {
    const result = evaluateGate([finding('unreachable-page', 'error')], { ...calm, orphans: 3 }, gate({ limits: { orphans: 0 } }));
    expect(result.failures.map((f) => f.rule)).toEqual(['limits.orphans', 'unreachable-page']);
  });
});

describe('the verdict in a built report reads the report\'s own counts', () => {
  it('fixture: deepest page 5 over maxDepth 4 fails through click-depth at level error; the tuning page (high importance) has 1 content inlink', () => {
    const report = fixtureReport({
      spec: {
        options: {
          maxDepth: 4,
          checks: { 'broken-link': { level: 'warning' }, 'broken-fragment': { level: 'none' }, 'orphan-page': { level: 'none' }, 'click-depth': { level: 'error' } },
          limits: { importantPageInlinks: 2 },
        },
      },
    });
    expect(report.gate.failures).toEqual([
      { rule: 'click-depth', limit: 0, actual: 1 },
      { rule: 'limits.importantPageInlinks', limit: 2, actual: 1 },
    ]);
  });
});
