/**
 * SARIF with a baseline: findings carry `baselineState` (`new` / `unchanged`), and the log still
 * validates against the OASIS SARIF 2.1.0 schema (`sarif-2.1.0-rtm.5.json` from the npm package
 * `@microsoft/jest-sarif`, JSON Schema draft-04, hence `ajv-draft-04`).
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import ajvDraft04 from 'ajv-draft-04';
import ajvFormats from 'ajv-formats';
import type { Log } from 'sarif';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import { compareReports, parseReportFile } from '../../src/compare/index.js';
import { formatReport } from '../../src/report/index.js';

const require = createRequire(import.meta.url);
const schema = JSON.parse(readFileSync(require.resolve('@microsoft/jest-sarif/lib/schemas/sarif-2.1.0-rtm.5.json'), 'utf8')) as object;
const ajv = new ajvDraft04.default({ allErrors: true, strict: false, unicodeRegExp: false });
ajvFormats.default(ajv);
const validate = ajv.compile(schema);

const fixtures = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', 'fixtures');
const noCache = { cache: { enabled: false } };

describe('SARIF baselineState', () => {
  it('marks the new finding new and the known ones unchanged, with a baseline or a base report', async () => {
    const base = await analyze({ root: path.join(fixtures, 'pr-base'), command: 'suggest', ...noCache });
    const withBaseline = await analyze({ root: path.join(fixtures, 'pr-head'), command: 'suggest', ...noCache, baseline: { findings: base.findings } });
    const compared = { ...(await analyze({ root: path.join(fixtures, 'pr-head'), command: 'suggest', ...noCache })) };
    const withBase = { ...compared, comparison: compareReports(parseReportFile(formatReport(base, 'json'), 'base.json'), compared) };
    for (const report of [withBaseline, withBase]) {
      const log = JSON.parse(formatReport(report, 'sarif')) as Log;
      expect(validate(log), JSON.stringify(validate.errors)).toBe(true);
      const states = log.runs[0]!.results!.filter((r) => r.ruleId !== 'link-suggestion').map((r) => [r.ruleId, r.baselineState]);
      expect(states.filter(([, s]) => s === 'new')).toEqual([['broken-link', 'new']]);
      expect(states.filter(([, s]) => s === 'unchanged')).toHaveLength(3);
    }
    const plain = JSON.parse(formatReport(base, 'sarif')) as Log;
    expect(plain.runs[0]!.results!.every((r) => r.baselineState === undefined)).toBe(true);
  });
});
