/**
 * SARIF output checked against the official schema: OASIS Static Analysis Results Interchange
 * Format (SARIF) Version 2.1.0, JSON schema `sarif-2.1.0-rtm.5.json` as shipped by the npm
 * package `@microsoft/jest-sarif` (JSON Schema draft-04, hence `ajv-draft-04`).
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import ajvDraft04 from 'ajv-draft-04';
import ajvFormats from 'ajv-formats';
import type { Log, Result } from 'sarif';
import { formatReport, suggestionLink, toSarif } from '../../src/report/index.js';
import { rules } from '../../src/rules/index.js';
import { fixtureReport } from './fixture.js';

const require = createRequire(import.meta.url);
const schemaPath = require.resolve('@microsoft/jest-sarif/lib/schemas/sarif-2.1.0-rtm.5.json');
const schema = JSON.parse(readFileSync(schemaPath, 'utf8')) as object;
// Both packages are CommonJS: under NodeNext the default import is `module.exports`, whose
// `default` is the class / plugin. unicodeRegExp off: one pattern of the schema (a language tag)
// is not valid with the `u` flag.
const ajv = new ajvDraft04.default({ allErrors: true, strict: false, unicodeRegExp: false });
ajvFormats.default(ajv);
const validate = ajv.compile(schema);

describe('sarif formatter', () => {
  const report = fixtureReport();
  const text = formatReport(report, 'sarif');
  const log = JSON.parse(text) as Log;
  const run = log.runs[0]!;
  const results = run.results!;

  it('validates against the OASIS SARIF 2.1.0 schema (findings and suggestions)', () => {
    const ok = validate(log);
    expect(validate.errors ?? []).toEqual([]);
    expect(ok).toBe(true);
    expect(results.filter((r) => r.ruleId === 'link-suggestion')).toHaveLength(2);
    expect(results.filter((r) => r.level === 'error')).toHaveLength(3);
  });

  it('the validator does reject a malformed log', () => {
    const broken = structuredClone(log);
    (broken.runs[0]!.results![0] as unknown as Record<string, unknown>).level = 'fatal';
    expect(validate(broken)).toBe(false);
    expect(validate({ version: '2.0.0', runs: [] })).toBe(false);
  });

  it('describes every rule and the suggestion rule in tool.driver', () => {
    expect(log.version).toBe('2.1.0');
    const driver = run.tool.driver;
    expect(driver).toMatchObject({ name: 'linkweave', version: '0.1.0' });
    expect(driver).not.toHaveProperty('informationUri');
    expect(driver.rules!.map((r) => r.id)).toEqual([...rules.map((r) => r.id), 'link-suggestion']);
    expect(driver.rules![driver.rules!.findIndex((r) => r.id === 'orphan-page')]).toEqual({
      id: 'orphan-page',
      shortDescription: { text: 'Every page is linked from at least one other page.' },
      defaultConfiguration: { level: 'error' },
    });
    for (const r of results) expect(driver.rules![r.ruleIndex!]!.id).toBe(r.ruleId);
  });

  it('puts findings at their file, line and column under SRCROOT', () => {
    expect(run.originalUriBaseIds).toEqual({ SRCROOT: { uri: 'file:///work/docs/' } });
    const broken = results.find((r) => r.ruleId === 'broken-link')!;
    expect(broken.level).toBe('error');
    expect(broken.message.text).toBe(report.findings.find((f) => f.rule === 'broken-link')!.message);
    expect(broken.locations).toEqual([
      { physicalLocation: { artifactLocation: { uri: 'index.md', uriBaseId: 'SRCROOT' }, region: { startLine: 9, startColumn: 3 } } },
    ]);
    expect(results.find((r) => r.ruleId === 'orphan-page')!.level).toBe('error');
  });

  it('gives a suggestion with an anchor a fix replacing the anchor by the link', () => {
    const s = results.find((r) => r.properties?.['suggestionId'] === 'b7e1c2d4')!;
    expect(s.level).toBe('note');
    expect(s.message.text).toBe(
      'Add a link to /guide/configure/advanced/tuning/ on "tuning options" (42% similar; target rank 0.56 -> 1.32; 2 clicks instead of 5). Why: too deep: 5 clicks, limit 3.',
    );
    expect(s.fixes).toEqual([
      {
        description: { text: 'Link "tuning options" to /guide/configure/advanced/tuning/' },
        artifactChanges: [
          {
            artifactLocation: { uri: 'reference/index.md', uriBaseId: 'SRCROOT' },
            replacements: [
              {
                // "tuning options" is 14 characters from 5:12; SARIF's endColumn is the column after the region.
                deletedRegion: { startLine: 5, startColumn: 12, endLine: 5, endColumn: 26 },
                insertedContent: { text: '[tuning options](../guide/configure/advanced/tuning.md)' },
              },
            ],
          },
        ],
      },
    ]);
  });

  it('a suggestion without an anchor has a location but no fix', () => {
    const s: Result = results.find((r) => r.properties?.['suggestionId'] === '0f3a9e71')!;
    expect(s.fixes).toBeUndefined();
    expect(s.locations![0]!.physicalLocation!.region).toEqual({ startLine: 3, startColumn: 1 });
    expect(s.message.text).toContain('needs a sentence written by hand');
  });

  it('a finding that belongs to no file (missing entry) has no location and still validates', () => {
    const noEntry = fixtureReport({ spec: { options: { entry: ['/', '/start/'] } } });
    const sarif = toSarif(noEntry);
    const missing = sarif.runs[0]!.results!.find((r) => r.ruleId === 'missing-entry')!;
    expect(missing).not.toHaveProperty('locations');
    expect(validate(sarif)).toBe(true);
  });

  it('links HTML sources with <a href> and percent-encodes file URIs', () => {
    const s = { ...report.suggestions[1]!, file: 'old pages/intro.html', anchor: 'tuning options' };
    const file = report.pages.find((p) => p.route === s.target)?.file;
    expect(suggestionLink(s, file, 'absolute')).toBe('<a href="/guide/configure/advanced/tuning/">tuning options</a>');
    expect(suggestionLink(s, file, 'relative')).toBe('<a href="../guide/configure/advanced/tuning/">tuning options</a>');
    const spaced = toSarif({ ...report, findings: [{ ...report.findings[0]!, file: 'old pages/a b.md' }], suggestions: [] });
    expect(spaced.runs[0]!.results![0]!.locations![0]!.physicalLocation!.artifactLocation!.uri).toBe('old%20pages/a%20b.md');
    expect(validate(spaced)).toBe(true);
  });
});

describe('SARIF in pieces', () => {
  it('joins to exactly the one-string log', async () => {
    const { formatReportPieces } = await import('../../src/report/index.js');
    const report = fixtureReport();
    expect([...formatReportPieces(report, 'sarif')].join('')).toBe(formatReport(report, 'sarif'));
  });
});
