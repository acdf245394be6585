/**
 * The SARIF writer: SARIF 2.1.0 (OASIS), one run. Every rule is a rule descriptor (from the
 * rule metadata) plus `link-suggestion` for the suggested links; findings are results at their
 * file, line and column relative to `SRCROOT` (the content root); suggestions are results of
 * level `note` whose `fixes` entry replaces the anchor phrase with the link markup. With a
 * baseline or a base report, each finding has a `baselineState` (`new` or `unchanged`).
 */
import { anchorForReading } from '../../parse/index.js';
import { pathToFileURL } from 'node:url';
import type { ArtifactLocation, Fix, Log, ReportingDescriptor, Result } from 'sarif';
import { rules } from '../../rules/registry.js';
import type { Finding, Report, Suggestion } from '../../types.js';
import { jsonTextPieces } from './json.js';
import type { FormatContext, Formatter } from '../types.js';
import { kindOfPath, linkText } from '../../routes/index.js';
import type { LinkStyle } from '../../routes/index.js';
import { formatSimilarity, impactOf } from './common.js';

/** Rule id of suggestion results. */
export const SUGGESTION_RULE = 'link-suggestion';

const SCHEMA = 'https://json.schemastore.org/sarif-2.1.0.json';

function descriptors(): ReportingDescriptor[] {
  return [
    ...rules.map((r) => ({
      id: r.id,
      shortDescription: { text: r.description },
      defaultConfiguration: { level: r.defaultSeverity },
    })),
    {
      id: SUGGESTION_RULE,
      shortDescription: { text: 'A new link from a related page would help readers reach this page.' },
      defaultConfiguration: { level: 'note' as const },
    },
  ];
}

/** A relative posix path as a URI reference (each segment percent-encoded). */
function uriOf(file: string): string {
  return file.split('/').map(encodeURIComponent).join('/');
}

function artifact(file: string): ArtifactLocation {
  return { uri: uriOf(file), uriBaseId: 'SRCROOT' };
}

/** `ruleIndex` is absent for a rule the descriptors do not know (a plugin's own). */
function findingResult(f: Finding, ruleIndex: number | undefined, baselineState: Result['baselineState']): Result {
  return {
    ruleId: f.rule,
    ...(ruleIndex === undefined ? {} : { ruleIndex }),
    level: f.severity,
    ...(baselineState === undefined ? {} : { baselineState }),
    message: { text: f.message },
    ...(f.file === ''
      ? {}
      : { locations: [{ physicalLocation: { artifactLocation: artifact(f.file), region: { startLine: f.line, startColumn: f.column } } }] }),
    partialFingerprints: { 'linkweaveFinding/v1': `${f.rule}|${f.route}|${f.target ?? ''}` },
    ...(f.route === '' ? {} : { properties: { route: f.route } }),
  };
}

/** Lines and the column after the last character of `text` starting at line:column. */
function endOf(line: number, column: number, text: string): { endLine: number; endColumn: number } {
  const parts = text.split(/\r\n|\r|\n/);
  if (parts.length === 1) return { endLine: line, endColumn: column + text.length };
  return { endLine: line + parts.length - 1, endColumn: parts[parts.length - 1].length + 1 };
}

/**
 * The link the fix inserts in place of the anchor: exactly what `apply` writes (`linkText`), in
 * the file's link style from `ctx.linkStyles` (else `relative`, apply's style when the site has
 * no links to follow). A target the report has no file for is linked by its route.
 */
export function suggestionLink(s: Suggestion & { anchor: string }, targetFile: string | undefined, style: LinkStyle): string {
  const kind = kindOfPath(s.file) ?? 'markdown';
  const source = { file: s.file, kind, route: s.source };
  if (targetFile === undefined) return linkText(source, { route: s.target, file: s.target }, 'absolute', s.anchor);
  return linkText(source, { route: s.target, file: targetFile }, style, s.anchor);
}

/** Source file by route (looked up per suggestion; a search of the pages each time was quadratic). */
function filesByRoute(report: Report): Map<string, string> {
  return new Map(report.pages.map((p) => [p.route, p.file]));
}

