import { describe, expect, it } from 'vitest';
import { formatReport } from '../../src/report/index.js';
import { fixtureReport } from './fixture.js';

// eslint-disable-next-line no-control-regex
const ANSI = /\u001b\[[0-9;]*m/;

describe('text formatter', () => {
  const report = fixtureReport();

  it('matches the reviewed snapshot (findings by file, suggestions by source file, summary and gate last)', async () => {
    await expect(formatReport(report, 'text')).toMatchFileSnapshot('__snapshots__/fixture.txt');
  });

  it('fits an 80-column terminal and has no colour codes without colour', () => {
    const text = formatReport(report, 'text');
    expect(text).not.toMatch(ANSI);
    for (const line of text.split('\n')) expect(line.length).toBeLessThanOrEqual(80);
  });

  it('colours severities only when asked', () => {
    const text = formatReport(report, 'text', { color: true });
    expect(text).toMatch(ANSI);
    expect(text.replace(new RegExp(ANSI.source, 'g'), '')).toBe(formatReport(report, 'text'));
  });

  it('width 0: `file:line:column  severity  rule-id`, the message unwrapped on the next line', () => {
    const lines = formatReport(report, 'text', { width: 0 }).split('\n');
    const at = lines.indexOf('index.md:9:3  error  broken-link');
    expect(at).toBeGreaterThanOrEqual(0);
    expect(lines[at + 1]).toBe(
      '    Broken link: no source file guide/instal.md; did you mean guide/install.md?',
    );
    const s = lines.indexOf('reference/index.md:5:12  add link "tuning options" -> /guide/configure/advanced/tuning/');
    expect(s).toBeGreaterThanOrEqual(0);
    expect(lines[s + 1]).toBe('    similarity 0.42, target rank 0.56 -> 1.32, depth 5 -> 2  id b7e1c2d4');
  });

  it('shows paths relative to the working folder when given one', () => {
    const text = formatReport(report, 'text', { cwd: '/work', width: 0 });
    expect(text).toContain('docs/index.md:9:3  error');
    expect(text).toContain('docs/reference/index.md:5:12  add link');
  });

  it('a clean site: no problems, gate passed', () => {
    const clean = fixtureReport({
      spec: { pages: [{ route: '/', links: ['/a/'] }, { route: '/a/', links: ['/'] }], pagerank: [0.5, 0.5] },
      suggestions: [],
    });
    expect(formatReport(clean, 'text')).toBe(
      [
        'No problems found',
        '2 pages, 2 links, 0 broken links, 0 broken fragments, 0 orphans, 0 unreachable,',
        '0 dead ends, deepest page 1 click (limit 3), PageRank 12 iterations',
        'Gate passed (fail on error)',
        '',
      ].join('\n'),
    );
  });
});

describe('text formatter safety', () => {
  it('shows control characters from the sources as U+FFFD, never as terminal escapes', () => {
    const report = fixtureReport();
    const hostile = {
      ...report,
      findings: [{ ...report.findings[0]!, file: 'a\u001b[2Jb.md', message: 'Unexpected \u001b]0;title\u0007 text' }],
      suggestions: [],
    };
    const text = formatReport(hostile, 'text', { width: 0 });
    expect(text).not.toMatch(/[\u0000-\u0008\u000b-\u001f]/);
    expect(text).toContain('a\uFFFD[2Jb.md:1:1  warning  max-click-depth\n    Unexpected \uFFFD]0;title\uFFFD text');
  });
});

describe('text formatter on a large site', () => {
  it('prints 150,000 findings (no argument list of that length, which overflows the stack)', () => {
    const report = fixtureReport();
    const one = report.findings[0]!;
    const findings = Array.from({ length: 150_000 }, (_, i) => ({ ...one, file: `p${String(i).padStart(6, '0')}.md`, line: 1, column: 1 }));
    const text = formatReport({ ...report, findings }, 'text');
    expect(text.split('\n').filter((l) => /^p\d{6}\.md:1:1 {2}/.test(l))).toHaveLength(150_000);
  });
});


describe('text formatter summary (maxItems)', () => {
  it('lists the first findings and suggestions, then how many more the full report has', () => {
    const report = fixtureReport();
    const findings = Array.from({ length: 25 }, (_, i) => ({ ...report.findings[0]!, file: `p${String(i).padStart(2, '0')}.md` }));
    const text = formatReport({ ...report, findings }, 'text', { maxItems: 20 });
    expect(text.split('\n').filter((l) => /^p\d\d\.md:/.test(l))).toHaveLength(20);
    expect(text).toContain('\n... and 5 more findings, in the full report\n');
    expect(formatReport({ ...report, findings }, 'text')).not.toContain('more findings');
  });
});
