import { describe, expect, it } from 'vitest';
import { escapeMarkdown, formatReport } from '../../src/report/index.js';
import type { Suggestion } from '../../src/types.js';
import { fixtureReport, SUGGESTIONS } from './fixture.js';

describe('markdown formatter', () => {
  it('matches the reviewed snapshot (verdict first, findings table, suggestion checklist, hand-written list, apply command)', async () => {
    await expect(formatReport(fixtureReport(), 'markdown')).toMatchFileSnapshot('__snapshots__/fixture.md');
  });

  it('starts with the verdict and lists the limits crossed', () => {
    const md = formatReport(fixtureReport({ spec: { options: { limits: { orphans: 0, importantPageInlinks: 3 } } } }), 'markdown');
    const lines = md.split('\n');
    expect(lines[0]).toBe('### linkweave: this run fails');
    expect(lines).toContain('| `limits.orphans` | 1 | at most 0 |');
    expect(lines).toContain('| `limits.importantPageInlinks` | 1 | at least 3 |');
    expect(lines).toContain('| `broken-link` | 1 error | none |');
  });

  it('collapses long lists in <details> after the first ten', () => {
    const many: Suggestion[] = Array.from({ length: 15 }, (_, i) => ({ ...SUGGESTIONS[0]!, id: `id${String(i).padStart(2, '0')}`, line: i + 1 }));
    const md = formatReport(fixtureReport({ suggestions: many }), 'markdown');
    const checklist = md.split('\n').filter((l) => l.startsWith('- [ ] '));
    expect(checklist).toHaveLength(15);
    expect(md).toContain('<details>\n<summary>5 more suggestions</summary>\n\n- [ ] "tuning options" in `reference/index.md:11`');
    expect(md.indexOf('id `id09`')).toBeLessThan(md.indexOf('<details>'));
  });

  it('lists at most 60 items of a long list, then says how many more the full reports have', () => {
    const many: Suggestion[] = Array.from({ length: 500 }, (_, i) => ({ ...SUGGESTIONS[0]!, id: `id${String(i).padStart(3, '0')}`, line: i + 1 }));
    const md = formatReport(fixtureReport({ suggestions: many }), 'markdown');
    expect(md.split('\n').filter((l) => l.startsWith('- [ ] '))).toHaveLength(60);
    expect(md).toContain('<summary>490 more suggestions</summary>');
    expect(md).toContain('\n... and 440 more suggestions, not listed here: the JSON and HTML reports have them all.\n\n</details>');
    expect(md.length).toBeLessThan(65_536);
  });

  it('a passing run says so first', () => {
    const clean = fixtureReport({ spec: { pages: [{ route: '/', links: ['/a/'] }, { route: '/a/', links: ['/'] }] }, suggestions: [] });
    expect(formatReport(clean, 'markdown')).toBe(
      [
        '### linkweave: this run passes',
        '',
        'No finding at or above `error` and no limit crossed.',
        '',
        '2 pages · 2 links · 0 broken links · 0 broken fragments · 0 orphan pages · 0 unreachable · 0 dead ends · deepest page 1 click (limit 3).',
        '',
        '#### Findings: none',
        '',
      ].join('\n'),
    );
  });

  it('escapes text that would turn into markup or break a table', () => {
    expect(escapeMarkdown('a | b <script> *x* [y]\nz')).toBe('a \\| b \\<script\\> \\*x\\* \\[y\\] z');
  });
});