function suggestionResult(files: ReadonlyMap<string, string>, styles: FormatContext['linkStyles'], s: Suggestion, ruleIndex: number): Result {
  const region = { startLine: s.line, startColumn: s.column };
  const impact = `${formatSimilarity(s.similarity)} similar; target ${impactOf(s)}`;
  const what =
    s.anchor === null
      ? `Add a link to ${s.target} near here; needs a sentence written by hand, no phrase here names the target (${impact}).`
      : `Add a link to ${s.target} on "${anchorForReading(s.anchor)}" (${impact}).`;
  const text = s.reason === '' ? what : `${what} Why: ${s.reason}.`;
  const fixes: Fix[] =
    s.anchor === null
      ? []
      : [
          {
            description: { text: `Link "${anchorForReading(s.anchor)}" to ${s.target}` },
            artifactChanges: [
              {
                artifactLocation: artifact(s.file),
                replacements: [
                  {
                    deletedRegion: { ...region, ...endOf(s.line, s.column, s.anchor) },
                    insertedContent: { text: suggestionLink({ ...s, anchor: s.anchor }, files.get(s.target), styles?.get(s.file) ?? 'relative') },
                  },
                ],
              },
            ],
          },
        ];
  return {
    ruleId: SUGGESTION_RULE,
    ruleIndex,
    level: 'note',
    message: { text },
    locations: [{ physicalLocation: { artifactLocation: artifact(s.file), region } }],
    partialFingerprints: { 'linkweaveSuggestion/v1': s.id },
    properties: { suggestionId: s.id, source: s.source, target: s.target, sourceHash: s.sourceHash },
    ...(fixes.length === 0 ? {} : { fixes }),
  };
}

/**
 * `baselineState` of each finding when the report was compared with a base report (preferred)
 * or a baseline: `new` for the findings that run did not have, else `unchanged`. Without
 * either, no state.
 */
function baselineStates(report: Report): (f: Finding) => Result['baselineState'] {
  const fresh = report.comparison?.newFindings ?? report.baseline?.new;
  if (fresh === undefined) return () => undefined;
  const identity = (f: Finding) => JSON.stringify([f.rule, f.file, f.line, f.column, f.route, f.message, f.target ?? null]);
  const left = new Map<string, number>();
  for (const f of fresh) left.set(identity(f), (left.get(identity(f)) ?? 0) + 1);
  return (f) => {
    const key = identity(f);
    const n = left.get(key) ?? 0;
    if (n === 0) return 'unchanged';
    left.set(key, n - 1);
    return 'new';
  };
}

/**
 * The SARIF log of a report, as an object (the formatter stringifies it).
 * @param linkStyles the link style of each source file, as `apply` chose it (`FormatContext.linkStyles`)
 */
export function toSarif(report: Report, linkStyles?: FormatContext['linkStyles']): Log {
  const driverRules = descriptors();
  const index = new Map(driverRules.map((r, i) => [r.id, i]));
  const state = baselineStates(report);
  const files = filesByRoute(report);
  const results: Result[] = [
    ...report.findings.map((f) => findingResult(f, index.get(f.rule), state(f))),
    ...report.suggestions.map((s) => suggestionResult(files, linkStyles, s, index.get(SUGGESTION_RULE)!)),
  ];
  const root = pathToFileURL(report.root).href;
  return {
    $schema: SCHEMA,
    version: '2.1.0',
    runs: [
      {
        tool: { driver: { name: 'linkweave', version: report.tool.version, rules: driverRules } },
        originalUriBaseIds: { SRCROOT: { uri: root.endsWith('/') ? root : `${root}/` } },
        columnKind: 'utf16CodeUnits',
        results,
      },
    ],
  };
}

/** The SARIF formatter. */
export const sarifFormatter: Formatter = {
  id: 'sarif',
  fileExtension: '.sarif',
  format(report, ctx) {
    return `${JSON.stringify(toSarif(report, ctx.linkStyles), null, 2)}\n`;
  },
  // The log, runs, one run, results: each result stringified alone (a large site's log is
  // longer than one string can be).
  pieces(report, ctx) {
    return jsonTextPieces(toSarif(report, ctx.linkStyles), 4);
  },
};
