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
      expect(formatReport(report, id)).toBe(formatter.format(report, { color: false }));
    }
    expect(FORMAT_IDS).toEqual(expect.arrayContaining(['text', 'json', 'markdown', 'sarif']));
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
