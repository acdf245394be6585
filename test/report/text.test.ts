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

  it('fits 100 columns by default and the width given, and has no colour codes without colour', () => {
    const text = formatReport(report, 'text');
    expect(text).not.toMatch(ANSI);
    const command = (l: string) => l.startsWith('  linkweave apply ');
    for (const line of text.split('\n')) if (!command(line)) expect(line.length).toBeLessThanOrEqual(100);
    for (const line of formatReport(report, 'text', { width: 60 }).split('\n')) if (!command(line)) expect(line.length).toBeLessThanOrEqual(60);
  });

  it('never breaks a line inside a quoted phrase, a route or the apply command', () => {
    const long = { ...report.suggestions.find((s) => s.anchor !== null)!, anchor: 'a rather long anchor phrase that must stay whole' };
    const text = formatReport({ ...report, suggestions: [long] }, 'text', { width: 50 });
    expect(text).toContain('"a rather long anchor phrase that must stay whole"');
    expect(text).toContain('/guide/configure/advanced/tuning/');
    expect(text).toContain(`  linkweave apply /work/docs --ids ${long.id}\n`);
    const quoted = formatReport(report, 'text', { width: 40 });
    expect(quoted).toContain('"setup";');
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
    const s = lines.indexOf('reference/index.md:5:12  link "tuning options" -> /guide/configure/advanced/tuning/');
    expect(s).toBeGreaterThanOrEqual(0);
    expect(lines[s + 1]).toBe('    42% similar; rank 0.56 -> 1.32; 2 clicks instead of 5; id b7e1c2d4');
  });

  it('shows paths relative to the working folder when given one', () => {
    const text = formatReport(report, 'text', { cwd: '/work', width: 0 });
    expect(text).toContain('docs/index.md:9:3  error');
    expect(text).toContain('docs/reference/index.md:5:12  link');
    // The apply command names the root as seen from the working folder, so it runs as printed.
    expect(text).toContain('  linkweave apply docs --ids b7e1c2d4\n');
    // A run with --config FILE prints an apply command that reads the same file.
    const withConfig = formatReport(report, 'text', { cwd: '/work', width: 0, applyArgs: ['--config', 'ci/link weave.json'] });
    expect(withConfig).toContain("  linkweave apply docs --config 'ci/link weave.json' --ids b7e1c2d4\n");
  });

  it('a clean site: no findings, the run passes', () => {
    const clean = fixtureReport({
      spec: { pages: [{ route: '/', links: ['/a/'] }, { route: '/a/', links: ['/'] }] },
      suggestions: [],
    });
    expect(formatReport(clean, 'text')).toBe(
      [
        'Site: 2 pages, 2 links, 0 broken links, 0 broken fragments, 0 orphan pages, 0 unreachable,',
        '  0 dead ends, deepest page 1 click (limit 3)',
        'Findings: none',
        'This run passes (exit 0): no errors, no limit crossed',
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
      findings: [{ ...report.findings[0]!, file: 'a\u001b[2Jb.md', message: 'Odd \u001b]0;title\u0007 text' }],
      suggestions: [],
    };
    const text = formatReport(hostile, 'text', { width: 0 });
    expect(text).not.toMatch(/[\u0000-\u0008\u000b-\u001f]/);
    expect(text).toContain('a\uFFFD[2Jb.md:1:1  warning  click-depth\n    Odd \uFFFD]0;title\uFFFD text');
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
