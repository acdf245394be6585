/**
 * The pull-request comment (`suggest --compare base.json --format markdown`) for the two
 * fixture versions, against a snapshot read by a person once: gate first, then the new
 * finding, the fixed one, every finding collapsed, the structure changes, the checklist.
 */
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import { compareReports, parseReportFile } from '../../src/compare/index.js';
import { formatReport } from '../../src/report/index.js';

const fixtures = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', 'fixtures');
const noCache = { cache: { enabled: false } };

describe('markdown comment with a base report', () => {
  it('matches the reviewed snapshot', async () => {
    const base = await analyze({ root: path.join(fixtures, 'pr-base'), command: 'suggest', ...noCache });
    const head = await analyze({ root: path.join(fixtures, 'pr-head'), command: 'suggest', ...noCache });
    const report = { ...head, comparison: compareReports(parseReportFile(formatReport(base, 'json'), 'base.json'), head) };
    // Paths as a user in the fixtures folder typed them: the snapshot names no machine folder.
    const md = formatReport(report, 'markdown', { cwd: fixtures });
    await expect(md).toMatchFileSnapshot('__snapshots__/pr-review.md');
    // The order a reviewer reads in.
    const order = ['### linkweave: this run fails', '#### New findings', '#### Fixed findings', '<summary>All', '#### Structure changes', '#### Suggested links'];
    const at = order.map((h) => md.indexOf(h));
    expect(at.every((i) => i >= 0)).toBe(true);
    expect(at).toEqual([...at].sort((a, b) => a - b));
  });

  it('with a baseline only: new and fixed against the baseline, and the verdict says how many were known', async () => {
    const base = await analyze({ root: path.join(fixtures, 'pr-base'), ...noCache });
    const head = await analyze({ root: path.join(fixtures, 'pr-head'), ...noCache, baseline: { findings: base.findings } });
    const md = formatReport(head, 'markdown');
    expect(md).toContain('3 findings known from the baseline do not count; 1 new.');
    expect(md).toContain('#### New findings (1, not in the baseline)');
    expect(md).toContain('#### Fixed findings (1, in the baseline, gone now)');
    expect(md).toContain('| error | `notes/legacy.md:1:1` | No page links to /notes/legacy/');
    expect(md).not.toContain('#### Structure changes');
  });
});
