/**
 * Baselines on two versions of one site (test/fixtures/pr-base -> pr-head): a page removed
 * (notes/legacy.md, an orphan), a link added (home -> reference/codes.md), a line inserted
 * above a finding (the broken link on the home page moves from line 8 to 10), a new page
 * with a broken link (guide/faq.md).
 */
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import { parseBaseline, formatBaseline } from '../../src/baseline/index.js';

const fixtures = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', 'fixtures');
const base = path.join(fixtures, 'pr-base');
const head = path.join(fixtures, 'pr-head');
const noCache = { cache: { enabled: false } };

describe('--baseline on two versions of a site', () => {
  it('known findings do not fail the gate, the new one does, the removed orphan is fixed', async () => {
    const before = await analyze({ root: base, ...noCache });
    const baseline = parseBaseline(formatBaseline(before.findings), 'base.json');
    const after = await analyze({ root: head, ...noCache, baseline });

    expect(after.baseline!.new.map((f) => [f.rule, f.file, f.line, f.target])).toEqual([
      ['broken-link', 'guide/faq.md', 3, 'guide/wiring-checklist.md'],
    ]);
    expect(after.baseline!.fixed.map((f) => [f.rule, f.route])).toEqual([['orphan-page', '/notes/legacy/']]);
    // The broken link on the home page moved two lines down: still known, not new.
    const moved = after.findings.find((f) => f.target === 'guide/old-setup.md')!;
    const was = before.findings.find((f) => f.target === 'guide/old-setup.md')!;
    expect([was.line, moved.line]).toEqual([8, 10]);
    expect(after.baseline!.known).toBe(after.findings.length - 1);
    // The gate counts the new finding only.
    expect(after.gate.passed).toBe(false);
    expect(after.gate.failures).toEqual([{ rule: 'broken-link', limit: 0, actual: 1 }]);
    // The report itself still lists every finding.
    expect(after.stats.findings.error).toBe(after.findings.length);
  });

  it('a baseline of the same run passes the gate; without one the same run fails', async () => {
    const plain = await analyze({ root: head, ...noCache });
    expect(plain.gate.passed).toBe(false);
    const same = await analyze({ root: head, ...noCache, baseline: { findings: plain.findings } });
    expect(same.gate).toEqual({ passed: true, failOn: 'error', failures: [] });
    expect(same.baseline).toEqual({ known: plain.findings.length, new: [], fixed: [] });
  });

  it('site limits read the whole site, baseline or not; limits.warnings counts new findings', async () => {
    const plain = await analyze({ root: head, ...noCache, limits: { brokenLinks: 1, orphans: 0 } });
    const limits = plain.gate.failures.filter((f) => f.rule.startsWith('limits.'));
    expect(limits).toEqual([
      { rule: 'limits.brokenLinks', limit: 1, actual: 2 },
      { rule: 'limits.orphans', limit: 0, actual: 1 },
    ]);
    const withBaseline = await analyze({ root: head, ...noCache, limits: { brokenLinks: 1, orphans: 0 }, baseline: { findings: plain.findings } });
    expect(withBaseline.gate.failures).toEqual(limits);

    // Findings as warnings: limits.warnings 0 fails on all of them, and on none under a baseline that has them.
    const warnings = {
      checks: { 'broken-link': { level: 'warning' }, 'broken-fragment': { level: 'warning' }, 'orphan-page': { level: 'warning' } },
      limits: { warnings: 0 },
    } as const;
    const warned = await analyze({ root: head, ...noCache, ...warnings });
    expect(warned.gate.failures).toEqual([{ rule: 'limits.warnings', limit: 0, actual: warned.findings.length }]);
    const known = await analyze({ root: head, ...noCache, ...warnings, baseline: { findings: warned.findings.slice(1) } });
    expect(known.gate.failures).toEqual([{ rule: 'limits.warnings', limit: 0, actual: 1 }]);
  });
});
