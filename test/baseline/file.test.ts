import { describe, expect, it } from 'vitest';
import { BASELINE_SCHEMA, formatBaseline, parseBaseline } from '../../src/baseline/index.js';
import type { Finding } from '../../src/types.js';

const FINDINGS: Finding[] = [
  { rule: 'orphan-page', severity: 'error', file: 'notes/old.md', line: 1, column: 1, route: '/notes/old/', message: 'orphan' },
  { rule: 'broken-link', severity: 'error', file: 'index.md', line: 9, column: 3, route: '/', message: 'missing b', target: 'b.md' },
  { rule: 'broken-link', severity: 'error', file: 'index.md', line: 4, column: 3, route: '/', message: 'missing a', target: 'a.md' },
  { rule: 'click-depth', severity: 'warning', file: 'deep.md', line: 1, column: 1, route: '/deep/', message: 'deep' },
];

describe('baseline file', () => {
  it('is sorted by rule, route and target, keys in a fixed order, byte-identical for any input order', () => {
    const text = formatBaseline(FINDINGS);
    expect(formatBaseline([...FINDINGS].reverse())).toBe(text);
    const parsed = JSON.parse(text) as { schema: string; findings: Finding[] };
    expect(parsed.schema).toBe(BASELINE_SCHEMA);
    expect(parsed.findings.map((f) => `${f.rule} ${f.route} ${f.target ?? ''}`)).toEqual([
      'broken-link / a.md',
      'broken-link / b.md',
      'click-depth /deep/ ',
      'orphan-page /notes/old/ ',
    ]);
    expect(Object.keys(parsed.findings[0]!)).toEqual(['rule', 'route', 'target', 'severity', 'file', 'line', 'column', 'message']);
    expect(Object.keys(parsed.findings[2]!)).toEqual(['rule', 'route', 'severity', 'file', 'line', 'column', 'message']);
    expect(text.endsWith('}\n')).toBe(true);
  });

  it('reads back what it wrote', () => {
    const back = parseBaseline(formatBaseline(FINDINGS), 'base.json');
    expect(formatBaseline(back.findings)).toBe(formatBaseline(FINDINGS));
    expect(back.findings).toHaveLength(4);
  });

  it('takes a JSON report as a baseline too (its findings)', () => {
    const report = JSON.stringify({ schema: 'linkweave/report@1', findings: FINDINGS, pages: [] });
    expect(parseBaseline(report, 'report.json').findings).toEqual(parseBaseline(formatBaseline(FINDINGS), 'b').findings);
  });

  it('names the file and the line and column of a JSON error', () => {
    expect(() => parseBaseline('{\n  "schema": "linkweave/baseline@1",\n  findings: []\n}', 'ci/base.json')).toThrow(
      /^ci\/base\.json: not valid JSON at line 3, column 3: /,
    );
    expect(() => parseBaseline('{"schema": "linkweave/baseline@1", "findings": [', 'b.json')).toThrow(/^b\.json: not valid JSON at line 1, column 49/);
  });

  it('names the key of a wrong shape and the schema it expected', () => {
    const bad = (findings: unknown) => JSON.stringify({ schema: BASELINE_SCHEMA, findings });
    expect(() => parseBaseline(bad([{ ...FINDINGS[0], line: 'one' }]), 'b.json')).toThrow(/^b\.json: key "findings\.0\.line": .*expected a linkweave\/baseline@1 file/);
    expect(() => parseBaseline(bad([{ ...FINDINGS[0], severity: 'fatal' }]), 'b.json')).toThrow(/key "findings\.0\.severity"/);
    expect(() => parseBaseline(bad('none'), 'b.json')).toThrow(/key "findings"/);
    expect(() => parseBaseline('{"schema": "eslint"}', 'b.json')).toThrow(/^b\.json: key "schema": expected "linkweave\/baseline@1" .*; got "eslint"/);
    expect(() => parseBaseline('[]', 'b.json')).toThrow(/key "schema".*got none/);
    expect(() => parseBaseline('{}', 'b.json')).toThrow(expect.objectContaining({ code: 'E_REPORT_INVALID' }));
  });
});
