import { describe, expect, it } from 'vitest';
import { isEngineError } from '../../src/errors.js';
import { FORMAT_IDS, formatReport, formatters } from '../../src/report/index.js';
import type { FormatId } from '../../src/report/index.js';
import { fixtureReport } from './fixture.js';

describe('formatReport', () => {
  const report = fixtureReport();

  it('dispatches to each built-in formatter by id, each declaring its id and extension', () => {
    for (const id of FORMAT_IDS) {
      const formatter = formatters[id]!;
      expect(formatter.id).toBe(id);
      expect(formatter.fileExtension).toMatch(/^\.[a-z]+$/);
    }
    expect([...FORMAT_IDS].sort()).toEqual(['html', 'json', 'markdown', 'sarif', 'text']);
    // Each id gives its own kind of document, recognised without the formatters' code.
    const out = Object.fromEntries(FORMAT_IDS.map((id) => [id, formatReport(report, id)])) as Record<FormatId, string>;
    expect(JSON.parse(out.json)).toEqual(JSON.parse(JSON.stringify(report)));
    const sarif = JSON.parse(out.sarif) as { version: string; runs: { results: { ruleId: string }[] }[] };
    expect(sarif.version).toBe('2.1.0');
    expect(sarif.runs[0]!.results.map((r) => r.ruleId)).toEqual(expect.arrayContaining(report.findings.map((f) => f.rule)));
    expect(out.html.startsWith('<!doctype html>')).toBe(true);
    expect(out.markdown).toMatch(/^#+ /);
    expect(out.markdown).toContain('| `index.md:9:3` |');
    expect(out.text).toMatch(/^index\.md:9:3 +error +broken-link$/m);
    expect(out.text).not.toMatch(/^[{<#]/);
  });

  it('an unknown id is a usage error listing the known ones', () => {
    let caught: unknown;
    try {
      formatReport(report, 'yaml' as FormatId);
    } catch (error) {
      caught = error;
    }
    expect(isEngineError(caught) && caught.code).toBe('E_USAGE');
    expect((caught as Error).message).toBe(`unknown format "yaml", expected one of ${FORMAT_IDS.map((f) => `"${f}"`).join(', ')}`);
  });
});
